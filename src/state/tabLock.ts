/**
 * Keeps two tabs of the same browser from silently overwriting one project. Each tab says which
 * project it opened; a tab already saving that project answers, and the newcomer stops saving
 * (read-only) until the user chooses to take over, which makes the other tab read-only instead.
 * BroadcastChannel reaches every same-origin tab; a browser without it gets no lock (one tab).
 */

export type TabMessage =
  | { type: 'hello'; tab: string; project: string }
  | { type: 'holding'; tab: string; project: string }
  | { type: 'take-over'; tab: string; project: string };

/** The part of a BroadcastChannel the lock uses; tests pass a fake. */
export interface ChannelLike {
  postMessage(message: TabMessage): void;
  onmessage: ((event: MessageEvent<TabMessage>) => void) | null;
  close(): void;
}

export interface TabLockEvents {
  /** Another tab is saving `project`: this tab must not. */
  heldElsewhere(project: string): void;
  /** Another tab took `project` over: this tab must stop saving it. */
  takenOver(project: string): void;
}

export interface TabLock {
  /** This tab opened `project` and means to save it. */
  announce(project: string): void;
  /** Saves from this tab win from now on; the other tab is told. */
  takeOver(): void;
  /** Whether this tab may save `project`. */
  holds(project: string): boolean;
  close(): void;
}

export const TAB_CHANNEL_NAME = 'firnline-projects';

export function createTabLock(channel: ChannelLike, events: TabLockEvents, tab: string = crypto.randomUUID()): TabLock {
  let current: string | null = null;
  let holding: string | null = null;
  channel.onmessage = ({ data }) => {
    if (!data || typeof data !== 'object' || data.tab === tab || typeof data.project !== 'string') return;
    if (data.type === 'hello' && holding === data.project) {
      channel.postMessage({ type: 'holding', tab, project: data.project });
    } else if (data.type === 'holding' && current === data.project && holding === data.project) {
      holding = null;
      events.heldElsewhere(data.project);
    } else if (data.type === 'take-over' && holding === data.project) {
      holding = null;
      events.takenOver(data.project);
    }
  };
  return {
    announce(project) {
      current = project;
      holding = project;
      channel.postMessage({ type: 'hello', tab, project });
    },
    takeOver() {
      if (current === null) return;
      holding = current;
      channel.postMessage({ type: 'take-over', tab, project: current });
    },
    holds: (project) => holding === project,
    close() {
      channel.onmessage = null;
      channel.close();
    },
  };
}

/** The browser's channel, or null where BroadcastChannel does not exist. */
export function browserTabChannel(): ChannelLike | null {
  if (typeof BroadcastChannel !== 'function') return null;
  const channel = new BroadcastChannel(TAB_CHANNEL_NAME);
  // Node (the unit tests) has BroadcastChannel too; there it must not keep the process alive.
  (channel as { unref?: () => void }).unref?.();
  return channel as ChannelLike;
}
