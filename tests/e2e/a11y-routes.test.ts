/**
 * Every route at a desk width (1440 x 900) and on a phone (390 x 844), as a role that can see it:
 * axe-core finds no serious or critical violation, nothing scrolls sideways, the phone's header
 * menu opens and closes from the keyboard, the dialogs reachable from the pages pass the same
 * audit, and on the phone the desk's verdict starts within the first screen.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { gone, networkQuiet, shown, startE2E, trackRequests, type DemoRole, type E2E } from '../helpers/e2e';
import { seriousA11yProblems, type A11yProblem } from '../helpers/axe';

const WIDTHS = [
  { name: 'desk', width: 1440, height: 900 },
  { name: 'phone', width: 390, height: 844 },
] as const;

interface RouteCase {
  label: string;
  role: DemoRole | null;
  path: () => string;
  /** Something that is on the page once it has loaded. */
  ready: (page: Page) => Promise<unknown>;
}

let e2e: E2E;
const pages = new Map<DemoRole | 'anonymous', Page>();
const ids = { project: 0, cantilever: 0, first: 0, second: 0 };

async function pageFor(role: DemoRole | null): Promise<Page> {
  const key = role ?? 'anonymous';
  const existing = pages.get(key);
  if (existing) return existing;
  const { context, page } = await e2e.newSession();
  trackRequests(page);
  if (role) await e2e.signInAs(context, role);
  pages.set(key, page);
  return page;
}

const heading = (page: Page) => shown(page.locator('main h1, h1').first());

const ROUTES: RouteCase[] = [
  {
    label: 'sign-in',
    role: null,
    path: () => '/sign-in',
    ready: (p) => shown(p.getByRole('button', { name: /sign in/i })),
  },
  { label: 'projects', role: 'architect', path: () => '/projects', ready: heading },
  { label: 'project', role: 'architect', path: () => `/projects/${ids.project}`, ready: heading },
  {
    label: 'desk (architect)',
    role: 'architect',
    path: () => `/cantilevers/${ids.cantilever}`,
    ready: (p) => shown(p.getByTestId('tip-deflection')),
  },
  {
    label: 'desk (fabricator)',
    role: 'fabricator',
    path: () => `/cantilevers/${ids.cantilever}`,
    ready: (p) => shown(p.getByTestId('tip-deflection')),
  },
  {
    label: 'history',
    role: 'engineer',
    path: () => `/cantilevers/${ids.cantilever}/history`,
    ready: heading,
  },
  {
    label: 'compare',
    role: 'engineer',
    path: () => `/cantilevers/${ids.cantilever}/compare?a=${ids.first}&b=${ids.second}`,
    ready: heading,
  },
  { label: 'review', role: 'engineer', path: () => `/revisions/${ids.second}/review`, ready: heading },
  { label: 'revision', role: 'engineer', path: () => `/revisions/${ids.first}`, ready: heading },
  {
    label: 'reach study',
    role: 'engineer',
    path: () => `/cantilevers/${ids.cantilever}/study`,
    ready: heading,
  },
  { label: 'shapes', role: 'engineer', path: () => '/shapes', ready: heading },
  { label: 'account', role: 'engineer', path: () => '/account', ready: heading },
  { label: 'team', role: 'admin', path: () => '/admin/team', ready: heading },
  { label: 'outbox', role: 'admin', path: () => '/admin/outbox', ready: heading },
  { label: 'not found', role: 'engineer', path: () => '/no-such-page', ready: heading },
];

/** What a route shows: its serious axe violations and how far it scrolls sideways. */
async function audit(page: Page, label: string, include?: string) {
  const problems = await seriousA11yProblems(page, include);
  return problems.map(
    (p: A11yProblem) => `${label}: ${p.impact} ${p.rule} x${p.count} (${p.targets.join(' | ')})`,
  );
}

async function overflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

