/**
 * Under the long profile: the switch for the steady-glacier preview and what it found, in words
 * (the dotted line on the profile is the same glacier). Announced politely to screen readers, so
 * an edit's consequence is heard without moving the focus from the field.
 */
import { useSteadyPreviewStore } from '../../state/steadyPreviewStore';
import { steadyPreviewText, type SteadyPreviewView } from './steadyPreviewText';
import './steadyPreview.css';

export function SteadyPreviewBar({ view }: { view: SteadyPreviewView }) {
  const enabled = useSteadyPreviewStore((s) => s.enabled);
  const setEnabled = useSteadyPreviewStore((s) => s.setEnabled);
  const text = steadyPreviewText(view);
  return (
    <div className="steady-preview" data-state={view.kind}>
      <label className="steady-preview-toggle">
        {/* "Show" beside the text it shows keeps the bar on one line; the full name is for screen readers. */}
        <input type="checkbox" checked={enabled} onChange={(e) => setEnabled(e.target.checked)} aria-label="Show the steady glacier for this climate" />
        Show
      </label>
      <p className="steady-preview-text" role="status" aria-live="polite" data-testid="steady-preview-text">
        {view.kind === 'glacier' && !view.glacier.iceFree && (
          <svg className="steady-preview-swatch" width="24" height="10" aria-hidden="true">
            <line x1="0" x2="24" y1="5" y2="5" />
          </svg>
        )}
        {text}
      </p>
    </div>
  );
}
