/**
 * Balance given as a table b(z), as compiled from stake measurements by elevation band:
 * piecewise linear in elevation and constant beyond the ends. Warming shifts the whole table up
 * by elaSensitivity * dT(t), so the profile keeps its shape while the ELA rises; the accumulation
 * (b > 0) is then multiplied by (1 + precipitationPerK / 100)^dT(t) (precipitationChange.ts).
 */
import { piecewiseLinear } from '../../piecewiseLinear';
import type { TableBalanceSpec } from '../../scenario';
import { DEFAULT_ELA_SENSITIVITY } from './linearBalance';
import { findEquilibriumLine, type MassBalanceModel } from './massBalanceModel';
import { precipitationFactor } from './precipitationChange';

export function tableBalance(spec: TableBalanceSpec): MassBalanceModel {
  const profile = piecewiseLinear(spec.points);
  const sensitivity = spec.elaSensitivity ?? DEFAULT_ELA_SENSITIVITY;
  const shiftedBalance = (z: number, warming: number, factor = 1) => {
    const b = profile(z - sensitivity * warming);
    return b > 0 ? b * precipitationFactor(spec.precipitationPerK, warming) * factor : b;
  };
  // The table's own zero crossing (lowest upward crossing), found once and shifted with warming.
  const tableEla = lowestUpwardZeroCrossing(spec.points);
  return {
    balanceAt: shiftedBalance,
    equilibriumLineAltitude: (warming) => tableEla + sensitivity * warming,
  };
}

function lowestUpwardZeroCrossing(points: TableBalanceSpec['points']): number {
  for (let k = 1; k < points.length; k++) {
    const [z0, b0] = points[k - 1];
    const [z1, b1] = points[k];
    if (b0 < 0 && b1 >= 0) return z0 + ((0 - b0) / (b1 - b0)) * (z1 - z0);
  }
  // A table that never changes sign from negative to positive has no ELA.
  return findEquilibriumLine(piecewiseLinear(points));
}