/** The innermost elements that reach past the window's right edge, to name in a failure. */
async function widest(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll('body *')) {
      const r = el.getBoundingClientRect();
      if (r.right <= window.innerWidth + 0.5 || r.width === 0) continue;
      const inner = [...el.children].some((c) => c.getBoundingClientRect().right > window.innerWidth + 0.5);
      if (inner) continue;
      out.push(
        `${el.tagName.toLowerCase()}.${String(el.className).slice(0, 60)} right=${Math.round(r.right)}`,
      );
      if (out.length >= 5) break;
    }
    return out;
  });
}

async function open(page: Page, path: string, ready: (page: Page) => Promise<unknown>) {
  await page.goto(path);
  await ready(page);
  await networkQuiet(page);
}

beforeAll(async () => {
  e2e = await startE2E();
  const engineer = await pageFor('engineer');
  const api = (path: string) => `${e2e.baseUrl}/api${path}`;
  const projects = (await (await engineer.request.get(api('/projects'))).json()) as { id: number }[];
  ids.project = projects[0].id;
  const project = (await (await engineer.request.get(api(`/projects/${ids.project}`))).json()) as {
    cantilevers: { id: number; name: string }[];
  };
  ids.cantilever = project.cantilevers.find((c) => c.name === 'East deck, typical beam')?.id ?? 0;
  const list = (await (
    await engineer.request.get(api(`/cantilevers/${ids.cantilever}/revisions`))
  ).json()) as {
    id: number;
    number: number;
  }[];
  const first = list.reduce((a, b) => (b.number > a.number ? b : a));
  ids.first = first.id;
  // A second revision (a thicker plate) gives Compare two revisions and Review something submitted.
  const current = (await (await engineer.request.get(api(`/revisions/${first.id}`))).json()) as {
    input: { connection: { plate: { thickness: string } } };
  };
  current.input.connection.plate.thickness = '1.5 in';
  const architect = await pageFor('architect');
  const saved = await architect.request.post(api(`/cantilevers/${ids.cantilever}/revisions`), {
    data: { baseRevision: first.number, message: 'Thicker plate', input: current.input },
  });
  if (saved.status() !== 201) throw new Error(`second revision: ${saved.status()} ${await saved.text()}`);
  ids.second = ((await saved.json()) as { id: number }).id;
  const submitted = await architect.request.post(api(`/revisions/${ids.second}/submit`), { data: {} });
  if (!submitted.ok()) throw new Error(`submit: ${submitted.status()} ${await submitted.text()}`);
});

afterAll(async () => {
  await e2e?.close();
});

describe.each(WIDTHS)('every route at $width x $height', ({ name, width, height }) => {
  it.each(ROUTES)('$label: no serious accessibility problem, no sideways scrolling', async (route) => {
    const page = await pageFor(route.role);
    await page.setViewportSize({ width, height });
    await open(page, route.path(), route.ready);
    const found = await audit(page, `${route.label} @${width}`);
    const extra = await overflow(page);
    if (extra > 0)
      found.push(
        `${route.label} @${width}: ${extra} px wider than the window: ${(await widest(page)).join(' | ')}`,
      );
    expect(found).toEqual([]);
  });

  it('the dialogs reachable from the pages pass the audit', async () => {
    const page = await pageFor('architect');
    await page.setViewportSize({ width, height });
    const found: string[] = [];
    const dialogAudit = async (dialogName: string) => {
      const dialog = page.getByRole('dialog', { name: dialogName });
      await shown(dialog);
      found.push(...(await audit(page, `${dialogName} dialog @${width}`, '[role="dialog"]')));
      return dialog;
    };

    await open(page, '/projects', heading);
    await page.getByRole('button', { name: /new project/i }).click();
    await dialogAudit('New project');
    await page.keyboard.press('Escape');

    await open(page, `/projects/${ids.project}`, heading);
    await page.getByRole('button', { name: /new cantilever/i }).click();
    await dialogAudit('New cantilever');
    await page.keyboard.press('Escape');

    await open(page, `/cantilevers/${ids.cantilever}`, (p) => shown(p.getByTestId('tip-deflection')));
    // On the phone the input groups start folded: open the two this test uses.
    for (const group of ['Reach', 'Section']) {
      const details = page.locator('details', { has: page.locator('summary', { hasText: group }) }).first();
      if ((await details.getAttribute('open')) === null) await details.locator('summary').click();
    }
    await page.getByRole('button', { name: 'Browse shapes for the member' }).click();
    const picker = await dialogAudit('Pick a shape');
    await picker.getByRole('searchbox').fill('W10X33');
    await picker.locator('[data-shape="W10X33"]').first().click();
    await shown(picker.getByText('Torsion constant J'));
    found.push(...(await audit(page, `shape picker with a shape chosen @${width}`, '[role="dialog"]')));
    await page.keyboard.press('Escape');
    await gone(picker);

    await page.getByLabel('Length (root to tip)', { exact: true }).fill('8.5 ft');
    await shown(page.getByTestId('unsaved'));
    await page.getByRole('button', { name: 'Save revision' }).click();
    await dialogAudit('Save revision');
    await page.keyboard.press('Escape');

    if (name === 'phone') await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    const leave = await dialogAudit('Leave without saving?');
    await leave.getByRole('button', { name: 'Leave and lose the changes' }).click();
    await page.waitForURL(/\/projects$/);
    expect(found).toEqual([]);
  });
});

