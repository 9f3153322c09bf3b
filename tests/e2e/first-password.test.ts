/**
 * A new account in a real browser: the admin creates it, one welcome e-mail is queued (no
 * password in it), the person signs in with the first password, is told why a new one is needed,
 * chooses it, and reaches the projects.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startE2E, type E2E, shown, gone } from '../helpers/e2e';

let e2e: E2E;

beforeAll(async () => {
  e2e = await startE2E();
});

afterAll(async () => {
  await e2e?.close();
});

const FIRST = 'granite ladder under 9 gulls';
const OWN = 'copper kettle on the north pier';

describe('a new account’s first sign-in', () => {
  it('gets one welcome e-mail and must choose its own password before anything else', async () => {
    const admin = await e2e.newSession();
    await e2e.signInAs(admin.context, 'admin');
    const created = await admin.context.request.post(`${e2e.baseUrl}/api/admin/users`, {
      data: {
        email: 'rafa.welder@reachline.test',
        displayName: 'Rafa Welder',
        role: 'fabricator',
        password: FIRST,
      },
    });
    expect(created.status()).toBe(201);
    const outbox = (await (await admin.context.request.get(`${e2e.baseUrl}/api/admin/outbox`)).json()) as {
      to: string[];
      subject: string;
      text: string;
    }[];
    const welcomes = outbox.filter((m) => m.to.includes('rafa.welder@reachline.test'));
    expect(welcomes.map((m) => m.subject)).toEqual(['Your Reachline account']);
    expect(welcomes[0].text).toContain('/sign-in with the e-mail address rafa.welder@reachline.test');
    expect(welcomes[0].text).not.toContain(FIRST);

    const { page } = await e2e.newSession();
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('rafa.welder@reachline.test');
    await page.getByLabel('Password').fill(FIRST);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await shown(page.getByRole('heading', { name: 'Choose a new password' }));
    await shown(page.getByText(/was set by an admin, for a new account or after a reset/));
    await e2e.screenshot(page, 'first-password');
    const form = page.getByRole('form', { name: 'Change password' });
    await form.getByLabel('Current password').fill(FIRST);
    await form.getByLabel('New password', { exact: true }).fill(OWN);
    await form.getByLabel('New password again').fill(OWN);
    await form.getByRole('button', { name: 'Change password' }).click();
    await gone(page.getByRole('heading', { name: 'Choose a new password' }));
    const projects = await page.evaluate(async () => (await fetch('/api/projects')).status);
    expect(projects).toBe(200);
  });
});
