/**
 * Warnings for a scenario that passed validation: choices that are allowed but physically odd,
 * or that make the run show little (e.g. a domain too short for the ice). Each names the key
 * to look at and says why it is odd.
 */
import { piecewiseLinear } from '../model/piecewiseLinear';
import type { Scenario } from '../model/scenario';
import { balanceWarnings } from './balanceWarnings';
import { curveRange } from './curveRange';
import { formatNumber } from './formatNumber';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import type { ValidationMessage } from './validationMessage';

const fmt = (x: number) => formatNumber(Number(x.toPrecision(6)));
const fmt3 = (x: number) => formatNumber(Number(x.toPrecision(3)));

export function scenarioWarnings(s: Scenario): ValidationMessage[] {
  const warnings: ValidationMessage[] = [];
  const warn = (path: string, message: string) => warnings.push({ path, message });
  const { length, spacing } = s.grid;
  const cells = Math.round(length / spacing);

  if (cells < L.cellsWarnBelow) {
    warn('/grid/spacing', `the grid has only ${cells} cells; fewer than ${L.cellsWarnBelow} resolve a glacier poorly`);
  }

  // Bed.
  const firstX = s.bed[0][0];
  const lastX = s.bed[s.bed.length - 1][0];
  if (firstX > 0 || lastX < length) {
    warn(
      '/bed',
      `the bed points cover x = ${fmt(firstX)} to ${fmt(lastX)} m but the domain runs from 0 to ${fmt(length)} m; beyond the points the bed is held at the end point's elevation`,
    );
  }
  const bed = piecewiseLinear(s.bed);
  if (bed(length) > bed(0)) {
    warn(
      '/bed',
      `the bed rises down-glacier overall, from ${fmt(bed(0))} m at x = 0 to ${fmt(bed(length))} m at x = ${fmt(length)} m; x = 0 is meant to be the head of the valley`,
    );
  }
  const bedRange = curveRange(s.bed, 0, length);

  // Width and shape.
  if (s.width !== undefined) {
    const width = curveRange(s.width, 0, length);
    if (width.max > L.widthRatioWarnAbove * width.min) {
      warn(
        '/width',
        `the width varies from ${fmt(width.min)} to ${fmt(width.max)} m within the domain, more than a factor of ${L.widthRatioWarnAbove}; a flowline model assumes a slowly varying width`,
      );
    }
  } else if (typeof s.shapeFactor === 'object') {
    warn(
      '/shapeFactor',
      `a cross-section shape factor needs the glacier width, but "width" is absent (1 m everywhere), so every section is narrower than the shape-factor table covers; give "width" or a number`,
    );
  }

  // Initial surface.
  if (s.surface !== undefined) {
    const surface = piecewiseLinear(s.surface);
    let iceCells = 0;
    for (let i = 0; i < cells; i++) {
      const x = (i + 0.5) * spacing;
      if (surface(x) > bed(x)) iceCells++;
    }
    const xLast = (cells - 0.5) * spacing;
    if (iceCells === 0) {
      warn('/surface', 'the surface lies at or below the bed in every cell, so the run starts ice-free');
    } else if (surface(xLast) > bed(xLast)) {
      warn(
        '/surface',
        `the initial ice reaches the last cell (x = ${fmt(xLast)} m), so it will flow out of the domain; the domain may be too short`,
      );
    }
  }

  // Ice.
  const { n, A, temperature, enhancement, density } = s.ice;
  if (A !== undefined) {
    const scale = Math.pow(L.referenceStress, n);
    const strainRate = A * scale;
    if (strainRate < L.strainRateWarnMin || strainRate > L.strainRateWarnMax) {
      warn(
        '/ice/A',
        `A = ${fmt(A)} Pa^-${fmt(n)} s^-1 is outside the usual range for glacier ice: for n = ${fmt(n)}, ${fmt3(L.strainRateWarnMin / scale)} to ${fmt3(L.strainRateWarnMax / scale)} Pa^-${fmt(n)} s^-1 (strain rates of ${L.strainRateWarnMin} to ${L.strainRateWarnMax} s^-1 at 100 kPa)`,
      );
    }
  }
  if (temperature !== undefined && n !== 3) {
    warn('/ice/temperature', `A from temperature is calibrated for n = 3, but n = ${fmt(n)}; the value is used as it is`);
  }
  if (enhancement !== undefined && enhancement > L.enhancementWarnAbove) {
    warn('/ice/enhancement', `an enhancement factor of ${fmt(enhancement)} is large; values above ${L.enhancementWarnAbove} are rarely used`);
  }
  if (density !== undefined && (density < L.densityWarnMin || density > L.densityWarnMax)) {
    warn(
      '/ice/density',
      `an ice density of ${fmt(density)} kg m^-3 is outside ${L.densityWarnMin} to ${L.densityWarnMax} kg m^-3, the range from bubbly glacier ice to pure ice`,
    );
  }

  // Sliding.
  if (s.sliding !== undefined && s.sliding.C > 0) {
    const speed = s.sliding.C * Math.pow(L.referenceStress, s.sliding.m);
    if (speed > L.slidingSpeedWarnMax) {
      warn(
        '/sliding/C',
        `at 100 kPa basal shear stress the sliding speed would be ${fmt3(speed)} m a^-1, faster than any glacier observed (over ${formatNumber(L.slidingSpeedWarnMax)} m a^-1)`,
      );
    } else if (speed < L.slidingSpeedWarnMin) {
      warn(
        '/sliding/C',
        `at 100 kPa basal shear stress the sliding speed would be only ${fmt3(speed)} m a^-1, which is negligible; C = 0 turns sliding off`,
      );
    }
  }

  warnings.push(...balanceWarnings(s, bedRange));

  // Run.
  if (s.run.years < 2 * s.run.outputEvery) {
    warn(
      '/run/outputEvery',
      `with an output interval of ${fmt(s.run.outputEvery)} a, a run of ${fmt(s.run.years)} a gives only one output after the start`,
    );
  }
  return warnings;
}
