/**
 * The walking skeleton in a real browser: sign in, open the demo cantilever, change the length and
 * see the tip deflection change, save a revision with a message, reload and find it listed.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { DEMO_PASSWORD, demoEmail, startE2E, type E2E, shown, gone } from '../helpers/e2e';

let e2e: E2E;
let page: Page;
let context: BrowserContext;

beforeAll(async () => {
  e2e = await startE2E();
  ({ page, context } = await e2e.newSession());
});

afterAll(async () => {
  await e2e?.close();
});

async function tipText(): Promise<string> {
  return (await page.getByTestId('tip-deflection').textContent()) ?? '';
}

describe('skeleton: sign in, edit, save, reload', () => {
  it('sends a signed-out person to sign in, with plain errors, then back', async () => {
    await page.goto('/projects');
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByText('E-mail must be an e-mail address').count()).toBe(1);
    await page.getByLabel('E-mail').fill(demoEmail('engineer'));
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await shown(page.getByText('That e-mail and password do not match an active account.'));
    await e2e.screenshot(page, 'sign-in');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/projects$/);
    await shown(page.getByRole('heading', { name: 'Projects' }));
    expect(await page.getByTestId('who').textContent()).toContain('engineer');
    await e2e.screenshot(page, 'projects');
    expect(context.pages().length).toBe(1);
  });

  it('opens the demo cantilever on the desk with a computed result and the caution', async () => {
    await page.getByRole('link', { name: /Harbor View Studio/ }).click();
    await shown(page.getByRole('heading', { name: 'Harbor View Studio' }));
    const scheduleHref = await page.getByTestId('project-schedule-link').getAttribute('href');
    expect(scheduleHref).toMatch(/^\/api\/projects\/\d+\/plate-schedule\.csv$/);
    const schedule = (await page.evaluate(async (h) => (await fetch(h)).text(), scheduleHref as string))
      .trimEnd()
      .split('\r\n');
    expect(schedule[0]).toMatch(/^Revision,State,Approved by,Approved on,Quantity,Mark,Arrangement,/);
    // The demo's east deck is approved at revision 1: the shop's schedule lists it, and no draft.
    expect(
      schedule.some((line) =>
        /^1,approved,"Priya Vasquez, PE",[\d-]+,1,"East deck, typical beam \(rev 1\)",post-base,\d/.test(
          line,
        ),
      ),
    ).toBe(true);
    expect(schedule.some((line) => line.includes('NOT APPROVED'))).toBe(false);
    // the project page states pass/fail words, so it carries the caution too
    expect(await page.getByTestId('caution-footer').textContent()).toContain('licensed engineer');
    await e2e.screenshot(page, 'project');
    await page.getByRole('link', { name: 'East deck, typical beam', exact: true }).click();
    await shown(page.getByTestId('tip-deflection'));
    expect(await page.getByTestId('caution').textContent()).toContain('licensed engineer');
    expect(await page.getByTestId('verdict').textContent()).toMatch(/checks/);
    expect(await page.locator('tr[data-check]').count()).toBeGreaterThan(4);
  });

  it('changes the length and sees the tip deflection change', async () => {
    const before = await tipText();
    const length = page.getByLabel('Length (root to tip)', { exact: true });
    const old = await length.inputValue();
    const feet = Number.parseFloat(old);
    await length.fill(`${feet + 2} ft`);
    await expect.poll(tipText, { timeout: 10_000 }).not.toBe(before);
    const tipBefore = Number.parseFloat(before);
    const tipAfter = Number.parseFloat(await tipText());
    expect(tipAfter).toBeGreaterThan(tipBefore);
    await shown(page.getByTestId('unsaved'));
    await e2e.screenshot(page, 'desk');
  });

  it('saves a revision with a message and finds it listed after a reload', async () => {
    const baseBefore = (await page.getByTestId('base-revision').textContent()) ?? '';
    await page.getByRole('button', { name: 'Save revision' }).click();
    const dialog = page.getByRole('dialog', { name: 'Save revision' });
    await dialog.getByRole('button', { name: 'Save revision' }).click();
    await shown(dialog.getByText('Message is required: describe what changed'));
    await dialog.getByLabel('Message').fill('Reach two feet longer for the view');
    await dialog.getByRole('button', { name: 'Save revision' }).click();
    await gone(dialog);
    await expect.poll(async () => page.getByTestId('base-revision').textContent()).not.toBe(baseBefore);
    expect(await page.getByTestId('unsaved').count()).toBe(0);
    await page.reload();
    await shown(page.getByTestId('revision-list').getByText('Reach two feet longer for the view'));
    const length = await page.getByLabel('Length (root to tip)', { exact: true }).inputValue();
    expect(Number.parseFloat(length)).toBeGreaterThan(0);
    expect(await page.getByTestId('unsaved').count()).toBe(0);
  });

  it('creates a cantilever that starts from the example design and saves it as revision 1', async () => {
    await page.getByRole('link', { name: 'Project', exact: true }).click();
    await page.getByRole('button', { name: 'New cantilever' }).click();
    const dialog = page.getByRole('dialog', { name: 'New cantilever' });
    await dialog.getByRole('button', { name: 'Create cantilever' }).click();
    await shown(dialog.getByText('Name is required'));
    await dialog.getByLabel('Name').fill('West deck, corner beam');
    await dialog.getByRole('button', { name: 'Create cantilever' }).click();
    await page.waitForURL(/\/cantilevers\/\d+$/);
    expect(await page.getByTestId('base-revision').textContent()).toBe('not saved yet');
    await shown(page.getByTestId('tip-deflection'));
    await page.getByRole('button', { name: 'Save revision' }).click();
    const save = page.getByRole('dialog', { name: 'Save revision' });
    await save.getByLabel('Message').fill('Starting point for the corner');
    await save.getByRole('button', { name: 'Save revision' }).click();
    await expect
      .poll(() => page.getByTestId('base-revision').textContent(), { timeout: 10_000 })
      .toBe('rev 1');
    await shown(page.getByTestId('revision-list').getByText('Starting point for the corner'));
  });
});
