/**
 * The design desk in a real browser: each input group edited, a check flipping from pass to fail
 * and back, US / SI with the same physical values, a shape picked from the browser.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { startE2E, type E2E, openDemoDesk, shown, gone } from '../helpers/e2e';

let e2e: E2E;
let page: Page;
let context: BrowserContext;

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  context = session.context;
  await e2e.signInAs(context, 'engineer');
  await openDemoDesk(page);
});

afterAll(async () => {
  await e2e?.close();
});

const field = (label: string) => page.getByLabel(label, { exact: true });
const word = (id: string) => page.locator(`tr[data-check="${id}"]`).getAttribute('data-word');
const tip = async () => (await page.getByTestId('tip-deflection').textContent()) ?? '';

/** Waits until the desk has recomputed the newest inputs. */
async function settled() {
  await expect
    .poll(async () => page.getByTestId('recompute-status').textContent(), { timeout: 10_000 })
    .toMatch(/^Up to date/);
}

describe('design desk', () => {
  it("Plate schedule: links the saved revision's schedule as CSV, and says why not while changes are unsaved", async () => {
    const link = page.getByTestId('plate-schedule-link');
    const href = await link.getAttribute('href');
    expect(href).toMatch(/^\/api\/revisions\/\d+\/plate-schedule\.csv$/);
    const revision = (await page.getByTestId('base-revision').textContent())?.replace('rev ', '');
    const csv = await page.evaluate(async (h) => (await fetch(h)).text(), href as string);
    const lines = csv.trimEnd().split('\r\n');
    expect(lines[0]).toMatch(/^Revision,State,Approved by,Approved on,Quantity,Mark,Arrangement,/);
    expect(lines[1]).toMatch(
      new RegExp(`^${revision},.*East deck, typical beam \\(rev ${revision}[,)].*,post-base,`),
    );
    expect(lines.at(-1)).toMatch(/^"Caution: /);
    const length = await field('Length (root to tip)').inputValue();
    await field('Length (root to tip)').fill('9 ft');
    await expect.poll(() => link.getAttribute('aria-disabled')).toBe('true');
    expect(await link.getAttribute('href')).toBeNull();
    expect(await page.locator('#plate-schedule-why').textContent()).toContain('Save your changes first');
    await field('Length (root to tip)').fill(length);
    await settled();
    // typed back to the saved value: nothing is unsaved any more, and the link returns
    await expect.poll(() => page.getByTestId('unsaved').count()).toBe(0);
    await expect.poll(() => link.getAttribute('href')).toBe(href);
  });

  it('Elevation: pointing along the member shows the readout with its units', async () => {
    const elevation = page.getByTestId('elevation');
    const box = await elevation.boundingBox();
    if (!box) throw new Error('the elevation has no box');
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.move(box.x + box.width / 2 + 5, box.y + box.height / 2);
    const readout = page.getByTestId('elevation-readout');
    await expect
      .poll(async () => (await readout.textContent()) ?? '', { timeout: 5_000 })
      .toMatch(/^At [\d.]+ ft from the root: shear -?[\d.]+ kip, moment -?[\d.]+ kip·ft, deflection/);
    await page.mouse.move(0, 0);
  });

  it('Reach: a long reach makes the live deflection check fail, and restoring it passes again', async () => {
    const length = await field('Length (root to tip)').inputValue();
    expect(await word('member.deflection.live')).not.toBe('does not pass');
    await field('Length (root to tip)').fill('30 ft');
    await expect.poll(() => word('member.deflection.live'), { timeout: 10_000 }).toBe('does not pass');
    expect(await page.getByTestId('verdict').textContent()).toContain('Does not pass');
    await e2e.screenshot(page, 'desk-failing');
    await field('Length (root to tip)').fill(length);
    await expect.poll(() => word('member.deflection.live'), { timeout: 10_000 }).not.toBe('does not pass');
  });

  it('Reach: a plain number is refused next to the field, without NaN', async () => {
    const length = await field('Length (root to tip)').inputValue();
    await field('Length (root to tip)').fill('12');
    await shown(page.getByText('Length (root to tip) needs a unit, got "12"').first());
    expect(await page.locator('body').textContent()).not.toContain('NaN');
    await field('Length (root to tip)').fill(length);
    await settled();
  });

  it('Support: a thin plate fails the plate thickness check, and back; "no connection" drops the plate checks', async () => {
    const thickness = await field('Thickness').inputValue();
    await field('Thickness').fill('0.25 in');
    await expect.poll(() => word('plate.thickness'), { timeout: 10_000 }).toBe('does not pass');
    await field('Thickness').fill(thickness);
    await expect.poll(() => word('plate.thickness'), { timeout: 10_000 }).not.toBe('does not pass');
    await page.getByLabel('Held at the pier by').selectOption('none');
    await expect.poll(() => page.locator('tr[data-check^="plate."]').count(), { timeout: 10_000 }).toBe(0);
    await page.getByLabel('Held at the pier by').selectOption('post-base');
    await expect
      .poll(() => page.locator('tr[data-check="plate.thickness"]').count(), { timeout: 10_000 })
      .toBe(1);
    expect(await field('Thickness').inputValue()).toBe(thickness);
  });

  it('Loads: a preset adds a load row with its source and changes the tip deflection; removing it restores', async () => {
    const before = await tip();
    const rows = page.getByRole('button', { name: /^Remove area load/ });
    const count = await rows.count();
    await page.getByRole('button', { name: 'Add preset: Residential deck live load, 60 psf' }).click();
    await expect.poll(() => rows.count()).toBe(count + 1);
    await expect.poll(tip, { timeout: 10_000 }).not.toBe(before);
    await rows.nth(count).click();
    await expect.poll(tip, { timeout: 10_000 }).toBe(before);
  });

  it('Version 2 inputs: the tip split shows beside the deflection; a weld adds its check; lateral support round-trips', async () => {
    const split = page.getByRole('figure', { name: 'Tip deflection: member and connection' });
    await expect.poll(() => split.textContent(), { timeout: 10_000 }).toMatch(/Member bending [\d.]+ in/);
    expect(await split.textContent()).toMatch(/Connection rotation [\d.]+ in/);
    await field('Fillet weld size').fill('5');
    await shown(page.getByText('Fillet weld size needs a unit, got "5"').first());
    await field('Fillet weld size').fill('5/16 in');
    await expect
      .poll(() => page.locator('tr[data-check="weld.strength"]').count(), { timeout: 10_000 })
      .toBe(1);
    await field('Fillet weld size').fill('');
    await expect
      .poll(() => page.locator('tr[data-check="weld.strength"]').count(), { timeout: 10_000 })
      .toBe(0);
    const before = await tip();
    await page.getByLabel('Lateral support', { exact: true }).selectOption('detailed');
    await page.getByLabel('Top flange', { exact: true }).selectOption('free');
    await settled();
    expect(await page.getByTestId('issue-summary').count()).toBe(0);
    await page.getByLabel('Top flange', { exact: true }).selectOption('braced');
    await page.getByLabel('Lateral support', { exact: true }).selectOption('simple');
    await settled();
    expect(await tip()).toBe(before);
  });

  it('Section: picks a shape from the shapes browser for the member', async () => {
    await page.getByRole('button', { name: 'Browse shapes for the member' }).click();
    const dialog = page.getByRole('dialog', { name: 'Pick a shape' });
    await dialog.getByRole('searchbox').fill('W10X33');
    await dialog.locator('tr[data-shape="W10X33"]').click();
    await shown(dialog.getByText('Torsion constant J'));
    await e2e.screenshot(page, 'shape-picker');
    await dialog.getByRole('button', { name: 'Use for member' }).click();
    await gone(dialog);
    expect(await field('Shape').inputValue()).toBe('W10X33');
    await settled();
    await page.getByLabel('Kind of section').selectOption('plates');
    await shown(field('Depth at the root'));
    await field('Web thickness').fill('0.3125 in');
    await settled();
    expect(await page.getByTestId('elevation-support').textContent()).toMatch(/built-up/i);
  });

  it('Units: SI shows the same physical values, and US again restores the text', async () => {
    const lengthUS = await field('Length (root to tip)').inputValue();
    const tipUS = await tip();
    await page.getByRole('radio', { name: 'SI' }).click();
    await expect.poll(() => field('Length (root to tip)').inputValue()).toMatch(/ m$/);
    await expect.poll(tip, { timeout: 10_000 }).toMatch(/mm$/);
    const feet = Number.parseFloat(lengthUS);
    const metres = Number.parseFloat(await field('Length (root to tip)').inputValue());
    // Converted inputs are written to 4 significant figures (relative change at most 5e-4).
    expect(metres / 0.3048 / feet).toBeCloseTo(1, 3);
    const inches = Number.parseFloat(tipUS);
    const mm = Number.parseFloat(await tip());
    expect(mm / 25.4 / inches).toBeCloseTo(1, 2);
    await e2e.screenshot(page, 'desk-si');
    await page.getByRole('radio', { name: 'US' }).click();
    await expect.poll(() => field('Length (root to tip)').inputValue()).toBe(lengthUS);
    await expect.poll(tip, { timeout: 10_000 }).toBe(tipUS);
  });

  it('stale save: shows what changed in the newer revision and keeps my changes on top of it', async () => {
    const cantileverId = Number(/cantilevers\/(\d+)/.exec(page.url())?.[1]);
    const list = (await (
      await context.request.get(`${e2e.baseUrl}/api/cantilevers/${cantileverId}/revisions`)
    ).json()) as { id: number; number: number }[];
    const newest = list.reduce((a, b) => (b.number > a.number ? b : a));
    const current = (await (
      await context.request.get(`${e2e.baseUrl}/api/revisions/${newest.id}`)
    ).json()) as { input: { connection: { plate: { thickness: string } } } };
    current.input.connection.plate.thickness = '2 in';
    const theirs = await context.request.post(`${e2e.baseUrl}/api/cantilevers/${cantileverId}/revisions`, {
      data: { baseRevision: newest.number, message: 'Thicker plate from the shop', input: current.input },
    });
    expect(theirs.status()).toBe(201);
    const next = newest.number + 1;

    await field('Length (root to tip)').fill('8 ft');
    await page.getByRole('button', { name: 'Save revision' }).click();
    const save = page.getByRole('dialog', { name: 'Save revision' });
    await save.getByLabel('Message').fill('Shorter reach');
    await save.getByRole('button', { name: 'Save revision' }).click();
    const conflict = page.getByRole('dialog', { name: `Revision ${next} was saved while you worked` });
    await shown(conflict);
    const row = conflict.getByRole('row').filter({ hasText: 'Support: plate thickness' });
    expect(await row.textContent()).toContain('2 in');
    expect(
      await conflict.getByRole('row').filter({ hasText: 'Reach: length, root to tip' }).textContent(),
    ).toContain('8 ft');
    await e2e.screenshot(page, 'desk-conflict');
    await conflict.getByRole('button', { name: `Keep my changes on top of revision ${next}` }).click();
    await shown(save);
    expect(await save.getByLabel('Message').inputValue()).toBe('Shorter reach');
    await save.getByRole('button', { name: 'Save revision' }).click();
    await expect
      .poll(() => page.getByTestId('base-revision').textContent(), { timeout: 10_000 })
      .toBe(`rev ${next + 1}`);
    expect(await field('Length (root to tip)').inputValue()).toBe('8 ft');
    await shown(page.getByTestId('revision-list').getByText('Shorter reach'));
  });

  it('asks before leaving with unsaved changes', async () => {
    await field('Length (root to tip)').fill('8.5 ft');
    await shown(page.getByTestId('unsaved'));
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    const ask = page.getByRole('dialog', { name: 'Leave without saving?' });
    await shown(ask);
    await ask.getByRole('button', { name: 'Stay on the desk' }).click();
    expect(page.url()).toMatch(/\/cantilevers\/\d+$/);
    expect(await field('Length (root to tip)').inputValue()).toBe('8.5 ft');
  });
});
