/**
 * Robustness in headless Chromium: a page closed in the middle of an autosave, again and again,
 * never leaves the project unreadable; and a second tab on the same project is told and saves
 * nothing until the user takes over.
 */
import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { sharedBrowser, waitForProject } from './browser';

const baseUrl = inject('baseUrl');
const TRIALS = 20;
const AUTOSAVE_DELAY_MS = 500;

async function openDemo(page: Page) {
  await page.goto(baseUrl, { waitUntil: 'load' });
  await waitForProject(page, demo.name);
  await page.getByRole('tab', { name: 'Climate and run' }).click();
}

const elaValue = (page: Page) => page.getByLabel('ELA', { exact: true }).inputValue();

describe('robustness in headless Chromium', () => {
  const session = sharedBrowser();

  it(`finds the project intact after closing the page mid-autosave ${TRIALS} times`, async () => {
    const { context, errors } = session();
    let page = session().page;
    await openDemo(page);
    let saved = Number(await elaValue(page));
    const projectButtons = await page.getByRole('button', { name: /^Open / }).count();
    const outcomes: string[] = [];
    for (let trial = 0; trial < TRIALS; trial++) {
      const next = 2830 + trial;
      const ela = page.getByLabel('ELA', { exact: true });
      await ela.fill(String(next));
      await ela.press('Enter');
      // Close anywhere from at once (pagehide must save) to just after the autosave starts.
      await page.waitForTimeout((trial * 37) % (AUTOSAVE_DELAY_MS + 100));
      await page.close();
      page = await context.newPage();
      await openDemo(page);
      const shown = Number(await elaValue(page));
      // Either the edit was saved whole, or the project is as it was before it.
      expect([saved, next]).toContain(shown);
      expect(await page.getByRole('alert').count()).toBe(0);
      // Still the one project: none was lost and replaced by a fresh demo.
      expect(await page.getByRole('button', { name: /^Open / }).count()).toBe(projectButtons);
      outcomes.push(shown === next ? 'new' : 'previous');
      saved = shown;
    }
    console.info(`closed mid-autosave ${TRIALS} times; reopened as`, outcomes.join(' '));
    expect(outcomes).toHaveLength(TRIALS);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('tells a second tab on the same project and lets it take over', async () => {
    const { context } = session();
    const first = await context.newPage();
    await openDemo(first);
    const second = await context.newPage();
    await openDemo(second);
    const notice = second.getByRole('alert').filter({ hasText: 'open in another tab' });
    await notice.waitFor();
    expect(await notice.textContent()).toMatch(/This tab is read-only: edits here are not saved unless you take over\./);
    expect(await first.getByRole('alert').count()).toBe(0);

    // An edit in the read-only tab is not saved over the first tab's project.
    const before = await elaValue(first);
    await second.getByLabel('ELA', { exact: true }).fill('2901');
    await second.getByLabel('ELA', { exact: true }).press('Enter');
    await second.waitForTimeout(AUTOSAVE_DELAY_MS * 2);
    const third = await context.newPage();
    await openDemo(third);
    expect(await elaValue(third)).toBe(before);
    await third.close();

    await second.getByRole('button', { name: 'Take over' }).click();
    await first.getByRole('alert').filter({ hasText: 'Another tab took this project over' }).waitFor();
    expect(await second.getByRole('alert').count()).toBe(0);
    await second.close();
  });
});
