/**
 * The valley cross-section (scenario key `section`): vertical walls at the width, or a floor of
 * that width with trapezoidal or parabolic flanks that widen the ice surface as it thickens.
 * Choosing a rectangular or parabolic section also sets a side-drag table of the same shape when
 * a table is in use, in the same edit, since the validator wants the two to agree.
 */
import { useState } from 'react';
import type { Scenario, SectionShape, SectionSpec, ShapeFactorSpec } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { NotApplied } from './NotApplied';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';

/** Widening given when flanks are first chosen: 200 m at 100 m of ice, walls at 45 degrees. */
const FIRST_WIDENING_M = 200;

type Choice = 'walls' | SectionShape;

/** The side-drag table that goes with a section: its own shape where Nye tabulated it. */
function matchingShapeFactor(current: ShapeFactorSpec | undefined, shape: SectionShape): ShapeFactorSpec | undefined {
  if (typeof current !== 'object' || shape === 'trapezoidal') return current;
  return { crossSection: shape };
}

export function ValleySectionField() {
  const section = useScenarioStore((s) => s.scenario.section);
  const [error, setError] = useState<string | null>(null);
  const choice: Choice = section?.shape ?? 'walls';

  function choose(next: Choice) {
    const s = useScenarioStore.getState().scenario;
    let spec: SectionSpec | undefined;
    if (next === 'rectangular') spec = { shape: 'rectangular' };
    else if (next !== 'walls') spec = { shape: next, widening: s.section?.widening ?? FIRST_WIDENING_M };
    const shapeFactor = spec ? matchingShapeFactor(s.shapeFactor, spec.shape) : s.shapeFactor;
    const result = commitEdit(withKey(withKey(s, 'section', spec), 'shapeFactor', shapeFactor), 'Set valley section');
    setError(refusalAt(result, '/section'));
  }

  return (
    <>
      <div className="field">
        <label htmlFor="valley-section">Valley cross-section</label>
        <select id="valley-section" value={choice} onChange={(e) => choose(e.target.value as Choice)}>
          <option value="walls">Fixed width (vertical walls)</option>
          <option value="rectangular">Rectangular section</option>
          <option value="trapezoidal">Trapezoidal section (straight flanks)</option>
          <option value="parabolic">Parabolic section (U-shaped)</option>
        </select>
        <p className="field-help">
          With a section the width above is the valley floor; the ice surface widens as the ice thickens, and the flux,
          volume, area and side drag all follow the same section.
        </p>
      </div>
      {section && section.shape !== 'rectangular' && (
        <ScenarioNumberField
          label="Widening at 100 m of ice"
          unit="m"
          path="/section/widening"
          value={section.widening}
          build={(s: Scenario, v) => ({ ...s, section: { shape: section.shape, ...(v === undefined ? {} : { widening: v }) } })}
          help="Surface width at 100 m of ice minus the floor width, greater than 0, at most 100,000 m; flanks at 45° give 200 m, at 30° 346 m."
        />
      )}
      <NotApplied message={error} />
    </>
  );
}
