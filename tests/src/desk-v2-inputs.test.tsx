import { act, fireEvent, render, screen, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import type { UseFormGetValues } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import { DeskFormHarness } from './desk-harness';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign, exampleMemberOnly } from '../../shared/engine/examples';
import { formatQuantity } from '../../shared/engine/units';
import type { DesignDocument } from '../../shared/schemas/design';
import { LoadsGroup } from '../../src/features/desk/components/loads-group';
import { ReachGroup } from '../../src/features/desk/components/reach-group';
import { SteelSummary } from '../../src/features/desk/components/steel-summary';
import { SupportGroup } from '../../src/features/desk/components/support-group';
import { TipDeflectionSplit } from '../../src/features/desk/components/tip-deflection-split';
import { describeSeries } from '../../src/features/desk/lib/chart-data';
import { issuesByField } from '../../src/features/desk/lib/issue-paths';
import { switchUnits } from '../../src/features/desk/lib/switch-units';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

let read: UseFormGetValues<DesignDocument> = () => {
  throw new Error('no form');
};

function Harness({
  children,
  issues,
  doc = exampleDesign,
}: {
  children: ReactNode;
  issues?: Map<string, string>;
  doc?: DesignDocument;
}) {
  return (
    <DeskFormHarness doc={doc} issues={issues} onForm={(form) => (read = form.getValues)}>
      {children}
    </DeskFormHarness>
  );
}

async function change(el: HTMLElement, value: string) {
  await act(async () => {
    fireEvent.change(el, { target: { value } });
  });
}
// quantity boxes are editable comboboxes (their unit list folded in)
const box = (name: string) => screen.getByRole('combobox', { name });
const pick = (name: string) => screen.getByRole('combobox', { name });
const spin = (name: string) => screen.getByRole('spinbutton', { name });

/** The document as it would be saved (JSON drops keys left undefined). */
const saved = () => JSON.parse(JSON.stringify(read())) as DesignDocument;

describe('desk inputs for wind and seismic', () => {
  it('takes a negative wind load (case W) and refuses a negative dead load, naming the field', async () => {
    render(
      <Harness>
        <LoadsGroup disabled={false} />
      </Harness>,
    );
    const areaCase = screen.getAllByRole('combobox', { name: 'Case' })[0]!;
    expect(within(areaCase).getByRole('option', { name: 'W, wind (− lifts)' })).toBeInTheDocument();
    await change(areaCase, 'W');
    await change(screen.getAllByRole('combobox', { name: 'Value' })[0]!, '-30 psf');
    expect(saved().loads?.area?.[0]).toEqual({ case: 'W', value: '-30 psf' });
    expect(screen.queryByRole('alert')).toBeNull();
    await change(areaCase, 'D');
    expect(
      await screen.findByText(
        'Value must not be negative for case D, got "-30 psf" (only wind, case W, may be negative: upward)',
      ),
    ).toBeInTheDocument();
  });

  it('writes loads.seismic only once a category is chosen, and says what is wrong with SDS', async () => {
    render(
      <Harness>
        <LoadsGroup disabled={false} />
      </Harness>,
    );
    expect(saved().loads?.seismic).toBeUndefined();
    await change(pick('Seismic design category'), 'D');
    await change(spin('SDS, in g'), '1.0');
    expect(saved().loads?.seismic).toEqual({ category: 'D', SDS: 1 });
    await change(spin('SDS, in g'), '5');
    expect(await screen.findByText('SDS, in g must be at most 3 (g)')).toBeInTheDocument();
    await change(pick('Seismic design category'), '');
    expect(saved().loads?.seismic).toBeUndefined();
  });
});

