import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import CompareRoute from '../../src/app/routes/compare';
import { pathWords } from '../../shared/words/field-words';
import { ratioRows } from '../../src/lib/ratio-rows';
import { exampleDesign } from '../../shared/engine/examples';
import { CAUTION, type Check } from '../../shared/engine/types';
import type { DesignDocument } from '../../shared/schemas/design';
import { makeRevision, renderAt, stubFetch } from './history-fixtures';

const longer: DesignDocument = {
  ...exampleDesign,
  member: { ...exampleDesign.member, length: '10 ft' },
  loads: {
    ...exampleDesign.loads,
    area: [
      { case: 'D', value: '15 psf' },
      { case: 'L', value: '75 psf' },
      { case: 'S', value: '25 psf' },
    ],
  },
};

function check(id: string, ratio: number | null, ok: boolean): Check {
  return { id, title: id, reference: 'test', combination: null, demand: null, capacity: null, ratio, ok };
}

describe('compare: paths in words', () => {
  it('names document paths the way the desk groups them', () => {
    expect(pathWords('member.length')).toBe('Reach: length, root to tip');
    expect(pathWords('loads.area[1].value')).toBe('Loads: area load 2, value');
    expect(pathWords('connection.anchors.embedment')).toBe('Support: rod embedment');
    expect(pathWords('member.somethingNew')).toBe('Reach: something new');
  });
});

describe('compare: ratio rows', () => {
  it('marks a higher ratio up, a lower one down, and never passes a ratio that was not computed', () => {
    const rows = ratioRows(
      [check('a', 0.5, true), check('b', 0.9, true), check('c', 0.4, true), check('gone', 0.1, true)],
      [check('a', 0.7, true), check('b', 0.6, true), check('c', null, true), check('new', 0.2, true)],
    );
    const by = Object.fromEntries(rows.map((r) => [r.id, r]));
    expect(by.a.trend).toBe('up');
    expect(by.a.change).toBeCloseTo(0.2, 10);
    expect(by.b.trend).toBe('down');
    expect(by.c.trend).toBe('none');
    expect(by.c.okB).toBe(false);
    expect(by.gone.trend).toBe('gone');
    expect(by.new.trend).toBe('new');
    expect(rows.map((r) => r.id)).toEqual(['a', 'b', 'c', 'gone', 'new']);
  });
});

