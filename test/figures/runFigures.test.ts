/**
 * The exported figures are well-formed SVG with the axes, units, legend, years, exaggeration and
 * caption a report figure needs, and one path per series.
 */
import { describe, expect, it } from 'vitest';
import { alongFlowFigure } from '../../src/figures/alongFlowFigure';
import { profileFigure, sequenceColours } from '../../src/figures/profileFigure';
import { runFigures } from '../../src/figures/runFigures';
import { timeSeriesFigure } from '../../src/figures/timeSeriesFigure';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { cirqueRun, parseSvg, TEST_VERSION, textsOf } from './figureFixtures';

const run = cirqueRun();
const joined = (doc: Document) => textsOf(doc).join(' | ');

describe('long-profile figure', () => {
  it('at one year: bed, ice and ELA with units, the year, the exaggeration and the caption', () => {
    const doc = parseSvg(profileFigure(run, { years: [30], caption: true }));
    const all = joined(doc);
    expect(all).toContain('Distance down-valley (km)');
    expect(all).toContain('Elevation (m a.s.l.)');
    expect(all).toContain('Long profile, year 30');
    expect(all).toContain('Ice, year 30');
    expect(all).toMatch(/Vertical exaggeration ×\d+\.\d/);
    expect(all).toContain('ELA 2880 m a.s.l.');
    expect(all).toContain(`Firnline ${TEST_VERSION}`);
    expect(all).toContain('Grid spacing: 100 m (30 cells, 3 km)');
    // The caution is wrapped over lines; its words are all there.
    expect(all.replace(/ \| /g, ' ')).toContain(CAUTION_TEXT.slice(0, 60));
    expect(doc.querySelectorAll('path.ice-surface')).toHaveLength(1);
    expect(doc.querySelectorAll('path.ice-fill')).toHaveLength(1);
    const svg = doc.documentElement;
    expect(svg.getAttribute('width')).toBe('170mm');
  });

  it('draws a debris cover as a band along the surface, with its thickness in the legend, tooltip and caption', () => {
    const covered = cirqueRun({ debris: [[1000, 0], [2000, 0.3]] });
    const doc = parseSvg(profileFigure(covered, { years: [30], caption: true }));
    const all = joined(doc);
    expect(doc.querySelectorAll('path.debris-band').length).toBeGreaterThan(0);
    expect(all).toMatch(/Debris cover \(up to 0\.\d+ m thick\)/);
    expect(doc.querySelector('path.debris-band title')?.textContent).toMatch(/^Debris cover, up to 0\.\d+ m thick, /);
    expect(all.replace(/ \| /g, ' ')).toContain('Debris cover: up to 0.3 m thick');
  });

  it('without the caption keeps the version and caution footer', () => {
    const all = joined(parseSvg(profileFigure(run, { years: [30], caption: false })));
    expect(all).not.toContain('Grid spacing');
    expect(all).toContain(`Firnline ${TEST_VERSION}`);
  });

  it('as a snapshot series: one surface path and one legend entry per year, in an ordered sequence', () => {
    const doc = parseSvg(profileFigure(run, { years: [0, 15, 30, 45, 50], caption: false }));
    const paths = Array.from(doc.querySelectorAll('path.ice-surface'));
    expect(paths.map((p) => p.getAttribute('data-year'))).toEqual(['0', '15', '30', '45', '50']);
    expect(paths.map((p) => p.getAttribute('stroke'))).toEqual(sequenceColours(5));
    const legend = textsOf(doc).filter((t) => t.startsWith('Ice surface, year'));
    expect(legend).toEqual(['Ice surface, year 0', 'Ice surface, year 15', 'Ice surface, year 30', 'Ice surface, year 45', 'Ice surface, year 50']);
    expect(joined(doc)).toContain('Long profile, years 0–50');
  });

  it('is the same text for the same run (no clock, no randomness)', () => {
    expect(profileFigure(cirqueRun(), { years: [50], caption: true })).toBe(profileFigure(run, { years: [50], caption: true }));
  });

  it('draws the ice inside the plot frame and between bed and the axis top', () => {
    const doc = parseSvg(profileFigure(run, { years: [0], caption: false }));
    const frame = doc.querySelector('rect.frame')!;
    const left = Number(frame.getAttribute('x'));
    const top = Number(frame.getAttribute('y'));
    const right = left + Number(frame.getAttribute('width'));
    const bottom = top + Number(frame.getAttribute('height'));
    const d = doc.querySelector('path.ice-fill')!.getAttribute('d')!;
    for (const [, x, y] of d.matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)) {
      expect(Number(x)).toBeGreaterThanOrEqual(left - 0.01);
      expect(Number(x)).toBeLessThanOrEqual(right + 0.01);
      expect(Number(y)).toBeGreaterThanOrEqual(top - 0.01);
      expect(Number(y)).toBeLessThanOrEqual(bottom + 0.01);
    }
  });
});

describe('along-flow figure', () => {
  it('has speed (surface, sliding) and stress panels with units: one path per series', () => {
    const doc = parseSvg(alongFlowFigure(run, { year: 50, caption: false }));
    const all = joined(doc);
    expect(all).toContain('Speed (m a-1)');
    expect(all).toContain('Driving stress (kPa)');
    expect(all).toContain('Distance down-valley (km)');
    expect(all).toContain('year 50');
    expect(Array.from(doc.querySelectorAll('path.series'), (p) => p.getAttribute('class'))).toEqual([
      'series series-surface-speed',
      'series series-sliding-speed',
      'series series-driving-stress',
    ]);
  });
});

describe('time-series figure', () => {
  it('has length, volume, ELA and warming panels with units on one time axis', () => {
    const doc = parseSvg(timeSeriesFigure(run, { caption: false, markYear: 30 }));
    const all = joined(doc);
    for (const title of ['Length (km)', 'Volume (106 m3 per m of width)', 'ELA (m a.s.l.)', 'Warming (K)', 'Model year (a)', 'year 30']) {
      expect(all).toContain(title);
    }
    expect(doc.querySelectorAll('path.series')).toHaveLength(4);
    // Model year 50 is the last output: the time axis ends at 50.
    const labels = textsOf(doc);
    expect(labels).toContain('50');
  });

  it('names the volume in km³ when the scenario has widths', () => {
    const wide = cirqueRun({ width: [[0, 800], [3000, 400]] });
    expect(joined(parseSvg(timeSeriesFigure(wide, { caption: false })))).toContain('Volume (km3)');
  });
});

describe('the standard figure set', () => {
  it('names four files as the browser names them (outputs 0-50 a: snapshots every 10 a, final year 50), each well-formed', () => {
    const files = runFigures(run);
    expect(files.map((f) => f.fileName)).toEqual(['profile-snapshots-every-10a.svg', 'profile-year-50.svg', 'along-flow-year-50.svg', 'time-series.svg']);
    for (const f of files) expect(() => parseSvg(f.svg)).not.toThrow();
  });
});
