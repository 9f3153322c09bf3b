/**
 * Headless Debian Chromium through playwright-core, as the browser tests and the desk benchmark
 * launch it. The flags keep Chromium off the network (this machine has none but the registries)
 * and work as root; never `playwright install`, which downloads a browser of its own. Which
 * Chromium: scripts/lib/chromium.ts (CHROMIUM_PATH, else /usr/bin/chromium).
 */
import { chromium, type Browser, type BrowserContext, type BrowserServer } from 'playwright-core';
import { realHost, resolveChromium } from '../../scripts/lib/chromium';

const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
const VIEWPORT = { width: 1440, height: 960 };

/** `npm test` installs a missing Chromium first; a direct vitest run only says what to install. */
function executablePath(): string {
  const found = resolveChromium({ ...realHost, isRoot: () => false });
  if ('problem' in found) throw new Error(found.problem);
  return found.path;
}

/** One Chromium of its own with a profile folder (the desk benchmark). */
export function launchChromium(profileDir: string, baseURL: string): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profileDir, {
    executablePath: executablePath(),
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: VIEWPORT,
    baseURL,
  });
}

/** One Chromium for a whole browser-test run (tests/helpers/e2e-global-setup.ts). */
export function launchChromiumServer(): Promise<BrowserServer> {
  return chromium.launchServer({ executablePath: executablePath(), headless: true, args: CHROMIUM_ARGS });
}

/** Connects to that Chromium; each session is then a fresh context (own cookies and storage). */
export async function connectChromium(wsEndpoint: string): Promise<{
  browser: Browser;
  newContext(baseURL: string): Promise<BrowserContext>;
}> {
  const browser = await chromium.connect(wsEndpoint);
  return { browser, newContext: (baseURL) => browser.newContext({ viewport: VIEWPORT, baseURL }) };
}
