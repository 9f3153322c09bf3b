/**
 * Headless Debian Chromium through playwright-core, as the browser tests and the desk benchmark
 * launch it. The flags keep Chromium off the network (this machine has none but the registries)
 * and work as root; never `playwright install`, which downloads a browser of its own.
 */
import { chromium, type BrowserContext } from 'playwright-core';

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

export function launchChromium(profileDir: string, baseURL: string): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profileDir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    viewport: { width: 1440, height: 960 },
    baseURL,
  });
}
