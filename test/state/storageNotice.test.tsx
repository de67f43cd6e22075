// @vitest-environment jsdom
/**
 * IndexedDB missing or full: the app says so, keeps the work open in memory, and offers the
 * open scenario as a file that validates and reopens as the same scenario.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { validateScenario } from '../../src/scenario/validateScenario';
import {
  MEMORY_ONLY_WARNING,
  STORAGE_FULL_WARNING,
  memoryStorage,
  openStorage,
  type KeyValueStorage,
} from '../../src/state/persistence';
import { AUTOSAVE_DELAY_MS, type ProjectStore } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { scenarioFileName } from '../../src/ui/app/downloadScenario';
import { ProjectsContext } from '../../src/ui/projects/ProjectsContext';
import { StorageNotice } from '../../src/ui/StorageNotice';
import { resetStores, testProjects } from '../helpers/resetStores';

const quotaError = () => new DOMException('The quota has been exceeded.', 'QuotaExceededError');

/** Memory storage that refuses every write once `full` is set. */
function fillableStorage() {
  const inner = memoryStorage();
  const state = { full: false };
  const storage: KeyValueStorage = {
    get: (key) => inner.get(key),
    async set(key, value) {
      if (state.full) throw quotaError();
      await inner.set(key, value);
    },
    del: (key) => inner.del(key),
    async replace(entries) {
      if (state.full) throw quotaError();
      return inner.replace(entries);
    },
    async update(key, change) {
      if (state.full) throw quotaError();
      return inner.update(key, change);
    },
  };
  return { storage, state };
}

/** Captures what a click on "Save scenario file" downloads. */
function captureDownloads() {
  const files: { name: string; blob: Blob }[] = [];
  const blobs = new Map<string, Blob>();
  URL.createObjectURL = vi.fn((blob: Blob) => {
    const url = `blob:test/${blobs.size}`;
    blobs.set(url, blob);
    return url;
  });
  URL.revokeObjectURL = vi.fn();
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    files.push({ name: this.download, blob: blobs.get(this.href)! });
  });
  return files;
}

let projects: ProjectStore;

/** Projects over `storage`, opened, and the notice showing them. */
async function openWithNotice(storage: KeyValueStorage, warning: string | null) {
  projects = testProjects(storage, { warning });
  await projects.getState().init();
  render(
    <ProjectsContext.Provider value={projects}>
      <StorageNotice />
    </ProjectsContext.Provider>,
  );
}

beforeEach(resetStores);
afterEach(() => {
  cleanup();
  vi.useRealTimers();
  vi.restoreAllMocks();
});

describe('storage missing or full', () => {
  it('opens in memory with the "full" warning when even the first write is refused', async () => {
    const { storage, state } = fillableStorage();
    state.full = true;
    const opened = await openStorage(() => storage);
    expect(opened.warning).toBe(STORAGE_FULL_WARNING);
    await opened.storage.set('k', 1);
    expect(await opened.storage.get('k')).toBe(1);
  });

  it('without IndexedDB: warns, keeps working in memory, and offers the scenario as a file', async () => {
    const opened = await openStorage();
    expect(opened.warning).toBe(MEMORY_ONLY_WARNING);
    await openWithNotice(opened.storage, opened.warning);
    const files = captureDownloads();
    expect(screen.getByRole('alert').textContent).toContain('projects last only until this tab is closed');
    fireEvent.click(screen.getByRole('button', { name: 'Save scenario file' }));
    expect(files).toHaveLength(1);
    expect(files[0].name).toBe(scenarioFileName(demoScenario));
    const checked = validateScenario(JSON.parse(await files[0].blob.text()));
    expect(checked.ok && checked.scenario).toEqual(demoScenario);
  });

  it('when storage fills up mid-session: says it is full, keeps the edit, and downloads the edited scenario', async () => {
    vi.useFakeTimers();
    const { storage, state } = fillableStorage();
    await openWithNotice(storage, null);
    expect(screen.queryByRole('alert')).toBeNull();
    state.full = true;
    const edited = { ...demoScenario, name: 'Edited after full', run: { years: 120, outputEvery: 10 } };
    await act(async () => {
      useScenarioStore.getState().apply(edited, 'Set run length');
      await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10);
    });
    expect(screen.getByRole('alert').textContent).toMatch(/^Saving the project failed: the browser's storage for this site is full \(QuotaExceededError\)\. Your work is still open in this tab/);
    expect(useScenarioStore.getState().scenario).toEqual(edited);
    const files = captureDownloads();
    fireEvent.click(screen.getByRole('button', { name: 'Save scenario file' }));
    expect(files[0].name).toBe('Edited-after-full.json');
    expect(JSON.parse(await files[0].blob.text())).toEqual(edited);
  });
});
