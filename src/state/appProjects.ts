/**
 * The app's projects, wired to the browser in this one place: IndexedDB through idb-keyval (or
 * memory with a warning), the BroadcastChannel to other tabs, the page's hide events and the
 * page's own stores. Nothing is opened until init() is called (App does, once).
 */
import { browserPageEvents } from './autosave';
import { openStorage } from './persistence';
import { createProjects } from './projectStore';
import { storeWorkspace } from './projectWorkspace';
import { browserTabChannel } from './tabLock';

export const appProjects = createProjects({
  storage: () => openStorage(),
  tabs: browserTabChannel,
  page: browserPageEvents(),
  workspace: storeWorkspace(),
});
