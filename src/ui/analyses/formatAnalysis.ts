/** Changes and parameters as the analyses print them: signed, with units, true minus signs. */
import { formatKm, formatVolume } from '../results/formatResult';

const sign = (value: number) => (value > 0 ? '+' : '');

export const formatKmChange = (metres: number) => (Number.isFinite(metres) ? `${sign(metres)}${formatKm(metres)}` : '—');
export const formatVolumeChange = (m3: number, unitWidth: boolean) => (Number.isFinite(m3) ? `${sign(m3)}${formatVolume(m3, unitWidth)}` : '—');

/** Per cent of a starting value, signed, one decimal; a dash when the start is zero. */
export function formatPercentChange(change: number, start: number): string {
  if (!(start > 0) || !Number.isFinite(change)) return '—';
  const percent = (100 * change) / start;
  return `${sign(percent)}${percent.toFixed(1).replace('-', '\u2212')} %`;
}

/** Volume for a chart axis: km³, or 10⁶ m³ per metre of width (m³ m⁻¹, short enough for an axis) for a unit-width flowline. */
export function volumeAxis(unitWidth: boolean): { title: string; scale: (m3: number) => number } {
  return unitWidth ? { title: 'Volume (10⁶ m³ m⁻¹)', scale: (v) => v / 1e6 } : { title: 'Volume (km³)', scale: (v) => v / 1e9 };
}
