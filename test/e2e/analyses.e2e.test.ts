/**
 * The Analyses panel in the built app, in headless Chromium: the committed change from a chosen
 * model year and a short sensitivity curve, computed in the analysis worker, each drawn as a chart
 * and given as numbers; a calibration; and the demo's lake drawn on the long profile at year 300.
 * Screenshots go to test-results/screenshots (analyses-*.png, demo-year-300-lake.png).
 */
import { describe, expect, inject, it } from 'vitest';
import type { Locator } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { saveElementScreenshot, saveScreenshot, sharedBrowser, waitForStatus, waitForProject, showView } from './browser';

const baseUrl = inject('baseUrl');
const numberIn = (panel: Locator, label: string) => panel.locator(`dd[data-number="${label}"]`).textContent();

describe('analyses in headless Chromium', () => {
  const session = sharedBrowser();

  it('draws the lake the demo leaves behind its riegel at year 300, labelled, with the caution', async () => {
    const { page } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done/, 90_000);
    expect(await page.locator('.year-output').textContent()).toBe('Year 300 of 300 a');
    const profile = page.locator('svg.long-profile');
    await profile.locator('[data-layer="lakes"] path.lake-water').first().waitFor();
    await saveScreenshot(page, 'demo-year-300-lake');
    await saveElementScreenshot(page.locator('section.profile'), 'demo-year-300-lake-profile');
    expect(await profile.locator('[data-layer="lakes"] path.lake-water').getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}Z$/);
    expect(await profile.getByText(/^Lake, up to \d+ m deep$/).isVisible()).toBe(true);
    expect(await page.locator('dd[data-number="Lakes"]').textContent()).toMatch(/^1, up to \d+ m deep at [\d.]+ km, [\d.]+ km long, ≈ [\d.]+ × 10⁶ m³$/);
    await showView(page, 'Numbers');
    expect(await page.getByRole('note').filter({ hasText: 'hazard precursor' }).isVisible()).toBe(true);
    // The water is filled in a water colour, not the ice's.
    const fills = await page.evaluate(() => ({
      water: getComputedStyle(document.querySelector('.lake-water')!).fill,
      ice: getComputedStyle(document.querySelector('path.ice')!).fill,
    }));
    expect(fills.water).not.toBe(fills.ice);
  });

  it('computes the committed change from a chosen model year, as numbers and charts', async () => {
    const { page, errors } = session();
    await showView(page, 'Analyses');
    const panel = page.locator('section.analyses');
    // Year 100, the end of the warming ramp: most of the retreat is still to come.
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('Home');
    for (let k = 0; k < 20; k++) await page.keyboard.press('ArrowRight');
    expect(await page.locator('.year-output').textContent()).toBe('Year 100 of 300 a');
    await panel.scrollIntoViewIfNeeded();
    expect(await panel.getByText('From model year').textContent()).toBe('From model year 100 a, warming held at +1.50 K.');
    await panel.getByRole('button', { name: 'Compute committed change' }).click();
    await panel.locator('[data-numbers="committed"]').waitFor({ timeout: 60_000 });
    await saveElementScreenshot(panel, 'analyses-committed');
    expect(await numberIn(panel, 'Held from model year')).toBe('100 a');
    expect(await numberIn(panel, 'Length change to come')).toMatch(/^−\d+\.\d\d km \(−\d+\.\d %\)$/);
    expect(await numberIn(panel, 'Volume change to come')).toMatch(/^−\d\.\d{3} km³ \(−\d+\.\d %\)$/);
    for (const chart of ['committed-length', 'committed-volume']) {
      const svg = panel.locator(`[data-chart="${chart}"]`);
      expect(await svg.isVisible()).toBe(true);
      expect(await svg.locator('[data-series="held"] path').getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){3,}/);
      expect(await svg.getByText('Model year (a)').isVisible()).toBe(true);
    }
    expect(errors).toEqual([]);
  });

  it('computes a short sensitivity curve with both branches told apart, and a calibration', async () => {
    const { page, errors } = session();
    const panel = page.locator('section.analyses');
    await panel.getByRole('tab', { name: 'Sensitivity' }).click();
    await panel.getByLabel('Lowest warming (K)').fill('0');
    await panel.getByLabel('Highest warming (K)').fill('2');
    await panel.getByLabel('Step (K)').fill('0.5');
    await panel.getByRole('button', { name: 'Compute sensitivity curve' }).click();
    await panel.locator('[data-numbers="sensitivity"]').waitFor({ timeout: 60_000 });
    await saveElementScreenshot(panel, 'analyses-sensitivity');
    const rows = panel.locator('[data-numbers="sensitivity"] tbody tr');
    expect(await rows.count()).toBe(5);
    const terminus = panel.locator('[data-chart="sensitivity-terminus"]');
    for (const text of ['Warming up', 'Cooling back', 'Warming held (K)', 'Terminus (km)']) {
      expect(await terminus.getByText(text, { exact: true }).isVisible(), text).toBe(true);
    }
    expect(await terminus.locator('[data-series="up"] circle').count()).toBe(5);
    expect(await terminus.locator('[data-series="down"] circle').count()).toBe(5);
    expect(await panel.locator('[data-chart="sensitivity-volume"]').getByText('Volume (km³)').isVisible()).toBe(true);

    await panel.getByRole('tab', { name: 'Calibration' }).click();
    await panel.getByLabel('Observed terminus (km down-valley)').fill('20');
    await panel.getByRole('button', { name: 'Calibrate the ELA' }).click();
    expect(await panel.getByRole('alert').textContent()).toMatch(/^Observed terminus: 20 km is at or beyond the end of the flowline/);
    await panel.getByLabel('Observed terminus (km down-valley)').fill('8');
    await panel.getByRole('button', { name: 'Calibrate the ELA' }).click();
    await panel.locator('[data-numbers="calibration"]').waitFor({ timeout: 60_000 });
    await saveElementScreenshot(panel, 'analyses-calibration');
    expect(await numberIn(panel, 'Modelled terminus')).toBe('8.00 km');
    expect(await numberIn(panel, 'ELA found')).toMatch(/^\d{4}\.\d\d m a\.s\.l\.$/);
    expect(await panel.getByRole('button', { name: /^Apply ELA/ }).isEnabled()).toBe(true);
    await saveScreenshot(page, 'analyses-full-page');
    expect(errors).toEqual([]);
  });
});
