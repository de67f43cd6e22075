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

/**
 * The contrast check axe leaves undecided for SVG text: each shown <text> fill against white, the
 * plots' background (text drawn over ice or bed wears a white halo), at least 4.5:1 (WCAG 2
 * SC 1.4.3, normal-size text: the stricter case, whatever the drawn size). Relative luminance and
 * ratio as defined in WCAG 2.
 */
export async function svgTextContrastProblems(page: Page): Promise<AxeFinding[]> {
  const problems = await page.evaluate(() => {
    const channel = (v: number) => (v <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
    const luminance = (rgb: number[]) => 0.2126 * channel(rgb[0] / 255) + 0.7152 * channel(rgb[1] / 255) + 0.0722 * channel(rgb[2] / 255);
    const found: { selector: string; text: string; fill: string; ratio: number }[] = [];
    for (const text of Array.from(document.querySelectorAll('svg text'))) {
      const style = getComputedStyle(text);
      const rgb = /^rgba?\(([\d.]+), ([\d.]+), ([\d.]+)(?:, ([\d.]+))?\)$/.exec(style.fill);
      if (!rgb || text.getClientRects().length === 0 || style.visibility === 'hidden' || !text.textContent?.trim()) continue;
      // Partly transparent text is blended with the white behind it.
      const alpha = (rgb[4] === undefined ? 1 : Number(rgb[4])) * Number(style.fillOpacity) * Number(style.opacity);
      const shown = [1, 2, 3].map((k) => Number(rgb[k]) * alpha + 255 * (1 - alpha));
      const ratio = 1.05 / (luminance(shown) + 0.05);
      if (ratio < 4.5) {
        const owner = text.closest('svg');
        found.push({ selector: `svg.${owner?.getAttribute('class')?.split(' ')[0] ?? '?'} text`, text: text.textContent.trim().slice(0, 40), fill: style.fill, ratio });
      }
    }
    return found;
  });
  return problems.map((p) => ({
    id: 'svg-text-contrast (own check)',
    impact: 'serious',
    help: 'SVG text must have a contrast of at least 4.5:1 with the white plot background',
    targets: [p.selector],
    summaries: [`"${p.text}" in ${p.fill}: ${p.ratio.toFixed(2)}:1`],
  }));
}
