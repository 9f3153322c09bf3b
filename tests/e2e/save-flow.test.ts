/**
 * The save flow in a real browser: Ctrl+S saves (and never reaches the browser's "save page"),
 * invalid inputs are listed in words with a way to each field, focus lands on the saved line,
 * revision messages read as sentences, and each result view shows the caution once.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { CAUTION } from '../../shared/engine/types';
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

const length = () => page.getByLabel('Length (root to tip)', { exact: true });
const focusedId = () => page.evaluate(() => document.activeElement?.id ?? '');
const focusedTestId = () => page.evaluate(() => document.activeElement?.getAttribute('data-testid') ?? '');

/** Counts Ctrl+S presses whose default the page prevented (a listener added after the desk's). */
async function watchSaveKeys() {
  await page.evaluate(() => {
    const w = window as unknown as { prevented: number; watching?: boolean };
    w.prevented = 0;
    if (w.watching) return;
    w.watching = true;
    window.addEventListener('keydown', (e) => {
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === 's' && e.defaultPrevented) w.prevented += 1;
    });
  });
  return () => page.evaluate(() => (window as unknown as { prevented: number }).prevented);
}

/** Caution notes a person can see now (the view's own and the layout's footer). */
const visibleCautions = () =>
  page
    .locator('[data-caution], [data-testid="caution-footer"]')
    .filter({ hasText: CAUTION.slice(0, 40) })
    .filter({
      visible: true,
    });

describe('saving on the desk', () => {
  it('Ctrl+S on invalid inputs lists them in words, with no message box, and takes you to the field', async () => {
    const prevented = await watchSaveKeys();
    await length().fill('9');
    await page.keyboard.press('Control+s');
    const blocked = page.getByRole('dialog', { name: 'This design cannot be saved yet' });
    await shown(blocked);
    expect(await prevented()).toBe(1);
    expect(await blocked.getByLabel('Message').count()).toBe(0);
    expect(await blocked.textContent()).not.toContain('member.length');
    await e2e.screenshot(page, 'save-blocked');
    await blocked.getByRole('button', { name: 'Reach: length, root to tip' }).click();
    await gone(blocked);
    expect(await focusedId()).toBe(await length().getAttribute('id'));
  });

  it('Ctrl+S opens the save, a second Ctrl+S saves, and focus lands on the line naming the new revision', async () => {
    const prevented = await watchSaveKeys();
    const base = Number((await page.getByTestId('base-revision').textContent())?.replace('rev ', ''));
    await length().fill('8.75 ft');
    await shown(page.getByTestId('unsaved'));
    await page.keyboard.press('Control+s');
    const save = page.getByRole('dialog', { name: 'Save revision' });
    await shown(save);
    expect(await save.textContent()).toContain(`Saves as revision ${base + 1}, on top of revision ${base}.`);
    await save.getByLabel('Message').fill('Reach trimmed to clear the neighbouring balcony above');
    await page.keyboard.press('Control+s');
    await gone(save);
    await expect
      .poll(() => page.getByTestId('save-status').textContent(), { timeout: 10_000 })
      .toBe(`Saved as revision ${base + 1}.`);
    expect(await focusedTestId()).toBe('save-status');
    expect(await prevented()).toBe(2);
    await expect
      .poll(() => page.getByTestId('base-revision').textContent(), { timeout: 10_000 })
      .toBe(`rev ${base + 1}`);
  });

  it('shows a revision message on the desk as a sentence, not one word per line', async () => {
    const message = page
      .getByTestId('revision-list')
      .getByText('Reach trimmed to clear the neighbouring balcony above');
    await shown(message);
    const box = await message.boundingBox();
    const lineHeight = await message.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight));
    // Nine words: one per line would be nine lines high; a sentence takes one or two.
    expect(box?.height).toBeLessThanOrEqual(2 * lineHeight + 1);
    await e2e.screenshot(page, 'desk-revisions');
  });

  it('shows the caution once on the desk, the revision, Review and Compare', async () => {
    expect(await visibleCautions().count()).toBe(1);
    const cantileverId = Number(/cantilevers\/(\d+)/.exec(page.url())?.[1]);
    const list = (await (
      await context.request.get(`${e2e.baseUrl}/api/cantilevers/${cantileverId}/revisions`)
    ).json()) as { id: number; number: number }[];
    const [first, last] = [...list]
      .sort((a, b) => a.number - b.number)
      .filter((_, i, all) => i === 0 || i === all.length - 1);
    const views: [string, () => Promise<void>][] = [
      [`/revisions/${last.id}`, () => shown(page.getByTestId('verdict'))],
      [
        `/revisions/${last.id}/review`,
        () => shown(page.getByRole('heading', { name: 'Verdict and checks' })),
      ],
      [
        `/cantilevers/${cantileverId}/compare?a=${first.id}&b=${last.id}`,
        () => shown(page.getByRole('heading', { name: 'Check ratios' })),
      ],
    ];
    for (const [path, loaded] of views) {
      await page.goto(path);
      await loaded();
      expect(await visibleCautions().count(), path).toBe(1);
    }
  });
});
