/**
 * Finds the Chromium the browser tests drive: CHROMIUM_PATH when set, else Debian's
 * /usr/bin/chromium, else (as root on Debian) installs Debian's chromium package with apt-get.
 * Otherwise it answers with one line saying what to install. Never `playwright install`, which
 * downloads a browser of its own from outside the Debian archive.
 */
import { spawnSync } from 'node:child_process';
import { accessSync, constants, existsSync } from 'node:fs';
import { seconds } from './timing';

export const DEBIAN_CHROMIUM = '/usr/bin/chromium';

export const INSTALL_HINT =
  "The browser tests need Chromium: install Debian's package (sudo apt-get install chromium) or set CHROMIUM_PATH to a Chromium executable.";

export interface ChromiumHost {
  env: NodeJS.ProcessEnv;
  isExecutable(path: string): boolean;
  isRoot(): boolean;
  isDebian(): boolean;
  /** Runs a command with inherited output; true when it exits 0. */
  run(cmd: string, args: string[]): boolean;
  log(line: string): void;
  now(): number;
}

export type ChromiumFound = { path: string } | { problem: string };

export function resolveChromium(host: ChromiumHost): ChromiumFound {
  const named = host.env.CHROMIUM_PATH;
  if (named) {
    if (host.isExecutable(named)) return { path: named };
    return { problem: `CHROMIUM_PATH is ${named}, which is not an executable file. ${INSTALL_HINT}` };
  }
  if (host.isExecutable(DEBIAN_CHROMIUM)) return { path: DEBIAN_CHROMIUM };
  if (!host.isRoot() || !host.isDebian()) return { problem: INSTALL_HINT };

  host.log(`No Chromium at ${DEBIAN_CHROMIUM}: installing Debian's chromium package with apt-get…`);
  const started = host.now();
  // The same install as .ci/run, so a local run and CI test the same browser.
  const ok =
    host.run('apt-get', ['update', '-qq']) && host.run('apt-get', ['install', '-y', '-qq', 'chromium']);
  if (!ok || !host.isExecutable(DEBIAN_CHROMIUM))
    return { problem: `apt-get could not install chromium. ${INSTALL_HINT}` };
  host.log(`Installed Debian's chromium in ${seconds(host.now() - started)}.`);
  return { path: DEBIAN_CHROMIUM };
}

function isExecutable(path: string): boolean {
  try {
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

export const realHost: ChromiumHost = {
  env: process.env,
  isExecutable,
  isRoot: () => process.getuid?.() === 0,
  isDebian: () => existsSync('/etc/debian_version') && isExecutable('/usr/bin/apt-get'),
  run: (cmd, args) =>
    spawnSync(cmd, args, {
      stdio: 'inherit',
      env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
    }).status === 0,
  log: (line) => console.log(line),
  now: () => Date.now(),
};
