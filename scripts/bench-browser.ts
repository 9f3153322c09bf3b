/**
 * Desk redraw benchmark in headless Chromium: from the input event of a changed length to the
 * charts' commit with the new result (performance marks "desk-input-<id>" set in the change
 * handler, the measure "desk-redraw" taken when the update that commits the charts returns; see
 * src/features/desk/lib/redraw-measure.ts). Builds that also record "desk-redraw-next-task" (the
 * next task after that commit, after any frame painted first) get that figure printed as well.
 * Guard: at the moment "desk-redraw" is measured, the chart lines must already be the ones on
 * screen once everything has settled; the run fails otherwise.
 * Then the reach study: a 40 x 40 study of length x tip depth on the same cantilever, from the click
 * on "Run study" (mark "study-start-<run>") to the first canvas paint with points
 * ("study-first-paint") and to the paint with every point ("study-complete"); median of 3 runs.
 * Builds nothing: run `npx vite build` first. Usage:
 *   npm run bench:browser [-- --runs 40] [-- --json] [-- --profile] [-- --trace] [-- --dist DIR]
 * `--profile` records a CPU profile of the main thread over the changes and prints the functions
 * with the most self time (build with `--minify false --outDir DIR` and pass `--dist DIR` for names);
 * `--trace` sums the main thread's trace events (script, style, layout, paint) per change.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { launchChromium } from '../tests/helpers/chromium';
import { startServer } from '../server/start';
import { percentile } from './lib/stats';

const args = process.argv.slice(2);
const json = args.includes('--json');
const runsAt = args.indexOf('--runs');
const runs = runsAt >= 0 ? Number(args[runsAt + 1]) : 40;
const profile = args.includes('--profile');
const trace = args.includes('--trace');
const distAt = args.indexOf('--dist');
const distDir = distAt >= 0 ? resolve(args[distAt + 1]) : undefined;

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface CpuProfile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

interface TraceEvent {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  tid: number;
  pid: number;
  args?: { name?: string };
}

/** Self time of the renderer main thread's trace events by name, in ms per change, the largest first. */
function summariseTrace(events: TraceEvent[], changes: number): [string, number][] {
  const main = events.find(
    (e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain',
  );
  const spans = events
    .filter(
      (e) => main && e.pid === main.pid && e.tid === main.tid && e.ph === 'X' && typeof e.dur === 'number',
    )
    .sort((a, b) => a.ts - b.ts || (b.dur ?? 0) - (a.dur ?? 0));
  const self = new Map<string, number>();
  const stack: { end: number; name: string }[] = [];
  for (const e of spans) {
    while (stack.length > 0 && stack[stack.length - 1].end <= e.ts) stack.pop();
    const parent = stack[stack.length - 1];
    if (parent) self.set(parent.name, (self.get(parent.name) ?? 0) - (e.dur ?? 0) / 1000);
    self.set(e.name, (self.get(e.name) ?? 0) + (e.dur ?? 0) / 1000);
    stack.push({ end: e.ts + (e.dur ?? 0), name: e.name });
  }
  return [...self]
    .map(([n, ms]) => [n, ms / changes] as [string, number])
    .sort((a, b) => b[1] - a[1])
    .slice(0, 25);
}

/** Self time by function and by script file, and total time by function, in ms per change, the largest first. */
function summariseProfile(
  cpu: CpuProfile,
  changes: number,
): { byFunction: [string, number][]; byFile: [string, number][]; inclusive: [string, number][] } {
  const self = new Map<number, number>();
  cpu.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (cpu.timeDeltas[i] ?? 0) / 1000));
  const parent = new Map<number, ProfileNode>();
  const byId = new Map(cpu.nodes.map((n) => [n.id, n]));
  for (const node of cpu.nodes) for (const child of node.children ?? []) parent.set(child, node);
  const inclusive = new Map<string, number>();
  for (const [id, ms] of self) {
    // Each function once per sample, however deep it recurses.
    const seen = new Set<string>();
    for (let node = byId.get(id); node; node = parent.get(node.id)) {
      const { functionName, url, lineNumber } = node.callFrame;
      if (!url) continue;
      seen.add(`${functionName || '(anonymous)'} ${url.slice(url.lastIndexOf('/') + 1)}:${lineNumber + 1}`);
    }
    for (const name of seen) inclusive.set(name, (inclusive.get(name) ?? 0) + ms / changes);
  }
  const byFunction = new Map<string, number>();
  const byFile = new Map<string, number>();
  for (const node of cpu.nodes) {
    const ms = (self.get(node.id) ?? 0) / changes;
    if (ms === 0) continue;
    const { functionName, url, lineNumber } = node.callFrame;
    const file = url ? url.slice(url.lastIndexOf('/') + 1) : '(native)';
    const name = `${functionName || '(anonymous)'} ${file}:${lineNumber + 1}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + ms);
    byFile.set(file, (byFile.get(file) ?? 0) + ms);
  }
  const top = (m: Map<string, number>, n: number) => [...m].sort((a, b) => b[1] - a[1]).slice(0, n);
  return { byFunction: top(byFunction, 30), byFile: top(byFile, 15), inclusive: top(inclusive, 60) };
}

/** Runs the 40 x 40 study `repeats` times; medians of the first-paint and complete measures (ms). */
async function studyBench(page: import('playwright-core').Page, cantileverId: number, repeats: number) {
  await page.goto(`/cantilevers/${cantileverId}/study`);
  await page.locator('#study-x-steps').waitFor();
  await page.locator('#study-x-steps').fill('40');
  await page.locator('#study-y-steps').fill('40');
  // The pool of workers starts with the screen; let it load the engine as a person would before the first run.
  await page.waitForTimeout(1000);
  for (let k = 0; k < repeats; k += 1) {
    await page.getByRole('button', { name: /Run study|Restart study/ }).click();
    await page.waitForFunction(
      (n) => performance.getEntriesByName('study-complete', 'measure').length > n,
      k,
      {
        timeout: 120_000,
        polling: 20,
      },
    );
  }
  const read = (name: string) =>
    page.evaluate((n) => performance.getEntriesByName(n, 'measure').map((e) => e.duration), name);
  const mid = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
  const workers = await page.evaluate(() => navigator.hardwareConcurrency);
  return {
    first: mid(await read('study-first-paint')),
    complete: mid(await read('study-complete')),
    workers,
  };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'reachline-bench-'));
  const uploadDir = join(dir, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  const server = await startServer({
    port: 0,
    databaseUrl: join(dir, 'bench.sqlite'),
    uploadDir,
    dataDir: dir,
    // Warnings and errors only: the request log of every call would bury the figures on stdout.
    logLevel: 'warn',
    ...(distDir ? { distDir } : {}),
  });
  const context = await launchChromium(join(dir, 'profile'), server.url);
  try {
    const login = await context.request.post(`${server.url}/api/auth/login`, {
      data: { email: 'engineer@reachline.test', password: 'reachline-demo' },
    });
    if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
    const projects = (await (await context.request.get(`${server.url}/api/projects`)).json()) as {
      id: number;
    }[];
    const project = (await (
      await context.request.get(`${server.url}/api/projects/${projects[0].id}`)
    ).json()) as { cantilevers: { id: number }[] };
    // Snapshot of the chart lines at the moment of each redraw measure, for the guard below.
    await context.addInitScript(() => {
      const measure = performance.measure.bind(performance);
      const snapshots: string[] = [];
      Object.assign(window, { __deskRedrawSnapshots: snapshots });
      performance.measure = ((...args: Parameters<typeof measure>) => {
        if (args[0] === 'desk-redraw')
          snapshots.push(
            [...document.querySelectorAll('.recharts-line-curve')].map((p) => p.getAttribute('d')).join('|'),
          );
        return measure(...args);
      }) as typeof performance.measure;
    });
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(`/cantilevers/${project.cantilevers[0].id}`);
    await page.getByTestId('tip-deflection').waitFor();
    const length = page.locator('#f-member-length');
    // Builds before the measure moved to the commit record only "desk-redraw" (at the next task).
    const hasNextTask = await page.evaluate(
      () => performance.getEntriesByName('desk-redraw-next-task', 'measure').length > 0,
    );
    await page.evaluate(() => {
      performance.clearMeasures('desk-redraw');
      performance.clearMeasures('desk-redraw-next-task');
    });
    // Main-thread CPU per change (less sensitive to other load on the machine than wall time).
    const cdp = await context.newCDPSession(page);
    await cdp.send('Performance.enable');
    const metric = async (name: string) => {
      const { metrics } = (await cdp.send('Performance.getMetrics')) as {
        metrics: { name: string; value: number }[];
      };
      return metrics.find((m) => m.name === name)?.value ?? 0;
    };
    const cpuBefore = await metric('ThreadTime');
    const scriptBefore = await metric('ScriptDuration');
    const layoutBefore = (await metric('LayoutDuration')) + (await metric('RecalcStyleDuration'));
    if (profile) {
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.setSamplingInterval', { interval: 100 });
      await cdp.send('Profiler.start');
    }
    const traceEvents: TraceEvent[] = [];
    if (trace) {
      cdp.on('Tracing.dataCollected', (e) => {
        traceEvents.push(...(e.value as unknown as TraceEvent[]));
      });
      await cdp.send('Tracing.start', {
        categories: 'devtools.timeline,disabled-by-default-devtools.timeline,blink,v8',
        transferMode: 'ReportEvents',
      });
    }
    const counts = () =>
      page.evaluate(() => [
        performance.getEntriesByName('desk-redraw', 'measure').length,
        performance.getEntriesByName('desk-redraw-next-task', 'measure').length,
      ]);
    const curves = () =>
      page.evaluate(() =>
        [...document.querySelectorAll('.recharts-line-curve')].map((p) => p.getAttribute('d')).join('|'),
      );
    let early = 0;
    for (let i = 0; i < runs; i += 1) {
      const [before, beforeNext] = await counts();
      await length.fill(`${(8 + (i % 6) * 0.5).toFixed(1)} ft`);
      await page.waitForFunction(
        (n) => performance.getEntriesByName('desk-redraw', 'measure').length > n,
        before,
        { timeout: 10_000, polling: 20 },
      );
      if (hasNextTask) {
        await page.waitForFunction(
          (n) => performance.getEntriesByName('desk-redraw-next-task', 'measure').length > n,
          beforeNext,
          { timeout: 10_000, polling: 20 },
        );
      }
      const atMeasure = await page.evaluate(() =>
        (window as unknown as { __deskRedrawSnapshots: string[] }).__deskRedrawSnapshots.at(-1),
      );
      if (atMeasure !== (await curves())) early += 1;
    }
    if (early > 0)
      throw new Error(
        `${early} of ${runs} redraw measures were taken before the charts showed the new result`,
      );
    if (trace) {
      const done = new Promise<void>((resolve) => cdp.once('Tracing.tracingComplete', () => resolve()));
      await cdp.send('Tracing.end');
      await done;
      console.log('main-thread trace, self time per change by event (ms):');
      for (const [name, ms] of summariseTrace(traceEvents, runs))
        console.log(`  ${ms.toFixed(2).padStart(7)}  ${name}`);
    }
    if (profile) {
      const { profile: cpu } = (await cdp.send('Profiler.stop')) as unknown as { profile: CpuProfile };
      const { byFunction, byFile, inclusive } = summariseProfile(cpu, runs);
      const saved = join(tmpdir(), 'reachline-desk.cpuprofile');
      writeFileSync(saved, JSON.stringify(cpu));
      console.log(`profile saved to ${saved} (opens in Chrome DevTools' Performance panel)`);
      console.log('self time per change, by file (ms):');
      for (const [file, ms] of byFile) console.log(`  ${ms.toFixed(2).padStart(7)}  ${file}`);
      console.log('self time per change, by function (ms):');
      for (const [name, ms] of byFunction) console.log(`  ${ms.toFixed(2).padStart(7)}  ${name}`);
      console.log('total time per change, by function (ms):');
      for (const [name, ms] of inclusive) console.log(`  ${ms.toFixed(2).padStart(7)}  ${name}`);
    }
    const cpuPerChange = (((await metric('ThreadTime')) - cpuBefore) * 1000) / runs;
    const scriptPerChange = (((await metric('ScriptDuration')) - scriptBefore) * 1000) / runs;
    const layoutPerChange =
      (((await metric('LayoutDuration')) + (await metric('RecalcStyleDuration')) - layoutBefore) * 1000) /
      runs;
    const samples = await page.evaluate(() =>
      performance.getEntriesByName('desk-redraw', 'measure').map((e) => e.duration),
    );
    const nextTask = await page.evaluate(() =>
      performance.getEntriesByName('desk-redraw-next-task', 'measure').map((e) => e.duration),
    );
    const engine = await page.evaluate(() =>
      performance.getEntriesByName('desk-engine', 'measure').map((e) => e.duration),
    );
    const points = await page.evaluate(() => document.querySelectorAll('.recharts-line-curve').length);
    if (!json)
      console.log(
        `main thread per change: ${cpuPerChange.toFixed(1)} ms CPU (script ${scriptPerChange.toFixed(1)} ms, style+layout ${layoutPerChange.toFixed(1)} ms)`,
      );
    if (!json)
      console.log(
        `engine round trip median ${[...engine].sort((a, b) => a - b)[Math.floor(engine.length / 2)]?.toFixed(1)} ms; ${points} curves`,
      );
    const sorted = [...samples].sort((a, b) => a - b);
    const median =
      sorted.length % 2
        ? sorted[(sorted.length - 1) / 2]
        : (sorted[sorted.length / 2 - 1] + sorted[sorted.length / 2]) / 2;
    const p95 = percentile(sorted, 0.95);
    // The lower quartile moves least when other work shares the machine: useful to compare builds.
    const p25 = percentile(sorted, 0.25);
    const round = (n: number) => Math.round(n * 10) / 10;
    const study = await studyBench(page, project.cantilevers[0].id, 3);
    if (json)
      console.log(
        JSON.stringify({
          deskRedrawMedianMs: round(median),
          deskRedrawP95Ms: round(p95),
          deskRedrawP25Ms: round(p25),
          nextTaskMedianMs:
            nextTask.length > 0
              ? round([...nextTask].sort((a, b) => a - b)[Math.floor(nextTask.length / 2)])
              : null,
          mainThreadCpuPerChangeMs: round(cpuPerChange),
          runs: samples.length,
          studyFirstPaintMs: round(study.first),
          studyCompleteMs: round(study.complete),
          studyWorkers: study.workers,
        }),
      );
    if (!json && nextTask.length > 0) {
      const n = [...nextTask].sort((a, b) => a - b);
      console.log(
        `to the next task after the commit (after any frame painted first): median ${round(n[Math.floor(n.length / 2)])} ms, p95 ${round(percentile(n, 0.95))} ms`,
      );
    }
    if (!json)
      console.log(
        `desk redraw over ${samples.length} changes: median ${round(median)} ms, p95 ${round(p95)} ms, p25 ${round(p25)} ms (target: median under 50 ms)`,
      );
    if (!json)
      console.log(
        `reach study 40 x 40 (${study.workers} workers), median of 3: first paint ${round(study.first)} ms, complete ${round(study.complete)} ms (target: complete under 1500 ms)`,
      );
  } finally {
    await context.close();
    await server.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
