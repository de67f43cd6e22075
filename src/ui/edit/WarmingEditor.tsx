/** Warming dT(t): a curve the user can drag, presets (step, ramp then hold, ramp that keeps rising) and a table. */
import { useState } from 'react';
import type { Point } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from './commitEdit';
import { pointListRefusal } from './pointListRefusal';
import { CurveStrip } from './CurveStrip';
import { parseTypedNumber } from './parseTypedNumber';
import { PointTableEditor } from './PointTableEditor';
import { warmingPreset, type WarmingPreset } from './warmingPresets';
import { withKey } from './withKey';
import { NotApplied } from './NotApplied';

const PRESETS: { value: WarmingPreset; label: string }[] = [
  { value: 'step', label: 'Step' },
  { value: 'ramp-hold', label: 'Ramp, then hold' },
  { value: 'ramp-rising', label: 'Ramp that keeps rising' },
];

export function WarmingEditor() {
  const warming = useScenarioStore((s) => s.scenario.warming);
  const years = useScenarioStore((s) => s.scenario.run.years);
  const [kelvin, setKelvin] = useState('2');
  const [ramp, setRamp] = useState('100');
  const [error, setError] = useState<string | null>(null);

  function commit(points: Point[] | undefined, label: string) {
    const s = useScenarioStore.getState().scenario;
    const result = commitEdit(withKey(s, 'warming', points), label);
    setError(pointListRefusal(result, '/warming', [{ unit: 'a' }, { unit: 'K' }]));
  }
  function applyPreset(preset: WarmingPreset) {
    const k = parseTypedNumber(kelvin);
    const r = parseTypedNumber(ramp);
    if (!k.ok) return setError(`Warming: ${k.message}`);
    if (!r.ok) return setError(`Ramp length: ${r.message}`);
    if (preset !== 'step' && !(r.value > 0)) return setError(`Ramp length: ${r.value} is not allowed; the ramp must last more than 0 years`);
    commit(warmingPreset(preset, k.value, r.value, years), `Warming: ${PRESETS.find((p) => p.value === preset)?.label.toLowerCase()}`);
  }

  return (
    <fieldset className="param-group">
      <legend>Warming</legend>
      <p className="field-help">Air-temperature change dT(t) from the year-0 climate, −50 to 50 K; held constant beyond the first and last point.</p>
      {warming ? (
        <>
          <CurveStrip
            title="Warming through time"
            pointName="Warming point"
            points={warming}
            xDomain={[0, years]}
            xLabel="Year (a)"
            yLabel="dT (K)"
            xUnit="a"
            yUnit="K"
            xStep={1}
            yStep={0.1}
            width={420}
            height={180}
            onCommit={commit}
          />
          <details>
            <summary>Warming points as a table</summary>
            <PointTableEditor
              caption="Warming"
              columns={[{ label: 'Year', unit: 'a' }, { label: 'dT', unit: 'K' }]}
              points={warming}
              path="/warming"
              build={(s, points) => ({ ...s, warming: points })}
              minPoints={1}
              addStep={50}
            />
          </details>
          <button type="button" onClick={() => commit(undefined, 'No warming')}>
            No warming
          </button>
        </>
      ) : (
        <p>No warming: the climate of year 0 throughout.</p>
      )}
      <div className="preset-row">
        <label>
          Warming <input type="text" inputMode="decimal" aria-label="Warming amount (K)" value={kelvin} onChange={(e) => setKelvin(e.target.value)} size={5} /> K
        </label>
        <label>
          over <input type="text" inputMode="decimal" aria-label="Ramp length (a)" value={ramp} onChange={(e) => setRamp(e.target.value)} size={5} /> a
        </label>
      </div>
      <div className="preset-row" role="group" aria-label="Warming presets">
        {PRESETS.map((p) => (
          <button key={p.value} type="button" onClick={() => applyPreset(p.value)}>
            {p.label}
          </button>
        ))}
      </div>
      <NotApplied message={error} />
    </fieldset>
  );
}
