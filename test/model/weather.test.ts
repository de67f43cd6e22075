/**
 * Year-to-year weather (model/random): SplitMix64 against its published reference outputs, the
 * Box–Muller normals' moments, purity in (seed, year), the AR(1) autocorrelation, and a steady
 * glacier fluctuating under it with the spread of a linear response model.
 */
import { describe, expect, it } from 'vitest';
import { runScenario } from '../../src/model/runScenario';
import { splitMix64, standardNormal } from '../../src/model/random/splitMix64';
import { createWeather, weatherYear } from '../../src/model/random/weather';
import type { Scenario } from '../../src/model/scenario';
import { straightValley } from '../helpers/testValleys';

describe('SplitMix64 (Steele, Lea & Flood 2014)', () => {
  it('gives the reference outputs of seed 0 exactly (Vigna\'s splitmix64.c; values from memory, confirmed by compiling that C here)', () => {
    expect(splitMix64(0n, 0n).toString(16)).toBe('e220a8397b1dcdaf');
    expect(splitMix64(0n, 1n).toString(16)).toBe('6e789e6aa1b965f4');
    expect(splitMix64(0n, 2n).toString(16).padStart(16, '0')).toBe('06c45d188009454f');
  });
});

describe('Box–Muller normals (Box & Muller 1958)', () => {
  it('have mean 0 and variance 1 over 100,000 draws (within 0.015: 3 standard errors is 0.0095 and 0.013)', () => {
    let sum = 0;
    let sumSq = 0;
    const n = 100_000;
    for (let k = 0; k < n; k++) {
      const z = standardNormal(42n, BigInt(k));
      sum += z;
      sumSq += z * z;
    }
    const mean = sum / n;
    const variance = sumSq / n - mean * mean;
    console.info('Box–Muller: mean', mean.toFixed(4), 'variance', variance.toFixed(4));
    expect(Math.abs(mean)).toBeLessThan(0.015);
    expect(Math.abs(variance - 1)).toBeLessThan(0.015);
  });
});

describe('weather', () => {
  const spec = { temperatureSd: 0.8, precipitationSd: 0.15, seed: 7, ar1: 0.5 };
  it('is a pure function of (seed, year): any order of asking, any time within the year, gives the same numbers bit for bit', () => {
    const inOrder = createWeather(spec);
    const backwards = createWeather(spec);
    const forward = Array.from({ length: 60 }, (_, k) => inOrder.temperatureAt(k + 1));
    const reversed = Array.from({ length: 60 }, (_, k) => backwards.temperatureAt(60 - k)).reverse();
    expect(reversed).toEqual(forward);
    expect(inOrder.precipitationFactorAt(12.25)).toBe(backwards.precipitationFactorAt(13));
  });
  it('applies year k over (k, k + 1] and nothing at t <= 0 (the spin-up)', () => {
    expect(weatherYear(0)).toBe(-1);
    expect(weatherYear(0.5)).toBe(0);
    expect(weatherYear(1)).toBe(0);
    expect(weatherYear(1.0001)).toBe(1);
    const w = createWeather(spec);
    expect(w.temperatureAt(0)).toBe(0);
    expect(w.precipitationFactorAt(-5)).toBe(1);
  });
  it('another seed gives other weather', () => {
    const a = createWeather(spec);
    const b = createWeather({ ...spec, seed: 8 });
    expect(a.temperatureAt(1)).not.toBe(b.temperatureAt(1));
  });
  it('has the asked standard deviation and lag-one autocorrelation over 20,000 years (sd within 5 %, phi within 0.03)', () => {
    const w = createWeather(spec);
    const n = 20_000;
    const a = Array.from({ length: n }, (_, k) => w.temperatureAt(k + 1));
    const mean = a.reduce((s, v) => s + v, 0) / n;
    const variance = a.reduce((s, v) => s + (v - mean) ** 2, 0) / n;
    let lag = 0;
    for (let k = 1; k < n; k++) lag += (a[k] - mean) * (a[k - 1] - mean);
    const phi = lag / (n - 1) / variance;
    console.info('weather: sd', Math.sqrt(variance).toFixed(3), 'K, lag-one autocorrelation', phi.toFixed(3));
    expect(Math.abs(Math.sqrt(variance) / 0.8 - 1)).toBeLessThan(0.05);
    expect(Math.abs(phi - 0.5)).toBeLessThan(0.03);
  });
});

describe('a steady glacier under year-to-year weather', () => {
  const valley: Scenario = straightValley('Weather test valley (invented)', { years: 600, outputEvery: 1 });

  const lengths = (s: Scenario) => {
    const report = runScenario(s);
    return { report, lengths: report.frames.map((f) => f.numbers.length) };
  };

  it('fluctuates with a length spread within a factor 2 of a linear response model (Roe & O\'Neal 2009), and not at all without weather', () => {
    const calm = lengths(valley);
    const windy = lengths({ ...valley, variability: { temperatureSd: 0.8, precipitationSd: 0.1, seed: 11 } });
    const sd = (values: number[]) => {
      const tail = values.slice(100);
      const m = tail.reduce((s, v) => s + v, 0) / tail.length;
      return Math.sqrt(tail.reduce((s, v) => s + (v - m) ** 2, 0) / tail.length);
    };
    expect(sd(calm.lengths)).toBeLessThan(1e-6 * calm.lengths[0]);
    // Linear one-stage model (Roe & O'Neal 2009, J. Glaciol. 55(193); form from memory):
    //   sigma_L = (A / (w H)) sigma_b sqrt(tau dt / 2),  tau = H / (-b_t),
    // with sigma_b from the ELA shift: gradient * elaSensitivity * sigma_T (precipitation adds a little).
    const numbers = calm.report.frames[0].numbers;
    const fields = calm.report.frames[0].fields;
    const last = fields.thickness.findLastIndex((h) => h >= 1);
    const H = numbers.maxThickness;
    const bt = -fields.balance[last] / 0.91; // m ice a^-1 at the terminus
    const tau = H / bt;
    const sigmaB = (0.007 * 100 * 0.8) / 0.91;
    const terminusWidth = 800 - (500 * (last + 0.5) * 100) / 12000; // the scenario's width at the terminus cell
    const expected = (numbers.area / (terminusWidth * H)) * sigmaB * Math.sqrt(tau / 2);
    const measured = sd(windy.lengths);
    console.info('weather: length sd', measured.toFixed(0), 'm; linear-model estimate', expected.toFixed(0), 'm; tau', tau.toFixed(0), 'a');
    // Within a factor 2: the estimate's form is from memory and a linear one-stage model.
    expect(measured).toBeGreaterThan(expected / 2);
    expect(measured).toBeLessThan(expected * 2);
    expect(Math.max(...windy.lengths)).toBeLessThan(11_000); // never pressed against the domain end
    expect(windy.report.summary.massBudget.relativeResidual).toBeLessThanOrEqual(1e-9);
  });

  it('the same seed gives bit-identical runs; the explicit scheme sees the same weather by year', () => {
    const s: Scenario = { ...valley, run: { years: 60, outputEvery: 10 }, variability: { temperatureSd: 0.8, precipitationSd: 0.1, seed: 3, ar1: 0.3 } };
    const a = runScenario(s);
    const b = runScenario(s);
    expect(a.frames.map((f) => Array.from(f.fields.thickness))).toEqual(b.frames.map((f) => Array.from(f.fields.thickness)));
    expect(a.frames.map((f) => f.numbers.warming)).toEqual(b.frames.map((f) => f.numbers.warming));
  });
});
