/**
 * Warnings about the mass balance against the bed: no accumulation area (the glacier cannot exist),
 * accumulation everywhere (the ice will run off the end of the domain), and the same at the
 * warmest and coolest points of the run. Also odd but valid table and degree-day parameters.
 */
import { degreeDayBalance } from '../model/physics/massBalance/degreeDayBalance';
import { DEFAULT_ELA_SENSITIVITY } from '../model/physics/massBalance/linearBalance';
import { warmingPoints } from '../model/climate';
import type { Scenario } from '../model/scenario';
import { curveRange, type ValueRange } from './curveRange';
import { formatNumber } from './formatNumber';
import type { ValidationMessage } from './validationMessage';

/** Elevations at which a degree-day balance is tried between the lowest and highest bed. */
const BED_SAMPLES = 100;

const fmt = (x: number) => formatNumber(Number(x.toPrecision(6)));

export function balanceWarnings(s: Scenario, bed: ValueRange): ValidationMessage[] {
  const warnings: ValidationMessage[] = [];
  const mb = s.massBalance;
  const points = warmingPoints(s);
  const warming = points === undefined ? { min: 0, max: 0 } : curveRange(points, 0, s.run.years);
  const noAccumulation = `there is no accumulation area on the bed, so the glacier cannot grow from ice-free ground and will shrink away`;
  const allAccumulation = `the whole bed gains mass, so the ice will reach the end of the domain (the domain may be too short)`;

  if (mb.model === 'linear') {
    const sensitivity = mb.elaSensitivity ?? DEFAULT_ELA_SENSITIVITY;
    const highest = `the highest bed point in the domain (${fmt(bed.max)} m)`;
    const lowest = `the lowest bed point in the domain (${fmt(bed.min)} m)`;
    if (mb.ela >= bed.max) {
      warnings.push({ path: '/massBalance/ela', message: `the ELA (${fmt(mb.ela)} m) is at or above ${highest}: ${noAccumulation}` });
    } else if (mb.ela <= bed.min) {
      warnings.push({ path: '/massBalance/ela', message: `the ELA (${fmt(mb.ela)} m) is at or below ${lowest}: ${allAccumulation}` });
    }
    const warmest = mb.ela + sensitivity * warming.max;
    const coolest = mb.ela + sensitivity * warming.min;
    if (warming.max > 0 && mb.ela < bed.max && warmest >= bed.max) {
      warnings.push({
        path: '/warming',
        message: `at the largest warming of the run (${fmt(warming.max)} K) the ELA rises to ${fmt(warmest)} m, at or above ${highest}: ${noAccumulation}`,
      });
    }
    if (warming.min < 0 && mb.ela > bed.min && coolest <= bed.min) {
      warnings.push({
        path: '/warming',
        message: `at the largest cooling of the run (${fmt(warming.min)} K) the ELA falls to ${fmt(coolest)} m, at or below ${lowest}: ${allAccumulation}`,
      });
    }
  } else if (mb.model === 'table') {
    const sensitivity = mb.elaSensitivity ?? DEFAULT_ELA_SENSITIVITY;
    // Shifting the table up by d gives b(z) = table(z - d).
    const balanceOnBed = (shift: number) => curveRange(mb.points, bed.min - shift, bed.max - shift);
    const now = balanceOnBed(0);
    if (now.max <= 0) {
      warnings.push({
        path: '/massBalance/points',
        message: `the table's balance is at most ${fmt(now.max)} m w.e. a^-1 between the lowest and highest bed points (${fmt(bed.min)} to ${fmt(bed.max)} m): ${noAccumulation}`,
      });
    } else if (now.min > 0) {
      warnings.push({
        path: '/massBalance/points',
        message: `the table's balance is at least ${fmt(now.min)} m w.e. a^-1 between the lowest and highest bed points (${fmt(bed.min)} to ${fmt(bed.max)} m): ${allAccumulation}`,
      });
    }
    if (warming.max > 0 && now.max > 0 && balanceOnBed(sensitivity * warming.max).max <= 0) {
      warnings.push({
        path: '/warming',
        message: `at the largest warming of the run (${fmt(warming.max)} K) the table shifts up by ${fmt(sensitivity * warming.max)} m and gives no positive balance on the bed: ${noAccumulation}`,
      });
    }
    if (warming.min < 0 && now.min <= 0 && balanceOnBed(sensitivity * warming.min).min > 0) {
      warnings.push({
        path: '/warming',
        message: `at the largest cooling of the run (${fmt(warming.min)} K) the table shifts down by ${fmt(-sensitivity * warming.min)} m and gives a positive balance on the whole bed: ${allAccumulation}`,
      });
    }
    const falling = mb.points.findIndex((p, i) => i > 0 && p[1] < mb.points[i - 1][1]);
    if (falling > 0) {
      warnings.push({
        path: `/massBalance/points/${falling}/1`,
        message: `the balance falls with elevation here (from ${fmt(mb.points[falling - 1][1])} to ${fmt(mb.points[falling][1])} m w.e. a^-1), which is unusual`,
      });
    }
  } else {
    if (mb.ddfIce < mb.ddfSnow) {
      warnings.push({
        path: '/massBalance/ddfIce',
        message: `the degree-day factor for ice (${fmt(mb.ddfIce)}) is smaller than that for snow (${fmt(mb.ddfSnow)} mm w.e. K^-1 d^-1); ice, being darker, usually melts faster`,
      });
    }
    // Precipitation varies linearly with height, so its extremes on the bed are at the bed's extremes.
    for (const z of [bed.min, bed.max]) {
      const factor = 1 + mb.precipitationGradient * (z - mb.referenceElevation);
      if (factor < 0 && mb.precipitation > 0) {
        warnings.push({
          path: '/massBalance/precipitationGradient',
          message: `with this gradient the precipitation would be negative at ${fmt(z)} m on the bed (${fmt(factor)} times the reference value) and is taken as zero there`,
        });
        break;
      }
    }
    // The degree-day balance has no ELA parameter: judge it on a ladder of bed elevations.
    const model = degreeDayBalance(mb);
    const balanceOnBed = (dT: number): ValueRange => {
      let min = Infinity;
      let max = -Infinity;
      for (let k = 0; k <= BED_SAMPLES; k++) {
        const b = model.balanceAt(bed.min + ((bed.max - bed.min) * k) / BED_SAMPLES, dT);
        min = Math.min(min, b);
        max = Math.max(max, b);
      }
      return { min, max };
    };
    const between = `between the lowest and highest bed points (${fmt(bed.min)} to ${fmt(bed.max)} m)`;
    const now = balanceOnBed(0);
    if (now.max <= 0) {
      warnings.push({
        path: '/massBalance',
        message: `the degree-day balance is at most ${fmt(now.max)} m w.e. a^-1 ${between}: ${noAccumulation}`,
      });
    } else if (now.min > 0) {
      warnings.push({
        path: '/massBalance',
        message: `the degree-day balance is at least ${fmt(now.min)} m w.e. a^-1 ${between}: ${allAccumulation}`,
      });
    }
    if (warming.max > 0 && now.max > 0 && balanceOnBed(warming.max).max <= 0) {
      warnings.push({
        path: '/warming',
        message: `at the largest warming of the run (${fmt(warming.max)} K) the degree-day balance is negative ${between}: ${noAccumulation}`,
      });
    }
    if (warming.min < 0 && now.min <= 0 && balanceOnBed(warming.min).min > 0) {
      warnings.push({
        path: '/warming',
        message: `at the largest cooling of the run (${fmt(warming.min)} K) the degree-day balance is positive ${between}: ${allAccumulation}`,
      });
    }
  }
  return warnings;
}
