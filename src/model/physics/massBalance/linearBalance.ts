/**
 * Linear balance profile around an equilibrium line (the usual "balance gradient" model,
 * e.g. Cuffey & Paterson 2010, section 4.4; Oerlemans 2001, Glaciers and Climate Change, ch. 2):
 *
 *   b(z) = gradient * (z - ELA)              for z < ELA  (ablation zone)
 *   b(z) = accumulationGradient * (z - ELA)  for z >= ELA, at most maxAccumulation
 *   ELA(t) = ela + elaSensitivity * dT(t)
 *   accumulation (b > 0) times (1 + precipitationPerK / 100)^dT(t)   (precipitationChange.ts)
 *
 * b in m w.e. a^-1, gradients in (m w.e. a^-1) per metre, elaSensitivity in m K^-1.
 */
import type { LinearBalanceSpec } from '../../scenario';
import type { MassBalanceModel } from './massBalanceModel';
import { precipitationFactor as precipitationFactorAt } from './precipitationChange';

/** Default ELA rise per kelvin [m K^-1]; published values 90-130 m K^-1 (Ambach 1989; Larocca et al. 2024). */
export const DEFAULT_ELA_SENSITIVITY = 100;

export function linearBalance(spec: LinearBalanceSpec): MassBalanceModel {
  const ablationGradient = spec.ablationGradient;
  const accumulationGradient = spec.accumulationGradient ?? spec.ablationGradient;
  const cap = spec.maxAccumulation ?? Number.POSITIVE_INFINITY;
  const sensitivity = spec.elaSensitivity ?? DEFAULT_ELA_SENSITIVITY;
  const elaAt = (warming: number): number => spec.ela + sensitivity * warming;
  return {
    balanceAt(z, warming, precipitationFactor = 1) {
      const height = z - elaAt(warming);
      if (height < 0) return ablationGradient * height;
      return Math.min(accumulationGradient * height, cap) * precipitationFactorAt(spec.precipitationPerK, warming) * precipitationFactor;
    },
    equilibriumLineAltitude: elaAt,
  };
}
