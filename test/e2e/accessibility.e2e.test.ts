/**
 * WCAG 2 A and AA checks by axe-core on every view of the built app in headless Chromium: the
 * workbench before and after a run, each editor tab, each supporting view (Numbers to Summary),
 * each analysis tab and the experiments view
 * (before and after a small experiment). No serious or critical violation may remain; a failure
 * lists each rule with its impact and the selectors of the offending nodes. The contrast of SVG
 * text, which axe cannot decide, is checked on its own (axe.ts).
 */
import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { describeFindings, seriousViolations, svgTextContrastProblems } from './axe';
import { sharedBrowser, showView, waitForProject, waitForStatus, type WorkbenchView } from './browser';

const baseUrl = inject('baseUrl');

async function expectNoSeriousViolations(page: Page, where: string): Promise<void> {
  const findings = [...(await seriousViolations(page)), ...(await svgTextContrastProblems(page))];
  if (findings.length > 0) console.info(`axe, ${where}:\n${describeFindings(findings)}`);
  expect.soft(findings.map((f) => `${f.id} (${f.impact}) at ${f.targets.join(', ')}`), where).toEqual([]);
}

describe('accessibility (axe-core, WCAG 2 A/AA) in headless Chromium', () => {
  const session = sharedBrowser();

  it('finds nothing serious on the workbench before a run, in every editor tab and draw mode', async () => {
    const { page, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);
    await expectNoSeriousViolations(page, 'workbench, Geometry tab');
    for (const tab of ['Ice and flow', 'Climate and run', 'Observations']) {
      await page.getByRole('tab', { name: tab }).click();
      await expectNoSeriousViolations(page, `workbench, ${tab} tab`);
    }
    // A refused value shows its reason at the field.
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const ela = page.getByLabel('ELA', { exact: true });
    const elaBefore = await ela.inputValue();
    await ela.fill('12000');
    await ela.press('Enter');
    await page.getByRole('alert').filter({ hasText: 'Not applied' }).waitFor();
    await expectNoSeriousViolations(page, 'workbench, a refused ELA');
    await ela.fill(elaBefore);
    await ela.press('Enter');
    await page.getByRole('tab', { name: 'Geometry' }).click();
    await page.getByRole('button', { name: 'Import profile from CSV…' }).click();
    await expectNoSeriousViolations(page, 'CSV import dialog');
    await page.getByRole('button', { name: 'Cancel' }).click();
    await page.getByRole('button', { name: 'Import centreline from GeoJSON…' }).click();
    await expectNoSeriousViolations(page, 'GeoJSON import dialog');
    await page.getByRole('button', { name: 'Cancel' }).click();
    for (const mode of ['Edit points', 'Draw bed', 'Draw ice surface']) {
      await page.getByRole('radio', { name: mode }).check();
      await expectNoSeriousViolations(page, `profile editing, ${mode}`);
    }
    await page.getByRole('radio', { name: 'View' }).check();
    expect(errors).toEqual([]);
  });

  it('finds nothing serious with results shown, in every supporting view and analysis tab', async () => {
    const { page, errors } = session();
    const views: WorkbenchView[] = ['Numbers', 'Speed and stress', 'Through time', 'Analyses', 'Export', 'Projects', 'Summary'];
    for (const view of views) {
      await showView(page, view);
      await expectNoSeriousViolations(page, `workbench before a run, ${view}`);
    }
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done/, 90_000);
    for (const view of views) {
      await showView(page, view);
      if (view === 'Export') await page.getByRole('region', { name: 'Export' }).waitFor();
      await expectNoSeriousViolations(page, `workbench with results, ${view}`);
    }
    await showView(page, 'Analyses');
    const panel = page.locator('section.analyses');
    for (const tab of ['Committed change', 'Sensitivity', 'Calibration', 'Bed from the surface']) {
      await panel.getByRole('tab', { name: tab }).click();
      await expectNoSeriousViolations(page, `analyses, ${tab} tab`);
    }
    await panel.getByRole('tab', { name: 'Committed change' }).click();
    await panel.getByRole('button', { name: 'Compute committed change' }).click();
    await panel.locator('[data-numbers="committed"]').waitFor({ timeout: 60_000 });
    await expectNoSeriousViolations(page, 'analyses, committed change computed');
    expect(errors).toEqual([]);
  });

  it('finds nothing serious in the experiments view, before and after a small experiment', async () => {
    const { page, errors } = session();
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const runLength = page.getByLabel('Run length', { exact: true });
    await runLength.fill('40');
    await runLength.press('Enter');
    await page.getByRole('button', { name: 'Experiments', exact: true }).click();
    const view = page.getByRole('main', { name: 'Experiments' });
    await view.waitFor();
    await expectNoSeriousViolations(page, 'experiments view, empty');
    const ladder = view.getByRole('form', { name: 'Warming ladder' });
    // A refused ladder first: its messages at the fields must be accessible too.
    await ladder.getByLabel('From (K)').fill('x');
    await ladder.getByRole('button', { name: 'Add ladder' }).click();
    await ladder.getByRole('alert').first().waitFor();
    await expectNoSeriousViolations(page, 'experiments view, a refused ladder');
    await ladder.getByLabel('From (K)').fill('1');
    await ladder.getByLabel('To (K)').fill('2');
    await ladder.getByLabel('Step (K)').fill('1');
    await ladder.getByLabel('By year (a)').fill('20');
    await ladder.getByRole('button', { name: 'Add ladder' }).click();
    await expectNoSeriousViolations(page, 'experiments view, two members listed');
    await view.getByRole('button', { name: 'Run experiment' }).click();
    await view.getByText('Finished: 2 of 2 done.').waitFor({ timeout: 90_000 });
    await expectNoSeriousViolations(page, 'experiments view, results');
    expect(errors).toEqual([]);
  });
});
