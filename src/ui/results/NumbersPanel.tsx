/** Glacier-wide numbers at the model year every view shows, with units. */
import type { GlacierNumbers } from '../../model/diagnostics';
import { useCurrentFrame } from '../../state/playbackStore';
import { LAKE_CAUTION_TEXT } from '../../outputs/caution';
import { useResultsStale, useRunStore } from '../../state/runStore';
import { lakeSummary } from './lakeSummary';
import { LAKES_HEADING } from '../../chart/lakeShapes';
import { frameLakes } from './frameLakes';
import { observationRows } from './observationRows';
import { useScenarioStore } from '../../state/scenarioStore';
import {
  formatArea,
  formatElevation,
  formatKm,
  formatMetres,
  formatRatio,
  formatSpeed,
  formatVolume,
  formatVolumeRate,
  formatWarming,
  formatYears,
} from './formatResult';

/** `frontalAblation`: the scenario calves into lakes at the front (scenario.frontalAblation, c > 0). */
export function numberRows(n: GlacierNumbers, unitWidth: boolean, frontalAblation = false): { label: string; value: string }[] {
  return [
    { label: 'Model year', value: formatYears(n.time) },
    { label: 'Length', value: formatKm(n.length) },
    { label: 'Terminus', value: Number.isFinite(n.terminus) ? `${formatKm(n.terminus)} down-valley` : 'no glacier' },
    { label: 'Volume', value: formatVolume(n.volume, unitWidth) },
    { label: 'Area', value: formatArea(n.area, unitWidth) },
    { label: 'Accumulation-area ratio', value: formatRatio(n.aar) },
    { label: 'Maximum thickness', value: formatMetres(n.maxThickness) },
    { label: 'Maximum surface speed', value: formatSpeed(n.maxSurfaceSpeed) },
    { label: 'ELA', value: formatElevation(n.ela) },
    { label: 'Warming since year 0', value: formatWarming(n.warming) },
    ...(frontalAblation
      ? [{ label: 'Frontal ablation into a lake at the ice front (since the last output)', value: formatVolumeRate(n.frontalAblation, unitWidth) }]
      : []),
  ];
}

export function NumbersPanel() {
  const frame = useCurrentFrame();
  const unitWidth = useScenarioStore((s) => !s.scenario.width);
  const calving = useScenarioStore((s) => (s.scenario.frontalAblation?.waterDepthCoefficient ?? 0) > 0);
  const stale = useResultsStale();
  const grid = useRunStore((s) => s.grid);
  const lakes = frame && grid ? frameLakes(frame, grid) : [];
  const observations = useScenarioStore((s) => s.scenario.observations);
  const misfits =
    frame && grid
      ? observationRows(observations, {
          x: grid.x,
          thickness: frame.fields.thickness,
          surfaceSpeed: frame.fields.surfaceSpeed,
          lengthM: grid.length,
          time: frame.time,
        })
      : [];
  return (
    <section className="numbers panel" aria-labelledby="numbers-heading">
      <h2 id="numbers-heading">Glacier at the selected year</h2>
      {frame && stale && <p className="stale-tag">Out of date: made before the last change to the scenario.</p>}
      {frame ? (
        <dl aria-live="off">
          {numberRows(frame.numbers, unitWidth, calving).map((row) => (
            <div key={row.label} className="number-row">
              <dt>{row.label}</dt>
              <dd data-number={row.label}>{row.value}</dd>
            </div>
          ))}
          <div className="number-row">
            <dt>{LAKES_HEADING}</dt>
            <dd data-number="Lakes">{lakeSummary(lakes, unitWidth)}</dd>
          </div>
          {misfits.map((row) => (
            <div key={row.label} className="number-row misfit">
              <dt>{row.label}</dt>
              <dd data-number={row.label}>{row.value}</dd>
            </div>
          ))}
        </dl>
      ) : (
        <p className="empty">No results yet. Press Run to compute them.</p>
      )}
      {lakes.length > 0 && (
        <p className="caution lake-caution" role="note">
          <strong>Caution:</strong> {LAKE_CAUTION_TEXT}
        </p>
      )}
    </section>
  );
}
