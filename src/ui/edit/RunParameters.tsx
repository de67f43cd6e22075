/** Run length, output interval, spin-up and the grid spacing. */
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from './commitEdit';
import { ScenarioNumberField } from './ScenarioNumberField';

export function RunParameters() {
  const run = useScenarioStore((s) => s.scenario.run);
  const grid = useScenarioStore((s) => s.scenario.grid);
  const spinup = useScenarioStore((s) => s.scenario.spinup ?? false);
  return (
    <fieldset className="param-group">
      <legend>Run</legend>
      <ScenarioNumberField
        label="Run length"
        unit="a"
        path="/run/years"
        value={run.years}
        build={(s, v) => ({ ...s, run: { ...s.run, years: v as number } })}
        help="Years to simulate from year 0, above 0 and at most 100,000."
      />
      <ScenarioNumberField
        label="Output interval"
        unit="a"
        path="/run/outputEvery"
        value={run.outputEvery}
        build={(s, v) => ({ ...s, run: { ...s.run, outputEvery: v as number } })}
        help="Years between saved states; above 0, at most the run length."
      />
      <div className="field">
        <label>
          <input
            type="checkbox"
            checked={spinup}
            onChange={(e) => {
              const s = useScenarioStore.getState().scenario;
              commitEdit({ ...s, spinup: e.target.checked }, e.target.checked ? 'Spin-up on' : 'Spin-up off');
            }}
          />{' '}
          Spin up to a steady state before year 0
        </label>
        <p className="field-help">Under the year-0 climate; off starts from the initial surface as drawn.</p>
      </div>
      <ScenarioNumberField
        label="Cell spacing"
        unit="m"
        path="/grid/spacing"
        value={grid.spacing}
        build={(s, v) => ({ ...s, grid: { ...s.grid, spacing: v as number } })}
        help={`At least 1 m; the domain (${grid.length / 1000} km) must hold a whole number of cells, 2 to 100,000.`}
      />
    </fieldset>
  );
}
