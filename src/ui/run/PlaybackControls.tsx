/** Play/pause through the output frames, a model-year slider and the playback speed. */
import { useId } from 'react';
import { PLAYBACK_SPEEDS, usePlaybackStore } from '../../state/playbackStore';
import { useRunStore } from '../../state/runStore';

export function PlaybackControls() {
  const sliderId = useId();
  const speedId = useId();
  const frames = useRunStore((s) => s.frames);
  const years = useRunStore((s) => s.years);
  const index = usePlaybackStore((s) => s.index);
  const playing = usePlaybackStore((s) => s.playing);
  const fps = usePlaybackStore((s) => s.fps);
  const thinning = useRunStore((s) => s.thinning);
  const { seek, toggle, setFps } = usePlaybackStore.getState();
  if (frames.length === 0) return null;
  const shown = Math.min(index, frames.length - 1);
  const time = frames[shown].time;

  return (
    <section className="playback" aria-label="Playback">
      <button type="button" onClick={toggle} disabled={frames.length < 2} aria-keyshortcuts="Space">
        {playing ? 'Pause playback' : 'Play'}
      </button>
      {/* The year beside the slider says what it sets; the label names it for screen readers. */}
      <label htmlFor={sliderId} className="slider-label visually-hidden">
        Model year
      </label>
      <input
        id={sliderId}
        type="range"
        min={0}
        max={frames.length - 1}
        step={1}
        value={shown}
        aria-valuetext={`Year ${time}`}
        onChange={(e) => {
          usePlaybackStore.getState().pause();
          seek(Number(e.target.value));
        }}
      />
      <output htmlFor={sliderId} className="year-output">
        {`Year ${time} of ${years} a`}
      </output>
      <span className="speed-choice">
        <label htmlFor={speedId}>Speed</label>
        <select id={speedId} value={fps} onChange={(e) => setFps(Number(e.target.value))}>
          {PLAYBACK_SPEEDS.map((s) => (
            <option key={s} value={s}>
              {`${s} output${s === 1 ? '' : 's'} / s`}
            </option>
          ))}
        </select>
      </span>
      {thinning > 1 && (
        <p className="thinning-note" role="note">
          {`To stay within memory, every ${thinning}th output of this long run is kept for viewing (the first and the latest always).`}
        </p>
      )}
    </section>
  );
}
