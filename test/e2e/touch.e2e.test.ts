/**
 * Drawing on the long profile with a finger and with a pen, in headless Chromium with a touch
 * screen: the input goes through the browser's own input pipeline (DevTools Input.dispatchTouchEvent
 * and Input.dispatchMouseEvent with pointerType 'pen'), so panning the page, touch-action and
 * pointer capture act as on a tablet. Each stroke must change the scenario as the mouse stroke of
 * edit.e2e.test.ts does, with no pointer cancelled on the way.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { CDPSession, Page } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { openBrowser, saveElementScreenshot, waitForProject, type BrowserSession } from './browser';

const baseUrl = inject('baseUrl');

const points = (page: Page, name: 'Bed' | 'Ice surface') => page.getByRole('button', { name: new RegExp(`^${name} point \\d+ of \\d+:`) });
const undoButton = (page: Page) => page.getByRole('button', { name: /^Undo/ });

async function pointLabels(page: Page, name: 'Bed' | 'Ice surface'): Promise<string[]> {
  return points(page, name).evaluateAll((circles) => circles.map((c) => c.getAttribute('aria-label') ?? ''));
}

/** "Bed point 3 of 13: 2.50 km, 2800 m a.s.l." → "2.50 km, 2800 m a.s.l." */
const position = (label: string | undefined) => label?.replace(/^.* point \d+ of \d+: /, '');

async function centreOf(page: Page, name: 'Bed' | 'Ice surface', index: number): Promise<[number, number]> {
  const box = await points(page, name).nth(index).boundingBox();
  if (!box) throw new Error(`${name} point ${index + 1} has no box`);
  return [box.x + box.width / 2, box.y + box.height / 2];
}

/** The stroke of the mouse test: from one point to another, bulging `bulge` px down on the way. */
function strokePath([x0, y0]: [number, number], [x1, y1]: [number, number], bulge: number, steps = 40): [number, number][] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const t = i / steps;
    return [x0 + (x1 - x0) * t, y0 + (y1 - y0) * t + bulge * Math.sin(Math.PI * t)];
  });
}

async function touchStroke(cdp: CDPSession, path: [number, number][]): Promise<void> {
  const [first, ...rest] = path;
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [{ x: first[0], y: first[1], id: 1 }] });
  for (const [x, y] of rest) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [{ x, y, id: 1 }] });
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
}

async function penStroke(cdp: CDPSession, path: [number, number][]): Promise<void> {
  const pen = { pointerType: 'pen' as const, force: 0.5 };
  const [first, ...rest] = path;
  await cdp.send('Input.dispatchMouseEvent', { type: 'mouseMoved', x: first[0], y: first[1], ...pen });
  await cdp.send('Input.dispatchMouseEvent', { type: 'mousePressed', x: first[0], y: first[1], button: 'left', buttons: 1, clickCount: 1, ...pen });
  for (const [x, y] of rest) await cdp.send('Input.dispatchMouseEvent', { type: 'mouseMoved', x, y, button: 'left', buttons: 1, ...pen });
  const [x, y] = path[path.length - 1];
  await cdp.send('Input.dispatchMouseEvent', { type: 'mouseReleased', x, y, button: 'left', buttons: 0, clickCount: 1, ...pen });
}

/** Starts recording the pointer events the page sees: type and pointerType, in order. */
async function recordPointers(page: Page): Promise<void> {
  await page.evaluate(() => {
    const log: string[] = [];
    (window as unknown as { pointerLog: string[] }).pointerLog = log;
    for (const type of ['pointerdown', 'pointerup', 'pointercancel']) {
      window.addEventListener(type, (e) => log.push(`${e.type}:${(e as PointerEvent).pointerType}`), true);
    }
  });
}

const takePointerLog = (page: Page) =>
  page.evaluate(() => {
    const log = (window as unknown as { pointerLog: string[] }).pointerLog;
    return log.splice(0, log.length);
  });

