/**
 * Exports through the user interface in headless Chromium: each figure format, the data archive
 * and the report sheet are downloaded and checked. The same scenario run by `firnline run
 * --figures` gives byte-identical SVG figures and CSV files: the worker and the command line run
 * the same engine to the same bits, and draw with the same figure code.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { strFromU8, unzipSync } from 'fflate';
import type { Download, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import pkg from '../../package.json';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { pngDpi, pngSize } from '../../src/ui/export/pngResolution';
import { ensureFreshBundles, runFirnline } from '../helpers/cliBundle';
import { openBrowser, saveScreenshot, waitForStatus, type BrowserSession, waitForProject, showView } from './browser';

const baseUrl = inject('baseUrl');
const SCREENSHOTS = fileURLToPath(new URL('../../test-results/screenshots/', import.meta.url));

async function downloadOf(page: Page, click: () => Promise<void>): Promise<{ download: Download; bytes: Buffer }> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  const path = await download.path();
  return { download, bytes: readFileSync(path) };
}

/** Page count, page size and all text of a PDF, read with Mozilla's PDF.js. */
async function readPdf(bytes: Buffer) {
  // The legacy build: it brings its own polyfills (Promise.withResolvers) for Node 20.
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const standardFontDataUrl = fileURLToPath(new URL('../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url));
  const doc = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, standardFontDataUrl }).promise;
  const page = await doc.getPage(1);
  const content = await page.getTextContent();
  const text = content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
  const [, , width, height] = page.view;
  return { pages: doc.numPages, width, height, text: text.replace(/\s+/g, ' ') };
}

