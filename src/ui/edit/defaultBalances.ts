/**
 * Starting values when the user switches the mass-balance model, placed on this valley so the
 * switch gives a glacier rather than an error. Sources beside each number.
 */
import { max, min } from 'd3';
import type { DegreeDayBalanceSpec, LinearBalanceSpec, MassBalanceSpec, Scenario, TableBalanceSpec } from '../../model/scenario';
import { createMassBalance } from '../../model/physics/massBalance/createMassBalance';

/** Lowest and highest bed elevation and highest surface [m a.s.l.] over the points given. */
export function valleyElevationRange(s: Scenario): [number, number] {
  const zs = [...s.bed, ...(s.surface ?? [])].map(([, z]) => z);
  return [min(zs) ?? Infinity, max(zs) ?? -Infinity];
}

/** ELA of the current balance (year 0), or the middle of the valley when it has none. */
function currentEla(s: Scenario): number {
  const ela = createMassBalance(s.massBalance).equilibriumLineAltitude(0);
  if (Number.isFinite(ela)) return Math.round(ela);
  const [lo, hi] = valleyElevationRange(s);
  return Math.round((lo + hi) / 2);
}

export function defaultBalance(s: Scenario, model: MassBalanceSpec['model']): MassBalanceSpec {
  const ela = currentEla(s);
  const sensitivity = s.massBalance.model !== 'degree-day' ? s.massBalance.elaSensitivity : undefined;
  switch (model) {
    case 'linear': {
      // 0.7 m w.e. per 100 m: within 0.5–1.0 for maritime glaciers (Cuffey & Paterson 2010, ch. 4 [memory]).
      const spec: LinearBalanceSpec = { model: 'linear', ela, ablationGradient: 0.007 };
      if (sensitivity !== undefined) spec.elaSensitivity = sensitivity;
      return spec;
    }
    case 'table': {
      // The current balance sampled over the valley, so the switch changes nothing yet.
      const [lo, hi] = valleyElevationRange(s);
      const balance = createMassBalance(s.massBalance);
      const step = Math.max(50, Math.ceil((hi - lo) / 6 / 50) * 50);
      const points: [number, number][] = [];
      for (let z = Math.floor(lo / 50) * 50; z < hi + step; z += step) {
        points.push([z, Math.max(-100, Math.min(100, Number(balance.balanceAt(z, 0).toFixed(2))))]);
      }
      const spec: TableBalanceSpec = { model: 'table', points };
      if (sensitivity !== undefined) spec.elaSensitivity = sensitivity;
      return spec;
    }
    case 'degree-day': {
      const spec: DegreeDayBalanceSpec = {
        model: 'degree-day',
        referenceElevation: ela,
        // Near −4 °C annual mean at the ELA of a maritime glacier (Ohmura et al. 1992 [memory]).
        meanTemperature: -4,
        amplitude: 8,
        // Standard-atmosphere lapse rate, 6.5 K per km (ICAO).
        lapseRate: 0.0065,
        precipitation: 2,
        // 5 % more precipitation per 100 m of height: common practice.
        precipitationGradient: 0.0005,
        snowThreshold: 1,
        // Degree-day factors: snow ~3–5, ice ~8 mm w.e. d⁻¹ K⁻¹ (Braithwaite 2008; Hock 2003).
        ddfSnow: 4,
        ddfIce: 8,
      };
      return spec;
    }
  }
}
