/**
 * The "bed from the surface" job of the analysis worker: the same numbers as invertBed called
 * directly; without fitting, the multiplier is 1 and the points are only compared (misfit of the
 * thickness with A as given); a scenario without an observed terminus fails, naming it.
 */
import { describe, expect, it } from 'vitest';
import observedJson from '../../examples/zindleton-observed.json';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { observationMisfit } from '../../src/model/analysis/observationMisfit';
import { invertBed } from '../../src/model/inversion/invertBed';
import { demoScenario } from '../../src/state/scenarioStore';
import { analysisSteps } from '../../src/worker/analysisJobs';
import { checkedJson } from '../helpers/checkedScenario';

const observed = checkedJson(observedJson);

describe('analysis job: bed from the surface', () => {
  it('fitted: the result of invertBed, bit for bit', () => {
    const result = runToEnd(analysisSteps({ kind: 'inversion', scenario: observed, smoothingMetres: 600, fitRateFactor: true }));
    if (result.kind !== 'inversion') throw new Error(result.kind);
    const direct = invertBed(observed, { smoothingMetres: 600 });
    expect(result.bed.fitted).toBe(true);
    expect(result.bed.inversion.rateFactorMultiplier).toBe(direct.rateFactorMultiplier);
    expect(Array.from(result.bed.inversion.bed)).toEqual(Array.from(direct.bed));
    expect(result.bed.inversion.misfit).toEqual(direct.misfit);
  });

  it('not fitted: multiplier 1, and the misfit of that thickness to the points', () => {
    const result = runToEnd(analysisSteps({ kind: 'inversion', scenario: observed, smoothingMetres: 300, fitRateFactor: false }));
    if (result.kind !== 'inversion') throw new Error(result.kind);
    const r = result.bed.inversion;
    expect(r.rateFactorMultiplier).toBe(1);
    expect(r.rateFactorMultiplierRange).toBeUndefined();
    const m = observationMisfit(r.x, r.thickness, observed.grid.length, observed.observations!.thickness!)!;
    console.info(`not fitted: RMS ${m.rms.toFixed(1)} m, bias ${m.bias.toFixed(1)} m over ${m.count} points`);
    expect(r.misfit).toEqual({ count: 5, rmsMetres: m.rms, biasMetres: m.bias, weightedRms: m.normalisedRms });
    expect(r.statements.at(-1)).toBe('rate factor not fitted: the 5 thickness point(s) are compared only');
  });

  it('without an observed terminus, fails naming it', () => {
    expect(() => runToEnd(analysisSteps({ kind: 'inversion', scenario: demoScenario, smoothingMetres: 300, fitRateFactor: true }))).toThrow(/needs the terminus position/);
  });
});
