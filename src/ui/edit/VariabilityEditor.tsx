/** Year-to-year weather (scenario key `variability`): on/off and its four numbers, each refused at its field. */
import { useState } from 'react';
import type { Scenario, VariabilitySpec } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { NotApplied } from './NotApplied';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';

/** A start the user can change: spreads of the order common in practice for valley glaciers. */
const DEFAULT_VARIABILITY: VariabilitySpec = { temperatureSd: 0.8, precipitationSd: 0.15, seed: 1 };

function setKey<K extends keyof VariabilitySpec>(key: K) {
  return (s: Scenario, v: number | undefined): Scenario =>
    withKey(s, 'variability', withKey(s.variability ?? DEFAULT_VARIABILITY, key, v as VariabilitySpec[K]));
}

export function VariabilityEditor() {
  const variability = useScenarioStore((s) => s.scenario.variability);
  const [error, setError] = useState<string | null>(null);
  const toggle = (on: boolean) => {
    const s = useScenarioStore.getState().scenario;
    const result = commitEdit(withKey(s, 'variability', on ? DEFAULT_VARIABILITY : undefined), on ? 'Year-to-year weather on' : 'Year-to-year weather off');
    setError(refusalAt(result, '/variability'));
  };
  return (
    <fieldset className="param-group">
      <legend>Year-to-year weather</legend>
      <label>
        <input type="checkbox" checked={variability !== undefined} onChange={(e) => toggle(e.target.checked)} /> Random weather each model year
      </label>
      <p className="field-help">
        Seeded: the same seed gives the same weather in every run, in the browser and on the command line; another seed gives other weather.
      </p>
      {variability && (
        <>
          <ScenarioNumberField label="Temperature standard deviation" unit="K" path="/variability/temperatureSd" value={variability.temperatureSd}
            build={setKey('temperatureSd')} help="Of the annual anomaly, 0 to 5; about 0.5–1 for summer temperatures (common practice)." />
          <ScenarioNumberField label="Precipitation standard deviation" unit="%" displayScale={100} path="/variability/precipitationSd"
            value={variability.precipitationSd} build={setKey('precipitationSd')} help="Of the annual precipitation, 0 to 50; 10–20 is common practice." />
          <ScenarioNumberField label="Seed" unit="" path="/variability/seed" value={variability.seed} build={setKey('seed')}
            help="A whole number from 0 to 4,294,967,295." />
          <ScenarioNumberField label="Year-to-year correlation" unit="" optional path="/variability/ar1" value={variability.ar1}
            build={setKey('ar1')} help="Lag-one autocorrelation, at least 0 and less than 1; empty: 0 (each year independent)." />
        </>
      )}
      <NotApplied message={error} />
    </fieldset>
  );
}
