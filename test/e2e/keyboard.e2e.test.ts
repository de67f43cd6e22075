/**
 * The main flow by keyboard alone in headless Chromium: from page load, Tab and Shift+Tab to the
 * profile edit mode, choose Edit points with the arrows, move a bed point with the arrows (undo
 * and redo it with the shortcuts), run, scrub the model year, and save a figure, pressing Enter
 * where a mouse would click. Every element the focus lands on must show its focus (a
 * :focus-visible outline or shadow, or the outline of the label of a visually hidden radio).
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { saveElementScreenshot, sharedBrowser, showView, waitForStatus, type WorkbenchView } from './browser';

const baseUrl = inject('baseUrl');

/** The focused element: its role and name as a person would read them, and how its focus shows. */
interface Focused {
  what: string;
  focusShown: string;
}

function readFocus(page: Page): Promise<Focused> {
  return page.evaluate(() => {
    const el = document.activeElement;
    if (!el || el === document.body) return { what: 'body', focusShown: 'nothing focused' };
    const role = el.getAttribute('role') ?? (el instanceof HTMLInputElement ? `input ${el.type}` : el.tagName.toLowerCase());
    const labelled = el instanceof HTMLInputElement || el instanceof HTMLSelectElement ? el.labels?.[0]?.textContent : null;
    const name = (el.getAttribute('aria-label') ?? labelled ?? el.textContent ?? '').trim().replace(/\s+/g, ' ');
    const what = `${role} "${name.slice(0, 60)}"`;
    const shows = (e: Element) => {
      const s = getComputedStyle(e);
      const outline = s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) > 0;
      return outline || s.boxShadow !== 'none';
    };
    if (!el.matches(':focus-visible')) return { what, focusShown: 'not :focus-visible' };
    if (shows(el)) return { what, focusShown: 'yes' };
    // A visually hidden control (the segmented radios) shows its focus on its label.
    const label = el.closest('label');
    if (label && getComputedStyle(el).opacity === '0' && shows(label)) return { what, focusShown: 'yes' };
    return { what, focusShown: 'no outline or shadow' };
  });
}

/**
 * Presses `key` (Tab or Shift+Tab) until the focused element matches `target`, at most `limit`
 * times; records every element visited in `visited`.
 */
async function moveFocusTo(page: Page, key: string, target: RegExp, visited: Focused[], limit = 80): Promise<void> {
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press(key);
    const focused = await readFocus(page);
    visited.push(focused);
    if (target.test(focused.what)) return;
  }
  throw new Error(`${key} never reached ${target}; visited:\n${visited.slice(-limit).map((f) => f.what).join('\n')}`);
}

function expectFocusShown(visited: Focused[]): void {
  const hidden = visited.filter((f) => f.focusShown !== 'yes').map((f) => `${f.what}: ${f.focusShown}`);
  expect(hidden, 'elements whose keyboard focus does not show').toEqual([]);
}

