/**
 * Fit one parameter to the scenario's own observations (calibrateParameter in the analysis
 * worker): every target the core supports — surface speeds to A, the enhancement factor or the
 * sliding coefficient C; thickness points to A (or E) through the bed inversion; the terminus, a
 * terminus record or the geodetic balance to the balance model's own parameter (ELA, table
 * shift, temperature offset). A target the scenario cannot support is refused at the field with
 * the core's own words (checkCalibration, no model run). The result shows the misfit before and
 * after, the observed against the modelled values as a chart with units, and applies the fitted
 * value as one undoable edit through commitEdit.
 */
import { useId, useState } from 'react';
import { terminusPointer } from '../../model/analysis/calibrateClimate';
import { checkCalibration } from '../../model/analysis/calibrateParameter';
import type { Misfit, ObservationKind, ParameterCalibration } from '../../model/analysis/calibrationTypes';
import type { Scenario } from '../../model/scenario';
import { useAnalysisStore } from '../../state/analysisStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from '../edit/commitEdit';
import { useAnalysisClient } from './AnalysisClientContext';
import { AnalysisNumbers } from './AnalysisNumbers';
import { AnalysisStart } from './AnalysisStart';
import { XYChart, type ChartSeries } from './XYChart';

export interface FitTarget {
  /** "<pointer> <observation>", the option's value. */
  key: string;
  pointer: string;
  observation: ObservationKind;
  label: string;
}

function balanceName(scenario: Scenario): string {
  switch (scenario.massBalance.model) {
    case 'linear':
      return 'ELA';
    case 'table':
      return 'Shift of the balance table';
    case 'degree-day':
      return 'Temperature offset';
  }
}

/** Every target the calibration core supports, for this scenario's balance model. */
export function fitTargets(scenario: Scenario): FitTarget[] {
  const balance = terminusPointer(scenario);
  const name = balanceName(scenario);
  const list: [string, ObservationKind, string][] = [
    ['/ice/A', 'surfaceSpeed', 'Rate factor A to the surface speeds'],
    ['/ice/enhancement', 'surfaceSpeed', 'Enhancement factor E to the surface speeds'],
    ['/sliding/C', 'surfaceSpeed', 'Sliding coefficient C to the surface speeds'],
    ['/ice/A', 'thickness', 'Rate factor A to the thickness points (bed inversion)'],
    ['/ice/enhancement', 'thickness', 'Enhancement factor E to the thickness points (bed inversion)'],
    [balance, 'terminus', `${name} to the observed terminus (spin-ups)`],
    [balance, 'terminusRecord', `${name} to the terminus record (transient runs)`],
    [balance, 'geodeticBalance', `${name} to the geodetic balance`],
  ];
  return list.map(([pointer, observation, label]) => ({ key: `${pointer} ${observation}`, pointer, observation, label }));
}

