/**
 * The live steady glacier in headless Chromium: on opening, the demo's steady glacier is stated
 * under the profile and drawn over it; an edit of the ELA changes the statement (worked out in
 * the preview worker); a refused ELA shows only the reason at the field; the switch turns it off.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, saveElementScreenshot, type BrowserSession } from './browser';

const baseUrl = inject('baseUrl');

describe('steady-glacier preview in headless Chromium', () => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
    await session.page.goto(baseUrl, { waitUntil: 'networkidle' });
  });

  afterAll(async () => {
    await session?.close();
  });

  it('states the steady glacier, follows an ELA edit, shows nothing on a refused one, and turns off', async () => {
    const { page, errors } = session;
    const text = page.getByTestId('steady-preview-text');
    const ela = page.getByLabel('ELA', { exact: true });
    await expect.poll(() => text.textContent(), { timeout: 30_000 }).toBe('Steady glacier for this climate: terminus 9.35 km, 1.565 km³');
    await expect(page.locator('svg.long-profile [data-layer="steady-glacier"] path.steady-surface').count()).resolves.toBeGreaterThan(0);

    await page.getByRole('tab', { name: 'Climate and run' }).click();
    await ela.fill('2700');
    await ela.press('Enter');
    await expect.poll(() => text.textContent(), { timeout: 30_000 }).toMatch(/^Steady glacier for this climate: terminus 11\.\d\d km, 2\.0\d\d km³$/);
    await saveElementScreenshot(page.locator('section.profile'), 'steady-preview-ela-2700');

    await ela.fill('20000');
    await ela.press('Enter');
    await expect(page.getByText(/^Not applied: 20000 is not allowed/).count()).resolves.toBe(1);
    await expect.poll(() => text.textContent()).toMatch(/^No steady glacier shown: the last edit was not applied/);
    await expect(page.locator('[data-layer="steady-glacier"]').count()).resolves.toBe(0);
    await ela.press('Escape');
    await expect.poll(() => text.textContent()).toMatch(/^Steady glacier for this climate: terminus 11\./);

    await page.getByLabel('Show the steady glacier for this climate').uncheck();
    await expect.poll(() => text.textContent()).toBe('');
    await expect(page.locator('[data-layer="steady-glacier"]').count()).resolves.toBe(0);
    // The choice outlasts a reload.
    await page.reload({ waitUntil: 'networkidle' });
    await expect(page.getByLabel('Show the steady glacier for this climate').isChecked()).resolves.toBe(false);
    await expect(page.getByTestId('steady-preview-text').textContent()).resolves.toBe('');
    expect(errors).toEqual([]);
  });
});
