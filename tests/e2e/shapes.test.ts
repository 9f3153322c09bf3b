/** The shapes browser in a real browser: search and filter, then import a CSV with one bad row. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startE2E, type E2E, shown } from '../helpers/e2e';

let e2e: E2E;
let page: Page;

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  await e2e.signInAs(session.context, 'fabricator');
  await page.goto('/shapes');
  await shown(page.getByRole('grid', { name: 'Shapes' }));
});

afterAll(async () => {
  await e2e?.close();
});

const CSV = [
  'label,family,W,A,d,bf,tf,tw,Ix,Zx,Sx,Iy,ry,J',
  'RL-W9X20,W,20,5.9,9,5.5,0.36,0.25,80,20,17.8,10,1.3,0.3',
  'RL-BAD1,W,20,5.9,,5.5,0.36,0.25,80,20,17.8,10,1.3,0.3',
].join('\n');

describe('shapes browser', () => {
  it('searches by label and filters by family and depth', async () => {
    await page.getByRole('searchbox').fill('HSS8');
    await page.getByLabel('Family').selectOption('HSS');
    await expect.poll(() => page.locator('tr[data-shape]').count()).toBeGreaterThan(0);
    const labels = await page
      .locator('tr[data-shape]')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-shape') ?? ''));
    expect(labels.every((l) => l.startsWith('HSS8'))).toBe(true);
    await page.getByRole('searchbox').fill('');
    await page.getByLabel('Family').selectOption('W');
    await page.getByLabel('Depth from (in)').fill('20');
    await page.getByLabel('Depth to (in)').fill('22');
    await expect.poll(() => page.locator('tr[data-shape="W12X26"]').count()).toBe(0);
    await page.locator('tr[data-shape]').first().click();
    await shown(page.getByText('Torsion constant J'));
    const depth = await page
      .getByRole('complementary', { name: 'Shape details' })
      .getByText(/^Depth d$/)
      .locator('xpath=following-sibling::dd[1]')
      .textContent();
    const d = Number.parseFloat(depth ?? '');
    expect(d).toBeGreaterThanOrEqual(20);
    expect(d).toBeLessThanOrEqual(22);
    // the list is one Tab stop on this page too: ArrowDown moves to the next shape and shows it
    const rows = page.locator('tr[data-shape]');
    expect(await page.locator('tr[data-shape][tabindex="0"]').count()).toBe(1);
    await rows.first().focus();
    await page.keyboard.press('ArrowDown');
    const next = (await rows.nth(1).getAttribute('data-shape')) ?? '';
    expect(await page.evaluate(() => (document.activeElement as HTMLElement).dataset.shape)).toBe(next);
    await shown(page.getByRole('complementary', { name: 'Shape details' }).getByText(next, { exact: true }));
    await e2e.screenshot(page, 'shapes');
  });

  it('imports a CSV, reports the bad row with its reason and lists the good shape', async () => {
    await page
      .getByLabel('CSV file', { exact: true })
      .setInputFiles({ name: 'our-shapes.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
    await page.getByRole('button', { name: 'Import' }).click();
    const result = page.getByTestId('import-result');
    await shown(result);
    expect(await result.textContent()).toContain('1 shape imported; 1 row rejected');
    const rejected = result.getByRole('table', { name: 'Rejected rows' }).getByRole('row').nth(1);
    expect(await rejected.textContent()).toMatch(/3\s*RL-BAD1.*needs d/);
    await e2e.screenshot(page, 'shapes-import');
    await page.getByLabel('Depth from (in)').fill('');
    await page.getByLabel('Depth to (in)').fill('');
    await page.getByRole('searchbox').fill('RL-W9');
    await expect.poll(() => page.locator('tr[data-shape="RL-W9X20"]').count()).toBe(1);
    expect(await page.locator('tr[data-shape="RL-W9X20"]').textContent()).toContain('imported');
  });
});
