import { describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { saveScreenshot, sharedBrowser } from './browser';

const baseUrl = inject('baseUrl');

describe('demo scenario in headless Chromium', () => {
  const session = sharedBrowser();

  it('shows the demo profile, parameters and caution using only same-origin requests', async () => {
    const { page, requests, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });

    await expect(page.title()).resolves.toBe('Firnline — glacier flowline modeller');
    await page.getByText(demo.name, { exact: true }).waitFor({ state: 'visible' });

    const profile = page.locator('svg.long-profile');
    await profile.waitFor({ state: 'visible' });
    // Taken before the checks so that a failing run still leaves a picture to look at.
    await saveScreenshot(page, 'demo');
    for (const layer of ['ice', 'bed']) {
      const d = await profile.locator(`path[data-layer="${layer}"]`).first().getAttribute('d');
      // A drawn path has a move-to and many line-to segments, not just an empty attribute.
      expect(d, `${layer} path`).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}/);
    }
    for (const text of ['Distance down-valley (km)', 'Elevation (m a.s.l.)', `ELA ${demo.massBalance.ela} m a.s.l.`]) {
      expect(await profile.getByText(text, { exact: true }).isVisible(), text).toBe(true);
    }
    expect(await profile.getByText(/^Vertical exaggeration ×\d+\.\d$/).isVisible()).toBe(true);

    // The caution sits beside the results and again at the foot of the page.
    const cautions = await page.getByRole('note').all();
    expect(cautions.length).toBeGreaterThan(0);
    expect(await cautions[0].isVisible()).toBe(true);
    for (const caution of cautions) {
      expect(await caution.textContent()).toMatch(/not a hazard assessment/);
      expect(await caution.textContent()).toMatch(/local authorities/);
    }

    const origin = new URL(baseUrl).origin;
    expect(requests.length).toBeGreaterThan(0);
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    // CSP violations and script failures show up as console errors.
    expect(errors).toEqual([]);
  });
});
