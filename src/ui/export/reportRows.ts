/**
 * The numbers of the report sheet as label/value rows: outcomes of the run (from its output frames
 * and summary) and its mass budget. Pure, so the wording, units and arithmetic are unit-tested.
 */
import { halfChangeTime } from '../../model/analysis/runOutcome';
import type { GlacierNumbers } from '../../model/diagnostics';
import type { RunSummary } from '../../model/runScenario';
import type { ExposedLake } from '../../model/analysis/exposedLakes';
import { formatLakeVolume, LAKES_HEADING } from '../../chart/lakeShapes';

export interface ReportRow {
  label: string;
  value: string;
}

const fixed = (v: number, digits: number) => (Number.isFinite(v) ? v.toFixed(digits) : 'n/a');
const signed = (v: number, digits: number) => (Number.isFinite(v) ? `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(digits)}` : 'n/a');
const percent = (change: number, start: number) => (start > 0 ? ` (${signed((100 * change) / start, 1)} %)` : '');

/** Volume in km³, or per metre of width (10⁶ m³ per m of width) for a unit-width flowline. */
function volumeText(m3: number, unitWidth: boolean): string {
  return unitWidth ? `${fixed(m3 / 1e6, 3)} × 10⁶ m³ per m of width` : `${fixed(m3 / 1e9, 3)} km³`;
}

export function outcomeRows(
  frames: readonly { time: number; numbers: GlacierNumbers }[],
  summary: RunSummary,
  unitWidth: boolean,
  finalLakes: readonly ExposedLake[],
): ReportRow[] {
  const first = frames[0];
  const last = frames[frames.length - 1];
  const a = first.numbers;
  const b = last.numbers;
  const times = frames.map((f) => f.time);
  const halfLength = halfChangeTime(times, frames.map((f) => f.numbers.length));
  const halfVolume = halfChangeTime(times, frames.map((f) => f.numbers.volume));
  const rows: ReportRow[] = [
    { label: `Length, year ${first.time} → ${last.time}`, value: `${fixed(a.length / 1000, 2)} → ${fixed(b.length / 1000, 2)} km` },
    { label: 'Length change', value: `${signed((b.length - a.length) / 1000, 2)} km${percent(b.length - a.length, a.length)}` },
    { label: `Volume, year ${first.time} → ${last.time}`, value: `${volumeText(a.volume, unitWidth)} → ${volumeText(b.volume, unitWidth)}` },
    { label: 'Volume change', value: `${signed(unitWidth ? (b.volume - a.volume) / 1e6 : (b.volume - a.volume) / 1e9, 3)} ${unitWidth ? '× 10⁶ m³ per m of width' : 'km³'}${percent(b.volume - a.volume, a.volume)}` },
    { label: 'Half of the length change by', value: Number.isFinite(halfLength) ? `year ${fixed(first.time + halfLength, 0)}` : 'no change' },
    { label: 'Half of the volume change by', value: Number.isFinite(halfVolume) ? `year ${fixed(first.time + halfVolume, 0)}` : 'no change' },
    { label: `Terminus, year ${last.time}`, value: Number.isFinite(b.terminus) ? `${fixed(b.terminus / 1000, 2)} km from the head` : 'ice-free' },
    { label: `Largest thickness, year ${last.time}`, value: `${fixed(b.maxThickness, 0)} m` },
    { label: `Largest surface speed, year ${last.time}`, value: `${fixed(b.maxSurfaceSpeed, 1)} m a⁻¹` },
  ];
  const r = summary.responseTime;
  if (r) {
    rows.push({
      label: 'Volume response time (e-folding)',
      value: `${Number.isFinite(r.eFoldingYears) ? `${fixed(r.eFoldingYears, 0)} a` : 'not reached'}; estimate H/(−b_t) ${fixed(r.estimateYears, 0)} a`,
    });
  }
  rows.push({ label: 'Steady state at the end', value: summary.endsInSteadyState ? 'yes' : 'no (still changing)' });
  if (finalLakes.length > 0) {
    const deepest = Math.max(...finalLakes.map((l) => l.maxDepth));
    const total = finalLakes.reduce((s, l) => s + l.volume, 0);
    rows.push({
      label: `${LAKES_HEADING}, year ${last.time}`,
      value: `${finalLakes.length} lake${finalLakes.length === 1 ? '' : 's'}, up to ${fixed(deepest, 0)} m deep, together ${formatLakeVolume(total, unitWidth)}`,
    });
  }
  return rows;
}

/** The budget in the run's units: 10⁶ m³, or 10⁶ m³ per m of width for a unit-width flowline. */
export function massBudgetRows(summary: RunSummary, unitWidth: boolean): ReportRow[] {
  const m = summary.massBudget;
  const perWidth = unitWidth ? ' per m of width' : '';
  const v = (x: number) => `${(x / 1e6).toFixed(3).replace('-', '−')} × 10⁶ m³${perWidth}`;
  return [
    { label: 'Ice volume at start / end', value: `${v(m.initialVolume)} / ${v(m.finalVolume)}` },
    { label: 'Surface balance applied', value: v(m.appliedBalance) },
    { label: 'Outflow at the domain end', value: v(m.outflow) },
    ...(m.frontalAblation > 0 ? [{ label: 'Calved into a lake at the ice front', value: v(m.frontalAblation) }] : []),
    { label: 'Residual (relative)', value: `${m.residual.toExponential(1)} m³${perWidth} (${m.relativeResidual.toExponential(1)})` },
  ];
}
