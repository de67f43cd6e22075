/**
 * Calibration to an observed terminus: the ELA (linear balance), the shift of a balance table, or
 * a temperature offset (degree-day) for which the spun-up glacier ends where the user says it
 * does, within a tolerance. Shows every spin-up tried, the value found and the match, and offers
 * to apply the value as one undoable edit through commitEdit. Below it, FitSection fits any
 * supported parameter to the observations stored in the scenario.
 */
import { useState } from 'react';
import { calibrationParameter } from '../../model/analysis/calibrateTerminus';
import { useAnalysisStore, type ResultOf } from '../../state/analysisStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from '../edit/commitEdit';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { formatKm } from '../results/formatResult';
import { useAnalysisClient } from './AnalysisClientContext';
import { AnalysisNumbers } from './AnalysisNumbers';
import { AnalysisStart } from './AnalysisStart';
import { checkObservedTerminus, checkTolerance } from './analysisInputs';
import { FitSection } from './FitSection';
import { calibratedScenario, formatParameter, parameterLabel, valueToApply } from './calibrationApply';
import { XYChart } from './XYChart';

const WHAT_IS_CALIBRATED = {
  ela: 'the ELA of the linear balance',
  'table-shift': 'a shift of the whole balance table up or down',
  'temperature-offset': 'an offset added to the mean temperature of the degree-day model',
} as const;

export function CalibrationSection() {
  const client = useAnalysisClient();
  const busy = useAnalysisStore((s) => s.active !== null);
  const slot = useAnalysisStore((s) => s.calibration);
  const scenario = useScenarioStore((s) => s.scenario);
  const { name } = calibrationParameter(scenario);
  const [observedText, setObservedText] = useState('');
  const [toleranceText, setToleranceText] = useState(String(scenario.grid.spacing / 2));
  const [error, setError] = useState<string | null>(null);

  const start = () => {
    const { scenario: current, revision } = useScenarioStore.getState();
    const domainLength = current.grid.length;
    const observed = checkObservedTerminus(observedText, domainLength);
    if (!observed.ok) return setError(observed.message);
    const tolerance = checkTolerance(toleranceText, current.grid.spacing, domainLength);
    if (!tolerance.ok) return setError(tolerance.message);
    setError(null);
    client.start({ kind: 'calibration', scenario: current, observedTerminus: observed.value, tolerance: tolerance.value }, revision);
  };

  return (
    <div className="analysis" data-analysis="calibration">
      <p className="analysis-intro">
        Find {WHAT_IS_CALIBRATED[name]} for which the spun-up glacier&apos;s terminus lies at an observed position, within the tolerance.
      </p>
      <div className="analysis-fields">
        <LocalNumberInput label="Observed terminus" unit="km down-valley" value={observedText} onChange={setObservedText} />
        <LocalNumberInput label="Tolerance" unit="m" value={toleranceText} onChange={setToleranceText} />
      </div>
      <p className="field-help">
        Terminus between 0 and {formatKm(scenario.grid.length)} (the flowline); tolerance at least {scenario.grid.spacing / 2} m, half a grid cell.
      </p>
      <AnalysisStart kind="calibration" error={error} disabled={busy} onStart={start}>
        Calibrate {parameterLabel(name) === 'ELA' ? 'the ELA' : parameterLabel(name).toLowerCase()}
      </AnalysisStart>
      {slot.result && <CalibrationResultView result={slot.result} madeAt={slot.revision} />}
      <h3 className="analysis-subheading">Fit to the scenario&apos;s observations</h3>
      <FitSection />
    </div>
  );
}

