/**
 * The experiments view in headless Chromium: a three-member warming ladder built through the
 * form, run on the page's worker pool, three curves on each chart and a three-row outcomes table;
 * then one member opened in the workbench. The run is shortened to 120 years so it is quick.
 */
import { readFileSync } from 'node:fs';
import { strFromU8, unzipSync } from 'fflate';
import { describe, expect, inject, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { saveElementScreenshot, saveScreenshot, sharedBrowser, waitForStatus, waitForProject } from './browser';

const baseUrl = inject('baseUrl');

describe('experiments in headless Chromium', () => {
  const session = sharedBrowser();

  it('builds a warming ladder, runs its three members in workers, and compares them', async () => {
    const { page, requests, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await waitForProject(page, demo.name);

    // A shorter run in the workbench; the experiment takes it as its base.
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const runLength = page.getByLabel('Run length', { exact: true });
    await runLength.fill('120');
    await runLength.press('Enter');

    await page.getByRole('button', { name: 'Experiments', exact: true }).click();
    const view = page.getByRole('main', { name: 'Experiments' });
    await view.waitFor();
    await view.getByText(/run of 120 a with outputs every 5 a/).waitFor();

    const ladder = view.getByRole('form', { name: 'Warming ladder' });
    await ladder.getByLabel('From (K)').fill('1');
    await ladder.getByLabel('To (K)').fill('3');
    await ladder.getByLabel('Step (K)').fill('1');
    await ladder.getByLabel('By year (a)').fill('60');
    await ladder.getByRole('button', { name: 'Add ladder' }).click();
    await view.getByText('3 members (3 variants); at most 10,000.').waitFor();

    const started = Date.now();
    await view.getByRole('button', { name: 'Run experiment' }).click();
    await view.getByText('Finished: 3 of 3 done.').waitFor({ timeout: 90_000 });
    console.info(`three members ran in ${Date.now() - started} ms`);
    expect(requests.some((url) => /experimentMember\.worker/.test(url)), 'the member worker was loaded').toBe(true);

    const names = ['1_+1-K-by-year-60', '2_+2-K-by-year-60', '3_+3-K-by-year-60'];
    for (const title of ['Glacier length: 3 members', 'Ice volume: 3 members']) {
      const chart = view.getByRole('img', { name: title });
      const lines = chart.locator('path.member-line');
      await expect(lines.count()).resolves.toBe(3);
      for (const d of await lines.evaluateAll((paths) => paths.map((p) => p.getAttribute('d') ?? ''))) {
        // 0, 5, ..., 120: 25 outputs.
        expect(d).toMatch(/^M[\d.,-]+(L[\d.,-]+){24}$/);
      }
      await expect(lines.evaluateAll((paths) => paths.map((p) => p.getAttribute('data-member')))).resolves.toEqual(names);
    }
    await expect(view.getByRole('img', { name: /Glacier surface at the end of the run for 3 members/ }).locator('path.member-line').count()).resolves.toBe(3);
    const rows = view.getByRole('table').locator('tbody tr');
    await expect(rows.count()).resolves.toBe(3);
    await expect(rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-member')))).resolves.toEqual(names);

    const caution = view.getByRole('note');
    expect(await caution.isVisible()).toBe(true);
    expect(await caution.textContent()).toMatch(/not a hazard assessment/);

    await saveScreenshot(page, 'experiments-ladder');
    // The results column alone, at full resolution, to read the charts' labels.
    await saveElementScreenshot(view.locator('.experiments-results'), 'experiments-results');

    // Exports: the members' chart as SVG (one line per member in each panel) and the data ZIP.
    const exporter = view.getByRole('region', { name: 'Export the experiment' });
    const [chart] = await Promise.all([page.waitForEvent('download'), exporter.getByRole('button', { name: 'SVG' }).click()]);
    const svg = readFileSync(await chart.path(), 'utf8');
    expect(svg.match(/class="series series-length-/g)).toHaveLength(3);
    expect(svg.match(/class="series series-volume-/g)).toHaveLength(3);
    expect(svg).toContain('Model year (a)');
    const [archive] = await Promise.all([page.waitForEvent('download'), exporter.getByRole('button', { name: 'Experiment data (.zip)' }).click()]);
    const files = unzipSync(new Uint8Array(readFileSync(await archive.path())));
    const experimentCsv = strFromU8(files['experiment.csv']).trimEnd().split('\n');
    expect(experimentCsv[0]).toBe('variant,t_yr,volume_m3,area_m2,length_m,terminus_m');
    expect(new Set(experimentCsv.slice(1).map((l) => l.split(',')[0]))).toEqual(new Set(names));
    expect(strFromU8(files['outcomes.csv']).trimEnd().split('\n')).toHaveLength(4);
    expect(strFromU8(files['README.txt'])).toMatch(/not a hazard assessment/);

    // The experiment's numbers for the third member, to find again in the workbench.
    const cells = await rows.nth(2).locator('td').allTextContents();
    const headers = await view.getByRole('table').locator('thead th').allTextContents();
    const cell = (title: string) => cells[headers.findIndex((h) => h.startsWith(title)) - 1];
    const lengthEnd = Number(cell('Length at end (m)').replace(/[,\u2009]/g, ''));
    const volumeEnd = cell('Volume at end (km³)');

    // A member opened in the workbench runs there as the current scenario.
    await view.getByRole('button', { name: names[2] }).click();
    await page.getByText(/Member 3_\+3-K-by-year-60 is now the workbench scenario/).waitFor();
    expect(await page.getByRole('main', { name: 'Experiments' }).count()).toBe(0);
    await waitForStatus(page, /^Done: 120 years/);
    await saveScreenshot(page, 'experiments-member-in-workbench');
    // Deterministic: the workbench run ends where the experiment's member ended.
    const number = (label: string) => page.locator(`dd[data-number="${label}"]`).textContent();
    expect(await number('Model year')).toBe('120 a');
    expect(await number('Length')).toBe(`${(lengthEnd / 1000).toFixed(2)} km`);
    expect(await number('Volume')).toBe(`${volumeEnd} km³`);

    const origin = new URL(baseUrl).origin;
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('sweeps A across the ladder: nine members, a shaded min-max range per warming', async () => {
    const { page, errors } = session();
    await page.getByRole('button', { name: 'Experiments', exact: true }).click();
    const view = page.getByRole('main', { name: 'Experiments' });
    const sweep = view.getByRole('form', { name: 'Parameter sweep' });
    await sweep.getByLabel('From (Pa⁻³ s⁻¹)').fill('1.2e-24');
    await sweep.getByLabel('To (Pa⁻³ s⁻¹)').fill('4.8e-24');
    // 120 members: more than the page checks itself, so the validator runs in a worker.
    await sweep.getByLabel('Values (count)').fill('40');
    await sweep.getByRole('button', { name: 'Set sweep' }).click();
    await view.getByText('120 members (3 variants × 40 sweep values); at most 10,000.').waitFor();
    expect(session().requests.some((url) => /experimentCheck\.worker/.test(url)), 'the check worker was loaded').toBe(true);
    // The same parameter again replaces its values.
    await sweep.getByLabel('Values (count)').fill('3');
    await sweep.getByRole('button', { name: 'Set sweep' }).click();
    await view.getByText('9 members (3 variants × 3 sweep values); at most 10,000.').waitFor();
    await view.getByRole('button', { name: /^Run experiment/ }).click();
    await view.getByText('Finished: 9 of 9 done.').waitFor({ timeout: 90_000 });
    const length = view.getByRole('img', { name: 'Glacier length: 9 members' });
    await expect(length.locator('path.member-line').count()).resolves.toBe(9);
    await expect(length.locator('path.spread-band').count()).resolves.toBe(3);
    await expect(view.getByRole('table').locator('tbody tr').count()).resolves.toBe(9);
    await saveScreenshot(page, 'experiments-sweep');
    await saveElementScreenshot(view.locator('.experiments-results'), 'experiments-sweep-results');
    expect(errors).toEqual([]);
  });
});
