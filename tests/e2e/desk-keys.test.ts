/**
 * The desk by keyboard in a real browser: one Tab stop per field in the member's groups, the unit
 * list of a field opened and used from the keyboard, the shapes picker one Tab stop with list keys,
 * axe-core on the open picker, and quantity boxes that show their whole value at 390 px.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { assertAccessible } from '../helpers/axe';
import { startE2E, type E2E, openDemoDesk, shown, gone } from '../helpers/e2e';

let e2e: E2E;
let page: Page;

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  await e2e.signInAs(session.context, 'engineer');
  await openDemoDesk(page);
});

afterAll(async () => {
  await e2e?.close();
});

interface Stop {
  key: string;
  tag: string;
  role: string | null;
  inGroup: boolean;
}

/** Presses Tab from the focused element until focus leaves `group`; returns every stop inside it. */
async function tabThrough(group: Locator, max = 40): Promise<Stop[]> {
  const stops: Stop[] = [];
  for (let i = 0; i < max; i++) {
    const stop = await group.evaluate((g) => {
      const el = document.activeElement as HTMLElement;
      return {
        key: el.id || el.getAttribute('aria-label') || el.textContent?.trim() || el.tagName,
        tag: el.tagName,
        role: el.getAttribute('role'),
        inGroup: g.contains(el),
      };
    });
    if (!stop.inGroup) break;
    stops.push(stop);
    await page.keyboard.press('Tab');
  }
  return stops;
}

/** The controls of a group that should each be one Tab stop: its fields and its buttons. */
async function controlsOf(group: Locator): Promise<string[]> {
  return group.evaluate((g) =>
    [...g.querySelectorAll<HTMLElement>('input, select, textarea, button')]
      .filter((el) => el.tabIndex >= 0 && !(el as HTMLInputElement).disabled && el.offsetParent !== null)
      .map((el) => el.id || el.getAttribute('aria-label') || el.textContent?.trim() || el.tagName),
  );
}

const group = (title: string) =>
  page.locator('fieldset').filter({ has: page.locator(`legend`, { hasText: title }) });

