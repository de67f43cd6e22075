/**
 * Faults in headless Chromium, each injected from the test: the browser's storage filling up
 * after the app has opened, the model worker crashing in the middle of a run, and a stored
 * project whose latest version is broken. In each case the user is told what happened in words,
 * and the app keeps working.
 */
import { readFile } from 'node:fs/promises';
import { afterEach, beforeEach, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import demo from '../../examples/demo-valley.json';
import { openBrowser, saveScreenshot, type BrowserSession, waitForStatus, waitForProject, showView } from './browser';

const baseUrl = inject('baseUrl');
const AUTOSAVE_DELAY_MS = 500;

declare global {
  interface Window {
    /** Flipped by the test: from then on every IndexedDB write fails as if the disk were full. */
    __storageFull: boolean;
    /** Every Worker the page has created, oldest first. */
    __workers: Worker[];
  }
}

/** Makes IDBObjectStore put/add throw a QuotaExceededError while window.__storageFull is set. */
function injectQuotaFault() {
  window.__storageFull = false;
  for (const method of ['put', 'add'] as const) {
    const original = IDBObjectStore.prototype[method];
    IDBObjectStore.prototype[method] = function (this: IDBObjectStore, ...args: Parameters<typeof original>) {
      if (window.__storageFull) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
      return original.apply(this, args);
    } as typeof original;
  }
}

/** Keeps a handle on every Worker the page creates, so the test can make one fail. */
function recordWorkers() {
  window.__workers = [];
  const Original = window.Worker;
  class RecordedWorker extends Original {
    constructor(url: string | URL, options?: WorkerOptions) {
      super(url, options);
      window.__workers.push(this);
    }
  }
  window.Worker = RecordedWorker;
}

async function openApp(page: Page) {
  await page.goto(baseUrl, { waitUntil: 'load' });
  await waitForProject(page, demo.name);
  await page.getByRole('tab', { name: 'Climate and run' }).click();
}

const elaField = (page: Page) => page.getByLabel('ELA', { exact: true });

async function setEla(page: Page, value: number) {
  await elaField(page).fill(String(value));
  await elaField(page).press('Enter');
}

const statusText = (page: Page) => page.locator('.run-status .status').textContent();


/** Reads a key of the app's own database ('firnline', store 'projects'). */
function readStored(page: Page, key: string) {
  return page.evaluate(
    (k) =>
      new Promise<unknown>((resolve, reject) => {
        const open = indexedDB.open('firnline');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const request = open.result.transaction('projects', 'readonly').objectStore('projects').get(k);
          request.onsuccess = () => {
            open.result.close();
            resolve(request.result);
          };
          request.onerror = () => reject(request.error);
        };
      }),
    key,
  );
}

function writeStored(page: Page, key: string, value: unknown) {
  return page.evaluate(
    ([k, v]) =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open('firnline');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const tx = open.result.transaction('projects', 'readwrite');
          tx.objectStore('projects').put(v, k as string);
          tx.oncomplete = () => {
            open.result.close();
            resolve();
          };
          tx.onerror = () => reject(tx.error);
        };
      }),
    [key, value] as const,
  );
}

/** A record shaped like a saved project whose scenario no longer validates. */
const BROKEN_RECORD = { scenario: { format: 'firnline-scenario', version: 1, name: 'broken', grid: 'not a grid' }, time: null };

