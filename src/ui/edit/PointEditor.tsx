/** The selected profile point as typed values, with buttons to step through, insert and delete points. */
import { useEffect, useState } from 'react';
import { useEditorStore } from '../../state/editorStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { parseTypedNumber } from './parseTypedNumber';
import { capitalised, deletePoint, insertPointAt, setPoint } from './pointEditActions';
import { MIN_POINTS, profileTargetPoints, TARGET_NAMES } from './profileTargetPoints';
import { NotApplied } from './NotApplied';

export function PointEditor() {
  const scenario = useScenarioStore((s) => s.scenario);
  // Not the stroke or drag preview, which change with every pointer move.
  const target = useEditorStore((s) => s.target);
  const selected = useEditorStore((s) => s.selected);
  const { select } = useEditorStore.getState();
  const points = profileTargetPoints(scenario, target);
  const index = selected !== null && selected < points.length ? selected : null;
  const point = index !== null ? points[index] : null;
  const [xText, setXText] = useState('');
  const [zText, setZText] = useState('');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setXText(point ? String(Number((point[0] / 1000).toFixed(4))) : '');
    setZText(point ? String(Number(point[1].toFixed(1))) : '');
    setError(null);
  }, [point]);

  function commit() {
    if (index === null || !point) return;
    const x = parseTypedNumber(xText);
    const z = parseTypedNumber(zText);
    if (!x.ok) return setError(`Distance: ${x.message}`);
    if (!z.ok) return setError(`Elevation: ${z.message}`);
    if (x.value * 1000 === point[0] && z.value === point[1]) return;
    setError(null);
    setPoint(target, index, [x.value * 1000, z.value]);
  }
  const name = TARGET_NAMES[target];

  return (
    <div className="point-editor" role="group" aria-label={`Selected ${name} point`}>
      <p>
        {index === null ? `No ${name} point selected (${points.length} points).` : `${capitalised(name)} point ${index + 1} of ${points.length}`}
      </p>
      <div className="preset-row">
        <button type="button" onClick={() => select(index === null ? 0 : Math.max(0, index - 1))}>
          Previous point
        </button>
        <button type="button" onClick={() => select(index === null ? 0 : Math.min(points.length - 1, index + 1))}>
          Next point
        </button>
      </div>
      {index !== null && (
        <>
          <div className="preset-row">
            <label>
              Distance <input type="text" inputMode="decimal" aria-label="Distance (km)" size={7} value={xText} onChange={(e) => setXText(e.target.value)} onBlur={commit} onKeyDown={(e) => e.key === 'Enter' && commit()} /> km
            </label>
            <label>
              Elevation <input type="text" inputMode="decimal" aria-label="Elevation (m a.s.l.)" size={7} value={zText} onChange={(e) => setZText(e.target.value)} onBlur={commit} onKeyDown={(e) => e.key === 'Enter' && commit()} /> m a.s.l.
            </label>
          </div>
          <p className="field-help">The distance stays between the neighbouring points.</p>
          <div className="preset-row">
            <button type="button" onClick={() => insertPointAt(target, { after: index })}>
              Insert point after
            </button>
            <button type="button" disabled={points.length <= MIN_POINTS[target]} onClick={() => deletePoint(target, index)}>
              Delete point
            </button>
          </div>
        </>
      )}
      <NotApplied message={error} />
    </div>
  );
}
