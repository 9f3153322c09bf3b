/**
 * The plate sketch in a real browser: every dimension of the table is written on the drawing,
 * labels are at least 12 px at 1440 px and never on the plate, a narrow pier marks its rods in red,
 * and the panel passes axe-core. Screenshots at 1440 x 900 and 390 x 844, US and SI.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startE2E, type E2E, openDemoDesk } from '../helpers/e2e';
import { assertAccessible } from '../helpers/axe';

let e2e: E2E;
let page: Page;
const PANEL = 'section[aria-label="Plate on the pier"]';

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  await e2e.signInAs(session.context, 'fabricator');
  await page.setViewportSize({ width: 1440, height: 900 });
  await openDemoDesk(page, 'plate-sketch');
});

afterAll(async () => {
  await e2e?.close();
});

async function settled() {
  await expect
    .poll(async () => page.getByTestId('recompute-status').textContent(), { timeout: 10_000 })
    .toMatch(/^Up to date/);
}

/** The drawn texts, and each table size that is a length (rods, section and bearing rows are words). */
async function drawnAndTabled() {
  return page.evaluate((panel) => {
    const root = document.querySelector(panel)!;
    const drawn = [...root.querySelectorAll('svg.plate-sketch-svg text')].map((t) => t.textContent ?? '');
    const rows = [...root.querySelectorAll('[data-testid="plate-dimensions"] tbody tr')].map((r) => ({
      id: r.getAttribute('data-dim') ?? '',
      size: r.querySelector('td')?.textContent ?? '',
    }));
    return { drawn, rows: rows.filter((r) => !['rods', 'steel', 'bearing'].includes(r.id)) };
  }, PANEL);
}

/** Rendered font size of every label (px), and whether any label's box meets the plate's box. */
async function measure() {
  return page.evaluate((panel) => {
    const svg = document.querySelector(`${panel} svg.plate-sketch-svg`) as SVGSVGElement;
    const plates = [...svg.querySelectorAll('[data-role="plate"]')].map((p) => p.getBoundingClientRect());
    const texts = [...svg.querySelectorAll('text')];
    const sizes = texts.map(
      (t) => Number.parseFloat(getComputedStyle(t).fontSize) * (t.getScreenCTM()?.a ?? 1),
    );
    const rotated = texts.map((t) => t.getScreenCTM()?.a ?? 1);
    const onPlate = texts
      .filter((t) => {
        const b = t.getBoundingClientRect();
        return plates.some(
          (p) => b.left < p.right && p.left < b.right && b.top < p.bottom && p.top < b.bottom,
        );
      })
      .map((t) => t.textContent);
    return {
      smallest: Math.min(...sizes.map((s, i) => (Math.abs(rotated[i]) < 1e-6 ? Infinity : s))),
      onPlate,
      svgWidth: svg.getBoundingClientRect().width,
      panelWidth: document.querySelector(panel)!.getBoundingClientRect().width,
    };
  }, PANEL);
}

describe('plate sketch', () => {
  it('writes every dimension of the table on the drawing, in US units', async () => {
    const { drawn, rows } = await drawnAndTabled();
    expect(rows.length).toBeGreaterThan(15);
    for (const r of rows)
      expect(
        drawn.some((t) => t.includes(r.size)),
        `${r.id}: ${r.size}`,
      ).toBe(true);
    expect(drawn.some((t) => /^holes 1-5\/16 in|^holes \d/.test(t))).toBe(true);
    expect(drawn.some((t) => /^plate washers /.test(t))).toBe(true);
    expect(drawn).not.toContain('tension row →');
  });

  it('at 1440 px: labels at least 12 px, none on the plate, the drawing as wide as the panel', async () => {
    const m = await measure();
    expect(m.smallest).toBeGreaterThanOrEqual(12);
    expect(m.onPlate).toEqual([]);
    expect(m.svgWidth).toBeGreaterThan(m.panelWidth - 40);
    await assertAccessible(page, 'plate sketch (1440, US)', PANEL);
    await page.locator(PANEL).screenshot({ path: 'tests/output/screens/plate-sketch-1440-us.png' });
  });

  it('in SI: the same drawing in millimetres, accessible, at both widths', async () => {
    await page.getByRole('radio', { name: 'SI' }).click();
    await settled();
    const { drawn, rows } = await drawnAndTabled();
    expect(rows.every((r) => /mm/.test(r.size))).toBe(true);
    for (const r of rows)
      expect(
        drawn.some((t) => t.includes(r.size)),
        `${r.id}: ${r.size}`,
      ).toBe(true);
    await assertAccessible(page, 'plate sketch (1440, SI)', PANEL);
    await page.locator(PANEL).screenshot({ path: 'tests/output/screens/plate-sketch-1440-si.png' });
    await page.setViewportSize({ width: 390, height: 844 });
    await expect.poll(async () => (await measure()).onPlate).toEqual([]);
    await assertAccessible(page, 'plate sketch (390, SI)', PANEL);
    await page.locator(PANEL).screenshot({ path: 'tests/output/screens/plate-sketch-390-si.png' });
    await page.getByRole('radio', { name: 'US' }).click();
    await settled();
    await assertAccessible(page, 'plate sketch (390, US)', PANEL);
    await page.locator(PANEL).screenshot({ path: 'tests/output/screens/plate-sketch-390-us.png' });
    await page.setViewportSize({ width: 1440, height: 900 });
  });

  it('a 10 in pier: the rods are marked in red with words and the edge reads the real distance', async () => {
    const length = page.getByLabel('Pier length, along N', { exact: true });
    const width = page.getByLabel('Pier width, along B', { exact: true });
    const [oldLength, oldWidth] = [await length.inputValue(), await width.inputValue()];
    await length.fill('10 in');
    await width.fill('10 in');
    await settled();
    const panel = page.locator(PANEL);
    await expect.poll(() => panel.locator('[data-role="warn-ring"]').count()).toBeGreaterThan(0);
    const drawn = await panel.locator('svg.plate-sketch-svg text').allTextContents();
    expect(drawn.some((t) => /outside the pier|< [\d-/]+ in min/.test(t))).toBe(true);
    expect(drawn).toContain('10 in');
    expect((await measure()).onPlate).toEqual([]);
    await assertAccessible(page, 'plate sketch (10 in pier)', PANEL);
    await panel.screenshot({ path: 'tests/output/screens/plate-sketch-1440-narrow-pier.png' });
    // On paper: black on white, the red marks black (their words stay).
    await page.emulateMedia({ media: 'print' });
    const paints = await page.evaluate((sel) => {
      const svg = document.querySelector(`${sel} svg.plate-sketch-svg`)!;
      const style = (q: string) => getComputedStyle(svg.querySelector(q)!);
      const warn = [...svg.querySelectorAll('text')].find((t) => t.textContent?.startsWith('⚠'))!;
      return {
        plate: style('[data-role="plate"]').fill,
        ring: style('[data-role="warn-ring"]').stroke,
        warn: getComputedStyle(warn).fill,
      };
    }, PANEL);
    expect(paints).toEqual({ plate: 'rgb(255, 255, 255)', ring: 'rgb(0, 0, 0)', warn: 'rgb(0, 0, 0)' });
    await page.emulateMedia({ media: 'screen' });
    await length.fill(oldLength);
    await width.fill(oldWidth);
    await settled();
  });
});
