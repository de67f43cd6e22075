/**
 * Headless system Chromium for the end-to-end tests: a fresh throw-away profile per session,
 * every request URL and console error recorded, and screenshots saved under test-results/.
 */
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

export const CHROMIUM_PATH = '/usr/bin/chromium';
export const VIEWPORT = { width: 1280, height: 800 };

// No sandbox: the tests run as root in a container. The rest keeps Chromium from reaching
// out to Google services, so the request log holds only what the page itself asked for.
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

const SCREENSHOT_DIR = fileURLToPath(new URL('../../test-results/screenshots/', import.meta.url));

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** URL of every request the page made, in order. */
  requests: string[];
  /** Console errors and uncaught page errors, e.g. CSP violations. */
  errors: string[];
  close(): Promise<void>;
}

export async function openBrowser(): Promise<BrowserSession> {
  const userDataDir = await mkdtemp(join(tmpdir(), 'firnline-e2e-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: VIEWPORT,
    deviceScaleFactor: 1,
  });
  const requests: string[] = [];
  const errors: string[] = [];
  context.on('request', (request) => requests.push(request.url()));
  const page = context.pages()[0] ?? (await context.newPage());
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));

  return {
    context,
    page,
    requests,
    errors,
    async close() {
      await context.close();
      await rm(userDataDir, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot as test-results/screenshots/NAME.png and returns its path. */
export async function saveScreenshot(page: Page, name: string): Promise<string> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const path = join(SCREENSHOT_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Saves a screenshot of one element (a panel, a plot) as test-results/screenshots/NAME.png. */
export async function saveElementScreenshot(locator: Locator, name: string): Promise<string> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const path = join(SCREENSHOT_DIR, `${name}.png`);
  await locator.screenshot({ path });
  return path;
}

/**
 * One browser for the enclosing describe block: opened before its tests, closed after them.
 * Call it inside `describe`; the returned function gives the session within the tests.
 */
export function sharedBrowser(): () => BrowserSession {
  let session: BrowserSession | undefined;
  beforeAll(async () => {
    session = await openBrowser();
  });
  afterAll(async () => {
    await session?.close();
  });
  return () => {
    if (!session) throw new Error('the browser session is not open (sharedBrowser must be called inside describe)');
    return session;
  };
}

/** Waits until the run status line matches `pattern`; on timeout says what it read instead. */
export async function waitForStatus(page: Page, pattern: RegExp, timeout = 60_000): Promise<void> {
  try {
    await page.waitForFunction(
      (source) => new RegExp(source).test(document.querySelector('.run-status .status')?.textContent ?? ''),
      pattern.source,
      { timeout },
    );
  } catch (error) {
    const shown = await page.locator('.run-status .status').textContent();
    throw new Error(`status never matched ${pattern}; it reads "${shown}"`, { cause: error });
  }
}

/** The supporting views behind the tabs under the long profile. */
export type WorkbenchView = 'Numbers' | 'Speed and stress' | 'Through time' | 'Analyses' | 'Export' | 'Projects' | 'Summary';

/** Shows one of the workbench's supporting views (the tab strip under the long profile). */
export async function showView(page: Page, name: WorkbenchView): Promise<void> {
  await page.getByRole('tablist', { name: 'Results and tools' }).getByRole('tab', { name, exact: true }).click();
}

/** Waits until the saved projects are open and the named one is listed; leaves the Projects tab shown. */
export async function waitForProject(page: Page, name: string, options: { timeout?: number } = {}): Promise<void> {
  await showView(page, 'Projects');
  await page.getByRole('button', { name: `Open ${name}` }).first().waitFor(options);
}
