/**
 * Offline after one visit: the service worker precaches the built app, so with the network cut
 * a reload still shows the demo and a run completes (the model worker script comes from the
 * cache), and an edit made offline runs and survives another offline reload. Every request of the session, online and offline, must be same-origin.
 */
import { describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { saveScreenshot, sharedBrowser, waitForStatus, waitForProject } from './browser';

const baseUrl = inject('baseUrl');

describe('offline in headless Chromium', () => {
  const session = sharedBrowser();

  it('reloads with the network cut, shows the demo, completes a run, and edits and runs again offline', async () => {
    const { page, context, requests, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name, { timeout: 20_000 });
    console.info('loaded online');
    // Wait until the service worker is active and has precached everything.
    const scope = await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
    console.info('service worker ready', scope);
    expect(scope).toBe(baseUrl);

    await context.setOffline(true);
    const offlineFrom = requests.length;
    await page.reload({ waitUntil: 'load' });
    expect(await page.evaluate(() => navigator.onLine)).toBe(false);
    expect(await page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
    await waitForProject(page, demo.name, { timeout: 20_000 });
    console.info('reloaded offline');
    await page.getByRole('button', { name: 'Run' }).click();
    await waitForStatus(page, /^Done/, 90_000);
    await saveScreenshot(page, 'offline-run-done');

    // Still offline: edit a parameter, run the edited scenario, and find the edit kept after a
    // further offline reload (autosave goes to the browser's own storage, not the network).
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const ela = page.getByLabel('ELA', { exact: true });
    await ela.fill('2850');
    await ela.press('Enter');
    await page.locator('button', { hasText: 'Undo: Set ELA' }).waitFor();
    await page.getByRole('button', { name: 'Run again' }).click();
    await waitForStatus(page, /^Done/, 90_000);
    // The profile's ELA label follows the edit: 2850 m plus 120 m per K of the 1.5 K warming at year 300.
    await page.getByRole('slider', { name: 'Model year' }).focus();
    await page.keyboard.press('End');
    await page.locator('svg.long-profile').getByText('ELA 3030 m a.s.l.', { exact: true }).waitFor();
    await saveScreenshot(page, 'offline-edited-run-done');
    await page.waitForTimeout(1_000); // autosave is debounced by 500 ms
    await page.reload({ waitUntil: 'load' });
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    await expect.poll(() => page.getByLabel('ELA', { exact: true }).inputValue()).toBe('2850');

    const offlineRequests = requests.slice(offlineFrom);
    console.info('requests while offline', offlineRequests);
    expect(offlineRequests.some((url) => /\/assets\/flowline\.worker-[^/]+\.js$/.test(url))).toBe(true);
    const origin = new URL(baseUrl).origin;
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    expect(errors).toEqual([]);
  });
});
