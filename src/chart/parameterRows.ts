/**
 * The scenario's main parameters as label/value text with units, for the summary panel.
 * Pure, so the wording and units are unit-tested without rendering.
 */
import type { ForcingRow, MassBalanceSpec, Point, Scenario } from '../model/scenario';
import { formatScientific, superscript } from './formatScientific';
import { rateFactorUnit, slidingCoefficientUnit } from './flowUnits';

export interface ParameterRow {
  label: string;
  value: string;
}

export function parameterRows(scenario: Scenario): ParameterRow[] {
  const { grid, ice, sliding } = scenario;
  const cells = Math.round(grid.length / grid.spacing);
  return [
    { label: 'Grid spacing', value: `${formatScientific(grid.spacing)} m (${cells} cells, ${formatScientific(grid.length / 1000)} km)` },
    { label: 'Flow-law exponent n', value: formatScientific(ice.n) },
    { label: 'Rate factor A', value: rateFactorText(scenario) },
    {
      label: 'Sliding',
      value:
        !sliding || sliding.C === 0
          ? 'Off'
          : `C = ${formatScientific(sliding.C)} ${slidingCoefficientUnit(sliding.m)}, m = ${formatScientific(sliding.m)}`,
    },
    ...sectionRows(scenario.section),
    ...massBalanceRows(scenario.massBalance),
    ...debrisRows(scenario.debris),
    ...frontalAblationRows(scenario.frontalAblation),
    ...precipitationRows(scenario.massBalance),
    scenario.forcing && scenario.forcing.length > 0
      ? { label: 'Forcing', value: forcingText(scenario.forcing) }
      : { label: 'Warming', value: warmingText(scenario.warming) },
    ...(scenario.variability
      ? [
          {
            label: 'Year-to-year weather',
            value:
              `temperature sd ${formatScientific(scenario.variability.temperatureSd)} K, precipitation sd ${formatScientific(100 * scenario.variability.precipitationSd)} %, ` +
              `seed ${scenario.variability.seed}${scenario.variability.ar1 ? `, lag-one correlation ${formatScientific(scenario.variability.ar1)}` : ''}`,
          },
        ]
      : []),
  ];
}

function rateFactorText({ ice }: Scenario): string {
  if (ice.A !== undefined) return `${formatScientific(ice.A)} ${rateFactorUnit(ice.n)}`;
  if (ice.temperature !== undefined) {
    const e = ice.enhancement ?? 1;
    return `From ice temperature ${formatScientific(ice.temperature)} °C${e === 1 ? '' : `, E = ${formatScientific(e)}`}`;
  }
  return 'Not given';
}

const BALANCE_GRADIENT_UNIT = `(m w.e. a${superscript(-1)}) m${superscript(-1)}`;

function massBalanceRows(mb: MassBalanceSpec): ParameterRow[] {
  switch (mb.model) {
    case 'linear': {
      const above = mb.accumulationGradient ?? mb.ablationGradient;
      const sensitivity = mb.elaSensitivity ?? 100;
      return [
        { label: 'Mass balance', value: 'Linear in elevation' },
        {
          label: 'ELA',
          value: `${formatScientific(mb.ela, 4)} m a.s.l., rising ${formatScientific(sensitivity)} m per K of warming`,
        },
        above === mb.ablationGradient
          ? { label: 'Balance gradient', value: `${formatScientific(mb.ablationGradient)} ${BALANCE_GRADIENT_UNIT}` }
          : {
              label: 'Ablation / accumulation gradient',
              value: `${formatScientific(mb.ablationGradient)} / ${formatScientific(above)} ${BALANCE_GRADIENT_UNIT}`,
            },
      ];
    }
    case 'table':
      return [
        { label: 'Mass balance', value: `Table of ${mb.points.length} elevations` },
        { label: 'ELA', value: 'Where the table crosses zero' },
      ];
    case 'degree-day':
      return [
        {
          label: 'Mass balance',
          value: mb.dailyTemperatureSd
            ? `Degree-day melt and snowfall, temperature spread ${formatScientific(mb.dailyTemperatureSd)} K (Calov & Greve 2005)`
            : 'Degree-day melt and snowfall',
        },
        { label: 'ELA', value: 'Follows from the climate' },
        ...(mb.refreezingFraction ? [{ label: 'Refreezing', value: `${formatScientific(100 * mb.refreezingFraction)} % of melt and rain, at most 60 % of snowfall (Reeh 1991)` }] : []),
      ];
  }
}

