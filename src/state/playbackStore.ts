/**
 * Which output frame every view shows, and playback through the frames. While a run is going the
 * views follow the newest frame until the user seeks or plays; playback advances on animation
 * frames at a chosen number of output frames per second.
 */
import { create } from 'zustand';
import { useRunStore } from './runStore';

export const PLAYBACK_SPEEDS = [1, 2, 5, 10, 20] as const;

type FrameCallback = (now: number) => void;
interface AnimationSource {
  request: (callback: FrameCallback) => number;
  cancel: (handle: number) => void;
}

let animation: AnimationSource = {
  request: (cb) => requestAnimationFrame(cb),
  cancel: (h) => cancelAnimationFrame(h),
};

/** Tests drive playback with their own clock. */
export function setAnimationSource(source: AnimationSource): void {
  animation = source;
}

export interface PlaybackState {
  /** Index into runStore.frames. */
  index: number;
  playing: boolean;
  /** Output frames per second. */
  fps: number;
  /** Show the newest frame as frames arrive. */
  follow: boolean;
  /** A model year to show once a run reaches it (restored with a project). */
  pendingTime: number | null;
  seek: (index: number) => void;
  stepBy: (delta: number) => void;
  play: () => void;
  pause: () => void;
  toggle: () => void;
  setFps: (fps: number) => void;
  setPendingTime: (time: number | null) => void;
}

let handle: number | undefined;
let lastTick: number | undefined;
let carried = 0;

function stopLoop() {
  if (handle !== undefined) animation.cancel(handle);
  handle = undefined;
  lastTick = undefined;
  carried = 0;
}

export const usePlaybackStore = create<PlaybackState>()((set, get) => {
  const tick: FrameCallback = (now) => {
    handle = undefined;
    const { playing, fps, index } = get();
    if (!playing) return;
    const last = useRunStore.getState().frames.length - 1;
    carried += lastTick === undefined ? 0 : ((now - lastTick) / 1000) * fps;
    lastTick = now;
    const advance = Math.floor(carried);
    carried -= advance;
    const next = Math.min(last, index + advance);
    if (next !== index) set({ index: next });
    if (next >= last && useRunStore.getState().status === 'done') {
      set({ playing: false, follow: true });
      stopLoop();
      return;
    }
    handle = animation.request(tick);
  };

  return {
    index: 0,
    playing: false,
    fps: 5,
    follow: true,
    pendingTime: null,
    seek(index) {
      const last = useRunStore.getState().frames.length - 1;
      const clamped = Math.max(0, Math.min(last, Math.round(index)));
      set({ index: clamped, follow: clamped === last && !get().playing });
    },
    stepBy(delta) {
      get().pause();
      get().seek(get().index + delta);
    },
    play() {
      const frames = useRunStore.getState().frames.length;
      if (frames < 2) return;
      // From the end, play starts again at the beginning.
      const index = get().index >= frames - 1 ? 0 : get().index;
      set({ playing: true, follow: false, index });
      stopLoop();
      handle = animation.request(tick);
    },
    pause() {
      stopLoop();
      if (get().playing) set({ playing: false });
    },
    toggle() {
      if (get().playing) get().pause();
      else get().play();
    },
    setFps(fps) {
      set({ fps });
    },
    setPendingTime(time) {
      set({ pendingTime: time });
    },
  };
});

// Follow the run: a new run starts at its first frame; new frames are shown while following;
// a restored model year is shown as soon as the run reaches it.
useRunStore.subscribe((state, previous) => {
  if (state.frames === previous.frames) return;
  // Another run's frames (or none): start again from its first frame, following.
  if (state.frames.length === 0 || state.frames[0] !== previous.frames[0]) {
    usePlaybackStore.getState().pause();
    usePlaybackStore.setState({ index: 0, follow: true });
    if (state.frames.length === 0) return;
  }
  const playback = usePlaybackStore.getState();
  const last = state.frames.length - 1;
  if (state.thinning !== previous.thinning && !playback.follow) {
    // Frames were thinned: stay on the same model year (or the next one kept).
    const time = previous.frames[Math.min(playback.index, previous.frames.length - 1)]?.time ?? 0;
    const same = state.frames.findIndex((f) => f.time >= time - 1e-9);
    usePlaybackStore.setState({ index: same >= 0 ? same : last });
    return;
  }
  if (playback.pendingTime !== null) {
    const reached = state.frames.findIndex((f) => f.time >= playback.pendingTime! - 1e-9);
    if (reached >= 0) {
      usePlaybackStore.setState({ index: reached, follow: false, pendingTime: null });
      return;
    }
  }
  if (playback.follow) usePlaybackStore.setState({ index: last });
});

/** The frame every view shows, or undefined before any frame. */
export function useCurrentFrame() {
  const index = usePlaybackStore((s) => s.index);
  return useRunStore((s) => s.frames[Math.min(index, s.frames.length - 1)]);
}
