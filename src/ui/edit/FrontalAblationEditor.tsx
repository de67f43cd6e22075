/**
 * Frontal ablation into a lake at the ice front (scenario key `frontalAblation`): the water-depth
 * coefficient c of u_c = c D_w, refused at the field outside 0 to 100 a^-1; empty removes the key.
 */
import type { Scenario } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';

const build = (s: Scenario, c: number | undefined): Scenario =>
  withKey(s, 'frontalAblation', c === undefined ? undefined : { waterDepthCoefficient: c });

export function FrontalAblationEditor() {
  const c = useScenarioStore((s) => s.scenario.frontalAblation?.waterDepthCoefficient);
  return (
    <fieldset className="param-group">
      <legend>Frontal ablation into a lake at the ice front</legend>
      <ScenarioNumberField
        label="Calving coefficient c"
        unit="a⁻¹"
        optional
        path="/frontalAblation/waterDepthCoefficient"
        value={c}
        build={build}
        // The coefficients are quoted from memory [memory] (physics/frontalAblation.ts); the user-facing text cites the sources only.
        help={
          'Calving rate = c × depth of a lake at the ice front; 0 to 100. About 27 for tidewater (Brown, Meier & Post 1982), ' +
          'about 2–3 in fresh water (Funk & Röthlisberger 1989; Warren & Kirkbride 2003). Empty: no calving.'
        }
      />
    </fieldset>
  );
}
