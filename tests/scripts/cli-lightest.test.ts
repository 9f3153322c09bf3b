/** `reachline lightest`: the JSON the issue fixes, the caution, exit codes and --families. */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../server/cli/main';
import type { CliIo } from '../../server/cli/check-command';
import { exampleDesign } from '../../shared/engine/examples';
import { CAUTION } from '../../shared/engine/types';

const dir = mkdtempSync(join(tmpdir(), 'reachline-cli-lightest-'));
const file = join(dir, 'design.json');
writeFileSync(file, JSON.stringify(exampleDesign));

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

describe('reachline lightest', () => {
  it('prints passing (lightest first, governing id and ratio) and failing (failedBy), the caution on stderr', async () => {
    const r = await inProcess(['lightest', file, '--families', 'W,C']);
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out) as {
      passing: {
        shape: string;
        steelWeight: { value: number; unit: string };
        governing: { id: string; ratio: number };
      }[];
      failing: { shape: string; steelWeight: { value: number; unit: string }; failedBy: string }[];
      caution: string;
    };
    expect(Object.keys(json)).toEqual(['passing', 'failing', 'caution']);
    expect(json.caution).toBe(CAUTION);
    expect(r.err).toContain(CAUTION);
    expect(json.passing.length).toBeGreaterThan(0);
    for (const p of json.passing) {
      expect(Object.keys(p)).toEqual(['shape', 'steelWeight', 'governing']);
      expect(p.shape).toMatch(/^(W|C)\d/);
      expect(p.steelWeight.unit).toBe('lbf');
      expect(p.governing.ratio).toBeLessThanOrEqual(1);
    }
    const weights = json.passing.map((p) => p.steelWeight.value);
    expect(weights).toEqual([...weights].sort((a, b) => a - b));
    for (const f of json.failing) expect(f.failedBy).toMatch(/\./);
  });

  it('reads standard input; an unknown family or an invalid document exits 2 with the field named', async () => {
    const fam = await inProcess(['lightest', file, '--families', 'W,T']);
    expect(fam.code).toBe(2);
    expect(fam.err).toBe('--families: must list families from W, HSS, PIPE, C, got "W,T"\n');
    const bad = await inProcess(
      ['lightest', '-'],
      JSON.stringify({ member: { length: '-3 ft', spacing: '4 ft', section: { shape: 'W8X18' } } }),
    );
    expect(bad.code).toBe(2);
    expect(bad.out).toBe('');
    expect(bad.err).toBe('member.length: must be a positive length, got "-3 ft"\n');
    const none = await inProcess(['lightest', '-']);
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/^\(document\): is not valid JSON/);
  });

  it('is in the help', async () => {
    const r = await inProcess(['--help']);
    expect(r.out).toContain('reachline lightest <design.json | ->  [--families W,HSS,PIPE,C]');
  });
});