describe('drawing with touch and pen in headless Chromium', () => {
  let session: BrowserSession;
  let cdp: CDPSession;

  beforeAll(async () => {
    session = await openBrowser({ hasTouch: true });
    await session.page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(session.page, demo.name);
    cdp = await session.context.newCDPSession(session.page);
    await recordPointers(session.page);
  });

  afterAll(async () => {
    await session?.close();
  });

  it('draws the bed with a finger: the stroke replaces the bed under it, as with the mouse', async () => {
    const { page, errors } = session;
    await page.getByRole('radio', { name: 'Draw bed' }).check();
    await page.locator('[data-testid="draw-capture"]').waitFor();
    const before = await pointLabels(page, 'Bed');
    expect(before).toHaveLength(13);
    const [from, to] = [await centreOf(page, 'Bed', 3), await centreOf(page, 'Bed', 9)];
    await takePointerLog(page); // forget the mouse clicks of the set-up
    await touchStroke(cdp, strokePath(from, to, 45));
    expect(await takePointerLog(page)).toEqual(['pointerdown:touch', 'pointerup:touch']);
    await expect.poll(() => undoButton(page).textContent()).toBe('Undo: Draw bed');
    const after = await pointLabels(page, 'Bed');
    console.info(`touch: the bed went from ${before.length} to ${after.length} points`);
    expect(after.length).toBeGreaterThan(3);
    expect(after).not.toEqual(before);
    // Head and end of the bed are outside the stroke and stay as they were.
    expect(position(after[0])).toBe(position(before[0]));
    expect(position(after.at(-1))).toBe(position(before.at(-1)));
    await saveElementScreenshot(page.locator('svg.long-profile'), 'touch-draw-bed-profile');
    expect(errors).toEqual([]);
  });

  it('draws the ice surface with a pen, as with the mouse', async () => {
    const { page, errors } = session;
    await page.getByRole('radio', { name: 'Draw ice surface' }).check();
    const before = await pointLabels(page, 'Ice surface');
    const [from, to] = [await centreOf(page, 'Ice surface', 2), await centreOf(page, 'Ice surface', 6)];
    await takePointerLog(page);
    await penStroke(cdp, strokePath(from, to, -30));
    expect(await takePointerLog(page)).toEqual(['pointerdown:pen', 'pointerup:pen']);
    await expect.poll(() => undoButton(page).textContent()).toBe('Undo: Draw ice surface');
    const after = await pointLabels(page, 'Ice surface');
    console.info(`pen: the ice surface went from ${before.length} to ${after.length} points`);
    expect(after).not.toEqual(before);
    expect(position(after[0])).toBe(position(before[0]));
    expect(position(after.at(-1))).toBe(position(before.at(-1)));
    await saveElementScreenshot(page.locator('svg.long-profile'), 'pen-draw-surface-profile');
    expect(errors).toEqual([]);
  });

  it('drags a point with a finger, committed once when the finger lifts', async () => {
    const { page, errors } = session;
    await page.getByRole('radio', { name: 'Edit points' }).check();
    await page.getByRole('combobox', { name: /Points of/ }).selectOption('bed');
    const before = await pointLabels(page, 'Bed');
    const [x, y] = await centreOf(page, 'Bed', 1);
    await takePointerLog(page);
    await touchStroke(cdp, strokePath([x, y], [x, y + 40], 0, 10));
    expect(await takePointerLog(page)).toEqual(['pointerdown:touch', 'pointerup:touch']);
    await expect.poll(() => undoButton(page).textContent()).toBe('Undo: Move bed point 2');
    const after = await pointLabels(page, 'Bed');
    expect(after).toHaveLength(before.length);
    const elevation = (label: string) => Number(/, (\d+) m a\.s\.l\./.exec(label)![1]);
    console.info(`touch drag: ${before[1]} → ${after[1]}`);
    expect(elevation(after[1])).toBeLessThan(elevation(before[1]));
    expect(errors).toEqual([]);
  });

  it('drags a width point with a finger and with a pen in the Geometry tab', async () => {
    const { page, errors } = session;
    await page.getByRole('tab', { name: 'Geometry' }).click();
    const widthPoint = (n: number) => page.getByRole('button', { name: new RegExp(`^Width point ${n} of \\d+:`) });
    await widthPoint(3).scrollIntoViewIfNeeded();
    const widthOf = async (n: number) => Number(/, (\d+) m$/.exec((await widthPoint(n).getAttribute('aria-label')) ?? '')![1]);
    for (const [tool, n] of [['touch', 3], ['pen', 4]] as const) {
      const before = await widthOf(n);
      const box = (await widthPoint(n).boundingBox())!;
      const [x, y] = [box.x + box.width / 2, box.y + box.height / 2];
      await takePointerLog(page);
      await (tool === 'touch' ? touchStroke : penStroke)(cdp, strokePath([x, y], [x, y - 25], 0, 10));
      expect(await takePointerLog(page)).toEqual([`pointerdown:${tool}`, `pointerup:${tool}`]);
      await expect.poll(() => undoButton(page).textContent()).toBe(`Undo: Move width point ${n}`);
      console.info(`${tool} drag: width point ${n} from ${before} m to ${await widthOf(n)} m`);
      expect(await widthOf(n)).toBeGreaterThan(before);
    }
    expect(errors).toEqual([]);
  });
});
