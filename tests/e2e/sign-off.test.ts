/**
 * Sign-off in a real browser: the architect saves and submits revision 2 of the demo's east deck
 * and then a newer draft, revision 3; the engineer opens revision 2 from the link in the e-mail,
 * sees that a newer revision exists, approves revision 2 after the confirmation, and the
 * fabricator downloads a project plate schedule that lists revision 2 as approved (and no draft),
 * and the calculation package of revision 2.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { APIRequestContext, BrowserContext, Page } from 'playwright-core';
import { request } from 'playwright-core';
import type { OutboxDto, ProjectDetailDto, ProjectDto, RevisionDto } from '../../shared/schemas/api';
import { DEMO_PASSWORD, demoEmail, startE2E, type E2E, shown } from '../helpers/e2e';

const CANTILEVER = 'East deck, typical beam';

let e2e: E2E;
let arch: { context: BrowserContext; page: Page };
let eng: { context: BrowserContext; page: Page };
let fab: { context: BrowserContext; page: Page };
let admin: APIRequestContext;
let projectId = 0;
let rev2: RevisionDto;

beforeAll(async () => {
  e2e = await startE2E();
  arch = await e2e.newSession();
  eng = await e2e.newSession();
  fab = await e2e.newSession();
  await e2e.signInAs(arch.context, 'architect');
  await e2e.signInAs(eng.context, 'engineer');
  await e2e.signInAs(fab.context, 'fabricator');
  admin = await request.newContext({ baseURL: e2e.baseUrl });
  await admin.post('/api/auth/login', { data: { email: demoEmail('admin'), password: DEMO_PASSWORD } });
});

afterAll(async () => {
  await admin?.dispose();
  await e2e?.close();
});

async function api<T>(
  context: BrowserContext,
  method: 'get' | 'post',
  path: string,
  data?: unknown,
): Promise<T> {
  const res = await context.request[method](`${e2e.baseUrl}${path}`, data === undefined ? {} : { data });
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

describe('sign-off: from the e-mail link to the shop', () => {
  it('the architect submits revision 2 and saves a newer draft; the engineer’s mail links to the review', async () => {
    const projects = await api<ProjectDto[]>(arch.context, 'get', '/api/projects');
    projectId = projects[0].id;
    const project = await api<ProjectDetailDto>(arch.context, 'get', `/api/projects/${projectId}`);
    const c = project.cantilevers.find((x) => x.name === CANTILEVER);
    expect(c?.latestApproved?.number).toBe(1);
    const rev1 = await api<RevisionDto>(arch.context, 'get', `/api/revisions/${c!.currentRevisionId}`);
    const longer = { ...rev1.input, member: { ...rev1.input.member, length: '8 ft' } };
    rev2 = await api<RevisionDto>(arch.context, 'post', `/api/cantilevers/${c!.id}/revisions`, {
      baseRevision: 1,
      message: 'Reach 8 ft for the view',
      input: longer,
    });
    await api(arch.context, 'post', `/api/revisions/${rev2.id}/submit`, { note: 'Ready for sign-off.' });
    await api(arch.context, 'post', `/api/cantilevers/${c!.id}/revisions`, {
      baseRevision: 2,
      message: 'Trying 9 ft',
      input: { ...longer, member: { ...longer.member, length: '9 ft' } },
    });
  });

  it('the engineer opens revision 2 from the e-mail link and approves it after the confirmation', async () => {
    const subject = `Review requested: ${CANTILEVER}, revision 2`;
    let mail: OutboxDto | undefined;
    await expect
      .poll(
        async () => {
          mail = ((await (await admin.get('/api/admin/outbox')).json()) as OutboxDto[]).find(
            (m) => m.subject === subject,
          );
          return mail !== undefined;
        },
        { timeout: 15_000 },
      )
      .toBe(true);
    expect(mail!.to).toEqual([demoEmail('engineer')]);
    expect(mail!.text).toContain('Note to the reviewer: Ready for sign-off.');
    const link = /Open the review: (\S+)/.exec(mail!.text)?.[1];
    expect(link).toMatch(new RegExp(`/revisions/${rev2.id}/review$`));
    const page = eng.page;
    // The link names the app's address (APP_ORIGIN); the test server listens on its own port.
    await page.goto(new URL(link!).pathname);
    await shown(page.getByRole('heading', { name: /^Review of revision 2/ }));
    await shown(
      page
        .getByTestId('newer-revisions')
        .getByText('A newer revision exists: the latest is revision 3. You are reviewing revision 2.'),
    );
    await shown(page.getByTestId('inputs-read-only'));
    const form = page.getByRole('form', { name: 'Review decision' });
    await form.getByRole('radio', { name: 'Approve revision 2' }).check();
    await form.getByRole('button', { name: 'Record decision' }).click();
    const confirm = page.getByRole('alertdialog', { name: 'Approve revision 2?' });
    await shown(confirm.getByText(/Revision 3 is newer and stays as it is/));
    await e2e.screenshot(page, 'sign-off-confirm');
    await confirm.getByRole('button', { name: 'Yes, approve revision 2' }).click();
    await shown(page.getByText('You approved revision 2.'));
  });

  it('the fabricator downloads a schedule that lists the approved revision 2, no draft, and its package', async () => {
    const page = fab.page;
    await page.goto(`/projects/${projectId}`);
    await shown(page.getByTestId('latest-approved').first().getByText('rev 2'));
    const href = await page.getByTestId('project-schedule-link').getAttribute('href');
    const csv = await page.evaluate(async (h) => (await fetch(h)).text(), href as string);
    const rows = csv.trimEnd().split('\r\n');
    expect(rows[0]).toMatch(/^Revision,State,Approved by,Approved on,Quantity,Mark,/);
    expect(
      rows.some((r) =>
        /^2,approved,"Priya Vasquez, PE",[\d-]+,1,"East deck, typical beam \(rev 2\)",/.test(r),
      ),
    ).toBe(true);
    expect(csv).not.toMatch(/rev 3/);
    expect(csv).not.toMatch(/NOT APPROVED/);
    await page.goto(`/revisions/${rev2.id}`);
    await shown(page.getByTestId('revision-of').getByText('This is revision 2 of 3.'));
    const pdfHref = await page.getByTestId('package-link').getAttribute('href');
    const head = await page.evaluate(async (h) => {
      const res = await fetch(h);
      const bytes = new Uint8Array(await res.arrayBuffer());
      return {
        status: res.status,
        type: res.headers.get('content-type'),
        start: String.fromCharCode(...bytes.slice(0, 5)),
      };
    }, pdfHref as string);
    expect(head).toEqual({ status: 200, type: 'application/pdf', start: '%PDF-' });
    await e2e.screenshot(page, 'revision-read-only');
  });
});
