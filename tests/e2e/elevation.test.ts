/**
 * The desk's elevation in a real browser: the member drawn with its three diagrams, one Tab stop,
 * the arrow keys stepping the cursor from station to station with a readout that matches the
 * engine's stations of the same revision, the deflection limit at the tip, the polite announcement,
 * axe-core on the panel, and screenshots at 1440 x 900 and 390 x 844.
 */
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { RevisionDto } from '../../shared/schemas/api';
import type { StationSeries } from '../../shared/engine/types';
import { formatQuantity } from '../../shared/engine/units';
import { assertAccessible } from '../helpers/axe';
import { SCREEN_DIR, startE2E, type E2E, openDemoDesk, shown } from '../helpers/e2e';

let e2e: E2E;
let page: Page;
let revision: RevisionDto;

const PANEL = 'section[aria-label="Member elevation and diagrams"]';

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  await e2e.signInAs(session.context, 'engineer');
  await page.setViewportSize({ width: 1440, height: 900 });
  await openDemoDesk(page);
  const cantileverId = Number(/\/cantilevers\/(\d+)/.exec(page.url())?.[1]);
  const res = await session.context.request.get(`${e2e.baseUrl}/api/cantilevers/${cantileverId}`);
  const cantilever = (await res.json()) as { currentRevisionId: number };
  const rev = await session.context.request.get(
    `${e2e.baseUrl}/api/revisions/${cantilever.currentRevisionId}`,
  );
  revision = (await rev.json()) as RevisionDto;
});

afterAll(async () => {
  await e2e?.close();
});

const readout = async () => ({
  x: await page.getByTestId('readout-x').textContent(),
  V: await page.getByTestId('readout-V').textContent(),
  M: await page.getByTestId('readout-M').textContent(),
  d: await page.getByTestId('readout-d').textContent(),
});

/** What the readout must say at station i of a series, from the stored revision's engine result. */
function expected(series: StationSeries, i: number) {
  const s = revision.result.stations!;
  const d = series.deflection[i];
  return {
    x: `${formatQuantity({ value: s.x[i], unit: s.units.x })} from the root`,
    V: formatQuantity({ value: series.V[i], unit: s.units.V }),
    M: formatQuantity({ value: series.M[i], unit: s.units.M }),
    d: `${formatQuantity({ value: Math.abs(d), unit: s.units.deflection })} ${d < 0 ? 'up' : 'down'}`,
  };
}

/** The panel cut from a full-page shot (an element shot would show the sticky desk header over it). */
async function panelShot(name: string) {
  // At the top of the page the sticky desk header sits above the results, not over the panel.
  await page.evaluate(() => window.scrollTo(0, 0));
  const clip = await page.locator(PANEL).evaluate((el) => {
    const r = el.getBoundingClientRect();
    return { x: r.left + window.scrollX, y: r.top + window.scrollY, width: r.width, height: r.height };
  });
  await page.screenshot({ path: join(SCREEN_DIR, `${name}.png`), fullPage: true, clip });
}

const cursorLeft = () =>
  page.getByTestId('elevation-cursor').evaluate((el) => el.getBoundingClientRect().left);

