/**
 * The editor in headless Chromium, found by accessible names (the layout is another engineer's):
 * draw a bed with the mouse and see its points, undo and redo by keyboard, and import CSV
 * profiles, one with a bad row that is listed by line number and not imported until accepted.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, saveElementScreenshot, saveScreenshot, type BrowserSession } from './browser';

const baseUrl = inject('baseUrl');

const bedPoints = (page: Page) => page.getByRole('button', { name: /^Bed point \d+ of \d+:/ });
const undoButton = (page: Page) => page.getByRole('button', { name: /^Undo/ });

async function bedPointCount(page: Page): Promise<number> {
  const label = await bedPoints(page).first().getAttribute('aria-label');
  return Number(/of (\d+):/.exec(label ?? '')?.[1]);
}

describe('editor in headless Chromium', () => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
    await session.page.goto(baseUrl, { waitUntil: 'networkidle' });
  });

  afterAll(async () => {
    await session?.close();
  });

  it('draws a bed with the mouse, shows its points, and undoes and redoes by keyboard', async () => {
    const { page, errors } = session;
    await page.getByRole('radio', { name: 'Draw bed' }).check();
    await page.locator('[data-testid="draw-capture"]').waitFor();
    // Redraw the bed from the 4 km point to the 8.2 km point with a deeper basin between them,
    // as a glaciologist would sketch an overdeepening under the ice.
    const from = await bedPoints(page).nth(3).boundingBox();
    const to = await bedPoints(page).nth(9).boundingBox();
    expect(from && to).toBeTruthy();
    const [x0, y0] = [from!.x + from!.width / 2, from!.y + from!.height / 2];
    const [x1, y1] = [to!.x + to!.width / 2, to!.y + to!.height / 2];
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    for (let i = 1; i <= 40; i++) {
      const t = i / 40;
      await page.mouse.move(x0 + (x1 - x0) * t, y0 + (y1 - y0) * t + 45 * Math.sin(Math.PI * t));
    }
    await page.mouse.up();
    await expect(undoButton(page).textContent()).resolves.toBe('Undo: Draw bed');
    const drawn = await bedPointCount(page);
    expect(drawn).toBeGreaterThan(3);
    expect(drawn).not.toBe(13);
    await saveScreenshot(page, 'edit-draw-bed');
    await saveElementScreenshot(page.locator('svg.long-profile'), 'edit-draw-bed-profile');

    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(() => bedPointCount(page)).toBe(13);
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => bedPointCount(page)).toBe(drawn);
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Control+y');
    await expect.poll(() => bedPointCount(page)).toBe(drawn);

    // Keyboard editing of a point: focus it, move it up, delete it.
    await page.getByRole('radio', { name: 'Edit points' }).check();
    await bedPoints(page).nth(1).focus();
    const before = await bedPoints(page).nth(1).getAttribute('aria-label');
    await page.keyboard.press('Shift+ArrowUp');
    await expect.poll(() => bedPoints(page).nth(1).getAttribute('aria-label')).not.toBe(before);
    await page.keyboard.press('Delete');
    await expect.poll(() => bedPointCount(page)).toBe(drawn - 1);
    // Drag a point with the mouse: the edit is committed once, when the button is released.
    const handle = bedPoints(page).nth(2);
    const hb = (await handle.boundingBox())!;
    await page.mouse.move(hb.x + hb.width / 2, hb.y + hb.height / 2);
    await page.mouse.down();
    for (let i = 1; i <= 10; i++) await page.mouse.move(hb.x + hb.width / 2, hb.y + hb.height / 2 + 4 * i);
    // Mid-drag: a preview only, nothing committed yet.
    await expect(undoButton(page).textContent()).resolves.toBe('Undo: Delete bed point 2');
    await page.mouse.up();
    await expect(undoButton(page).textContent()).resolves.toBe('Undo: Move bed point 3');
    await saveScreenshot(page, 'edit-points');
    expect(errors).toEqual([]);
  });

  it('lists a CSV row that cannot be read by its line number and imports nothing until accepted', async () => {
    const { page, errors } = session;
    const pointsBefore = await bedPointCount(page);
    await page.getByRole('tab', { name: 'Geometry' }).click();
    await page.getByRole('button', { name: 'Import profile from CSV…' }).click();
    const csv = [
      'distance_km;bed_m;surface_m;width_m',
      '0;3250;3330;1800',
      '1,5;3000;3110;1500',
      '3;2820;2930;1300',
      '4,5;2x00;2780;1100',
      '6;2580;2650;1000',
      '5,5;2560;2600;950',
      '8;2400;2440;900',
      '10;2250;2250;800',
      '12;2100;2100;700',
    ].join('\n');
    await page.getByLabel('CSV file').setInputFiles({ name: 'survey-2019.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    const problems = page.getByRole('list', { name: 'Rows that could not be read' });
    await problems.waitFor({ state: 'visible' });
    const items = await problems.getByRole('listitem').allTextContents();
    expect(items).toEqual([
      'Line 5: bed "2x00" is not a number',
      'Line 7: distance 5.5 is not greater than 6 on line 6; distances must increase down the valley',
    ]);
    const importButton = page.getByRole('button', { name: 'Import', exact: true });
    expect(await importButton.isDisabled()).toBe(true);
    await saveScreenshot(page, 'edit-csv-bad-rows');
    await saveElementScreenshot(page.getByRole('dialog', { name: /Import a surveyed profile/ }), 'edit-csv-dialog');
    expect(await bedPointCount(page)).toBe(pointsBefore);

    await page.getByLabel(/Leave out the 2 unreadable rows/).check();
    await importButton.click();
    await expect(undoButton(page).textContent()).resolves.toBe('Undo: Import profile survey-2019.csv');
    expect(await bedPointCount(page)).toBe(7);
    await saveScreenshot(page, 'edit-csv-imported');

    await page.keyboard.press('Control+z');
    await expect.poll(() => bedPointCount(page)).toBe(pointsBefore);
    expect(errors).toEqual([]);
  });

  it('refuses a bad parameter at the field with the reason and applies a good one', async () => {
    const { page, errors } = session;
    const panels = page.getByRole('region', { name: 'Scenario editor' });
    await page.getByRole('tab', { name: 'Ice and flow' }).click();
    await saveElementScreenshot(panels, 'edit-ice-and-flow');
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const ela = page.getByLabel('ELA', { exact: true });
    await ela.fill('12000');
    await ela.press('Enter');
    const refusal = page.getByRole('alert').filter({ hasText: 'Not applied' });
    await expect(refusal.textContent()).resolves.toMatch(/12000 is not allowed/);
    expect(await ela.inputValue()).toBe('12000');
    await saveElementScreenshot(panels, 'edit-climate-refused');
    await ela.fill('2850');
    await ela.press('Enter');
    await expect(undoButton(page).textContent()).resolves.toBe('Undo: Set ELA');
    expect(await refusal.count()).toBe(0);
    expect(errors).toEqual([]);
  });
});
