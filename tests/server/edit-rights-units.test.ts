import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { switchUnits } from '../../src/features/desk/lib/switch-units';
import { createTestEnv, type TestEnv } from '../helpers/api';

describe('edit rights compare inputs by value, whatever units they are written in', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  const url = () => `/api/cantilevers/${env.cantileverId}/revisions`;
  const latest = async (agent: Awaited<ReturnType<TestEnv['login']>>) => {
    const list = (await agent.get(url()).expect(200)).body as { id: number; number: number }[];
    const revision = (await agent.get(`/api/revisions/${list[0].id}`).expect(200)).body;
    return { number: list[0].number, input: revision.input };
  };

  it('lets an SI architect save a member change to a design saved in US units', async () => {
    const architect = await env.login('architect');
    const base = await latest(architect);
    expect(base.input.units ?? 'US').toBe('US');
    // The desk rewrites every quantity in SI (4 significant figures) for an architect who reads SI.
    const { doc: si } = switchUnits(base.input, 'SI');
    expect(si.connection?.plate.thickness).toMatch(/ mm$/);
    si.member.section = { ...si.member.section, shape: 'W12X30' };
    const saved = await architect
      .post(url())
      .send({ baseRevision: base.number, message: 'Heavier beam, in SI', input: si });
    expect(saved.status).toBe(201);
    expect(saved.body.input.member.section.shape).toBe('W12X30');
  });

  it('still refuses a real connection change written in SI, naming only that field', async () => {
    const architect = await env.login('architect');
    const base = await latest(architect);
    expect(base.input.units).toBe('SI');
    base.input.connection.plate.thickness = '60 mm';
    const refused = await architect
      .post(url())
      .send({ baseRevision: base.number, message: 'thicker plate', input: base.input });
    expect(refused.status).toBe(403);
    expect(refused.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      'input.connection.plate.thickness',
    ]);
  });
});