function sectionRows(section: Scenario['section']): ParameterRow[] {
  if (!section) return [];
  if (section.shape === 'rectangular') return [{ label: 'Valley section', value: 'Rectangular: vertical walls at the width' }];
  const L = section.widening ?? 0;
  const wider = `surface ${formatScientific(L)} m wider than the floor at 100 m of ice`;
  if (section.shape === 'parabolic') return [{ label: 'Valley section', value: `Parabolic (U-shaped) over the floor width, ${wider}` }];
  // Flanks at angle theta widen the surface by 2 * 100 m / tan(theta).
  const angle = (Math.atan(200 / L) * 180) / Math.PI;
  return [{ label: 'Valley section', value: `Trapezoidal over the floor width, ${wider} (flanks at ${formatScientific(Number(angle.toPrecision(3)))}°)` }];
}

function debrisRows(debris: Point[] | undefined): ParameterRow[] {
  if (!debris || debris.every(([, h]) => h === 0)) return [];
  const thickest = Math.max(...debris.map(([, h]) => h));
  return [{ label: 'Debris cover', value: `up to ${formatScientific(thickest)} m thick; ablation × 0.066 / (0.066 + h) (Anderson & Anderson 2016)` }];
}

function frontalAblationRows(spec: Scenario['frontalAblation']): ParameterRow[] {
  if (!spec || spec.waterDepthCoefficient === 0) return [];
  return [
    {
      label: 'Frontal ablation',
      value: `calving rate ${formatScientific(spec.waterDepthCoefficient)} a${superscript(-1)} × depth of the lake at the ice front (Brown, Meier & Post 1982)`,
    },
  ];
}

function precipitationRows(mb: MassBalanceSpec): ParameterRow[] {
  const p = mb.precipitationPerK;
  if (p === undefined || p === 0) return [];
  const what = mb.model === 'degree-day' ? 'Precipitation' : 'Accumulation';
  return [{ label: `${what} change`, value: `${p > 0 ? '+' : ''}${formatScientific(p)} % per K of warming (compounded)` }];
}

function forcingText(forcing: ForcingRow[]): string {
  const [t0, dT0, p0] = forcing[0];
  const [t1, dT1, p1] = forcing[forcing.length - 1];
  const factor = (p: number) => `precipitation ×${formatScientific(p)}`;
  if (forcing.length === 1) return `${kelvin(dT0)}, ${factor(p0)} throughout`;
  return `${forcing.length} rows, year ${formatScientific(t0)} (${kelvin(dT0)}, ${factor(p0)}) to year ${formatScientific(t1)} (${kelvin(dT1)}, ${factor(p1)}), then held`;
}

function kelvin(dT: number): string {
  return `${dT > 0 ? '+' : ''}${formatScientific(dT)} K`;
}

function warmingText(warming: Point[] | undefined): string {
  if (!warming || warming.length === 0 || warming.every(([, dT]) => dT === 0)) return 'None';
  if (warming.length === 1) return `${kelvin(warming[0][1])} throughout`;
  const [t0, dT0] = warming[0];
  const [t1, dT1] = warming[warming.length - 1];
  const steps = warming.length > 2 ? ` through ${warming.length} points` : '';
  return `${kelvin(dT0)} at year ${formatScientific(t0)} to ${kelvin(dT1)} at year ${formatScientific(t1)}${steps}, then held`;
}