/** Why the scenario cannot support the target (the core's refusal), or null. */
export function targetRefusal(scenario: Scenario, target: FitTarget): string | null {
  try {
    checkCalibration(scenario, target.pointer, target.observation);
    return null;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}

/** A parameter value with four significant figures, a true minus sign and its unit. */
export function formatValue(value: number, unit: string): string {
  const text = Math.abs(value) >= 1e-3 && Math.abs(value) < 1e5 ? String(Number(value.toPrecision(5))) : value.toExponential(3);
  return `${text.replace(/^-/, '\u2212')}${unit === '-' || unit === '' ? '' : ` ${unit}`}`;
}

export function formatMisfit(m: Misfit): string {
  const n = (v: number) => String(Number(v.toPrecision(3))).replace(/^-/, '\u2212');
  const chi = m.chiSquare !== undefined ? `, \u03c7\u00b2 ${n(m.chiSquare)}` : '';
  return `RMS ${n(m.rms)} ${m.unit}, bias ${n(m.bias)} ${m.unit} (${m.count} observation${m.count === 1 ? '' : 's'}${chi})`;
}

const VALUE_NAME: Record<ObservationKind, string> = {
  surfaceSpeed: 'Surface speed',
  thickness: 'Ice thickness',
  terminus: 'Terminus',
  terminusRecord: 'Terminus',
  geodeticBalance: 'Glacier-wide balance',
};

export function FitSection() {
  const client = useAnalysisClient();
  const busy = useAnalysisStore((s) => s.active !== null);
  const slot = useAnalysisStore((s) => s.fit);
  const scenario = useScenarioStore((s) => s.scenario);
  const targets = fitTargets(scenario);
  // First offer a target the scenario supports (if any).
  const [key, setKey] = useState(() => (targets.find((t) => targetRefusal(scenario, t) === null) ?? targets[0]).key);
  const target = targets.find((t) => t.key === key) ?? targets[0];
  const refusal = targetRefusal(scenario, target);
  const id = useId();

  const start = () => {
    const { scenario: current, revision } = useScenarioStore.getState();
    if (targetRefusal(current, target) !== null) return;
    client.start({ kind: 'fit', scenario: current, pointer: target.pointer, observation: target.observation }, revision);
  };

  return (
    <div className="analysis" data-analysis="fit">
      <p className="analysis-intro">Fit one parameter to the observations in the scenario (its observations block), and apply the fitted value.</p>
      <div className="analysis-fields">
        <label htmlFor={id}>Parameter and observation</label>
        <select id={id} value={target.key} onChange={(e) => setKey(e.target.value)} aria-describedby={refusal ? `${id}-refusal` : undefined}>
          {targets.map((t) => (
            <option key={t.key} value={t.key}>
              {t.label}
            </option>
          ))}
        </select>
      </div>
      {refusal && (
        <p className="field-error" data-refusal="fit" id={`${id}-refusal`}>
          Cannot fit: {refusal}
        </p>
      )}
      <AnalysisStart kind="fit" error={null} disabled={busy || refusal !== null} onStart={start}>
        Fit {target.pointer}
      </AnalysisStart>
      {slot.result && <FitResultView fit={slot.result.fit} madeAt={slot.revision} />}
    </div>
  );
}

function FitResultView({ fit, madeAt }: { fit: ParameterCalibration; madeAt: number | null }) {
  const revision = useScenarioStore((s) => s.revision);
  const [applied, setApplied] = useState<{ text: string; ok: boolean } | null>(null);
  const current = madeAt === revision;
  const c = fit.comparison;
  const km = c.along === 'x';
  const single = c.at.length === 1;
  const xs = single ? [0, 1] : c.at.map((a) => (km ? a / 1000 : a));
  const series: ChartSeries[] = single
    ? [{ key: 'modelled', label: 'Modelled: before (0), after (1) the fit', className: 'trials', markers: 'filled', xs, ys: [c.before[0], c.after[0]] }]
    : [
        { key: 'observed', label: 'Observed', className: 'observed', noLine: true, markers: 'open', xs, ys: c.observed },
        { key: 'before', label: 'Modelled before', className: 'before', dashed: true, markers: 'none', xs, ys: c.before },
        { key: 'after', label: 'Modelled after', className: 'after', markers: 'filled', xs, ys: c.after },
      ];

  const apply = () => {
    const done = commitEdit(fit.scenario, `${fit.pointer} fitted to the ${VALUE_NAME[fit.observation].toLowerCase()} observations`);
    setApplied(
      done.ok
        ? { ok: true, text: `Applied: ${fit.pointer} = ${formatValue(fit.value, fit.unit)}. Undo with Ctrl+Z; run again to see the fitted glacier.` }
        : { ok: false, text: `Not applied: ${done.errors.map((e) => e.message).join('; ')}` },
    );
  };

  const rows: [string, string][] = [
    ['Before', formatValue(fit.before, fit.unit)],
    ['Fitted', formatValue(fit.value, fit.unit)],
    ...(fit.range ? [['Range', `${formatValue(fit.range.low, '')} to ${formatValue(fit.range.high, fit.unit)} (${fit.range.kind})`] as [string, string]] : []),
    ['Misfit before', formatMisfit(fit.misfitBefore)],
    ['Misfit after', formatMisfit(fit.misfitAfter)],
    ['Model evaluations', `${fit.runs.count} (${fit.runs.kind})`],
  ];
  return (
    <div className="analysis-result">
      <AnalysisNumbers name="fit" rows={rows} />
      <XYChart
        name="fit"
        title={`${VALUE_NAME[fit.observation]} observed and modelled before and after the fit (${c.unit})`}
        xTitle={single ? 'Fit: before (0), after (1)' : km ? 'Distance down-valley (km)' : 'Model year (a)'}
        yTitle={`${VALUE_NAME[fit.observation]} (${c.unit})`}
        xPad={0.05}
        legend
        yMinSpan={1e-9}
        hLines={single ? [{ value: c.observed[0], label: `observed ${formatValue(c.observed[0], c.unit)}`, className: 'observed' }] : []}
        series={series}
      />
      <p className="analysis-note">Method: {fit.method}.</p>
      <ul className="analysis-statements">
        {fit.statements.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
      <div className="button-row">
        <button type="button" disabled={!current} onClick={apply}>
          Apply {fit.pointer} = {formatValue(fit.value, fit.unit)} to the scenario
        </button>
      </div>
      {!current && !applied && <p className="analysis-note">The scenario has changed since this fit; fit again to apply a value.</p>}
      {applied && (
        <p className={applied.ok ? 'analysis-note' : 'field-error'} role="status">
          {applied.text}
        </p>
      )}
    </div>
  );
}