function CalibrationResultView({ result, madeAt }: { result: ResultOf<'calibration'>; madeAt: number | null }) {
  const { calibration: c, observedTerminus, tolerance } = result;
  const revision = useScenarioStore((s) => s.revision);
  const [applied, setApplied] = useState<{ text: string; ok: boolean } | null>(null);
  const label = parameterLabel(c.parameterName);
  const value = valueToApply(c);
  const current = madeAt === revision;

  const apply = () => {
    // The calibration was made from this revision, so its scenario is the current one.
    const { scenario } = useScenarioStore.getState();
    const edit = calibratedScenario(scenario, c, observedTerminus);
    const done = commitEdit(edit.scenario, edit.label);
    setApplied(
      done.ok
        ? { ok: true, text: `Applied: ${label} ${formatParameter(c.parameterName, value, c.unit)}. Undo with Ctrl+Z; run again to see the calibrated glacier.` }
        : { ok: false, text: `Not applied: ${done.errors.map((e) => e.message).join('; ')}` },
    );
  };

  const rows: [string, string][] = [
    [`${label} found`, formatParameter(c.parameterName, value, c.unit)],
    ...(c.matchBand
      ? [['Values giving the same terminus', `${formatParameter(c.parameterName, c.matchBand[0], '')}to ${formatParameter(c.parameterName, c.matchBand[1], c.unit)}`] as [string, string]]
      : []),
    ['Modelled terminus', formatKm(c.terminus)],
    ['Observed terminus', `${formatKm(observedTerminus)} ± ${tolerance} m`],
    ['Mismatch', `${Math.round(c.terminus - observedTerminus)} m`.replace('-', '\u2212')],
    ['Spin-ups run', String(c.iterations)],
  ];
  return (
    <div className="analysis-result">
      <p className={c.matched ? 'analysis-verdict matched' : 'notice'} role="status">
        {c.matched
          ? `Matched: the terminus lies within ${tolerance} m of the observation.`
          : `No value matched within ${tolerance} m after ${c.iterations} spin-ups; the closest is shown. Try a larger tolerance or check the observed position.`}
      </p>
      <AnalysisNumbers name="calibration" rows={rows} />
      <XYChart
        name="calibration"
        title={`Terminus of each trial spin-up against the ${label}, with the observed terminus and tolerance`}
        xTitle={`${label} (${c.unit})`}
        yTitle="Terminus (km)"
        xPad={0.05}
        xTicks={3}
        legend
        yMinSpan={0.5}
        hBand={{ from: (observedTerminus - tolerance) / 1000, to: (observedTerminus + tolerance) / 1000, className: 'tolerance-band' }}
        hLines={[{ value: observedTerminus / 1000, label: `observed ${formatKm(observedTerminus)}`, className: 'observed' }]}
        vLines={c.matched ? [{ value: c.parameter, label: 'found', className: 'found' }] : []}
        series={[{ key: 'trials', label: 'Trial spin-ups', className: 'trials', noLine: true, markers: 'filled', xs: c.trials.map((t) => t.parameter), ys: c.trials.map((t) => t.terminus / 1000) }]}
      />
      <details className="analysis-iterations" open>
        <summary>Iterations ({c.iterations} spin-ups)</summary>
        <table className="analysis-table" data-numbers="calibration-trials">
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">
                {label} ({c.unit})
              </th>
              <th scope="col">Terminus (km)</th>
              <th scope="col">Match</th>
            </tr>
          </thead>
          <tbody>
            {c.trials.map((t, i) => (
              <tr key={i}>
                <th scope="row">{i + 1}</th>
                <td>{formatParameter(c.parameterName, t.parameter, '').trim()}</td>
                <td>{(t.terminus / 1000).toFixed(2)}</td>
                <td>{Math.abs(t.terminus - observedTerminus) <= tolerance ? 'yes' : 'no'}{t.converged ? '' : ' (not steady)'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
      {c.matched && (
        <div className="button-row">
          <button type="button" disabled={!current} onClick={apply}>
            Apply {label} {formatParameter(c.parameterName, value, c.unit)} to the scenario
          </button>
        </div>
      )}
      {c.matched && !current && !applied && <p className="analysis-note">The scenario has changed since this calibration; calibrate again to apply a value.</p>}
      {applied && (
        <p className={applied.ok ? 'analysis-note' : 'field-error'} role="status">
          {applied.text}
        </p>
      )}
    </div>
  );
}
