import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../../server/cli/main';
import type { CliIo } from '../../server/cli/check-command';
import { exampleDesign, exampleMemberOnly } from '../../shared/engine/examples';
import { CAUTION } from '../../shared/engine/types';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'reachline-cli-'));
const memberFile = join(dir, 'member.json');
writeFileSync(memberFile, JSON.stringify(exampleMemberOnly));
const invalidDoc = JSON.stringify({
  member: { length: '-3 ft', spacing: '4 ft', section: { shape: 'W12X26' } },
});

/** Runs main() in this process with injected standard input and captured output and exit code. */
async function inProcess(args: string[], stdin = '') {
  let out = '';
  let err = '';
  const io: CliIo = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readStdin: async () => stdin,
  };
  const code = await main(args, io);
  return { code, out, err };
}

function spawn(args: string[]) {
  const r = spawnSync(process.execPath, ['server/cli/bin.js', ...args], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: 110000,
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

// One smoke test through the real bin.js (Node, the tsx loader, process.exitCode, the real
// standard streams); everything else calls main() in this process, which is much faster.
describe('reachline CLI (spawned through bin.js)', { timeout: 120000 }, () => {
  it('check <file>: the result on stdout, the caution on stderr, exit 0 when every check passes', () => {
    const r = spawn(['check', memberFile]);
    const result = JSON.parse(r.out);
    expect(result.checks.map((c: { id: string }) => c.id)).toContain('member.flexure');
    expect(r.code).toBe(result.ok ? 0 : 1);
    expect(result.ok).toBe(true);
    // The desk's words: the design verdict and its sentence.
    expect(r.err).toContain(`Passes. All ${result.checks.length} checks pass.`);
    expect(r.err).toContain(CAUTION);
  });
});

describe('reachline CLI (in process)', () => {
  it('check - with invalid input: exit 2, one line per problem on stderr, nothing on stdout', async () => {
    const r = await inProcess(['check', '-'], invalidDoc);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err.trim().split('\n')).toEqual(['member.length: must be a positive length, got "-3 ft"']);
  });

  it('exit 1 when a check fails, with the failing ids on stderr', async () => {
    const failing = { ...exampleMemberOnly, frequencyMin: '80 Hz' };
    const r = await inProcess(['check', '-'], JSON.stringify(failing));
    expect(r.code).toBe(1);
    expect(JSON.parse(r.out).ok).toBe(false);
    expect(r.err).toMatch(/^Does not pass\. \d+ of \d+ checks do not pass/m);
    // Each check that does not pass on its own line: the id (the contract) and the words of the desk.
    expect(r.err).toMatch(/^ {2}member\.vibration: does not pass \(ratio \d+\.\d\d\)$/m);
    expect(r.err).toContain(CAUTION);
  });

  it('--stations adds the station arrays; the connection is merged when present', async () => {
    const r = await inProcess(['check', '-', '--stations'], JSON.stringify(exampleDesign));
    const result = JSON.parse(r.out);
    expect(result.stations.x.length).toBeGreaterThan(40);
    expect(result.checks.length).toBeGreaterThan(5);
    expect([0, 1]).toContain(r.code);
  });

  it('problems the schema cannot see are reported the same way (exit 2)', async () => {
    const doc = {
      ...exampleMemberOnly,
      member: { ...exampleMemberOnly.member, section: { shape: 'W99X1' } },
    };
    const r = await inProcess(['check', '-'], JSON.stringify(doc));
    expect(r).toEqual({
      code: 2,
      out: '',
      err: 'member.section.shape: unknown shape "W99X1": not in the shapes table\n',
    });
  });

  it('not JSON, a missing file, an unknown option: exit 2 with a plain message', async () => {
    expect((await inProcess(['check', '-'], '{ nope')).err).toMatch(/^\(document\): is not valid JSON/);
    const missing = await inProcess(['check', join(dir, 'absent.json')]);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('ENOENT');
    expect((await inProcess(['check', memberFile, '--fast'])).code).toBe(2);
  });

  it('shapes --json prints the whole table with its source, under the published column names', async () => {
    const r = await inProcess(['shapes', '--json']);
    const table = JSON.parse(r.out);
    expect(table.source).toContain('AISC Shapes Database v15.0');
    expect(table.count).toBe(table.shapes.length);
    const w = table.shapes.find((s: { label: string }) => s.label === 'W12X26');
    expect(w).toMatchObject({ family: 'W', A: 7.65, Ix: 204, Zx: 37.2 }); // AISC Shapes Database v15.0 [pub]
    expect((await inProcess(['shapes', '--family', 'HSS', '--json'])).out).not.toContain('"family":"W"');
  });

  it('--help explains every option', async () => {
    const r = await inProcess(['--help']);
    expect(r.code).toBe(0);
    for (const option of ['check', 'shapes', '--stations', '--json', '--family', 'Exit status'])
      expect(r.out).toContain(option);
  });
});

describe('reachline check with the Version 2 keys (ENGINE-CONTRACT)', () => {
  it('accepts every Version 2 key, reports the new checks and the direction of each combination', async () => {
    const doc = {
      ...exampleDesign,
      member: {
        length: '9 ft',
        spacing: '4 ft',
        section: { shape: 'W8X18' },
        lateralSupport: {
          topFlange: 'braced',
          loadAt: 'top-flange',
          root: 'fixed',
          tip: 'free',
          braces: ['4 ft'],
          effectiveLengthFactor: 1.4,
        },
      },
      loads: {
        ...exampleDesign.loads,
        area: [...(exampleDesign.loads?.area ?? []), { case: 'W', value: '-30 psf' }],
        seismic: { SDS: 1.0, category: 'D' },
      },
      connection: {
        ...exampleDesign.connection!,
        footprint: { shape: 'HSS8X8X1/2' },
        post: { height: '12 in' },
        weld: { size: '5/16 in', electrode: 'E70' },
        flexibleRoot: true,
      },
    };
    const r = await inProcess(['check', '-'], JSON.stringify(doc));
    expect(r.code).toBeLessThan(2);
    const result = JSON.parse(r.out);
    const ids = result.checks.map((c: { id: string }) => c.id);
    for (const id of [
      'member.flexure',
      'member.flexure.uplift',
      'post.combined',
      'weld.strength',
      'member.vibration',
    ])
      expect(ids).toContain(id);
    const names = result.member.combinations.map((c: { name: string }) => c.name);
    expect(names).toEqual(
      expect.arrayContaining([
        '1.2D + 1.0W + L + 0.5S',
        '0.9D + 1.0W',
        '1.2D + Ev + L + 0.2S',
        '0.9D - Ev',
        '0.2D upward (ASCE 7-16 12.4.4)',
      ]),
    );
    expect(result.member.tipDeflectionParts.connection.value).toBeGreaterThan(0);
    expect(result.connection.plateMoment.unit).toBe('kip ft');
    expect(r.err).toMatch(/0\.9D \+ 1\.0W \(up\)/);
    expect(r.err).toMatch(/1\.4D \(down\)/);
  });
});