describe('desk inputs for lateral support', () => {
  it('replaces the unbraced length by braces and writes only the keys the person set', async () => {
    const doc: DesignDocument = {
      ...exampleDesign,
      member: { ...exampleDesign.member, length: '12 ft', unbracedLength: '4 ft' },
    };
    render(
      <Harness doc={doc}>
        <ReachGroup disabled={false} />
      </Harness>,
    );
    await change(pick('Lateral support'), 'detailed');
    expect(saved().member.unbracedLength).toBeUndefined();
    expect(saved().member.lateralSupport).toEqual({ braces: ['4 ft'] });
    expect(screen.getByText(/a length given there is now a brace at that distance/)).toBeInTheDocument();
    expect(pick('Top flange')).toHaveValue('braced');
    await change(pick('Top flange'), 'free');
    await change(pick('Root restraint'), 'twist-only');
    await change(box('Brace 1, from the root'), '6 ft');
    await change(spin('Effective-length factor K, free-tip segment'), '2.5');
    expect(saved().member.lateralSupport).toEqual({
      topFlange: 'free',
      root: 'twist-only',
      braces: ['6 ft'],
      effectiveLengthFactor: 2.5,
    });
    await change(spin('Effective-length factor K, free-tip segment'), '0.2');
    expect(
      await screen.findByText('Effective-length factor K, free-tip segment must be at least 0.5'),
    ).toBeInTheDocument();
    await change(spin('Effective-length factor K, free-tip segment'), '');
    expect(saved().member.lateralSupport?.effectiveLengthFactor).toBeUndefined();
    await change(box('Brace 1, from the root'), '6');
    expect(
      await screen.findByText('Brace 1, from the root needs a unit, got "6" (for example "10 ft")'),
    ).toBeInTheDocument();
    await change(pick('Lateral support'), 'simple');
    expect(saved().member.lateralSupport).toBeUndefined();
    expect(saved().member.unbracedLength).toBe('6');
  });

  it('shows the engine issue on a brace (array brackets) beside that brace', async () => {
    const doc: DesignDocument = {
      ...exampleDesign,
      member: {
        length: '9 ft',
        spacing: '4 ft',
        section: { shape: 'W8X18' },
        lateralSupport: { braces: ['2 ft', '12 ft'] },
      },
    };
    const issues = issuesByField([
      {
        path: 'member.lateralSupport.braces[1]',
        message: 'must lie between the root and the tip (length 9 ft), got "12 ft"',
      },
    ]);
    render(
      <Harness doc={doc} issues={issues}>
        <ReachGroup disabled={false} />
      </Harness>,
    );
    expect(box('Brace 2, from the root')).toHaveAttribute('aria-invalid', 'true');
    expect(
      screen.getByText(
        'Brace 2, from the root must lie between the root and the tip (length 9 ft), got "12 ft"',
      ),
    ).toBeInTheDocument();
    expect(box('Brace 1, from the root')).toHaveAttribute('aria-invalid', 'false');
  });
});

describe('desk inputs for the post, the weld and the root', () => {
  it('round-trips the post height, the weld and the flexible-root switch', async () => {
    render(
      <Harness>
        <SupportGroup disabled={false} onBrowse={() => undefined} />
      </Harness>,
    );
    const root = screen.getByRole('checkbox', { name: /Root rotates with the connection/ });
    expect(root).toBeChecked();
    expect(saved().connection?.flexibleRoot).toBeUndefined();
    expect(saved().connection?.post).toBeUndefined();
    expect(saved().connection?.weld).toBeUndefined();
    await change(box('Post height'), '12 in');
    await change(box('Fillet weld size'), '5/16 in');
    await change(pick('Electrode'), 'E80');
    await act(async () => {
      fireEvent.click(root);
    });
    const c = saved().connection;
    expect(c?.post).toEqual({ height: '12 in' });
    expect(c?.weld).toEqual({ size: '5/16 in', electrode: 'E80' });
    expect(c?.flexibleRoot).toBe(false);
    await change(box('Post height'), '');
    expect(saved().connection?.post).toBeUndefined();
  });

  it('names the field of a bad weld size and of an engine issue on the post', async () => {
    const issues = issuesByField([
      { path: 'connection.post', message: 'applies to a post base only (arrangement "post-base")' },
    ]);
    render(
      <Harness issues={issues}>
        <SupportGroup disabled={false} onBrowse={() => undefined} />
      </Harness>,
    );
    await change(box('Fillet weld size'), '5');
    expect(
      await screen.findByText('Fillet weld size needs a unit, got "5" (for example "10 ft")'),
    ).toBeInTheDocument();
    expect(
      screen.getByText('Post height applies to a post base only (arrangement "post-base")'),
    ).toBeInTheDocument();
  });
});

