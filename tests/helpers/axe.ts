/**
 * Accessibility audit of the page as it stands, with axe-core (WCAG 2.0-2.2 A and AA rules). Browser
 * tests call it on every route and open dialog; any serious or critical violation fails the test
 * with the rule, the impact and the first offending elements named.
 */
import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

export interface A11yProblem {
  rule: string;
  impact: string;
  help: string;
  targets: string[];
  /** How many elements break the rule (targets names the first five). */
  count: number;
}

const TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

/**
 * Serious and critical violations on the page (or inside `include`, a CSS selector), and headings out
 * of order. One axe run per call: the WCAG rules by tag plus `heading-order` enabled by name (axe runs
 * a rule named in `rules` whatever the tags), in the page itself (`setLegacyMode`: the app has no
 * frames, and the default mode injects axe three times and opens a blank page per run to merge
 * per-frame results). Violations only are collected in full (`resultTypes`).
 */
export async function seriousA11yProblems(page: Page, include?: string): Promise<A11yProblem[]> {
  let builder = new AxeBuilder({ page })
    .options({
      runOnly: { type: 'tag', values: TAGS },
      rules: { 'heading-order': { enabled: true } },
      // Every rule still runs and every violating element is still listed; only passing and
      // inapplicable results keep a single node each, instead of every node serialized back
      // (about half the time of a run on the desk).
      resultTypes: ['violations'],
    })
    .setLegacyMode();
  if (include) builder = builder.include(include);
  const { violations } = await builder.analyze();
  // Headings out of order is rated "moderate" (a best-practice rule outside the WCAG tags), but a
  // screen-reader user moves by headings, so it fails here too, whatever its impact.
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical' || v.id === 'heading-order')
    .map((v) => ({
      rule: v.id,
      impact: v.impact ?? 'unknown',
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.join(' ')),
      count: v.nodes.length,
    }));
}

/** Throws with a readable list when the page has a serious or critical violation. */
export async function assertAccessible(page: Page, label: string, include?: string): Promise<void> {
  const problems = await seriousA11yProblems(page, include);
  if (problems.length === 0) return;
  const lines = problems.map((p) => `  ${p.impact} ${p.rule}: ${p.help}\n    ${p.targets.join('\n    ')}`);
  throw new Error(
    `${label}: ${problems.length} serious or critical accessibility problem(s)\n${lines.join('\n')}`,
  );
}
