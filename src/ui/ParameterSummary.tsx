/** Read-only summary of the scenario's parameters, with units, beside the profile. */
import type { Scenario } from '../model/scenario';
import { parameterRows } from '../chart/parameterRows';

export function ParameterSummary({ scenario }: { scenario: Scenario }) {
  return (
    <section className="parameters" aria-labelledby="parameters-heading">
      <h2 id="parameters-heading">Parameters</h2>
      <dl>
        {parameterRows(scenario).map((row) => (
          <div key={row.label} className="parameter">
            <dt>{row.label}</dt>
            <dd>{row.value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
