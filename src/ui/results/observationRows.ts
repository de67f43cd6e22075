/**
 * The misfit rows of the numbers panel: modelled minus observed thickness and surface speed at the
 * shown model year (model/analysis/observationMisfit.ts), worded with units. Pure, so it is tested
 * on plain data.
 */
import { observationMisfit, type Misfit } from '../../model/analysis/observationMisfit';
import type { Observations } from '../../model/scenario';
import { formatRatio } from './formatResult';

export interface ObservationRow {
  label: string;
  value: string;
}

const signed = (v: number, decimals: number): string => {
  const text = Math.abs(v).toFixed(decimals);
  return Number(text) === 0 ? text : `${v < 0 ? '\u2212' : '+'}${text}`;
};

function describe(m: Misfit, unit: string, decimals: number): string {
  const parts = [
    `RMS ${m.rms.toFixed(decimals)} ${unit}`,
    `bias ${signed(m.bias, decimals)} ${unit}`,
  ];
  if (Number.isFinite(m.weightedRms)) parts.push(`weighted RMS ${m.weightedRms.toFixed(decimals)} ${unit}`);
  if (Number.isFinite(m.normalisedRms)) parts.push(`RMS/uncertainty ${formatRatio(m.normalisedRms)}`);
  parts.push(`${m.count} point${m.count === 1 ? '' : 's'}${m.outside ? ` (${m.outside} outside the domain left out)` : ''}`);
  return parts.join(', ');
}

/**
 * Rows for thickness and surface speed, where the scenario has such observations: modelled fields
 * at cell centres `x` over a domain of `lengthM` m at model year `time`.
 */
export function observationRows(
  observations: Observations | undefined,
  fields: { x: ArrayLike<number>; thickness: ArrayLike<number>; surfaceSpeed: ArrayLike<number>; lengthM: number; time: number },
): ObservationRow[] {
  if (!observations) return [];
  const rows: ObservationRow[] = [];
  const { x, lengthM } = fields;
  const thickness = observations.thickness?.length ? observationMisfit(x, fields.thickness, lengthM, observations.thickness) : null;
  const speed = observations.surfaceSpeed?.length ? observationMisfit(x, fields.surfaceSpeed, lengthM, observations.surfaceSpeed) : null;
  if (observations.thickness?.length) {
    rows.push({ label: 'Thickness, model − observed', value: thickness ? describe(thickness, 'm', 0) : 'no observation inside the domain' });
  }
  if (observations.surfaceSpeed?.length) {
    rows.push({ label: 'Surface speed, model − observed', value: speed ? describe(speed, 'm a⁻¹', 1) : 'no observation inside the domain' });
  }
  if (rows.length) {
    const year = observations.year ?? 0;
    rows.push({
      label: 'Observations compared',
      value: year === fields.time ? `of year ${year}, at the same model year` : `of year ${year}, compared at model year ${fields.time}: select year ${year} to compare like with like`,
    });
  }
  return rows;
}