describe('desk elevation', () => {
  it('draws the member with the shear, moment and deflection strips on one axis with its unit', async () => {
    const panel = page.locator(PANEL);
    await shown(panel.getByTestId('elevation-drawing'));
    expect(await panel.locator('.recharts-line-curve').count()).toBe(3);
    for (const key of ['V', 'M', 'd']) expect(await panel.getByTestId(`strip-${key}`).count()).toBe(1);
    const text = (await panel.textContent()) ?? '';
    expect(text).toContain('Distance from the root (ft)');
    expect(text).toContain('Moment (kip·ft)');
    // one set of brackets to a title: no "Deflection (down) (in)"
    for (const key of ['V', 'M', 'd'])
      expect(await panel.getByTestId(`strip-${key}`).locator('p').textContent()).not.toMatch(/\).*\(/);
    expect(await panel.getByTestId('elevation-support').textContent()).toMatch(/post .* plate .* pier/);
    // one Tab stop: the elevation itself, nothing in the Tab order inside it (recharts' layers carry tabindex -1)
    const elevation = panel.getByTestId('elevation');
    expect(await elevation.getAttribute('tabindex')).toBe('0');
    const tabbable = 'a[href], button, input, select, textarea, [tabindex]:not([tabindex="-1"])';
    expect(await elevation.locator(tabbable).count()).toBe(0);
  });

  it('steps the cursor with the arrow keys; the readout is the engine value at each station', async () => {
    const s = revision.result.stations!;
    const flexure = revision.result.checks.find((c) => c.id === 'member.flexure')!;
    const series = s.combinations.find((c) => c.name === flexure.combination)!;
    const elevation = page.getByTestId('elevation');
    await elevation.focus();
    await page.keyboard.press('Home');
    await expect.poll(readout).toEqual(expected(series, 0));
    const atRoot = await cursorLeft();
    for (let k = 0; k < 4; k += 1) await page.keyboard.press('ArrowRight');
    await expect.poll(readout).toEqual(expected(series, 4));
    expect(await cursorLeft()).toBeGreaterThan(atRoot);
    // shear and moment fall toward the tip under gravity
    expect(Math.abs(series.M[4])).toBeLessThan(Math.abs(series.M[0]));
    await page.keyboard.press('End');
    const last = s.x.length - 1;
    await expect.poll(readout).toEqual(expected(series, last));
    expect(await page.getByTestId('tip-deflection').textContent()).toBe(
      formatQuantity({ value: Math.abs(series.deflection[last]), unit: s.units.deflection }),
    );
    await page.keyboard.press('ArrowLeft');
    await expect.poll(readout).toEqual(expected(series, last - 1));
    expect(await elevation.getAttribute('aria-valuetext')).toBe(expected(series, last - 1).x);
    // the announcement follows once the keys rest, with the same reading
    await expect
      .poll(() => page.getByTestId('elevation-announce').textContent(), { timeout: 5_000 })
      .toContain(`At ${expected(series, last - 1).x}: shear ${expected(series, last - 1).V}`);
  });

  it('marks the deflection limit at the tip under the service combination of the total-load check', async () => {
    const total = revision.result.checks.find((c) => c.id === 'member.deflection.total')!;
    await page.getByRole('button', { name: `Show ${total.combination} with its limit` }).click();
    const marker = page.locator(`${PANEL} [data-testid="limit-marker"]`);
    await shown(marker);
    expect(await marker.textContent()).toContain(`limit ${formatQuantity(total.capacity!)} = span/`);
    await page.getByTestId('elevation').focus();
    await page.keyboard.press('End');
    // the readout at the tip is the check's demand (the tip deflection of that combination)
    await expect
      .poll(() => page.getByTestId('readout-d').textContent())
      .toBe(`${formatQuantity(total.demand!)} down`);
    await assertAccessible(page, 'desk elevation at 1440 px', PANEL);
    await e2e.screenshot(page, 'elevation-desk-1440');
    await panelShot('elevation-panel-1440');
  });

  it('fits a phone: no sideways scroll in the panel, still accessible', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    const panel = page.locator(PANEL);
    await expect
      .poll(() => panel.evaluate((el) => el.scrollWidth <= el.clientWidth + 1), { timeout: 5_000 })
      .toBe(true);
    const drawing = await panel.getByTestId('elevation-drawing').boundingBox();
    const box = await panel.boundingBox();
    expect(drawing!.x + drawing!.width).toBeLessThanOrEqual(box!.x + box!.width + 1);
    await page.getByTestId('elevation').focus();
    await page.keyboard.press('Home');
    await expect.poll(() => page.getByTestId('readout-x').textContent()).toBe('0 ft from the root');
    await assertAccessible(page, 'desk elevation at 390 px', PANEL);
    await e2e.screenshot(page, 'elevation-desk-390');
    await panelShot('elevation-panel-390');
  });
});
