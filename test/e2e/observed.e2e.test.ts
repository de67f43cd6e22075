/**
 * A real (invented) glacier in headless Chromium: examples/zindleton-observed.json, the output of
 * `firnline invert` on the Zindleton survey, is opened as a file and run; the measured thickness,
 * speeds and terminus are drawn beside the model and the misfit rows are listed; its figures are
 * byte-identical to `firnline run --figures`; the bed from the surface is computed in the
 * analysis worker, previewed on the long profile, applied as one edit and undone. The
 * observations editor takes a point and refuses one outside the domain at the field.
 * Screenshots at 1280 px wide go to test-results/screenshots (observed-*.png).
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Download, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import observed from '../../examples/zindleton-observed.json';
import demo from '../../examples/demo-valley.json';
import { ensureFreshBundles, runFirnline } from '../helpers/cliBundle';
import { saveElementScreenshot, saveScreenshot, sharedBrowser, waitForStatus, waitForProject, showView } from './browser';

const baseUrl = inject('baseUrl');
const EXAMPLE = readFileSync(new URL('../../examples/zindleton-observed.json', import.meta.url));

/** Page count and all text of a PDF, read with Mozilla's PDF.js (as the exports test does). */
async function readPdf(bytes: Buffer) {
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const standardFontDataUrl = fileURLToPath(new URL('../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url));
  const doc = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, standardFontDataUrl }).promise;
  const content = await (await doc.getPage(1)).getTextContent();
  const text = content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
  return { pages: doc.numPages, text: text.replace(/\s+/g, ' ') };
}

async function downloadOf(page: Page, click: () => Promise<void>): Promise<{ download: Download; bytes: Buffer }> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  return { download, bytes: readFileSync(await download.path()) };
}