describe('desk by keyboard', () => {
  it('visits each field of the member groups once with Tab (the unit list is no stop of its own)', async () => {
    for (const [title, first] of [
      ['Reach', 'Length (root to tip)'],
      ['Section', 'Kind of section'],
    ] as const) {
      const fieldset = group(title);
      await page.getByLabel(first, { exact: true }).focus();
      const stops = await tabThrough(fieldset);
      const controls = await controlsOf(fieldset);
      expect(stops.map((s) => s.key)).toEqual(controls);
      expect(new Set(stops.map((s) => s.key)).size).toBe(stops.length);
      // the unit buttons inside the boxes are mouse-only (tabindex -1)
      expect(stops.some((s) => /other units$/.test(s.key))).toBe(false);
      const quantityBoxes = await fieldset.locator('input[role="combobox"]').count();
      expect(quantityBoxes).toBeGreaterThan(0);
      expect(await fieldset.getByRole('button', { name: /other units$/ }).count()).toBe(quantityBoxes);
    }
  });

  it('converts a value from the unit list by keyboard, and keeps a unit typed by hand', async () => {
    const length = page.getByRole('combobox', { name: 'Length (root to tip)', exact: true });
    const saved = await length.inputValue();
    await length.focus();
    await page.keyboard.press('Alt+ArrowDown');
    expect(await length.getAttribute('aria-expanded')).toBe('true');
    const list = page.locator(`#${await length.getAttribute('aria-controls')}`);
    await shown(list);
    await assertAccessible(page, 'desk, unit list open', `#${await list.getAttribute('id')}`);
    const inches = list.getByRole('option').filter({ hasText: / in$/ });
    const inchesText = (await inches.textContent()) ?? '';
    // the arrows move the active option until it is the inches one, Enter converts to it
    for (let i = 0; i < 4; i++) {
      const activeId = await length.getAttribute('aria-activedescendant');
      if (activeId === (await inches.getAttribute('id'))) break;
      await page.keyboard.press('ArrowDown');
    }
    await page.keyboard.press('Enter');
    expect(await length.inputValue()).toBe(inchesText);
    expect(await length.getAttribute('aria-expanded')).toBe('false');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('role'))).toBe('combobox');
    // Escape closes without changing anything
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Escape');
    expect(await length.getAttribute('aria-expanded')).toBe('false');
    expect(await length.inputValue()).toBe(inchesText);
    // typed by hand, metres in a US design stay as typed and are valid
    await length.fill('2.75 m');
    await expect.poll(() => length.getAttribute('aria-invalid')).toBe('false');
    expect(await length.inputValue()).toBe('2.75 m');
    await length.fill(saved);
  });

  it('the shapes picker: one Tab stop for the list, keys to move and Enter to use a shape, no axe problems', async () => {
    const browse = page.getByRole('button', { name: 'Browse shapes for the member' });
    // time from the click to the first painted frame with the rows (the first open also fetches the table)
    const openMs = async () =>
      page.evaluate(
        () =>
          new Promise<number>((resolve) => {
            const t0 = performance.now();
            document.querySelector<HTMLElement>('[aria-label="Browse shapes for the member"]')?.click();
            const check = () => {
              if (document.querySelector('[role="dialog"] [role="grid"] tr[data-shape]')) {
                requestAnimationFrame(() => resolve(performance.now() - t0));
              } else requestAnimationFrame(check);
            };
            check();
          }),
      );
    const dialog = page.getByRole('dialog', { name: 'Pick a shape' });
    const first = await openMs();
    await page.keyboard.press('Escape');
    await gone(dialog);
    const again: number[] = [];
    for (let i = 0; i < 5; i++) {
      again.push(await openMs());
      await page.keyboard.press('Escape');
      await gone(dialog);
    }
    again.sort((a, b) => a - b);
    console.log(
      `shape picker open: first ${first.toFixed(0)} ms, then median ${again[2]!.toFixed(0)} ms (${again.map((t) => t.toFixed(0)).join(', ')})`,
    );
    await browse.click();
    const grid = dialog.getByRole('grid', { name: 'Shapes' });
    await shown(grid.locator('tr[data-shape]').first());
    // the whole table is in the list (aria-rowcount, the head row included), the rows in view are drawn
    const rowCount = Number(await grid.getAttribute('aria-rowcount')) - 1;
    expect(rowCount).toBeGreaterThan(600);
    const drawn = await grid.locator('tr[data-shape]').count();
    expect(drawn).toBeLessThan(80);
    console.log(`shape picker: ${drawn} of ${rowCount} rows drawn`);
    expect(await grid.locator('tr[data-shape][tabindex="0"]').count()).toBe(1);
    await assertAccessible(page, 'shape picker dialog', '[role="dialog"]');

    // Tab round the dialog (it keeps the focus inside): the 600-odd rows are one stop
    const search = dialog.getByRole('searchbox');
    await search.focus();
    const stops: (string | null)[] = [];
    for (let i = 0; i < 40; i++) {
      await page.keyboard.press('Tab');
      const shape = await page.evaluate(() => {
        const el = document.activeElement as HTMLElement;
        return el.getAttribute('type') === 'search' ? 'SEARCH' : (el.dataset.shape ?? el.tagName);
      });
      if (shape === 'SEARCH') break;
      stops.push(shape);
    }
    const rowStops = stops.filter((s) => s && !['BUTTON', 'INPUT', 'SELECT'].includes(s));
    expect(rowStops).toHaveLength(1);
    expect(stops.length).toBeLessThan(25);

    // into the list: arrows, End (scrolled into view), Home, then type-ahead and Enter
    const focusedShape = () => page.evaluate(() => (document.activeElement as HTMLElement).dataset.shape);
    const rowAt = async (index: number) =>
      grid.locator(`tr[aria-rowindex="${index + 2}"]`).getAttribute('data-shape');
    await grid.locator('tr[tabindex="0"]').focus();
    await page.keyboard.press('Home');
    await expect.poll(focusedShape).toBe(await rowAt(0));
    await page.keyboard.press('ArrowDown');
    const second = await rowAt(1);
    await expect.poll(focusedShape).toBe(second);
    expect(await dialog.getByRole('complementary', { name: 'Shape details' }).textContent()).toContain(
      second,
    );
    await page.keyboard.press('End');
    const last = grid.locator(`tr[aria-rowindex="${rowCount + 1}"]`);
    await expect.poll(() => last.evaluate((r) => r === document.activeElement)).toBe(true);
    const inView = () =>
      last.evaluate((r) => {
        const box = r.closest('[data-scroll]')!.getBoundingClientRect();
        const row = r.getBoundingClientRect();
        return row.top >= box.top && row.bottom <= box.bottom + 1;
      });
    await expect.poll(inView).toBe(true);
    // the rows before it are drawn too once scrolled there
    await expect.poll(() => grid.locator(`tr[aria-rowindex="${rowCount}"]`).count()).toBe(1);
    await page.keyboard.press('PageUp');
    await expect.poll(focusedShape).not.toBe(await last.getAttribute('data-shape'));
    await page.keyboard.type('W10X33');
    await expect.poll(focusedShape).toBe('W10X33');
    await e2e.screenshot(page, 'shape-picker-keys');
    await page.keyboard.press('Enter');
    await gone(dialog);
    expect(await page.getByLabel('Shape', { exact: true }).inputValue()).toBe('W10X33');
  });

  it('shows the whole value of every quantity box at 390 px wide', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    try {
      await shown(page.getByRole('combobox', { name: 'Length (root to tip)', exact: true }));
      const cut = await page.evaluate(() =>
        [...document.querySelectorAll<HTMLInputElement>('input[role="combobox"]')]
          .filter((el) => el.offsetParent !== null && el.value !== '')
          .filter((el) => el.scrollWidth > el.clientWidth)
          .map((el) => `${el.id}: "${el.value}" (${el.clientWidth} px)`),
      );
      expect(cut).toEqual([]);
      await e2e.screenshot(page, 'desk-fields-390');
    } finally {
      await page.setViewportSize({ width: 1440, height: 960 });
    }
  });
});
