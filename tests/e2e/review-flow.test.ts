/**
 * The review path in a real browser against the real server: the architect saves a revision and
 * submits it, the engineers' e-mail is captured in the outbox, the engineer requests changes with a
 * comment, the architect revises and submits again, the engineer approves, and Compare shows what
 * changed. Two browser sessions (architect, engineer); the admin is checked through the API and,
 * at the end, the Outbox screen in the architect's window after signing in as the admin.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { request, type APIRequestContext, type BrowserContext, type Page } from 'playwright-core';
import { CAUTION } from '../../shared/engine/types';
import type { OutboxDto, ProjectDetailDto, ProjectDto } from '../../shared/schemas/api';
import { DEMO_PASSWORD, demoEmail, startE2E, type E2E, shown } from '../helpers/e2e';

const CANTILEVER = 'East deck, typical beam';
const ENGINEER = 'Priya Vasquez, PE';

let e2e: E2E;
let arch: { context: BrowserContext; page: Page };
let eng: { context: BrowserContext; page: Page };
let admin: APIRequestContext;
let cantileverId = 0;
const lengths: number[] = [];

beforeAll(async () => {
  e2e = await startE2E();
  arch = await e2e.newSession();
  eng = await e2e.newSession();
  await e2e.signInAs(arch.context, 'architect');
  await e2e.signInAs(eng.context, 'engineer');
  admin = await request.newContext({ baseURL: e2e.baseUrl });
  const login = await admin.post('/api/auth/login', {
    data: { email: demoEmail('admin'), password: DEMO_PASSWORD },
  });
  expect(login.ok()).toBe(true);
  const projects = (await (
    await arch.context.request.get(`${e2e.baseUrl}/api/projects`)
  ).json()) as ProjectDto[];
  const project = (await (
    await arch.context.request.get(`${e2e.baseUrl}/api/projects/${projects[0].id}`)
  ).json()) as ProjectDetailDto;
  cantileverId = project.cantilevers.find((c) => c.name === CANTILEVER)?.id ?? 0;
  expect(cantileverId).toBeGreaterThan(0);
});

afterAll(async () => {
  await admin?.dispose();
  await e2e?.close();
});

/** On the desk: change the reach by `deltaFeet` and save a revision with `message`. */
async function saveOnDesk(page: Page, deltaFeet: number, message: string): Promise<void> {
  await page.goto(`/cantilevers/${cantileverId}`);
  await shown(page.getByTestId('tip-deflection'));
  const length = page.getByLabel('Length (root to tip)', { exact: true });
  const feet = Number.parseFloat(await length.inputValue());
  if (lengths.length === 0) lengths.push(feet);
  await length.fill(`${feet + deltaFeet} ft`);
  await shown(page.getByTestId('unsaved'));
  await page.getByRole('button', { name: 'Save revision' }).click();
  const dialog = page.getByRole('dialog', { name: 'Save revision' });
  await dialog.getByLabel('Message').fill(message);
  await dialog.getByRole('button', { name: 'Save revision' }).click();
  await dialog.waitFor({ state: 'detached', timeout: 15_000 }).catch(async () => {
    throw new Error(`the save dialog stayed open: ${await dialog.textContent()}`);
  });
  lengths.push(feet + deltaFeet);
}

/** In the history: submit the latest draft, revision `number`, for review. */
async function submitLatest(page: Page, number: number, message: string): Promise<void> {
  await page.goto(`/cantilevers/${cantileverId}/history`);
  const list = page.getByRole('list', { name: 'Revisions, newest first' });
  await shown(list.getByText(message));
  const latest = list.getByRole('listitem').first();
  expect(await latest.getByRole('heading').textContent()).toContain(`Revision ${number}Draft`);
  await latest.getByRole('button', { name: 'Submit for review' }).click();
  await shown(
    page.getByText(`Revision ${number} was submitted for review. ${ENGINEER} was notified by e-mail.`),
  );
  await shown(latest.getByText('Awaiting review'));
}

async function outbox(): Promise<OutboxDto[]> {
  const res = await admin.get('/api/admin/outbox');
  expect(res.status()).toBe(200);
  return (await res.json()) as OutboxDto[];
}

/** The engineer opens the review of revision `number` from the history. */
async function openReview(number: number): Promise<void> {
  const page = eng.page;
  await page.goto(`/cantilevers/${cantileverId}/history`);
  await page.getByRole('link', { name: `Open review of revision ${number}` }).click();
  await shown(page.getByRole('heading', { name: new RegExp(`^Review of revision ${number}`) }));
  expect(await page.getByText(CAUTION).count()).toBeGreaterThan(0);
  expect(await page.locator('tr[data-check]').count()).toBeGreaterThan(4);
}

