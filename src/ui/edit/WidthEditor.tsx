/**
 * Glacier width along the valley (a draggable strip under the profile), the valley cross-section
 * and the cross-section type for side drag.
 */
import { useState } from 'react';
import type { CrossSection, Point, Scenario, ShapeFactorSpec } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { pointListRefusal } from './pointListRefusal';
import { CurveStrip } from './CurveStrip';
import { PointTableEditor } from './PointTableEditor';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';
import { NotApplied } from './NotApplied';
import { ValleySectionField } from './ValleySectionField';

/** Width given when a unit-width flowline first gets a width profile: 1 km, an ordinary alpine valley glacier. */
const FIRST_WIDTH_M = 1000;

type SectionChoice = 'none' | 'number' | CrossSection;

function sectionChoice(spec: ShapeFactorSpec | undefined): SectionChoice {
  if (spec === undefined) return 'none';
  return typeof spec === 'number' ? 'number' : spec.crossSection;
}

export function WidthEditor() {
  const width = useScenarioStore((s) => s.scenario.width);
  const length = useScenarioStore((s) => s.scenario.grid.length);
  const shapeFactor = useScenarioStore((s) => s.scenario.shapeFactor);
  const [error, setError] = useState<string | null>(null);
  const commitWidth = (points: Point[] | undefined, label: string) => {
    const s = useScenarioStore.getState().scenario;
    // A unit-width flowline has no valley floor, so it drops the section in the same edit.
    const next = points === undefined ? withKey(s, 'section', undefined) : s;
    const result = commitEdit(withKey(next, 'width', points), label);
    setError(pointListRefusal(result, '/width', [{ unit: 'km', scale: 1 / 1000 }, { unit: 'm' }]));
  };
  const choice = sectionChoice(shapeFactor);

  function chooseSection(next: SectionChoice) {
    const s = useScenarioStore.getState().scenario;
    const spec: ShapeFactorSpec | undefined =
      next === 'none' ? undefined : next === 'number' ? (typeof s.shapeFactor === 'number' ? s.shapeFactor : 0.8) : { crossSection: next };
    const result = commitEdit(withKey(s, 'shapeFactor', spec), 'Set cross-section');
    setError(refusalAt(result, '/shapeFactor'));
  }

  return (
    <fieldset className="param-group width-editor">
      <legend>Width and cross-section</legend>
      {width ? (
        <>
          <CurveStrip
            title="Glacier width along the valley"
            pointName="Width point"
            points={width}
            xDomain={[0, length]}
            xLabel="Distance down-valley (km)"
            yLabel="Width (m)"
            xDisplay={1 / 1000}
            xUnit="km"
            yUnit="m"
            yFloor={0}
            xStep={50}
            yStep={10}
            height={180}
            onCommit={commitWidth}
          />
          <p className="field-help">Drag a point, or focus it and use the arrow keys (Shift: ×10). Width above 0, at most 100 km.</p>
          <details>
            <summary>Width points as a table</summary>
            <PointTableEditor
              caption="Width"
              columns={[{ label: 'Distance', unit: 'km', scale: 1 / 1000 }, { label: 'Width', unit: 'm' }]}
              points={width}
              path="/width"
              build={(s, points) => ({ ...s, width: points })}
              minPoints={1}
              addStep={500}
            />
          </details>
          <ValleySectionField />
          <button type="button" onClick={() => commitWidth(undefined, 'Unit-width flowline')}>
            Use a unit width (1 m) instead
          </button>
        </>
      ) : (
        <>
          <p>Unit-width flowline: 1 m everywhere, so volumes are in m³ per m of width.</p>
          <button type="button" onClick={() => commitWidth([[0, FIRST_WIDTH_M], [length, FIRST_WIDTH_M]], 'Set width profile')}>
            Give the glacier a width (starts at 1 km)
          </button>
        </>
      )}
      <div className="field">
        <label htmlFor="cross-section">Side drag (shape factor, Nye 1965)</label>
        <select id="cross-section" value={choice} onChange={(e) => chooseSection(e.target.value as SectionChoice)}>
          <option value="none">None (f = 1)</option>
          <option value="number">A fixed f</option>
          <option value="parabolic">Parabolic cross-section</option>
          <option value="semi-elliptic">Semi-elliptic cross-section</option>
          <option value="rectangular">Rectangular cross-section</option>
        </select>
        <p className="field-help">A cross-section type computes f from the width (with a valley section: its surface width) and the ice thickness; it needs a width profile.</p>
      </div>
      {choice === 'number' && (
        <ScenarioNumberField
          label="Shape factor f"
          unit="–"
          path="/shapeFactor"
          value={shapeFactor as number}
          build={(s: Scenario, v) => ({ ...s, shapeFactor: v as number })}
          help="Greater than 0, at most 1; 1 is no side drag, about 0.5–0.8 for valley glaciers (Nye 1965)."
        />
      )}
      <NotApplied message={error} />
    </fieldset>
  );
}
