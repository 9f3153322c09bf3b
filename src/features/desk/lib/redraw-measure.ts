/**
 * The desk's redraw measure (read by scripts/bench-browser.ts): from the input that asked for a
 * result (mark "desk-input-<id>") to the commit in which the charts show that result.
 *
 * The charts hand new data to their own stores in effects, and re-render from there. The answer
 * from the engine is applied with flushSync, so those effects and the re-render they cause finish
 * inside the same task: "desk-redraw" is taken when that task's update returns. "desk-redraw-next-task"
 * is the older, looser end point (the next message-channel task, after any frame the browser paints
 * first), kept so that figures stay comparable with earlier builds.
 */

let committed: number | null = null;

/** Called by the charts when a commit shows result `id`; the measure itself waits for the task's end. */
export function noteChartsCommitted(id: number): () => void {
  committed = id;
  const mark = `desk-input-${id}`;
  const channel = new MessageChannel();
  channel.port1.onmessage = () => {
    if (performance.getEntriesByName(mark, 'mark').length > 0)
      performance.measure('desk-redraw-next-task', mark);
    performance.clearMarks(mark);
  };
  channel.port2.postMessage(null);
  return () => channel.port1.close();
}

/** Called once the update for result `id` has been applied (charts' store effects and re-render included). */
export function finishRedraw(id: number): void {
  if (committed !== id) return;
  committed = null;
  const mark = `desk-input-${id}`;
  if (performance.getEntriesByName(mark, 'mark').length > 0) performance.measure('desk-redraw', mark);
}
