/** Debris cover (scenario key `debris`): [x m, thickness m] points; reduces ablation only. */
import { useState } from 'react';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { NotApplied } from './NotApplied';
import { PointTableEditor } from './PointTableEditor';
import { withKey } from './withKey';

export function DebrisEditor() {
  const debris = useScenarioStore((s) => s.scenario.debris);
  const length = useScenarioStore((s) => s.scenario.grid.length);
  const [error, setError] = useState<string | null>(null);
  const set = (points: [number, number][] | undefined, label: string) =>
    setError(refusalAt(commitEdit(withKey(useScenarioStore.getState().scenario, 'debris', points), label), '/debris'));
  return (
    <fieldset className="param-group">
      <legend>Debris cover</legend>
      <p className="field-help">
        Thickness 0 to 10 m along the flowline, x strictly increasing, constant beyond the ends. Melt under debris is the bare-ice melt times
        0.066 / (0.066 + thickness in m) (Anderson &amp; Anderson 2016): half under 6.6 cm, a tenth under 0.6 m; accumulation is untouched.
      </p>
      {debris ? (
        <>
          <PointTableEditor
            caption="Debris cover"
            columns={[{ label: 'x', unit: 'm' }, { label: 'Debris thickness', unit: 'm' }]}
            points={debris}
            path="/debris"
            build={(s, points) => ({ ...s, debris: points })}
            minPoints={1}
            addStep={500}
          />
          <button type="button" onClick={() => set(undefined, 'No debris cover')}>
            No debris cover
          </button>
        </>
      ) : (
        <button type="button" onClick={() => set([[Math.round(length / 2), 0], [length, 0.3]], 'Debris cover on the lower half')}>
          Add debris cover
        </button>
      )}
      <NotApplied message={error} />
    </fieldset>
  );
}
