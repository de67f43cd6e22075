/**
 * The analysis figures of the command line: committed change (run so far, held run, the year held
 * from) and the sensitivity curve (warming-up and cooling-back branches), well-formed SVG with
 * units on the axes, a legend, the version and the caution.
 */
import { describe, expect, it } from 'vitest';
import { committedChangeAtYear } from '../../src/model/analysis/committedChange';
import { sensitivityCurve, warmingLadder } from '../../src/model/analysis/sensitivityCurve';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { committedChangeFigure, sensitivityFigure } from '../../src/figures/analysisFigures';
import { cirqueRun, parseSvg, TEST_VERSION, textsOf } from './figureFixtures';

describe('analysis figures', () => {
  const run = cirqueRun();
  const scenario = run.scenario;

  it('committed change: the run so far and the held run in both panels, a marker at the year held from', () => {
    const result = committedChangeAtYear(scenario, 15);
    const runSoFar = run.frames.filter((f) => f.time <= 15).map((f) => ({ time: f.time, length: f.numbers.length, volume: f.numbers.volume }));
    const doc = parseSvg(committedChangeFigure({ scenario, firnlineVersion: TEST_VERSION, runSoFar, result }));
    const texts = textsOf(doc).join(' | ');
    for (const t of ['Length (km)', 'Model year (a)', 'Run so far', 'Warming held', 'held from 15', `Firnline ${TEST_VERSION}`, 'Idealised model results']) expect(texts).toContain(t);
    expect(doc.querySelectorAll('[data-panel="length"] path.series')).toHaveLength(2);
    expect(doc.querySelectorAll('[data-panel="volume"] path.series')).toHaveLength(2);
  });

  it('sensitivity: both branches in both panels, warming on the shared axis', () => {
    const model = createFlowlineModel(scenario);
    const points = sensitivityCurve(model, model.initialThickness, warmingLadder(0, 1, 0.5));
    const doc = parseSvg(sensitivityFigure({ scenario, firnlineVersion: TEST_VERSION, points }));
    const texts = textsOf(doc).join(' | ');
    for (const t of ['Steady terminus (km)', 'Warming held (K)', 'Warming up', 'Cooling back', `Firnline ${TEST_VERSION}`]) expect(texts).toContain(t);
    expect(doc.querySelectorAll('[data-panel="terminus"] path.series')).toHaveLength(2);
    expect(doc.querySelectorAll('[data-panel="volume"] path.series')).toHaveLength(2);
  });
});
