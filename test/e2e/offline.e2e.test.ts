/**
 * Offline after one visit: the service worker precaches the built app, so with the network cut
 * a reload still shows the demo and a run completes (the model worker script comes from the
 * cache). Every request of the session, online and offline, must be same-origin.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { openBrowser, saveScreenshot, type BrowserSession } from './browser';

const baseUrl = inject('baseUrl');

describe('offline in headless Chromium', () => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
  });

  afterAll(async () => {
    await session?.close();
  });

  it('reloads with the network cut, shows the demo and completes a run', async () => {
    const { page, context, requests, errors } = session;
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await page.getByRole('button', { name: `Open ${demo.name}` }).waitFor({ timeout: 20_000 });
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
    await page.getByRole('button', { name: `Open ${demo.name}` }).waitFor({ timeout: 20_000 });
    console.info('reloaded offline');
    await page.getByRole('button', { name: 'Run' }).click();
    await page.waitForFunction(() => /^Done/.test(document.querySelector('.run-status .status')?.textContent ?? ''), null, {
      timeout: 90_000,
    });
    await saveScreenshot(page, 'offline-run-done');

    const offlineRequests = requests.slice(offlineFrom);
    console.info('requests while offline', offlineRequests);
    expect(offlineRequests.some((url) => /\/assets\/flowline\.worker-[^/]+\.js$/.test(url))).toBe(true);
    const origin = new URL(baseUrl).origin;
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    expect(errors).toEqual([]);
  });
});