describe('observations and the bed from the surface in headless Chromium', () => {
  const session = sharedBrowser();
  let work: string;

  beforeAll(() => {
    ensureFreshBundles();
    work = mkdtempSync(join(tmpdir(), 'firnline-observed-'));
    writeFileSync(join(work, 'scenario.json'), EXAMPLE);
    expect(runFirnline(work, ['run', 'scenario.json', '--out', 'cli', '--figures', '--quiet']).status).toBe(0);
  });
  afterAll(() => rmSync(work, { recursive: true, force: true }));

  it('opens the observed example, runs it, and draws the observations beside the model with the misfit', async () => {
    const { page, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);
    await page.getByLabel('Scenario file to open').setInputFiles({ name: 'zindleton-observed.json', mimeType: 'application/json', buffer: EXAMPLE });
    await page.getByText(/^Opened zindleton-observed\.json/).waitFor();
    const profile = page.locator('svg.long-profile');
    expect(await profile.locator('[data-layer="observed-thickness"] circle').count()).toBe(observed.observations.thickness.length);
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done/, 90_000);
    expect(await profile.locator('[data-layer="observed-thickness"] circle').count()).toBe(5);
    expect(await profile.getByText('Bed implied by measured thickness').isVisible()).toBe(true);
    // A terminus record: the long profile shows its position in the observation year.
    expect(await profile.locator('[data-layer="observed-terminus"] title').textContent()).toBe('Observed terminus 8.50 km (year 0)');
    await showView(page, 'Speed and stress');
    expect(await page.locator('[data-layer="observed"] circle').count()).toBe(observed.observations.surfaceSpeed.length);
    expect(await page.locator('dd[data-number="Thickness, model − observed"]').textContent()).toMatch(/^RMS \d+ m, bias [+−]?\d+ m, .*5 points$/);
    expect(await page.locator('dd[data-number="Surface speed, model − observed"]').textContent()).toMatch(/^RMS \d+\.\d m a⁻¹, bias .*6 points$/);
    await saveScreenshot(page, 'observed-run');
    await saveElementScreenshot(page.locator('section.profile'), 'observed-run-profile');
    expect(errors).toEqual([]);
  });

  it('exports the long-profile and speed figures with the observations, byte-identical to the command line', async () => {
    const { page } = session();
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('End');
    await showView(page, 'Export');
    const panel = page.getByRole('region', { name: 'Export' });
    const cases: [string, string][] = [
      ['Long profile at the shown year', 'profile-year-'],
      ['Speed and driving stress at the shown year', 'along-flow-year-'],
    ].map(([label, prefix]) => [label, readdirSync(join(work, 'cli')).find((f) => f.startsWith(prefix) && f.endsWith('.svg'))!]);
    for (const [label, cliName] of cases) {
      await panel.getByLabel('Figure', { exact: true }).selectOption({ label });
      const { bytes } = await downloadOf(page, () => panel.getByRole('button', { name: 'SVG' }).click());
      const svg = bytes.toString('utf8');
      expect(svg).toBe(readFileSync(join(work, 'cli', cliName), 'utf8'));
      expect(svg).toMatch(cliName.startsWith('profile') ? /Bed implied by measured thickness, year 0.*Observed terminus, year 0/s : /Measured surface speed, year 0/);
      writeFileSync(new URL(`../../test-results/screenshots/observed-${cliName}`, import.meta.url), svg);
    }
    // The report sheet lists the misfit at the shown year, and still fits one page on both papers.
    for (const paper of ['a4', 'letter']) {
      await panel.getByLabel('Report paper').selectOption(paper);
      const downloaded = page.waitForEvent('download', { timeout: 60_000 }).catch(() => null);
      await panel.getByRole('button', { name: 'Report sheet (PDF)' }).click();
      const status = panel.getByText(/^(Saved .*_report-|Export failed)/);
      await status.waitFor({ timeout: 60_000 });
      expect(await status.textContent(), paper).toMatch(/^Saved /);
      const download = await downloaded;
      const bytes = readFileSync(await download!.path());
      const read = await readPdf(bytes);
      expect(read.pages).toBe(1);
      for (const t of ['Misfit to observations, model minus observed', 'Thickness (5 points)', 'Surface speed (6 points)', 'model year 200 with observations of year 0']) {
        expect(read.text, paper).toContain(t);
      }
      writeFileSync(new URL(`../../test-results/screenshots/observed-report-${paper}.pdf`, import.meta.url), bytes);
    }
    expect(session().errors).toEqual([]);
  });

  it('computes the bed from the surface, previews it, applies it as one edit and undoes it', async () => {
    const { page, errors } = session();
    await showView(page, 'Analyses');
    const analyses = page.locator('section.analyses');
    const profile = page.locator('svg.long-profile');
    const bedBefore = await profile.locator('path.bed').getAttribute('d');
    await analyses.getByRole('tab', { name: 'Bed from the surface' }).click();
    // The example's bed is itself inverted with the default 300 m: a longer smoothing gives another.
    await analyses.getByLabel('Smoothing distance (m)').fill('1000');
    await analyses.getByRole('button', { name: 'Compute the bed from the surface' }).click();
    const numbers = analyses.locator('[data-numbers="inversion"]');
    await numbers.waitFor({ timeout: 60_000 });
    expect(await numbers.locator('dd[data-number="Multiplier of A"]').textContent()).toMatch(/^\d+\.?\d*$/);
    expect(await numbers.locator('dd[data-number="Range of the multiplier"]').textContent()).toMatch(/^\d+\.?\d* to \d+\.?\d*$/);
    expect(await numbers.locator('dd[data-number="Thickness points compared"]').textContent()).toBe('5');
    expect(await analyses.locator('[data-numbers="inversion-statements"] li').count()).toBeGreaterThanOrEqual(3);
    expect(await analyses.getByRole('note').filter({ hasText: 'Caution' }).isVisible()).toBe(true);
    await profile.locator('[data-layer="bed-preview"] path.bed-preview-line').waitFor();
    expect(await profile.locator('[data-layer="preview-legend"]').textContent()).toBe('Bed from the surface (preview)');
    expect(await profile.locator('path.bed-preview-band').getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}Z$/);
    // Told apart from the bed: another colour and dashed.
    const style = await page.evaluate(() => {
      const line = getComputedStyle(document.querySelector('.bed-preview-line')!);
      return { stroke: line.stroke, dash: line.strokeDasharray, bed: getComputedStyle(document.querySelector('path.bed')!).stroke };
    });
    expect(style.stroke).not.toBe(style.bed);
    expect(style.dash).not.toBe('none');
    await saveScreenshot(page, 'observed-bed-preview');
    await saveElementScreenshot(page.locator('section.profile'), 'observed-bed-preview-profile');
    await saveElementScreenshot(analyses, 'observed-bed-analysis');

    await analyses.getByRole('button', { name: 'Apply this bed to the scenario' }).click();
    await analyses.getByText(/^Applied: the bed from the surface/).waitFor();
    expect(await profile.locator('[data-layer="bed-preview"]').count()).toBe(0);
    expect(await profile.locator('path.bed').getAttribute('d')).not.toBe(bedBefore);
    await saveElementScreenshot(page.locator('section.profile'), 'observed-bed-applied-profile');
    const undo = page.getByRole('group', { name: 'Undo and redo' }).getByRole('button', { name: /^Undo: Bed from the surface/ });
    expect(await undo.isVisible()).toBe(true);
    await undo.click();
    await expect.poll(() => profile.locator('path.bed').getAttribute('d')).toBe(bedBefore);
    expect(await analyses.getByText(/^Out of date/).isVisible()).toBe(true);
    expect(errors).toEqual([]);
  });

  it('edits the observations: a refused position is shown at the field, an accepted one is one edit', async () => {
    const { page, errors } = session();
    await page.getByRole('tab', { name: 'Observations' }).click();
    const editor = page.getByRole('region', { name: 'Observations' });
    const x = editor.getByLabel('Measured ice thickness: x, row 1 (km)');
    await x.fill('30');
    await x.press('Enter');
    // In km, as the column shows positions.
    expect(await editor.getByRole('alert').textContent()).toContain('/observations/thickness/0/0: 30 is not allowed; the x of each thickness observation must lie within the domain, from 0 to 12 km (grid.length)');
    await x.fill('1.2');
    await x.press('Enter');
    await expect.poll(() => editor.getByRole('alert').count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Undo: Set measured ice thickness x, row 1/ }).isVisible()).toBe(true);
    await editor.scrollIntoViewIfNeeded();
    await saveElementScreenshot(page.locator('section.editor-panels'), 'observed-editor');
    expect(errors).toEqual([]);
  });
});
