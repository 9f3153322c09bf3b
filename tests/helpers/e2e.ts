/**
 * Browser-test harness: the real server (real SQLite file, a copy of the migrated template
 * database, real fake-SMTP, the built client from dist/) on a random loopback port, seeded with the
 * demo, and headless Debian Chromium driven by playwright-core (one browser for the run, from
 * e2e-global-setup.ts; a fresh context per session). One harness per test file; close() removes
 * every temporary file.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { inject } from 'vitest';
import { connectChromium } from './chromium';
import { startServer } from '../../server/start';
import { freshTestDirs } from './test-db';

export const DEMO_PASSWORD = 'reachline-demo';
export type DemoRole = 'admin' | 'architect' | 'fabricator' | 'engineer';
export const demoEmail = (role: DemoRole) => `${role}@reachline.test`;

export const SCREEN_DIR = join(process.cwd(), 'tests', 'output', 'screens');

export interface E2E {
  baseUrl: string;
  /** A fresh browser context (own cookies) with one page. */
  newSession(): Promise<{ context: BrowserContext; page: Page }>;
  /** Signs the context in through the API (cookies shared with its pages). */
  signInAs(context: BrowserContext, role: DemoRole): Promise<void>;
  screenshot(page: Page, name: string): Promise<void>;
  close(): Promise<void>;
}

export async function startE2E(): Promise<E2E> {
  // A copy of the migrated template database (tests/helpers/test-db.ts): the server's own migrate
  // finds nothing to do, and it seeds the demo into the empty copy.
  const dirs = await freshTestDirs();
  mkdirSync(dirs.uploadDir, { recursive: true });
  mkdirSync(SCREEN_DIR, { recursive: true });
  const server = await startServer({
    port: 0,
    databaseUrl: dirs.databaseUrl,
    uploadDir: dirs.uploadDir,
    dataDir: dirs.root,
    // Browser tests sign the same accounts in many times; the limit itself is tested in tests/server.
    loginRateLimit: 500,
    // A low scrypt cost for the seeded accounts, as in the API tests: every sign-in verifies a hash.
    passwordCost: 1024,
  });
  const chromium = await connectChromium(inject('chromiumWsEndpoint'));
  const contexts: BrowserContext[] = [];
  const errors: string[] = [];

  async function newSession() {
    const context = await chromium.newContext(server.url);
    contexts.push(context);
    const page = await context.newPage();
    page.on('pageerror', (err) => errors.push(`pageerror: ${err.message}`));
    return { context, page };
  }

  async function signInAs(context: BrowserContext, role: DemoRole) {
    const res = await context.request.post(`${server.url}/api/auth/login`, {
      data: { email: demoEmail(role), password: DEMO_PASSWORD },
    });
    if (!res.ok()) throw new Error(`sign-in as ${role} failed: ${res.status()} ${await res.text()}`);
  }

  async function screenshot(page: Page, name: string) {
    // A full-page capture resizes the page to its whole size and back: on the desk, which fits its
    // window, that took about five times the CPU of a plain capture of the same picture.
    const fits = await page.evaluate(
      () =>
        document.documentElement.scrollHeight <= window.innerHeight &&
        document.documentElement.scrollWidth <= window.innerWidth,
    );
    await page.screenshot({ path: join(SCREEN_DIR, `${name}.png`), fullPage: !fits });
  }

  async function close() {
    for (const c of contexts) await c.close().catch(() => undefined);
    await chromium.browser.close();
    await server.close();
    dirs.remove();
    if (errors.length > 0) throw new Error(`uncaught errors in the page:\n${errors.join('\n')}`);
  }

  return { baseUrl: server.url, newSession, signInAs, screenshot, close };
}

/**
 * When `shown` and `gone` look again: after 20, 40, 60 and 80 ms, then every 100 ms. Each look is a
 * round trip to the page, where a role or text locator is matched against the whole document (on
 * the desk 3-13 ms of the page's main thread, and about 2 ms in this process), so looking every
 * 20 ms took up to half the page's main thread while it was drawing what the test waits for.
 */
const LOOK_AGAIN_MS = [20, 40, 60, 80, 100];

/**
 * Resolves true once `check` holds, false when `timeout` ms have gone by without it. `lookAgainMs`
 * gives the waits between looks; the last one repeats.
 */
async function lookUntil(
  check: () => boolean | Promise<boolean>,
  timeout: number,
  lookAgainMs: readonly number[] = LOOK_AGAIN_MS,
): Promise<boolean> {
  const deadline = Date.now() + timeout;
  for (let look = 0; ; look += 1) {
    if (await check()) return true;
    const left = deadline - Date.now();
    if (left <= 0) return false;
    const wait = lookAgainMs[Math.min(look, lookAgainMs.length - 1)]!;
    await new Promise((resolve) => setTimeout(resolve, Math.min(wait, left)));
  }
}

/**
 * Waits until the locator's element is visible (see `LOOK_AGAIN_MS`). Playwright's `waitFor` looks
 * again after 20, 50, 100 and 100 ms and then only every 500 ms, so an element drawn 300 ms after a
 * page opened is seen up to half a second late (measured: a heading drawn at 440 ms was seen at
 * 890 ms). Strict like `waitFor`: a locator that matches several elements throws. When the wait
 * fails, Playwright's own wait gives the error, which names the locator.
 */
export async function shown(locator: Locator, timeout = 30_000): Promise<void> {
  if (!(await lookUntil(() => locator.isVisible(), timeout))) await locator.waitFor({ timeout: 1 });
}

/** Waits until nothing matches the locator (Playwright: `waitFor({ state: 'detached' })`). */
export async function gone(locator: Locator, timeout = 30_000): Promise<void> {
  const none = await lookUntil(async () => (await locator.count()) === 0, timeout);
  if (!none) await locator.waitFor({ state: 'detached', timeout: 1 });
}

const inFlight = new WeakMap<Page, { count: number; last: number }>();

/** Starts counting the page's requests in flight, for `networkQuiet` (call before it navigates). */
export function trackRequests(page: Page): void {
  if (inFlight.has(page)) return;
  const state = { count: 0, last: Date.now() };
  inFlight.set(page, state);
  page.on('request', () => {
    state.count += 1;
    state.last = Date.now();
  });
  const done = () => {
    state.count = Math.max(0, state.count - 1);
    state.last = Date.now();
  };
  page.on('requestfinished', done);
  page.on('requestfailed', done);
}

/**
 * Resolves once no request of the page (see `trackRequests`) has been in flight for `quietMs`:
 * Playwright's 'networkidle' is the same with a fixed half second, which every page pays in full.
 */
export async function networkQuiet(page: Page, quietMs = 150, timeout = 30_000): Promise<void> {
  const state = inFlight.get(page);
  if (!state) throw new Error('networkQuiet: call trackRequests(page) before the page navigates');
  // The check reads a counter in this process, not the page: looking every 20 ms costs nothing.
  const quiet = await lookUntil(() => state.count === 0 && Date.now() - state.last >= quietMs, timeout, [20]);
  if (!quiet) throw new Error(`the page still had ${state.count} request(s) in flight`);
}

/**
 * Opens the demo's east deck on the desk the way a person does (projects list, project, cantilever)
 * and waits until `ready` (a test id) is drawn.
 */
export async function openDemoDesk(page: Page, ready = 'tip-deflection'): Promise<void> {
  await page.goto('/projects');
  await page.getByRole('link', { name: /Harbor View Studio/ }).click();
  await page.getByRole('link', { name: 'East deck, typical beam', exact: true }).click();
  await shown(page.getByTestId(ready));
}