describe('faults in headless Chromium', () => {
  let session: BrowserSession;

  beforeEach(async () => {
    // A fresh profile per case: each starts from an empty IndexedDB.
    session = await openBrowser();
  });

  afterEach(async () => {
    await session?.close();
  });

  it('warns when storage is full, keeps the edit and runs, and offers the scenario as a file', async () => {
    const { page } = session;
    await page.addInitScript(injectQuotaFault);
    await openApp(page);
    expect(await page.locator('.storage-notice').count()).toBe(0);
    const before = Number(await elaField(page).inputValue());

    await page.evaluate(() => (window.__storageFull = true));
    const edited = before + 37;
    await setEla(page, edited);
    await page.waitForTimeout(AUTOSAVE_DELAY_MS * 3);

    const notice = page.locator('.storage-notice');
    await notice.waitFor();
    expect(await notice.getAttribute('role')).toBe('alert');
    const text = await notice.textContent();
    expect(text).toContain('Saving the project failed');
    expect(text).toContain("the browser's storage for this site is full (QuotaExceededError)");
    expect(text).toContain('Your work is still open in this tab');
    // The edit is still in the editor, not rolled back to what storage holds.
    expect(Number(await elaField(page).inputValue())).toBe(edited);

    // The model does not need storage: a run still completes.
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done: 300 years, 61 outputs/);
    expect(Number(await elaField(page).inputValue())).toBe(edited);
    await saveScreenshot(page, 'fault-storage-full');

    // The way out: the notice's own button downloads the scenario, with the edit in it.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      notice.getByRole('button', { name: 'Save scenario file' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.json$/);
    const path = await download.path();
    const file = JSON.parse(await readFile(path, 'utf8'));
    expect(file.format).toBe('firnline-scenario');
    expect(file.name).toBe(demo.name);
    expect(JSON.stringify(file)).toContain(String(edited));
    expect(JSON.stringify(demo)).not.toContain(String(edited));
  });

  it('tells the user when the model worker crashes mid-run, keeps the frames, and runs again in a fresh worker', async () => {
    const { page, errors } = session;
    await page.addInitScript(recordWorkers);
    await openApp(page);

    // Stepping holds the run between outputs: a deterministic point in the middle of a run.
    await page.getByRole('button', { name: 'Step one output' }).click();
    await waitForStatus(page, /^Paused at year 0\.$/);
    await page.getByRole('button', { name: 'Step one output' }).click();
    await waitForStatus(page, /^Paused at year 5\.$/);
    expect(await page.locator('[data-layer="model-year"]').textContent()).toBe('Year 5');
    const terminusBefore = await page.locator('svg.long-profile [data-layer="terminus"] text').textContent();
    expect(terminusBefore).toMatch(/^Terminus \d+\.\d\d km$/);
    const workersBefore = await page.evaluate(() => window.__workers.length);
    expect(workersBefore).toBeGreaterThanOrEqual(1);

    // The worker fails the way a crashed one does: an error event on the Worker object.
    await page.evaluate(() => {
      const worker = window.__workers.at(-1)!;
      worker.dispatchEvent(new ErrorEvent('error', { message: 'simulated crash in the flowline worker' }));
    });

    const notice = page.locator('.run-controls .notice');
    await notice.waitFor();
    expect(await notice.getAttribute('role')).toBe('alert');
    expect(await notice.textContent()).toBe(
      'The model stopped unexpectedly (simulated crash in the flowline worker). Your project is unchanged; frames computed so far are kept. Press Run to try again.',
    );
    expect(await statusText(page)).toMatch(/^The run failed: The model stopped unexpectedly .*\. 2 outputs before it are kept\.$/);
    // What was shown stays on screen.
    expect(await page.locator('[data-layer="model-year"]').textContent()).toBe('Year 5');
    expect(await page.locator('svg.long-profile [data-layer="terminus"] text').textContent()).toBe(terminusBefore);
    await saveScreenshot(page, 'fault-worker-crash');

    // Run again gets a new worker, and it finishes.
    await page.getByRole('button', { name: 'Run again', exact: true }).click();
    await waitForStatus(page, /^Done: 300 years, 61 outputs/);
    expect(await page.evaluate(() => window.__workers.length)).toBe(workersBefore + 1);
    expect(await page.locator('[data-layer="model-year"]').textContent()).toBe('Year 300');
    await saveScreenshot(page, 'fault-worker-crash-rerun');
    expect(errors).toEqual([]);
  });

  it('opens the previous version when the latest saved version is corrupt, and says so', async () => {
    const { page } = session;
    await openApp(page);
    const original = Number(await elaField(page).inputValue());
    const edited = original + 53;
    await setEla(page, edited);
    await page.waitForTimeout(AUTOSAVE_DELAY_MS * 3);

    const id = (await readStored(page, 'current')) as string;
    const head = (await readStored(page, `head:${id}`)) as { current: string; previous: string | null };
    // The autosave made a second version; the first is kept as the previous one.
    expect(head.current).not.toBe(`project:${id}`);
    expect(head.previous).toBe(`project:${id}`);
    await writeStored(page, head.current, BROKEN_RECORD);

    await page.reload({ waitUntil: 'load' });
    await waitForProject(page, demo.name);
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    const alert = page.locator('.app-header .project-notice .notice-text');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(
      new RegExp(`^The latest save of "${demo.name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}" could not be used \\(its saved scenario is not valid \\(.+\\)\\); the previous saved version was opened instead\\.$`),
    );
    expect(Number(await elaField(page).inputValue())).toBe(original);
    // Still the one project, and it works: a run completes.
    expect(await page.getByRole('button', { name: `Open ${demo.name}` }).count()).toBe(1);
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await waitForStatus(page, /^Done: 300 years, 61 outputs/);
    await saveScreenshot(page, 'fault-corrupt-latest');
  });

  it('opens without crashing when the only saved version is corrupt, leaves it as it was, and says so', async () => {
    const { page, errors } = session;
    await openApp(page);
    const id = (await readStored(page, 'current')) as string;
    const head = (await readStored(page, `head:${id}`)) as { current: string; previous: string | null };
    expect(head).toEqual({ current: `project:${id}`, previous: null });
    await writeStored(page, head.current, BROKEN_RECORD);

    await page.reload({ waitUntil: 'load' });
    const alert = page.locator('.app-header .project-notice .notice-text');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(
      /^Project ".+" could not be opened: its saved scenario is not valid \(.+\)\. It is left as it was\.$/,
    );
    // The broken project stays in the list, untouched; a fresh demo project, under a name of its
    // own, is open beside it.
    await showView(page, 'Projects');
    await expect.poll(() => page.getByRole('button', { name: 'Open Demo 2' }).count()).toBe(1);
    expect(await page.getByRole('button', { name: `Open ${demo.name}` }).count()).toBe(1);
    expect(await readStored(page, head.current)).toEqual(BROKEN_RECORD);
    expect(await readStored(page, 'current')).not.toBe(id);
    await page.getByRole('tab', { name: 'Climate and run' }).click();
    expect(Number(await elaField(page).inputValue())).toBeGreaterThan(0);
    await saveScreenshot(page, 'fault-corrupt-only-version');
    expect(errors).toEqual([]);
  });
});
