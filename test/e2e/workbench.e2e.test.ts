/**
 * The workbench in headless Chromium: run the demo in the worker and watch the terminus move,
 * pause and step, seek and play, and find the project restored from IndexedDB after a reload.
 * Also measures (does not assert) the time from pressing Run to the first frame on screen and
 * the longest main-thread task during the run, written to test-results/measurements.json.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { openBrowser, saveScreenshot, type BrowserSession, waitForStatus, waitForProject, showView } from './browser';

const baseUrl = inject('baseUrl');
const RESULTS_DIR = fileURLToPath(new URL('../../test-results/', import.meta.url));

declare global {
  interface Window {
    __longTasks: { start: number; duration: number }[];
    __firstFrame: Promise<{ clicked: number; shown: number }>;
    __terminusDrawn: string[];
  }
}

/** Records every long task (> 50 ms) from the start of the page. */
function observeLongTasks() {
  window.__longTasks = [];
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) window.__longTasks.push({ start: e.startTime, duration: e.duration });
  }).observe({ type: 'longtask', buffered: true });
}

const numberValue = (page: Page, label: string) => page.locator(`dd[data-number="${label}"]`).textContent();


describe('workbench in headless Chromium', () => {
  let session: BrowserSession;
  const measurements: Record<string, unknown> = {};

  beforeAll(async () => {
    session = await openBrowser();
    await session.page.addInitScript(observeLongTasks);
  });

  afterAll(async () => {
    await mkdir(RESULTS_DIR, { recursive: true });
    await writeFile(`${RESULTS_DIR}measurements.json`, `${JSON.stringify(measurements, null, 2)}\n`);
    console.info('measurements', measurements);
    await session?.close();
  });

  it('runs the demo in the worker: frames arrive, and the terminus has retreated by year 300', async () => {
    const { page } = session;
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);
    await saveScreenshot(page, 'workbench-before-run');

    // Time from the click to the first frame on screen, and every terminus position drawn while
    // the run streams in, taken inside the page.
    await page.evaluate(() => {
      window.__terminusDrawn = [];
      window.__firstFrame = new Promise((resolve) => {
        const button = [...document.querySelectorAll('button')].find((b) => b.textContent === 'Run')!;
        let clicked = 0;
        let resolved = false;
        button.addEventListener('click', () => (clicked = performance.now()), { capture: true, once: true });
        const observer = new MutationObserver(() => {
          const text = document.querySelector('svg.long-profile [data-layer="terminus"] text')?.textContent;
          if (!clicked || !text) return;
          if (window.__terminusDrawn.at(-1) !== text) window.__terminusDrawn.push(text);
          if (!resolved) {
            resolved = true;
            requestAnimationFrame(() => resolve({ clicked, shown: performance.now() }));
          }
        });
        observer.observe(document.body, { subtree: true, childList: true, characterData: true });
      });
    });
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    const first = await page.evaluate(() => window.__firstFrame);
    await waitForStatus(page, /^Done: 300 years, 61 outputs after a spin-up of [\d,]+ model years to a steady state\.$/);
    const done = await page.evaluate(() => performance.now());
    await saveScreenshot(page, 'workbench-done');

    const tasks = await page.evaluate(() => window.__longTasks);
    const during = tasks.filter((t) => t.start >= first.clicked && t.start <= done);
    measurements.runToFirstFrameMs = Math.round(first.shown - first.clicked);
    measurements.longestTaskDuringRunMs = during.length ? Math.round(Math.max(...during.map((t) => t.duration))) : 0;
    measurements.longTasksDuringRun = during.map((t) => ({ startAfterClickMs: Math.round(t.start - first.clicked), durationMs: Math.round(t.duration) }));
    measurements.runWallClockMs = Math.round(done - first.clicked);
    measurements.terminusPositionsDrawnDuringRun = (await page.evaluate(() => window.__terminusDrawn)).length;

    const terminus = page.locator('svg.long-profile [data-layer="terminus"] text');
    const km = (text: string | null) => Number(text!.replace(/[^\d.]/g, ''));
    const at300 = await terminus.textContent();
    expect(at300).toMatch(/^Terminus \d+\.\d\d km$/);
    expect(await page.locator('[data-layer="model-year"]').textContent()).toBe('Year 300');
    expect(await numberValue(page, 'Model year')).toBe('300 a');
    expect(await numberValue(page, 'Terminus')).toBe(`${at300!.replace('Terminus ', '')} down-valley`);

    // Every frame was kept: back at year 0 the terminus stands where the spin-up left it.
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('Home');
    expect(await page.locator('[data-layer="model-year"]').textContent()).toBe('Year 0');
    const at0 = await terminus.textContent();
    // 1.5 K of warming over a century: the demo glacier ends more than a kilometre shorter.
    expect(km(at300)).toBeLessThan(km(at0) - 1);
    await page.keyboard.press('End');

    await showView(page, 'Speed and stress');
    for (const name of ['Speed along the flowline', 'Driving stress along the flowline']) {
      const d = await page.getByRole('region', { name }).locator('path.series').first().getAttribute('d');
      expect(d, name).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}/);
    }
    await showView(page, 'Through time');
    expect(await page.locator('svg.time-series [data-layer="cursor"]').count()).toBe(1);

    // The same run again, with the page's code already compiled and every view mounted.
    const again = await page.evaluate(() => performance.now());
    await page.getByRole('button', { name: 'Run again' }).click();
    await waitForStatus(page, /^Done/);
    const againDone = await page.evaluate(() => performance.now());
    const warm = (await page.evaluate(() => window.__longTasks)).filter((t) => t.start >= again && t.start <= againDone);
    measurements.secondRun = {
      wallClockMs: Math.round(againDone - again),
      longestTaskMs: warm.length ? Math.round(Math.max(...warm.map((t) => t.duration))) : 0,
      longTasks: warm.length,
    };
  });

  it('steps one output at a time while paused, seeks, resumes; the slider and Space move every view', async () => {
    const { page } = session;
    // Stepping with no run going on starts a run held at its start: deterministic however fast
    // the machine computes.
    await page.getByRole('button', { name: 'Step one output' }).click();
    await waitForStatus(page, /^Paused at year 0\.$/);
    expect(await page.locator('.year-output').textContent()).toBe('Year 0 of 300 a');
    await page.getByRole('button', { name: 'Step one output' }).click();
    await waitForStatus(page, /^Paused at year 5\.$/);
    expect(await page.locator('.year-output').textContent()).toBe('Year 5 of 300 a');
    await saveScreenshot(page, 'workbench-paused-year-5');
    // Paused, seeking shows each output: the ELA rises 120 m per K, 0.075 K by year 5.
    expect(await numberValue(page, 'ELA')).toBe('2789 m a.s.l.');
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('Home');
    expect(await numberValue(page, 'ELA')).toBe('2780 m a.s.l.');
    expect(await numberValue(page, 'Warming since year 0')).toBe('0.00 K');
    await page.getByRole('button', { name: 'Resume' }).click();
    await waitForStatus(page, /^Done/);

    const slider = page.getByRole('slider', { name: 'Model year' });
    await slider.focus();
    await page.keyboard.press('Home');
    expect(await page.locator('.year-output').textContent()).toBe('Year 0 of 300 a');
    const lengthAt0 = await numberValue(page, 'Length');
    const elaAt0 = await numberValue(page, 'ELA');
    await page.keyboard.press('End');
    expect(await page.locator('.year-output').textContent()).toBe('Year 300 of 300 a');
    expect(await numberValue(page, 'Length')).not.toBe(lengthAt0);
    expect(await numberValue(page, 'ELA')).not.toBe(elaAt0);
    // 1.5 K at 120 m per K raises the ELA by 180 m.
    expect(elaAt0).toBe(`${demo.massBalance.ela} m a.s.l.`);
    expect(await numberValue(page, 'ELA')).toBe(`${demo.massBalance.ela + 180} m a.s.l.`);

    await page.keyboard.press('Home');
    for (let i = 0; i < 12; i++) await page.keyboard.press('ArrowRight');
    expect(await page.locator('.year-output').textContent()).toBe('Year 60 of 300 a');
    await saveScreenshot(page, 'workbench-year-60');

    // Space plays from the selected year when focus is not in a text field.
    await page.locator('h1').click();
    await page.keyboard.press('Space');
    await page.waitForFunction(() => !document.querySelector('.year-output')?.textContent?.startsWith('Year 60 '));
    await page.keyboard.press('Space');
    expect(await page.getByRole('button', { name: 'Play' }).isVisible()).toBe(true);
  });

  it('restores the open project, its scenario and selected year from IndexedDB after a reload', async () => {
    const { page, requests, errors } = session;
    await showView(page, 'Projects');
    await page.getByRole('button', { name: 'New blank valley' }).click();
    await waitForProject(page, 'Blank valley');
    // The blank valley is ice-free: the profile shows no ice until it is run.
    expect(await page.locator('svg.long-profile path[data-layer="ice"]').count()).toBe(0);
    await page.getByRole('button', { name: 'Rename Blank valley' }).click();
    await page.getByLabel('New name for “Blank valley”').fill('   ');
    await page.getByRole('button', { name: 'Save name' }).click();
    expect(await page.getByRole('alert').filter({ hasText: 'project name' }).textContent()).toMatch(/at least one character/);
    await page.getByLabel('New name for “Blank valley”').fill('Cirque test');
    await page.getByRole('button', { name: 'Save name' }).click();
    await waitForProject(page, 'Cirque test');

    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done/);
    const slider = page.getByRole('slider', { name: 'Model year' });
    await slider.focus();
    await page.keyboard.press('Home');
    for (let i = 0; i < 20; i++) await page.keyboard.press('ArrowRight');
    expect(await page.locator('.year-output').textContent()).toBe('Year 100 of 300 a');
    // Autosave waits half a second after the last change.
    await page.waitForTimeout(1200);

    await page.reload({ waitUntil: 'networkidle' });
    await waitForProject(page, 'Cirque test');
    expect(await page.getByLabel('Project', { exact: true }).textContent()).toBe('Cirque test');
    expect(await page.locator('[aria-current="true"] .project-name').textContent()).toMatch(/^Cirque test/);
    expect(await page.getByRole('button', { name: `Open ${demo.name}` }).isVisible()).toBe(true);
    expect(await page.locator('svg.long-profile path[data-layer="ice"]').count()).toBe(0);
    // Results are not saved; running again returns to the year that was selected.
    await showView(page, 'Numbers');
    expect(await page.getByRole('region', { name: 'Glacier at the selected year' }).getByText('No results yet. Press Run to compute them.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done/);
    expect(await page.locator('.year-output').textContent()).toBe('Year 100 of 300 a');
    await saveScreenshot(page, 'workbench-restored');

    const origin = new URL(baseUrl).origin;
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    expect(errors).toEqual([]);
  });
});