describe('exports in headless Chromium', () => {
  let session: BrowserSession;
  let work: string;
  let cliOut: string;

  beforeAll(async () => {
    ensureFreshBundles();
    work = mkdtempSync(join(tmpdir(), 'firnline-exports-'));
    session = await openBrowser();
    const { page } = session;
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);
  });

  afterAll(async () => {
    await session?.close();
    rmSync(work, { recursive: true, force: true });
  });

  it('runs the demo, and the command line runs the same scenario file with --figures', async () => {
    const { page } = session;
    await showView(page, 'Projects');
    const { bytes } = await downloadOf(page, () => page.getByRole('button', { name: 'Save scenario file' }).click());
    writeFileSync(join(work, 'scenario.json'), bytes);
    const cli = runFirnline(work, ['run', 'scenario.json', '--out', 'cli', '--figures', '--quiet']);
    expect(cli.status).toBe(0);
    cliOut = join(work, 'cli');

    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done: 300 years/);
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('End');
    await showView(page, 'Export');
    await page.getByRole('region', { name: 'Export' }).waitFor();
  });

  it('saves each SVG figure byte-identical to the command line figure', async () => {
    const { page } = session;
    const panel = page.getByRole('region', { name: 'Export' });
    const cases: [string, string, string][] = [
      ['Long profile at the shown year', 'profile-year-300.svg', '_profile-year-300.svg'],
      ['Long profile, snapshot series', 'profile-snapshots-every-50a.svg', '_profile-snapshots-every-50a.svg'],
      ['Speed and driving stress at the shown year', 'along-flow-year-300.svg', '_along-flow-year-300.svg'],
      ['Length, volume, ELA and warming through time', 'time-series.svg', '_time-series.svg'],
    ];
    for (const [label, cliName, suffix] of cases) {
      await panel.getByLabel('Figure', { exact: true }).selectOption({ label });
      const { download, bytes } = await downloadOf(page, () => panel.getByRole('button', { name: 'SVG' }).click());
      expect(download.suggestedFilename()).toMatch(new RegExp(`${suffix.replace(/\./g, '\\.')}$`));
      expect(bytes.toString('utf8')).toBe(readFileSync(join(cliOut, cliName), 'utf8'));
    }
    await saveScreenshot(page, 'exports-panel');
  });

  it('saves a PNG of the requested size with its resolution stated, and a one-page PDF figure with real text', async () => {
    const { page } = session;
    const panel = page.getByRole('region', { name: 'Export' });
    await panel.getByLabel('Figure', { exact: true }).selectOption({ label: 'Long profile at the shown year' });
    await panel.getByLabel('Width (mm)').fill('100');
    await panel.getByLabel('PNG resolution (dpi)').fill('300');
    // 100 mm at 300 dpi: 100 / 25.4 * 300 = 1181.1 -> 1181 px wide.
    await expect.poll(() => panel.getByText(/PNG: 1181 × \d+ px\./).count()).toBe(1);
    const png = await downloadOf(page, () => panel.getByRole('button', { name: 'PNG' }).click());
    const bytes = new Uint8Array(png.bytes);
    expect(pngSize(bytes).width).toBe(1181);
    const shown = /PNG: 1181 × (\d+) px/.exec((await panel.textContent()) ?? '');
    expect(pngSize(bytes).height).toBe(Number(shown?.[1]));
    expect(pngDpi(bytes)).toBe(300);
    writeFileSync(join(SCREENSHOTS, 'export-profile.png'), bytes);

    const pdf = await downloadOf(page, () => panel.getByRole('button', { name: 'PDF', exact: true }).click());
    const read = await readPdf(pdf.bytes);
    expect(read.pages).toBe(1);
    // 100 mm = 283.46 pt wide.
    expect(read.width).toBeCloseTo(283.46, 1);
    for (const t of ['Long profile, year 300', 'Distance down-valley (km)', 'Elevation (m a.s.l.)', 'Vertical exaggeration', `Firnline ${pkg.version}`]) {
      expect(read.text).toContain(t);
    }
    writeFileSync(join(SCREENSHOTS, 'export-profile.pdf'), pdf.bytes);
  });

  it('refuses a typed value out of range with a message naming the field and the allowed range', async () => {
    const { page } = session;
    const panel = page.getByRole('region', { name: 'Export' });
    await panel.getByLabel('Width (mm)').fill('9000');
    await expect.poll(() => panel.getByRole('alert').first().textContent()).toMatch(/^Figure width: "9000" is not allowed; give a width from 40 to 500 mm\.$/);
    expect(await panel.getByRole('button', { name: 'SVG' }).isDisabled()).toBe(true);
    await panel.getByLabel('Width (mm)').fill('170');
    expect(await panel.getByRole('button', { name: 'SVG' }).isDisabled()).toBe(false);
  });

  it('saves the data as a ZIP whose CSV files are byte-identical to the command line output', async () => {
    const { page } = session;
    const panel = page.getByRole('region', { name: 'Export' });
    await panel.getByLabel('Profiles of').selectOption('all');
    const { download, bytes } = await downloadOf(page, () => panel.getByRole('button', { name: 'Data (.zip)' }).click());
    expect(download.suggestedFilename()).toMatch(/_data\.zip$/);
    const files = unzipSync(new Uint8Array(bytes));
    const names = Object.keys(files);
    const scenarioFile = names.find((n) => n.endsWith('.json') && n !== 'summary.json');
    expect(names.sort()).toEqual(['README.txt', scenarioFile, 'profiles.csv', 'series.csv', 'summary.json'].sort());
    expect(strFromU8(files[scenarioFile!])).toBe(readFileSync(join(work, 'scenario.json'), 'utf8'));
    expect(strFromU8(files['profiles.csv'])).toBe(readFileSync(join(cliOut, 'profiles.csv'), 'utf8'));
    expect(strFromU8(files['series.csv'])).toBe(readFileSync(join(cliOut, 'series.csv'), 'utf8'));
    const readme = strFromU8(files['README.txt']);
    expect(readme).toContain(`Firnline ${pkg.version}`);
    expect(readme).toContain(CAUTION_TEXT);
    const summary = JSON.parse(strFromU8(files['summary.json']));
    expect(summary.firnlineVersion).toBe(pkg.version);
    expect(summary.massBudget).toEqual(JSON.parse(readFileSync(join(cliOut, 'summary.json'), 'utf8')).massBudget);
  });

  it('saves a one-page A4 report sheet with the figures, tables, mass budget and caution', async () => {
    const { page } = session;
    const panel = page.getByRole('region', { name: 'Export' });
    await panel.getByLabel('Report paper').selectOption('a4');
    const { download, bytes } = await downloadOf(page, () => panel.getByRole('button', { name: 'Report sheet (PDF)' }).click());
    expect(download.suggestedFilename()).toMatch(/_report-a4\.pdf$/);
    const read = await readPdf(bytes);
    expect(read.pages).toBe(1);
    // A4 is 210 x 297 mm = 595.28 x 841.89 pt (ISO 216).
    expect(read.width).toBeCloseTo(595.28, 1);
    expect(read.height).toBeCloseTo(841.89, 1);
    for (const t of [demo.name, 'Parameters', 'Outcomes', 'Mass budget', 'Caution.', `Firnline ${pkg.version}`, 'Long profile, year 300', 'Model year (a)']) {
      expect(read.text).toContain(t);
    }
    writeFileSync(join(SCREENSHOTS, 'export-report-a4.pdf'), bytes);

    // US Letter, 8.5 x 11 in = 612 x 792 pt: shorter than A4, and still one page.
    await panel.getByLabel('Report paper').selectOption('letter');
    const letter = await downloadOf(page, () => panel.getByRole('button', { name: 'Report sheet (PDF)' }).click());
    expect(letter.download.suggestedFilename()).toMatch(/_report-letter\.pdf$/);
    const readLetter = await readPdf(letter.bytes);
    expect([readLetter.pages, readLetter.width, readLetter.height]).toEqual([1, 612, 792]);
    expect(readLetter.text).toContain('Mass budget');
    expect(session.errors).toEqual([]);
  });
});