describe('the audit itself', () => {
  it('catches a nameless button and a skipped heading level in one axe run', async () => {
    const { page } = await e2e.newSession();
    await page.setContent(
      '<html lang="en"><head><title>audit probe</title></head><body><main>' +
        '<h1>Deck</h1><h3>Skipped a level</h3><button></button>' +
        // content outside every landmark breaks `region`, a best-practice rule that is not run
        '</main><div>outside every landmark</div></body></html>',
    );
    const rules = (await seriousA11yProblems(page)).map((p) => p.rule).sort();
    expect(rules).toEqual(['button-name', 'heading-order']);
  });
});

describe('on a phone (390 x 844)', () => {
  it('the header folds into a menu that opens, is audited, and closes with Escape back to its button', async () => {
    const page = await pageFor('admin');
    await page.setViewportSize({ width: 390, height: 844 });
    await open(page, '/projects', heading);
    const button = page.getByRole('button', { name: 'Menu' });
    expect(await button.getAttribute('aria-expanded')).toBe('false');
    const menuId = await button.getAttribute('aria-controls');
    expect(menuId).toBeTruthy();
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    await button.focus();
    await page.keyboard.press('Enter');
    expect(await button.getAttribute('aria-expanded')).toBe('true');
    const menu = page.locator(`#${menuId}`);
    await shown(menu);
    await expect.poll(() => audit(page, 'header menu @390')).toEqual([]);
    // every entry is reachable with Tab, and none lies outside the window
    for (const name of ['Projects', 'Shapes', 'Team', 'Outbox']) {
      const link = menu.getByRole('link', { name });
      const box = await link.boundingBox();
      expect(box && box.x >= 0 && box.x + box.width <= 390).toBe(true);
    }
    const signOut = menu.getByRole('button', { name: 'Sign out' });
    const box = await signOut.boundingBox();
    expect(box && box.x >= 0 && box.x + box.width <= 390).toBe(true);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Projects');
    await page.keyboard.press('Escape');
    expect(await button.getAttribute('aria-expanded')).toBe('false');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-controls'))).toBe(menuId);
    expect(await overflow(page)).toBeLessThanOrEqual(0);
  });

  it('the desk shows its verdict within the first screen; screenshots at both widths', async () => {
    const page = await pageFor('engineer');
    for (const { name, width, height } of WIDTHS) {
      await page.setViewportSize({ width, height });
      await open(page, `/cantilevers/${ids.cantilever}`, (p) => shown(p.getByTestId('tip-deflection')));
      await shown(page.getByTestId('verdict'));
      if (name === 'phone') {
        const top = await page.getByTestId('verdict').evaluate((el) => el.getBoundingClientRect().top);
        expect(top).toBeGreaterThanOrEqual(0);
        expect(top).toBeLessThan(844);
      }
      await e2e.screenshot(page, `desk-${name}-${width}`);
    }
  });
});
