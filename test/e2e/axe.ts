/**
 * axe-core in the page under test. The app's Content-Security-Policy (script-src 'self') refuses
 * an inline <script>, so axe's source is evaluated through the DevTools protocol instead
 * (page.evaluate is not subject to the page's CSP).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { AxeResults, RunOptions } from 'axe-core';
import type { Page } from 'playwright-core';

const AXE_SOURCE = readFileSync(fileURLToPath(new URL('../../node_modules/axe-core/axe.min.js', import.meta.url)), 'utf8');

/** One axe finding, cut down to what a failure message needs. */
export interface AxeFinding {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
  summaries: string[];
}

/**
 * Runs axe with the WCAG 2 A and AA rules over the whole document and returns the findings whose
 * impact is serious or critical (the ones the accessibility requirement forbids): the violations,
 * and the results axe leaves for review ("incomplete") except colour contrast. Those are counted
 * too because axe files an ARIA attribute that is "not well supported" (aria-label on a <p>)
 * there rather than as a violation; contrast is left out because axe cannot decide it for SVG
 * text or for text over other elements, which is most of what it leaves for review here.
 */
export async function seriousViolations(page: Page): Promise<AxeFinding[]> {
  const loaded = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe !== 'undefined');
  if (!loaded) await page.evaluate(AXE_SOURCE);
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (context: Document, options: RunOptions) => Promise<AxeResults> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa'] }, resultTypes: ['violations', 'incomplete'] });
    const undecidedButSerious = result.incomplete.filter((v) => v.id !== 'color-contrast');
    return [...result.violations, ...undecidedButSerious]
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({
        id: v.id,
        impact: v.impact ?? null,
        help: v.help,
        targets: v.nodes.map((n) => JSON.stringify(n.target)),
        summaries: v.nodes.map((n) => (n.failureSummary ?? '').replace(/\s+/g, ' ')),
      }));
  });
}

/** The findings as readable lines: rule, impact, help, then each node's selector and reason. */
export function describeFindings(findings: AxeFinding[]): string {
  return findings
    .map((f) => [`${f.id} (${f.impact}): ${f.help}`, ...f.targets.map((t, i) => `  ${t} — ${f.summaries[i]}`)].join('\n'))
    .join('\n');
}