describe('the main flow by keyboard in headless Chromium', () => {
  const session = sharedBrowser();

  it('edits a bed point, runs, scrubs the model year and saves a figure without the mouse', async () => {
    const { page, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    // The saved projects are open once the demo is listed (in the hidden Projects view: no click).
    await page.getByRole('button', { name: `Open ${demo.name}`, includeHidden: true }).first().waitFor({ state: 'attached' });
    const visited: Focused[] = [];

    // Edit mode: Tab to the mode radios, then the arrows choose (View → … → Edit points).
    await moveFocusTo(page, 'Tab', /^input radio "View"$/, visited);
    for (let k = 0; k < 3; k++) {
      await page.keyboard.press('ArrowRight');
      visited.push(await readFocus(page));
    }
    expect(visited.at(-1)!.what).toBe('input radio "Edit points"');
    expect(await page.getByRole('radio', { name: 'Edit points' }).isChecked()).toBe(true);
    // Passing Draw ice surface chose the surface's points; the next control chooses the bed's.
    await moveFocusTo(page, 'Tab', /^select "Points of/, visited);
    await page.keyboard.press('ArrowUp');
    expect(await page.getByRole('combobox', { name: /Points of/ }).inputValue()).toBe('bed');

    // The points sit on the profile, above the toolbar: Shift+Tab reaches the last one first.
    await moveFocusTo(page, 'Shift+Tab', /^button "Bed point \d+ of \d+:/, visited);
    const point = visited.at(-1)!.what;
    const index = Number(/Bed point (\d+)/.exec(point)![1]);
    await page.keyboard.press('Shift+Tab');
    visited.push(await readFocus(page));
    expect(visited.at(-1)!.what).toMatch(new RegExp(`^button "Bed point ${index - 1} of`));
    const before = (await readFocus(page)).what;
    await page.keyboard.press('Shift+ArrowUp');
    await page.keyboard.press('ArrowUp');
    await expect.poll(async () => (await readFocus(page)).what).not.toBe(before);
    const undo = page.getByRole('button', { name: /^Undo/ });
    expect(await undo.textContent()).toBe(`Undo: Move bed point ${index - 1}`);
    const elevation = (label: string) => Number(/, (\d+) m a\.s\.l\./.exec(label)![1]);
    const after = (await readFocus(page)).what;
    console.info(`keyboard: ${before} → ${after}`);
    await saveElementScreenshot(page.locator('svg.long-profile'), 'keyboard-point-focus');
    // The undo shortcuts work with the focus on the point (two moves, two steps); it stays put.
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Control+z');
    await expect.poll(async () => (await readFocus(page)).what).toBe(before);
    await page.keyboard.press('Control+Shift+z');
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(async () => (await readFocus(page)).what).toBe(after);
    expect(elevation(after)).toBeGreaterThan(elevation(before));

    // Run: back up to the Run button and press Enter.
    await moveFocusTo(page, 'Shift+Tab', /^button "Run"$/, visited);
    await page.keyboard.press('Enter');
    await waitForStatus(page, /^Done: 300 years/, 90_000);

    // Scrub the model year with the slider's own keys, then the workbench shortcuts off it.
    await moveFocusTo(page, 'Tab', /^input range/, visited);
    await page.keyboard.press('Home');
    for (let k = 0; k < 4; k++) await page.keyboard.press('ArrowRight');
    expect(await page.locator('.year-output').textContent()).toBe('Year 20 of 300 a');
    await page.keyboard.press('End');
    expect(await page.locator('.year-output').textContent()).toBe('Year 300 of 300 a');
    await page.keyboard.press('PageDown');
    const scrubbed = await page.locator('.year-output').textContent();
    expect(scrubbed).toMatch(/^Year \d+ of 300 a$/);
    expect(scrubbed).not.toBe('Year 300 of 300 a');

    // Export: Tab on to the supporting views' tabs, the arrows choose Export, then Tab on to the
    // SVG figure button and press Enter; the file is downloaded.
    await moveFocusTo(page, 'Tab', /^tab "/, visited);
    for (let k = 0; k < 10 && !/^tab "Export"$/.test((await readFocus(page)).what); k++) {
      await page.keyboard.press('ArrowRight');
      visited.push(await readFocus(page));
    }
    expect(await page.getByRole('tab', { name: 'Export', exact: true }).getAttribute('aria-selected')).toBe('true');
    await moveFocusTo(page, 'Tab', /^button "SVG"$/, visited);
    const [download] = await Promise.all([page.waitForEvent('download'), page.keyboard.press('Enter')]);
    expect(download.suggestedFilename()).toMatch(/\.svg$/);
    const svg = readFileSync(await download.path(), 'utf8');
    expect(svg).toMatch(/^<\?xml|^<svg/);

    expectFocusShown(visited);
    expect(errors).toEqual([]);
  });

  it('shows the focus on every tab stop of the workbench with results, in each supporting view, and of the experiments view', async () => {
    const { page, errors } = session();
    /** Rounds the page once from the view switch's button, back to it; checks every stop. */
    async function roundThePage(start: 'Workbench' | 'Experiments', where: string) {
      await page.getByRole('button', { name: start, exact: true }).focus();
      const stops: Focused[] = [];
      await moveFocusTo(page, 'Tab', new RegExp(`^button "${start}"$`), stops, 600);
      // Past the last stop the focus leaves the page (to the browser) once: not a stop of the page.
      const onPage = stops.filter((f) => f.what !== 'body');
      expect(stops.length - onPage.length).toBeLessThanOrEqual(1);
      console.info(`${where}: ${onPage.length} tab stops`);
      expect(onPage.length).toBeGreaterThan(20);
      expectFocusShown(onPage);
    }
    const views: WorkbenchView[] = ['Numbers', 'Speed and stress', 'Through time', 'Analyses', 'Export', 'Projects', 'Summary'];
    for (const view of views) {
      await showView(page, view);
      await roundThePage('Workbench', `workbench, ${view}`);
    }
    await page.getByRole('button', { name: 'Experiments', exact: true }).click();
    await roundThePage('Experiments', 'experiments');
    expect(errors).toEqual([]);
  });
});
