/**
 * Year-to-year weather: a temperature anomaly [K] and a precipitation factor [-] for each model
 * year, added to the scenario's climate (model/climate.ts).
 *
 *   e_T(k), e_P(k)   standard normal, Box–Muller from SplitMix64 (splitMix64.ts), stream `seed`,
 *                    draws 4k..4k+3 (two normals per year: temperature, then precipitation)
 *   a(0) = e(0);  a(k) = phi a(k-1) + sqrt(1 - phi^2) e(k)     AR(1) with unit variance
 *   dT'(k) = temperatureSd a_T(k)                                [K]
 *   P'(k)  = max(0, 1 + precipitationSd a_P(k))                  [-]
 *
 * The weather of model year k applies over the times (k, k + 1]: the implicit step takes its
 * climate at the end of the step, so a step over year k sees year k's weather; at t <= 0 (the
 * spin-up and year 0 itself) there is none. Each value is a pure function of (seed, k): the
 * series is built from year 0 upwards once and kept, whatever order the years are asked in.
 * An AR(1) process for interannual climate noise is common practice (e.g. the red-noise model of
 * Hasselmann 1976, Tellus 28; from memory); the sizes are the user's.
 */
import { standardNormal } from './splitMix64';

export interface VariabilitySpecLike {
  temperatureSd: number;
  precipitationSd: number;
  seed: number;
  ar1?: number;
}

export interface Weather {
  /** Temperature anomaly [K] of the model year containing time t (k < t <= k + 1). */
  temperatureAt: (time: number) => number;
  /** Precipitation factor [-] of the model year containing time t. */
  precipitationFactorAt: (time: number) => number;
}

/** Model year whose weather applies at time t [a], or -1 for t <= 0. */
export function weatherYear(time: number): number {
  return time > 0 ? Math.ceil(time) - 1 : -1;
}

export function createWeather(spec: VariabilitySpecLike): Weather {
  const seed = BigInt(spec.seed);
  const phi = spec.ar1 ?? 0;
  const innovation = Math.sqrt(1 - phi * phi);
  const temperature: number[] = [];
  const precipitation: number[] = [];
  const extendTo = (k: number) => {
    for (let j = temperature.length; j <= k; j++) {
      const eT = standardNormal(seed, BigInt(2 * j));
      const eP = standardNormal(seed, BigInt(2 * j + 1));
      temperature.push(j === 0 ? eT : phi * temperature[j - 1] + innovation * eT);
      precipitation.push(j === 0 ? eP : phi * precipitation[j - 1] + innovation * eP);
    }
  };
  return {
    temperatureAt(time) {
      const k = weatherYear(time);
      if (k < 0) return 0;
      extendTo(k);
      return spec.temperatureSd * temperature[k];
    },
    precipitationFactorAt(time) {
      const k = weatherYear(time);
      if (k < 0) return 1;
      extendTo(k);
      return Math.max(0, 1 + spec.precipitationSd * precipitation[k]);
    },
  };
}