describe('tip deflection split and camber', () => {
  it('shows member bending and connection rotation with numbers and units, and the dead-load camber', () => {
    const result = evaluateDesign(parsedDesignSchema.parse(exampleDesign));
    const parts = result.member.tipDeflectionParts;
    expect(parts).toBeDefined();
    render(
      <>
        <TipDeflectionSplit result={result} />
        <SteelSummary result={result} />
      </>,
    );
    const figure = screen.getByRole('figure', { name: 'Tip deflection: member and connection' });
    const m = parts!.member.value;
    const c = parts!.connection.value;
    const pm = Math.round((100 * m) / (m + c));
    expect(within(figure).getByText(/^Member bending/).textContent).toContain(formatQuantity(parts!.member));
    expect(within(figure).getByText(/^Connection rotation/).textContent).toContain(
      formatQuantity(parts!.connection),
    );
    expect(within(figure).getByText(/^Member bending/).textContent).toContain(`(${pm} %)`);
    expect(within(figure).getByText(/^Connection rotation/).textContent).toContain(`(${100 - pm} %)`);
    expect(within(figure).getByText(/^Connection rotation/).textContent).toMatch(/ in /);
    expect(screen.getByTestId('tip-split-member').style.width).toBe(`${pm}%`);
    expect(screen.getByTestId('tip-split-connection').style.width).toBe(`${100 - pm}%`);
    const camber = result.member.recommendedCamber!;
    expect(screen.getByTestId('summary-camber').textContent).toBe(formatQuantity(camber));
    expect(camber.value).toBeGreaterThan(0);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('shows nothing when the result has no split (no connection)', () => {
    const result = evaluateDesign(parsedDesignSchema.parse(exampleMemberOnly));
    render(<TipDeflectionSplit result={result} />);
    expect(screen.queryByTestId('tip-split')).toBeNull();
  });
});

describe('new quantities follow the unit switch', () => {
  it('rewrites braces, the post height and the weld size in SI and back', () => {
    const doc: DesignDocument = {
      ...exampleDesign,
      member: {
        length: '9 ft',
        spacing: '4 ft',
        section: { shape: 'W8X18' },
        lateralSupport: { braces: ['3 ft'] },
      },
      connection: { ...exampleDesign.connection!, post: { height: '12 in' }, weld: { size: '0.25 in' } },
    };
    const { doc: si, record } = switchUnits(doc, 'SI');
    // 3 ft = 0.9144 m, 12 in = 304.8 mm, 0.25 in = 6.35 mm (exact by definition of the inch).
    expect(si.member.lateralSupport?.braces).toEqual(['0.9144 m']);
    expect(si.connection?.post?.height).toBe('304.8 mm');
    expect(si.connection?.weld?.size).toBe('6.35 mm');
    const back = switchUnits(si, 'US', record).doc;
    expect(back.member.lateralSupport?.braces).toEqual(['3 ft']);
    expect(back.connection?.weld?.size).toBe('0.25 in');
  });
});

describe('uplift in words', () => {
  it('says the tip moves upward under net wind uplift', () => {
    const doc: DesignDocument = {
      ...exampleDesign,
      loads: { ...exampleDesign.loads!, area: [{ case: 'W', value: '-60 psf' }] },
    };
    const result = evaluateDesign(parsedDesignSchema.parse(doc), { stations: true });
    const wind = result.stations!.cases.find((c) => c.name === 'W')!;
    expect(describeSeries(result, wind, null).deflection).toMatch(/[\d.]+ in upward at the tip\.$/);
  });
});
