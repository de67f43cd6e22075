/**
 * Result numbers as people write them in reports: a fixed, sensible number of decimals per
 * quantity, a true minus sign, grouping from five digits on, and a dash when undefined.
 */
const NONE = '—';

// Building a number format is slow (milliseconds); these are made once and reused every frame.
const formats = new Map<number, Intl.NumberFormat>();

function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return NONE;
  let format = formats.get(decimals);
  if (!format) {
    // 'min2': 2960 but 29,600, the way four-digit elevations are written in reports and on axes.
    format = new Intl.NumberFormat('en-GB', {
      minimumFractionDigits: decimals,
      maximumFractionDigits: decimals,
      useGrouping: 'min2' as unknown as boolean,
    });
    formats.set(decimals, format);
  }
  return format.format(value).replace('-', '\u2212');
}

export const formatKm = (metres: number) => (Number.isFinite(metres) ? `${fixed(metres / 1000, 2)} km` : NONE);
export const formatYears = (years: number) => `${fixed(years, Number.isInteger(years) ? 0 : 1)} a`;
export const formatMetres = (metres: number) => (Number.isFinite(metres) ? `${fixed(metres, 0)} m` : NONE);
export const formatElevation = (metres: number) => (Number.isFinite(metres) ? `${fixed(metres, 0)} m a.s.l.` : NONE);
export const formatSpeed = (metresPerYear: number) => (Number.isFinite(metresPerYear) ? `${fixed(metresPerYear, 1)} m a⁻¹` : NONE);
export const formatRatio = (ratio: number) => fixed(ratio, 2);

/** Warming with its sign, since it is a change from year 0. */
export function formatWarming(kelvin: number): string {
  if (!Number.isFinite(kelvin)) return NONE;
  return `${kelvin > 0 ? '+' : ''}${fixed(kelvin, 2)} K`;
}

/**
 * Volume and area depend on whether the scenario gives widths: with widths they are true volumes
 * (km³) and areas (km²); without, the flowline is one metre wide and they are per metre of width.
 */
export function formatVolume(m3: number, unitWidth: boolean): string {
  if (!Number.isFinite(m3)) return NONE;
  return unitWidth ? `${fixed(m3 / 1e6, 3)} × 10⁶ m³ per m of width` : `${fixed(m3 / 1e9, 3)} km³`;
}

/** A volume rate [m^3 a^-1], e.g. the frontal ablation. */
export function formatVolumeRate(m3PerYear: number, unitWidth: boolean): string {
  if (!Number.isFinite(m3PerYear)) return NONE;
  return unitWidth ? `${fixed(m3PerYear / 1e3, 2)} × 10³ m³ a⁻¹ per m of width` : `${fixed(m3PerYear / 1e6, 3)} × 10⁶ m³ a⁻¹`;
}

export function formatArea(m2: number, unitWidth: boolean): string {
  if (!Number.isFinite(m2)) return NONE;
  return unitWidth ? `${fixed(m2 / 1000, 2)} × 10³ m² per m of width` : `${fixed(m2 / 1e6, 2)} km²`;
}
