/** Weertman sliding u_b = C tau_b^m; C = 0 (or no sliding key) turns it off. */
import type { Scenario } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { formatScientific, superscript } from '../../chart/formatScientific';
import { slidingCoefficientUnit } from '../../chart/flowUnits';
import { ScenarioNumberField } from './ScenarioNumberField';

/** Default sliding exponent when sliding is first switched on: m = 3 (Weertman 1957). */
const DEFAULT_M = 3;

export function SlidingParameters() {
  const sliding = useScenarioStore((s) => s.scenario.sliding);
  const m = sliding?.m ?? DEFAULT_M;
  const C = sliding?.C ?? 0;
  const speed = C * 1e5 ** m;
  const build = (key: 'C' | 'm') => (s: Scenario, v: number | undefined) => ({
    ...s,
    sliding: { C: s.sliding?.C ?? 0, m: s.sliding?.m ?? DEFAULT_M, [key]: v as number },
  });
  return (
    <fieldset className="param-group">
      <legend>Sliding</legend>
      <ScenarioNumberField
        label="Sliding coefficient C"
        unit={slidingCoefficientUnit(m)}
        path="/sliding/C"
        value={C}
        build={build('C')}
        help="At least 0; 0 is no sliding. Weertman (1957) law u_b = C τ_b^m."
      />
      <ScenarioNumberField
        label="Sliding exponent m"
        unit="–"
        path="/sliding/m"
        value={m}
        build={build('m')}
        help="1 to 10; 3 as in Weertman (1957)."
      />
      <p className="derived" aria-live="polite">
        {C === 0 ? 'Sliding off.' : `Sliding speed at 100 kPa basal stress: ${formatScientific(speed)} m a${superscript(-1)}.`}
      </p>
    </fieldset>
  );
}
