/**
 * One screen: at 1280 x 800 and 1024 x 768 the page does not scroll, and the long profile, the
 * run controls, the model-year slider and the parameter panel with the field being edited (the
 * ELA) are all inside the window at once, none overlapping another. Screenshots of both sizes go
 * to test-results/screenshots/ for a look by eye.
 */
import { describe, expect, inject, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { openBrowser, saveScreenshot, waitForStatus } from './browser';

const baseUrl = inject('baseUrl');

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

async function boxOf(locator: Locator, what: string): Promise<Box> {
  const box = await locator.boundingBox();
  if (!box) throw new Error(`${what} is not laid out (hidden or detached)`);
  return box;
}

function expectInside(box: Box, width: number, height: number, what: string) {
  const inside = box.x >= 0 && box.y >= 0 && box.x + box.width <= width + 0.5 && box.y + box.height <= height + 0.5;
  expect(inside, `${what} at ${JSON.stringify(box)} lies outside the ${width} x ${height} window`).toBe(true);
}

const overlaps = (a: Box, b: Box) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

async function checkOneScreen(page: Page, width: number, height: number) {
  const scroll = await page.evaluate(() => ({ height: document.documentElement.scrollHeight, width: document.documentElement.scrollWidth }));
  expect(scroll, 'the page itself scrolls').toEqual({ height, width });

  const profile = await boxOf(page.getByRole('img', { name: 'Long profile of the flowline' }), 'the long profile');
  const run = await boxOf(page.getByRole('region', { name: 'Run' }), 'the run controls');
  const slider = await boxOf(page.getByRole('slider', { name: 'Model year' }), 'the model-year slider');
  const ela = await boxOf(page.getByRole('textbox', { name: 'ELA', exact: true }), 'the ELA field');
  const parameters = await boxOf(page.getByRole('region', { name: 'Parameters' }), 'the parameter column');
  const boxes = { profile, run, slider, ela, parameters };
  for (const [what, box] of Object.entries(boxes)) expectInside(box, width, height, what);
  // A usable plot: the profile keeps at least a third of the window's height.
  expect(profile.height).toBeGreaterThan(height / 3);
  for (const [a, b] of [
    ['profile', 'run'],
    ['profile', 'slider'],
    ['profile', 'parameters'],
    ['run', 'slider'],
  ] as const) {
    expect(overlaps(boxes[a], boxes[b]), `${a} overlaps ${b}`).toBe(false);
  }
}

describe('the workbench on one screen', () => {
  it('lets the supporting views take more height by dragging the handle above them', async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      await page.goto(baseUrl);
      const views = page.getByRole('region', { name: 'Results and tools' });
      const before = await boxOf(views, 'the supporting views');
      const handle = await boxOf(page.getByRole('separator', { name: 'Height of the results and tools' }), 'the handle');
      await page.mouse.move(handle.x + handle.width / 2, handle.y + handle.height / 2);
      await page.mouse.down();
      await page.mouse.move(handle.x + handle.width / 2, handle.y - 150, { steps: 5 });
      await page.mouse.up();
      const after = await boxOf(views, 'the supporting views');
      expect(after.height - before.height).toBeGreaterThan(120);
      expectInside(after, 1280, 800, 'the supporting views');
      expect(session.errors).toEqual([]);
    } finally {
      await session.close();
    }
  });

  for (const viewport of [
    { width: 1280, height: 800 },
    { width: 1024, height: 768 },
  ]) {
    it(`fits ${viewport.width} x ${viewport.height} without scrolling, with the ELA field in view`, async () => {
      const session = await openBrowser();
      try {
        const { page } = session;
        await page.setViewportSize(viewport);
        await page.goto(baseUrl);
        await page.getByRole('button', { name: 'Run', exact: true }).click();
        await waitForStatus(page, /^Done/);
        await page.getByRole('tab', { name: 'Climate and run' }).click();
        await page.getByRole('textbox', { name: 'ELA', exact: true }).focus();
        await checkOneScreen(page, viewport.width, viewport.height);
        await saveScreenshot(page, `one-screen-${viewport.width}x${viewport.height}`);
        expect(session.errors).toEqual([]);
      } finally {
        await session.close();
      }
    });
  }
});
