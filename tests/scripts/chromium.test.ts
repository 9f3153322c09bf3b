import { describe, expect, it } from 'vitest';
import {
  DEBIAN_CHROMIUM,
  INSTALL_HINT,
  resolveChromium,
  type ChromiumHost,
} from '../../scripts/lib/chromium';

/** A host where only the given paths are executable; apt-get "installs" by adding the Debian path. */
function host(over: Partial<ChromiumHost> & { executables?: string[]; aptWorks?: boolean } = {}) {
  const executables = new Set(over.executables ?? []);
  const ran: string[] = [];
  const logged: string[] = [];
  let clock = 0;
  const h: ChromiumHost = {
    env: {},
    isExecutable: (p) => executables.has(p),
    isRoot: () => true,
    isDebian: () => true,
    run: (cmd, args) => {
      ran.push([cmd, ...args].join(' '));
      clock += 21_000;
      if (over.aptWorks === false) return false;
      if (args[0] === 'install') executables.add(DEBIAN_CHROMIUM);
      return true;
    },
    log: (line) => void logged.push(line),
    now: () => clock,
    ...over,
  };
  return { h, ran, logged };
}

describe('finding the Chromium for the browser tests', () => {
  it('takes CHROMIUM_PATH first, and says so plainly when it names nothing runnable', () => {
    const ok = host({
      env: { CHROMIUM_PATH: '/opt/chrome/chrome' },
      executables: ['/opt/chrome/chrome', DEBIAN_CHROMIUM],
    });
    expect(resolveChromium(ok.h)).toEqual({ path: '/opt/chrome/chrome' });
    const bad = host({ env: { CHROMIUM_PATH: '/nowhere/chrome' }, executables: [DEBIAN_CHROMIUM] });
    expect(resolveChromium(bad.h)).toEqual({
      problem: `CHROMIUM_PATH is /nowhere/chrome, which is not an executable file. ${INSTALL_HINT}`,
    });
    expect(bad.ran).toEqual([]);
  });

  it("uses Debian's /usr/bin/chromium without installing anything", () => {
    const { h, ran } = host({ executables: [DEBIAN_CHROMIUM] });
    expect(resolveChromium(h)).toEqual({ path: DEBIAN_CHROMIUM });
    expect(ran).toEqual([]);
  });

  it('as root on Debian installs the chromium package with apt-get and says how long it took', () => {
    const { h, ran, logged } = host();
    expect(resolveChromium(h)).toEqual({ path: DEBIAN_CHROMIUM });
    expect(ran).toEqual(['apt-get update -qq', 'apt-get install -y -qq chromium']);
    expect(logged).toEqual([
      "No Chromium at /usr/bin/chromium: installing Debian's chromium package with apt-get…",
      "Installed Debian's chromium in 42.0 s.",
    ]);
  });

  it('stops with one line saying what to install when it may not install, or apt-get fails', () => {
    for (const h of [host({ isRoot: () => false }).h, host({ isDebian: () => false }).h]) {
      expect(resolveChromium(h)).toEqual({ problem: INSTALL_HINT });
    }
    expect(INSTALL_HINT).not.toContain('\n');
    expect(INSTALL_HINT).toContain('apt-get install chromium');
    const failing = host({ aptWorks: false });
    expect(resolveChromium(failing.h)).toEqual({
      problem: `apt-get could not install chromium. ${INSTALL_HINT}`,
    });
    expect(failing.ran).toEqual(['apt-get update -qq']);
  });
});
