/** Initial ice surface: start ice-free, or fill the valley with a perfectly plastic glacier (Nye 1952). */
import { useState } from 'react';
import { DEFAULT_ICE_DENSITY } from '../../model/units';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { DEFAULT_YIELD_STRESS, plasticProfile } from './geometry/plasticProfile';
import { LocalNumberInput } from './LocalNumberInput';
import { readFormNumbers } from './readFormNumbers';
import { withKey } from './withKey';
import { NotApplied } from './NotApplied';

export function SurfaceTools() {
  const hasSurface = useScenarioStore((s) => s.scenario.surface !== undefined);
  const length = useScenarioStore((s) => s.scenario.grid.length);
  const [yieldKPa, setYieldKPa] = useState(String(DEFAULT_YIELD_STRESS / 1000));
  const [terminusKm, setTerminusKm] = useState(() => String(Number(((length * 0.7) / 1000).toFixed(2))));
  const [message, setMessage] = useState<string | null>(null);

  function fillPlastic() {
    const read = readFormNumbers({
      tau: { label: 'Yield stress', unit: 'kPa', text: yieldKPa, min: 0, above: true, max: 1000 },
      terminus: { label: 'Terminus position', unit: 'km', text: terminusKm, min: 0, above: true, max: length / 1000 },
    });
    if (!read.ok) return setMessage(read.errors.join('; '));
    const s = useScenarioStore.getState().scenario;
    const surface = plasticProfile({
      bed: s.bed,
      lengthM: s.grid.length,
      terminusM: read.values.terminus * 1000,
      yieldStress: read.values.tau * 1000,
      density: s.ice.density ?? DEFAULT_ICE_DENSITY,
    });
    const result = commitEdit({ ...s, surface }, `Plastic ice surface (${read.values.tau} kPa)`);
    setMessage(refusalAt(result));
  }

  return (
    <fieldset className="param-group">
      <legend>Initial ice</legend>
      <button
        type="button"
        disabled={!hasSurface}
        onClick={() => commitEdit(withKey(useScenarioStore.getState().scenario, 'surface', undefined), 'Start ice-free')}
      >
        Start ice-free
      </button>
      <p className="field-help">Or draw the surface on the profile, or fill the valley with a perfectly plastic glacier:</p>
      <LocalNumberInput label="Yield stress" unit="kPa" value={yieldKPa} onChange={setYieldKPa}
        help="Basal shear stress of a perfectly plastic glacier; 100 kPa is usual (Nye 1952; common practice), 50–150 kPa observed." />
      <LocalNumberInput label="Terminus position" unit="km" value={terminusKm} onChange={setTerminusKm}
        help={`Where the ice ends, 0 to ${length / 1000} km; the surface is integrated up-valley from there.`} />
      <button type="button" onClick={fillPlastic}>
        Fill with plastic ice
      </button>
      <NotApplied message={message} />
    </fieldset>
  );
}