describe('review flow: submit, request changes, revise, approve, compare', () => {
  it('the architect saves a revision and submits it; the engineer’s e-mail is captured', async () => {
    await saveOnDesk(arch.page, 1, 'Reach one foot longer for the view');
    await submitLatest(arch.page, 2, 'Reach one foot longer for the view');
    const subject = `Review requested: ${CANTILEVER}, revision 2`;
    await expect
      .poll(async () => (await outbox()).find((m) => m.subject === subject)?.status, { timeout: 15_000 })
      .toBe('sent');
    const mail = (await outbox()).find((m) => m.subject === subject) as OutboxDto;
    expect(mail.to).toEqual([demoEmail('engineer')]);
    expect(mail.text).toContain('Reach one foot longer for the view');
  });

  it('the engineer requests changes with a comment; the form checks the comment first', async () => {
    await openReview(2);
    const page = eng.page;
    await e2e.screenshot(page, 'review');
    const form = page.getByRole('form', { name: 'Review decision' });
    await form.getByRole('radio', { name: 'Request changes' }).check();
    await form.getByRole('button', { name: 'Record decision' }).click();
    await shown(form.getByText('Comment is required when you request changes: say what should change'));
    await form
      .getByLabel('Comment')
      .fill('The tip moves too much at this reach; bring it back or deepen the section.');
    await form.getByRole('button', { name: 'Record decision' }).click();
    await shown(page.getByText('You requested changes on revision 2.'));
    await shown(page.getByText(new RegExp(`^Changes requested by ${ENGINEER} on `)));
    expect(await page.getByRole('form', { name: 'Review decision' }).count()).toBe(0);
    await expect
      .poll(async () =>
        (await outbox()).some(
          (m) => m.subject === `Revision 2 of ${CANTILEVER} was returned with changes requested`,
        ),
      )
      .toBe(true);
  });

  it('the architect sees the request, revises and submits again', async () => {
    const page = arch.page;
    await page.goto(`/cantilevers/${cantileverId}/history`);
    const second = page.getByRole('list', { name: 'Revisions, newest first' }).getByRole('listitem').first();
    await shown(second.getByText('Changes requested'));
    await second.getByRole('link', { name: 'Review record' }).click();
    await shown(
      page.getByText('The tip moves too much at this reach; bring it back or deepen the section.').first(),
    );
    expect(await page.getByRole('radio').count()).toBe(0);

    await saveOnDesk(page, -1, 'Shorter reach after review');
    await submitLatest(page, 3, 'Shorter reach after review');
    await expect
      .poll(
        async () => (await outbox()).some((m) => m.subject === `Review requested: ${CANTILEVER}, revision 3`),
        { timeout: 15_000 },
      )
      .toBe(true);
  });

  it('the engineer approves; the approval is final', async () => {
    await openReview(3);
    const page = eng.page;
    const changes = page.getByRole('table', { name: /Changed inputs/ });
    await shown(changes);
    expect(await changes.getByRole('row', { name: /Reach: length/ }).count()).toBe(1);
    const form = page.getByRole('form', { name: 'Review decision' });
    await form.getByRole('radio', { name: 'Approve revision 3' }).check();
    await form.getByRole('button', { name: 'Record decision' }).click();
    const confirm = page.getByRole('alertdialog', { name: 'Approve revision 3?' });
    await confirm.getByRole('button', { name: 'Yes, approve revision 3' }).click();
    await shown(page.getByText('You approved revision 3.'));
    await shown(page.getByText(new RegExp(`^Approved by ${ENGINEER} on `)));
    expect(await page.getByRole('radio').count()).toBe(0);
    await page.reload();
    await shown(page.getByText(new RegExp(`^Approved by ${ENGINEER} on `)));
    expect(await page.getByText(/An approval is final/).count()).toBe(1);
    await e2e.screenshot(page, 'review-approved');
  });

  it('the history shows the states, and Compare shows the change between the two reviewed revisions', async () => {
    const page = eng.page;
    await page.goto(`/cantilevers/${cantileverId}/history`);
    const items = page.getByRole('list', { name: 'Revisions, newest first' }).getByRole('listitem');
    await shown(items.first().getByText('Approved'));
    expect(await items.nth(1).getByText('Changes requested').count()).toBe(1);
    await page.getByRole('checkbox', { name: 'Pick revision 3 for compare' }).check();
    await page.getByRole('checkbox', { name: 'Pick revision 2 for compare' }).check();
    await e2e.screenshot(page, 'history');
    await page.getByRole('link', { name: 'Compare revision 2 with 3' }).click();
    await shown(page.getByRole('heading', { name: 'Compare revision 2 with revision 3' }));

    const row = page
      .getByRole('table', { name: /Changed inputs/ })
      .getByRole('row', { name: /Reach: length/ });
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells.map((c) => Number.parseFloat(c))).toEqual([lengths[1], lengths[2]]);
    const ratios = page.getByRole('table', { name: /Check ratios/ });
    expect(await ratios.locator('tbody tr').count()).toBeGreaterThan(4);
    // a shorter reach bends the root less
    expect(await ratios.locator('tr[data-check="member.flexure"]').textContent()).toContain('ratio down');
    expect(await page.getByText(CAUTION).count()).toBeGreaterThan(0);
    await shown(page.locator('.recharts-line').first());
    // moment, shear and deflection, each for both revisions
    expect(await page.locator('.recharts-line').count()).toBe(6);
    expect(await page.getByText(/^Moment under .+\. Revision 2: reach 8\.00 ft, root moment /).count()).toBe(
      1,
    );
    expect(await page.getByText(/^Revision 3 total-load limit /).count()).toBe(1);
    await e2e.screenshot(page, 'compare');
  });

  it('the admin reads both requests and both decisions on the Outbox screen', async () => {
    const page = arch.page;
    await e2e.signInAs(arch.context, 'admin');
    await page.goto('/admin/outbox');
    const table = page.getByRole('table', { name: /E-mails captured/ });
    await shown(table);
    for (const subject of [
      `Review requested: ${CANTILEVER}, revision 2`,
      `Revision 2 of ${CANTILEVER} was returned with changes requested`,
      `Review requested: ${CANTILEVER}, revision 3`,
      `Revision 3 of ${CANTILEVER} was approved`,
    ]) {
      await expect
        .poll(
          async () => {
            await page.getByRole('button', { name: 'Refresh' }).click();
            return table.getByRole('rowheader', { name: subject }).count();
          },
          { timeout: 15_000 },
        )
        .toBe(1);
    }
    await page
      .getByRole('button', { name: `Show text of “Review requested: ${CANTILEVER}, revision 3”` })
      .click();
    await shown(page.getByText('Message: Shorter reach after review'));
    await e2e.screenshot(page, 'outbox');

    await page.goto('/admin/team');
    const accounts = page.getByRole('table', { name: 'Accounts' });
    await shown(accounts.getByRole('row', { name: new RegExp(ENGINEER) }));
    expect(await accounts.locator('tbody tr').count()).toBe(4);
    await e2e.screenshot(page, 'team');
  });

  it('the admin creates an account and adds it to the project, then removes it', async () => {
    const page = arch.page;
    const form = page.getByRole('form', { name: 'Create an account' });
    await form.getByLabel('E-mail').fill('second.engineer@reachline.test');
    await form.getByLabel('Name').fill('Noor Haddad');
    await form.getByLabel('Role').selectOption('engineer');
    await form.getByLabel('First password').fill('short');
    await form.getByRole('button', { name: 'Create account' }).click();
    await shown(form.getByText('First password must be at least 10 characters'));
    await form.getByLabel('First password').fill('a-long-first-password');
    await form.getByRole('button', { name: 'Create account' }).click();
    await shown(
      page.getByText('Account created for Noor Haddad (second.engineer@reachline.test) as engineer.'),
    );
    await shown(page.getByRole('table', { name: 'Accounts' }).getByRole('row', { name: /Noor Haddad/ }));

    const projects = (await (await admin.get('/api/projects')).json()) as ProjectDto[];
    await page.goto(`/projects/${projects[0].id}`);
    const panel = page.getByRole('region', { name: 'Project members' });
    await panel
      .getByLabel('Add an account')
      .selectOption({ label: 'Noor Haddad (engineer, second.engineer@reachline.test)' });
    await panel.getByRole('button', { name: 'Add member' }).click();
    await shown(panel.getByText('Noor Haddad was added to the project.'));
    await shown(panel.getByRole('button', { name: 'Remove Noor Haddad' }));
    const detail = (await (await admin.get(`/api/projects/${projects[0].id}`)).json()) as ProjectDetailDto;
    expect(detail.members.map((m) => m.email)).toContain('second.engineer@reachline.test');
    await e2e.screenshot(page, 'project-members');
    await panel.getByRole('button', { name: 'Remove Noor Haddad' }).click();
    await shown(panel.getByText('Noor Haddad was removed from the project.'));
    const after = (await (await admin.get(`/api/projects/${projects[0].id}`)).json()) as ProjectDetailDto;
    expect(after.members.map((m) => m.email)).not.toContain('second.engineer@reachline.test');
  });
});