describe('Compare screen', () => {
  it('shows the changed inputs side by side, every check ratio before and after, and the caution', async () => {
    const a = makeRevision(11, 1, exampleDesign);
    const b = makeRevision(12, 2, longer);
    stubFetch(({ method, path }) => {
      if (method === 'GET' && path === '/api/revisions/11') return { body: a };
      if (method === 'GET' && path === '/api/revisions/12') return { body: b };
      return undefined;
    });
    renderAt(<CompareRoute />, {
      route: '/cantilevers/7/compare?a=11&b=12',
      path: '/cantilevers/:cantileverId/compare',
    });

    expect(
      await screen.findByRole('heading', { name: 'Compare revision 1 with revision 2' }),
    ).toBeInTheDocument();
    const inputs = screen.getByRole('table', { name: /Changed inputs/ });
    const lengthRow = within(inputs).getByRole('row', { name: /Reach: length, root to tip/ });
    expect(
      within(lengthRow)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    ).toEqual(['9 ft', '10 ft']);
    const liveRow = within(inputs).getByRole('row', { name: /Loads: area load 2, value/ });
    expect(
      within(liveRow)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    ).toEqual(['60 psf', '75 psf']);
    expect(within(inputs).getAllByRole('row')).toHaveLength(3);

    const ratios = screen.getByRole('table', { name: /Check ratios/ });
    const ids = new Set([...a.result.checks, ...b.result.checks].map((c) => c.id));
    expect(ratios.querySelectorAll('tbody tr')).toHaveLength(ids.size);
    const flexA = a.result.checks.find((c) => c.id === 'member.flexure');
    const flexB = b.result.checks.find((c) => c.id === 'member.flexure');
    expect(flexA?.ratio).not.toBeNull();
    const flexRow = ratios.querySelector('tr[data-check="member.flexure"]') as HTMLElement;
    const cells = within(flexRow)
      .getAllByRole('cell')
      .map((c) => c.textContent);
    expect(cells[0]).toContain((flexA?.ratio as number).toFixed(2));
    expect(cells[1]).toContain((flexB?.ratio as number).toFixed(2));
    // A longer reach with more live load bends the root harder.
    expect(cells[3]).toContain('ratio up');
    expect(cells[2]).toBe(`+${((flexB?.ratio as number) - (flexA?.ratio as number)).toFixed(2)}`);

    // Once per view: the layout's footer steps aside for it.
    expect(screen.getAllByText(CAUTION)).toHaveLength(1);
    expect(screen.getByText(/2 inputs changed/)).toBeInTheDocument();
    const governing = flexB?.combination as string;
    const rootA = a.result.stations?.combinations.find((c) => c.name === governing)?.M[0] as number;
    const rootB = b.result.stations?.combinations.find((c) => c.name === governing)?.M[0] as number;
    expect(rootB).toBeGreaterThan(rootA);
    const total = b.result.checks.find((c) => c.id === 'member.deflection.total');
    const service = total?.combination as string;
    const summary = screen.getByText(/^Moment under /);
    expect(summary.textContent).toContain(`Moment under ${governing}, deflection under ${service}.`);
    // the service curve is built from the unfactored cases, the root's rotation included (a flexible
    // root, the default with a connection): its tip is each revision's own deflection demand
    expect(service).toBe('D + L');
    const caseTip = (name: string) =>
      a.result.stations?.cases.find((c) => c.name === name)?.deflection.at(-1) as number;
    const tipA = caseTip('D') + caseTip('L');
    // the engine's case curves carry the root's rotation; the case summaries stay the member's own
    expect(tipA).toBeGreaterThan(
      (a.result.member.cases.D?.tipDeflection.value as number) +
        (a.result.member.cases.L?.tipDeflection.value as number),
    );
    const tipB = total?.demand?.value as number;
    expect(summary.textContent).toContain(`tip deflection ${tipA.toPrecision(3)} in. Revision 2`);
    expect(summary.textContent).toContain(`tip deflection ${tipB.toPrecision(3)} in.`);
    expect(summary.textContent).toContain(
      `Revision 1: reach 9.00 ft, root moment ${rootA.toPrecision(3)} kip·ft`,
    );
    expect(summary.textContent).toContain(
      `Revision 2: reach 10.0 ft, root moment ${rootB.toPrecision(3)} kip·ft`,
    );
  });

  it('shows a ratio that was not computed as a failure, never as a pass', async () => {
    const a = makeRevision(11, 1, exampleDesign);
    const b = makeRevision(12, 2, exampleDesign);
    b.result.checks = b.result.checks.map((c) =>
      c.id === 'member.shear' ? { ...c, ratio: null, ok: true } : c,
    );
    b.result.ok = true;
    stubFetch(({ path }) =>
      path === '/api/revisions/11' ? { body: a } : path === '/api/revisions/12' ? { body: b } : undefined,
    );
    renderAt(<CompareRoute />, {
      route: '/cantilevers/7/compare?a=11&b=12',
      path: '/cantilevers/:cantileverId/compare',
    });

    const table = await screen.findByRole('table', { name: /Check ratios/ });
    const row = table.querySelector('tr[data-check="member.shear"]') as HTMLElement;
    const cells = within(row).getAllByRole('cell');
    expect(cells[1].textContent).toBe('not computed');
    expect(cells[3].textContent).toBe('not computed');
    expect(screen.getByText('The two revisions have the same inputs.')).toBeInTheDocument();
    // the later revision's verdict follows the uncomputed check, whatever its stored flag says
    expect(screen.getByRole('region', { name: 'Summary' })).toHaveTextContent('Revision 2: Does not pass');
  });
});
