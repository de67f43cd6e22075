/**
 * The experiment figure: one line per member in each of the length and volume panels, the
 * members named in the legend, and a spread band per swept variant.
 */
import { describe, expect, it } from 'vitest';
import { experimentFigure, MAX_LEGEND_MEMBERS, type ExperimentFigureMember } from '../../src/figures/experimentFigure';
import { memberStyle } from '../../src/ui/experiments/memberStyles';
import { cirqueRun, parseSvg, TEST_VERSION, textsOf } from './figureFixtures';

function member(index: number, group: number, warming: number): ExperimentFigureMember {
  const run = cirqueRun({ warming: [[0, 0], [30, warming]] });
  return {
    name: `+${warming} K by year 30`,
    group,
    style: memberStyle(index),
    times: run.frames.map((f) => f.time),
    length: run.frames.map((f) => f.numbers.length),
    volume: run.frames.map((f) => f.numbers.volume),
  };
}

const base = cirqueRun().scenario;
const members = [member(0, 0, 0), member(1, 0, 1), member(2, 1, 2)];

describe('experiment figure', () => {
  it('draws each member in both panels, named in the legend, with units on the axes', () => {
    const doc = parseSvg(experimentFigure({ experimentName: 'Cirque ladder (invented)', base, members, bands: false, firnlineVersion: TEST_VERSION, caption: true }));
    const texts = textsOf(doc).join(' | ');
    for (const t of ['Cirque ladder (invented)', 'Length (km)', 'Volume (106 m3 per m of width)', 'Model year (a)', '+0 K by year 30', '+2 K by year 30', `Firnline ${TEST_VERSION}`]) {
      expect(texts).toContain(t);
    }
    expect(doc.querySelectorAll('[data-panel="length"] path.series')).toHaveLength(3);
    expect(doc.querySelectorAll('[data-panel="volume"] path.series')).toHaveLength(3);
    expect(doc.querySelectorAll('path.band')).toHaveLength(0);
    const strokes = Array.from(doc.querySelectorAll('[data-panel="length"] path.series'), (p) => p.getAttribute('stroke'));
    expect(strokes).toEqual(members.map((m) => m.style.colour));
  });

  it('shades the spread of each group that has two or more members, in both panels', () => {
    const doc = parseSvg(experimentFigure({ experimentName: 'Cirque sweep', base, members, bands: true, firnlineVersion: TEST_VERSION, caption: false }));
    // Group 0 has two members, group 1 one: one band per panel.
    expect(doc.querySelectorAll('path.band')).toHaveLength(2);
    expect(textsOf(doc)).toContain('Range over the sweep');
  });

  it('for an ensemble, shades the 5–95 % and 17–83 % percentiles of each ensemble group', () => {
    const ensemble = [member(0, 0, 0), member(1, 0, 1), member(2, 0, 2)].map((m) => ({ ...m, ensembleGroup: 0 }));
    const doc = parseSvg(experimentFigure({ experimentName: 'Cirque ensemble', base, members: ensemble, bands: false, percentileBands: true, firnlineVersion: TEST_VERSION, caption: false }));
    // One group, two bands, two panels.
    expect(doc.querySelectorAll('path.band')).toHaveLength(4);
    expect(textsOf(doc)).toContain('5–95 % of the ensemble');
    expect(textsOf(doc)).toContain('17–83 % of the ensemble');
    expect(textsOf(doc)).not.toContain('Range over the sweep');
  });

  it('names at most 21 members and says how many more there are', () => {
    const many = Array.from({ length: 25 }, (_, k) => ({ ...members[0], name: `member ${k + 1}`, style: memberStyle(k) }));
    const doc = parseSvg(experimentFigure({ experimentName: 'Many', base, members: many, bands: false, firnlineVersion: TEST_VERSION, caption: false }));
    const names = textsOf(doc).filter((t) => t.startsWith('member '));
    expect(names).toHaveLength(MAX_LEGEND_MEMBERS);
    expect(textsOf(doc)).toContain('and 4 more members');
    expect(doc.querySelectorAll('[data-panel="length"] path.series')).toHaveLength(25);
  });
});
