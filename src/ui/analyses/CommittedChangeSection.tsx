/**
 * Committed change: from the model year selected in the playback, hold that year's warming and
 * run to a steady state; show the length and volume change still to come, as numbers and as the
 * run so far (solid) continued by the held run (dashed).
 */
import { memo, useMemo } from 'react';
import { useAnalysisStore } from '../../state/analysisStore';
import { useCurrentFrame } from '../../state/playbackStore';
import { useResultsStale, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { formatKm, formatVolume, formatWarming, formatYears } from '../results/formatResult';
import { useAnalysisClient } from './AnalysisClientContext';
import { AnalysisNumbers } from './AnalysisNumbers';
import { AnalysisStart } from './AnalysisStart';
import { formatKmChange, formatPercentChange, formatVolumeChange, volumeAxis } from './formatAnalysis';
import { XYChart } from './XYChart';

export function CommittedChangeSection() {
  const client = useAnalysisClient();
  const frame = useCurrentFrame();
  const stale = useResultsStale();
  const busy = useAnalysisStore((s) => s.active !== null);
  const slot = useAnalysisStore((s) => s.committed);
  const unitWidth = useScenarioStore((s) => !s.scenario.width);

  const start = () => {
    if (!frame || stale) return;
    const { scenario, revision } = useScenarioStore.getState();
    client.start({ kind: 'committed', scenario, year: frame.time, thickness: frame.fields.thickness }, revision);
  };
  const unavailable = !frame
    ? 'Run the scenario first: the committed change starts from the model year selected in the playback.'
    : stale
      ? 'The results are out of date: run the scenario again, then choose a model year.'
      : null;

  return (
    <div className="analysis" data-analysis="committed">
      <p className="analysis-intro">
        Hold the warming of the selected model year from then on and run to a new steady state: the further change still to come.
      </p>
      {frame && !stale && (
        <p className="analysis-from">
          From model year <strong>{formatYears(frame.time)}</strong>, warming held at <strong>{formatWarming(frame.numbers.warming)}</strong>.
        </p>
      )}
      {unavailable && <p className="empty">{unavailable}</p>}
      <AnalysisStart kind="committed" error={null} disabled={Boolean(unavailable) || busy} onStart={start}>
        Compute committed change
      </AnalysisStart>
      {slot.result && <CommittedResult result={slot.result.committed} unitWidth={unitWidth} />}
    </div>
  );
}

// Memoised: the section re-renders with every playback frame (it names the selected year), the
// result and its charts only when a new result comes.
const CommittedResult = memo(function CommittedResult({ result, unitWidth }: { result: import('../../model/analysis/committedChange').CommittedChange; unitWidth: boolean }) {
  const frames = useRunStore((s) => s.frames);
  const volume = volumeAxis(unitWidth);
  // The run up to the year held from, to show the held run as its continuation.
  const history = useMemo(() => frames.filter((f) => f.time <= result.year + 1e-9), [frames, result.year]);
  const rows: [string, string][] = [
    ['Held from model year', formatYears(result.year)],
    ['Warming held', formatWarming(result.warming)],
    ['Length now → steady', `${formatKm(result.lengthNow)} → ${formatKm(result.lengthSteady)}`],
    ['Length change to come', `${formatKmChange(result.lengthChange)} (${formatPercentChange(result.lengthChange, result.lengthNow)})`],
    ['Volume now → steady', `${formatVolume(result.volumeNow, unitWidth)} → ${formatVolume(result.volumeSteady, unitWidth)}`],
    ['Volume change to come', `${formatVolumeChange(result.volumeChange, unitWidth)} (${formatPercentChange(result.volumeChange, result.volumeNow)})`],
    [
      'Steady after',
      result.converged ? `${formatYears(result.yearsToSteady)} more (model year ${formatYears(result.year + result.yearsToSteady)})` : `not steady within ${formatYears(result.yearsToSteady)}`,
    ],
  ];
  const years = result.path.map((p) => p.year);
  const endYear = result.year + result.yearsToSteady;
  const common = {
    xTitle: 'Model year (a)',
    vLines: [{ value: result.year, label: `held from ${formatYears(result.year)}`, className: 'held-from' }],
  };
  return (
    <div className="analysis-result">
      {!result.converged && (
        <p className="notice">The held run did not reach a steady state within its limit; the change shown is a lower bound of what is to come.</p>
      )}
      <AnalysisNumbers name="committed" rows={rows} />
      <XYChart
        name="committed-length"
        title={`Glacier length through the run to year ${result.year}, then with the warming held until steady at year ${endYear}`}
        yTitle="Length (km)"
        yFromZero
        yMinSpan={1}
        legend
        {...common}
        series={[
          { key: 'run', label: 'Run so far', className: 'run-so-far', xs: history.map((f) => f.time), ys: history.map((f) => f.numbers.length / 1000), markers: 'none' },
          { key: 'held', label: 'Warming held', className: 'held-run', dashed: true, xs: years, ys: result.path.map((p) => p.length / 1000), markers: 'none' },
        ]}
      />
      <XYChart
        name="committed-volume"
        title={`Glacier volume through the run to year ${result.year}, then with the warming held until steady`}
        yTitle={volume.title}
        yFromZero
        {...common}
        series={[
          { key: 'run', label: 'Run so far', className: 'run-so-far', xs: history.map((f) => f.time), ys: history.map((f) => volume.scale(f.numbers.volume)), markers: 'none' },
          { key: 'held', label: 'Warming held', className: 'held-run', dashed: true, xs: years, ys: result.path.map((p) => volume.scale(p.volume)), markers: 'none' },
        ]}
      />
    </div>
  );
});
