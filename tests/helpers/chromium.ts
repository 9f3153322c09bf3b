/**
 * Headless Debian Chromium through playwright-core, as the browser tests and the desk benchmark
 * launch it. The flags keep Chromium off the network (this machine has none but the registries)
 * and work as root; never `playwright install`, which downloads a browser of its own. Which
 * Chromium: scripts/lib/chromium.ts (CHROMIUM_PATH, else /usr/bin/chromium).
 */
import { chromium, type BrowserContext } from 'playwright-core';
import { realHost, resolveChromium } from '../../scripts/lib/chromium';

const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** `npm test` installs a missing Chromium first; a direct vitest run only says what to install. */
function executablePath(): string {
  const found = resolveChromium({ ...realHost, isRoot: () => false });
  if ('problem' in found) throw new Error(found.problem);
  return found.path;
}

export function launchChromium(profileDir: string, baseURL: string): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profileDir, {
    executablePath: executablePath(),
    args: CHROMIUM_ARGS,
    viewport: { width: 1440, height: 960 },
    baseURL,
  });
}
