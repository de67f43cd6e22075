/**
 * Steady-state sensitivity curve: steady terminus and volume against a held warming, going up and
 * coming back down; the two branches are told apart by colour, line style and marker.
 */
import { useState } from 'react';
import type { SteadyPoint } from '../../model/analysis/sensitivityCurve';
import { useAnalysisStore, type ResultOf } from '../../state/analysisStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { formatKm, formatWarming } from '../results/formatResult';
import { useAnalysisClient } from './AnalysisClientContext';
import { AnalysisStart } from './AnalysisStart';
import { checkSensitivityInputs, SENSITIVITY_LIMITS } from './analysisInputs';
import { volumeAxis } from './formatAnalysis';
import { compareBranches } from './sensitivityBranches';
import { XYChart, type ChartSeries } from './XYChart';

const DEFAULT_SENSITIVITY = { from: '-2', to: '4', step: '0.5' };

export function SensitivitySection() {
  const client = useAnalysisClient();
  const busy = useAnalysisStore((s) => s.active !== null);
  const slot = useAnalysisStore((s) => s.sensitivity);
  const unitWidth = useScenarioStore((s) => !s.scenario.width);
  const [from, setFrom] = useState(DEFAULT_SENSITIVITY.from);
  const [to, setTo] = useState(DEFAULT_SENSITIVITY.to);
  const [step, setStep] = useState(DEFAULT_SENSITIVITY.step);
  const [error, setError] = useState<string | null>(null);
  const { lowest, highest, smallestStep, largestStep, mostWarmings } = SENSITIVITY_LIMITS;

  const start = () => {
    const checked = checkSensitivityInputs(from, to, step);
    if (!checked.ok) {
      setError(checked.message);
      return;
    }
    setError(null);
    const { scenario, revision } = useScenarioStore.getState();
    client.start({ kind: 'sensitivity', scenario, ...checked.value }, revision);
  };

  return (
    <div className="analysis" data-analysis="sensitivity">
      <p className="analysis-intro">
        Steady glacier for each warming held constant, stepping up through the range and back down from the scenario&apos;s initial ice; where the
        branches part, the glacier has two steady states for one climate.
      </p>
      <div className="analysis-fields">
        <LocalNumberInput label="Lowest warming" unit="K" value={from} onChange={setFrom} />
        <LocalNumberInput label="Highest warming" unit="K" value={to} onChange={setTo} />
        <LocalNumberInput label="Step" unit="K" value={step} onChange={setStep} />
      </div>
      <p className="field-help">
        Warmings from {String(lowest).replace('-', '\u2212')} to +{highest} K; step {smallestStep} to {largestStep} K, dividing the range, at most {mostWarmings} warmings.
      </p>
      <AnalysisStart kind="sensitivity" error={error} disabled={busy} onStart={start}>
        Compute sensitivity curve
      </AnalysisStart>
      {slot.result && <SensitivityResult result={slot.result} unitWidth={unitWidth} />}
    </div>
  );
}

function branchSeries(points: SteadyPoint[], value: (p: SteadyPoint) => number): ChartSeries[] {
  const up = points.filter((p) => p.branch === 'up');
  // The down branch is drawn from the top warming (where it leaves the up branch) downwards.
  const down = [up[up.length - 1], ...points.filter((p) => p.branch === 'down')];
  return [
    { key: 'up', label: 'Warming up', className: 'branch-up', xs: up.map((p) => p.warming), ys: up.map(value), markers: 'filled' },
    { key: 'down', label: 'Cooling back', className: 'branch-down', dashed: true, xs: down.map((p) => p.warming), ys: down.map(value), markers: 'open' },
  ];
}

function SensitivityResult({ result, unitWidth }: { result: ResultOf<'sensitivity'>; unitWidth: boolean }) {
  const { points, spacing, domainLength } = result;
  const comparison = compareBranches(points, spacing, domainLength);
  const volume = volumeAxis(unitWidth);
  const signed = (w: number) => formatWarming(w);
  const largest = comparison.largestTerminusDifference;
  const largestVolume = comparison.largestVolumeDifference;
  return (
    <div className="analysis-result">
      <ul className="analysis-findings" data-numbers="sensitivity-summary">
        <li>
          {comparison.differAt.length
            ? `The branches differ by more than one grid cell (${spacing} m) at ${comparison.differAt.map(signed).join(', ')}: two steady glaciers for one climate there.`
            : `The branches agree within one grid cell (${spacing} m) at every warming: one steady glacier for each climate in this range.`}
        </li>
        <li>
          Largest difference between branches: terminus {largest ? `${Number.isFinite(largest.metres) ? `${largest.metres} m` : 'ice on one branch only'} at ${signed(largest.warming)}` : 'none'}
          {'; '}volume {largestVolume ? `${(100 * largestVolume.share).toFixed(1)} % at ${signed(largestVolume.warming)}` : 'none'}.
        </li>
        {comparison.atDomainEnd.length > 0 && (
          <li>
            At {comparison.atDomainEnd.map(signed).join(', ')} the ice reaches the end of the flowline ({formatKm(domainLength)}): the steady terminus there is
            cut off by the domain and the curve flattens for that reason alone.
          </li>
        )}
        {comparison.unconverged > 0 && <li className="field-error">{comparison.unconverged} step(s) did not reach a steady state within their limit.</li>}
      </ul>
      <XYChart
        name="sensitivity-terminus"
        title="Steady terminus position against held warming, warming-up and cooling-back branches"
        xTitle="Warming held (K)"
        yTitle="Terminus (km)"
        legend
        yMinSpan={1}
        series={branchSeries(points, (p) => p.terminus / 1000)}
      />
      <XYChart
        name="sensitivity-volume"
        title="Steady ice volume against held warming, warming-up and cooling-back branches"
        xTitle="Warming held (K)"
        yTitle={volume.title}
        yFromZero
        series={branchSeries(points, (p) => volume.scale(p.volume))}
      />
      <table className="analysis-table" data-numbers="sensitivity">
        <caption>Steady states, warming up / cooling back (terminus from the head of the valley)</caption>
        <thead>
          <tr>
            <th scope="col">Warming (K)</th>
            <th scope="col">Terminus (km)</th>
            <th scope="col">{unitWidth ? 'Volume (10⁶ m³ per m of width)' : 'Volume (km³)'}</th>
          </tr>
        </thead>
        <tbody>
          {comparison.rows.map((row) => (
            <tr key={row.warming} className={comparison.differAt.includes(row.warming) ? 'differs' : undefined}>
              <th scope="row">{signed(row.warming).replace(' K', '')}</th>
              <td>{pair(terminusKm(row.up), row.down && terminusKm(row.down))}</td>
              <td>{pair(volumeText(row.up.volume, unitWidth), row.down && volumeText(row.down.volume, unitWidth))}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** "up / down", or the up value alone at the top warming where the curve turns. */
function pair(up: string, down: string | undefined): string {
  return down === undefined ? `${up} (turn)` : `${up} / ${down}`;
}

function terminusKm(p: SteadyPoint): string {
  return Number.isNaN(p.terminus) ? 'none' : (p.terminus / 1000).toFixed(2);
}

function volumeText(m3: number, unitWidth: boolean): string {
  return (unitWidth ? m3 / 1e6 : m3 / 1e9).toFixed(3);
}
