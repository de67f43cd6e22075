/**
 * Observations on the exported figures, as on the screen: measured thickness as the bed it implies
 * (with error bars), measured surface speeds with error bars, the observed terminus, each with a
 * legend entry naming the year; and the report sheet's misfit rows. Without observations the
 * figures are unchanged.
 */
import { describe, expect, it } from 'vitest';
import { alongFlowFigure } from '../../src/figures/alongFlowFigure';
import { profileFigure } from '../../src/figures/profileFigure';
import { reportMisfitRows } from '../../src/ui/export/reportSheet';
import { cirqueRun, parseSvg, textsOf } from './figureFixtures';

const observations = {
  year: 30,
  terminus: 2000,
  thickness: [
    [800, 60, 8],
    [1400, 50, 6],
  ],
  surfaceSpeed: [
    [900, 8, 2],
    [1500, 6, 1.5],
    [1900, 3, 1],
  ],
};
const observed = cirqueRun({ observations });
const plain = cirqueRun();

describe('observations on the figures', () => {
  it('long profile: implied bed with error bars, observed terminus, legend entries with the year', () => {
    const doc = parseSvg(profileFigure(observed, { years: [30], caption: false }));
    const texts = textsOf(doc);
    expect(texts).toContain('Bed implied by measured thickness, year 30');
    expect(texts).toContain('Observed terminus, year 30');
    expect(doc.querySelectorAll('g.observations-thickness circle')).toHaveLength(2);
    expect(doc.querySelectorAll('g.observed-terminus path')).toHaveLength(1);
  });

  it('a terminus record: the position of the observation year is drawn', () => {
    const record = cirqueRun({ observations: { year: 10, terminus: [[0, 2400], [20, 2000]] } });
    const doc = parseSvg(profileFigure(record, { years: [30], caption: false }));
    expect(textsOf(doc)).toContain('Observed terminus, year 10');
    expect(doc.querySelectorAll('g.observed-terminus path')).toHaveLength(1);
  });

  it('speed figure: measured speeds with error bars in the speed panel, and a legend entry', () => {
    const doc = parseSvg(alongFlowFigure(observed, { year: 30, caption: false }));
    expect(textsOf(doc)).toContain('Measured surface speed, year 30');
    expect(doc.querySelectorAll('g[data-panel="speed"] g.observations-speed circle')).toHaveLength(3);
  });

  it('without observations, no marks and no legend entries', () => {
    const profile = profileFigure(plain, { years: [30], caption: false });
    const speed = alongFlowFigure(plain, { year: 30, caption: false });
    expect(profile).not.toContain('observations');
    expect(speed).not.toContain('observations');
    expect(profile).not.toContain('Observed terminus');
  });

  it('report sheet: misfit rows (RMS, bias, count) for thickness and speed at the shown year; none without observations', () => {
    const rows = reportMisfitRows(observed, 30);
    expect(rows.map((r) => r.label)).toEqual(['Thickness (2 points)', 'Surface speed (3 points)', 'Compared']);
    expect(rows[0].value).toMatch(/^RMS \d+ m, bias [+−]?\d+ m$/);
    expect(rows[1].value).toMatch(/^RMS \d+\.\d m a⁻¹, bias [+−]?\d+\.\d m a⁻¹$/);
    expect(rows[2].value).toBe('model year 30 with observations of year 30');
    expect(reportMisfitRows(plain, 30)).toEqual([]);
  });
});
