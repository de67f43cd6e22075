/** Run length, output interval, how the run starts (StartOptions) and the grid spacing. */
import { useScenarioStore } from '../../state/scenarioStore';
import { ScenarioNumberField } from './ScenarioNumberField';
import { StartOptions } from './StartOptions';

export function RunParameters() {
  const run = useScenarioStore((s) => s.scenario.run);
  const grid = useScenarioStore((s) => s.scenario.grid);
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
      <StartOptions />
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
