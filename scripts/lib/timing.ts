/** One line per step with the time it took, as `npm start`, `npm run build` and `npm run db:reset` print them. */

export function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(1)} s`;
}

/**
 * Prints "<label>: <doing>… " at once (so a long step shows what it is doing), then what `work`
 * returned and the time taken on the same line. A failure ends the line and propagates.
 */
export async function timed(
  label: string,
  doing: string,
  work: () => Promise<string> | string,
): Promise<void> {
  const started = Date.now();
  process.stdout.write(`${label}: ${doing}… `);
  try {
    const what = await work();
    process.stdout.write(`${what} (${seconds(Date.now() - started)})\n`);
  } catch (err) {
    process.stdout.write(`failed (${seconds(Date.now() - started)})\n`);
    throw err;
  }
}
