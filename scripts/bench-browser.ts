/**
 * Desk redraw benchmark in headless Chromium: from the input event of a changed length to the
 * charts' commit with the new result (performance marks "desk-input-<id>" set in the change
 * handler, the measure "desk-redraw" taken one animation frame after the charts' effect).
 * Builds nothing: run `npx vite build` first. Usage:
 *   npm run bench:browser [-- --runs 40] [-- --json]
 */
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { startServer } from '../server/start';

const args = process.argv.slice(2);
const json = args.includes('--json');
const runsAt = args.indexOf('--runs');
const runs = runsAt >= 0 ? Number(args[runsAt + 1]) : 40;

function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1));
  return sorted[i];
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'reachline-bench-'));
  const uploadDir = join(dir, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  const server = await startServer({ port: 0, databaseUrl: join(dir, 'bench.sqlite'), uploadDir, dataDir: dir });
  const context = await chromium.launchPersistentContext(join(dir, 'profile'), {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    viewport: { width: 1440, height: 960 },
    baseURL: server.url,
  });
  try {
    const login = await context.request.post(`${server.url}/api/auth/login`, { data: { email: 'engineer@reachline.test', password: 'reachline-demo' } });
    if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
    const projects = (await (await context.request.get(`${server.url}/api/projects`)).json()) as { id: number }[];
    const project = (await (await context.request.get(`${server.url}/api/projects/${projects[0].id}`)).json()) as { cantilevers: { id: number }[] };
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(`/cantilevers/${project.cantilevers[0].id}`);
    await page.getByTestId('tip-deflection').waitFor();
    const length = page.locator('#f-member-length');
    await page.evaluate(() => performance.clearMeasures('desk-redraw'));
    // Main-thread CPU per change (less sensitive to other load on the machine than wall time).
    const cdp = await context.newCDPSession(page);
    await cdp.send('Performance.enable');
    const metric = async (name: string) => {
      const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
      return metrics.find((m) => m.name === name)?.value ?? 0;
    };
    const cpuBefore = await metric('ThreadTime');
    const scriptBefore = await metric('ScriptDuration');
    const layoutBefore = (await metric('LayoutDuration')) + (await metric('RecalcStyleDuration'));
    const count = () => page.evaluate(() => performance.getEntriesByName('desk-redraw', 'measure').length);
    for (let i = 0; i < runs; i += 1) {
      const before = await count();
      await length.fill(`${(8 + (i % 6) * 0.5).toFixed(1)} ft`);
      await page.waitForFunction((n) => performance.getEntriesByName('desk-redraw', 'measure').length > n, before, { timeout: 10_000, polling: 20 });
    }
    const cpuPerChange = ((await metric('ThreadTime')) - cpuBefore) * 1000 / runs;
    const scriptPerChange = ((await metric('ScriptDuration')) - scriptBefore) * 1000 / runs;
    const layoutPerChange = ((await metric('LayoutDuration')) + (await metric('RecalcStyleDuration')) - layoutBefore) * 1000 / runs;
    const samples = await page.evaluate(() => performance.getEntriesByName('desk-redraw', 'measure').map((e) => e.duration));
    const engine = await page.evaluate(() => performance.getEntriesByName('desk-engine', 'measure').map((e) => e.duration));
    const points = await page.evaluate(() => document.querySelectorAll('.recharts-line-curve').length);
    if (!json) console.log(`main thread per change: ${cpuPerChange.toFixed(1)} ms CPU (script ${scriptPerChange.toFixed(1)} ms, style+layout ${layoutPerChange.toFixed(1)} ms)`);
    if (!json) console.log(`engine round trip median ${[...engine].sort((a, b) => a - b)[Math.floor(engine.length / 2)]?.toFixed(1)} ms; ${points} curves`);
    const sorted = [...samples].sort((a, b) => a - b);
    const median = sorted.length % 2 ? sorted[(sorted.length - 1) / 2] : (sorted[sorted.length / 2 - 1] + sorted[sorted.length / 2]) / 2;
    const p95 = percentile(sorted, 0.95);
    const round = (n: number) => Math.round(n * 10) / 10;
    if (json) console.log(JSON.stringify({ deskRedrawMedianMs: round(median), deskRedrawP95Ms: round(p95), mainThreadCpuPerChangeMs: round(cpuPerChange), runs: samples.length }));
    else console.log(`desk redraw over ${samples.length} changes: median ${round(median)} ms, p95 ${round(p95)} ms (target: median under 50 ms)`);
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
