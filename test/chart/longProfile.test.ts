import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../src/model/scenario';
import {
  exaggerationLabel,
  longProfileGeometry,
  sampleScenario,
  scenarioEla,
  verticalExaggeration,
  type PlotSize,
  type ProfileSamples,
} from '../../src/chart/longProfile';

/** Three 100 m cells, centres at 50, 150 and 250 m. */
function threeCells(overrides: Partial<Scenario> = {}): Scenario {
  return {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 300, spacing: 100 },
    bed: [
      [0, 1000],
      [300, 970],
    ],
    // At the centres: 1025 - 40 * 50/200 = 1015, 1025 - 40 * 150/200 = 995, 985 - 30 * 50/100 = 970.
    surface: [
      [0, 1025],
      [200, 985],
      [300, 955],
    ],
    ice: { n: 3, A: 2.4e-24 },
    massBalance: { model: 'linear', ela: 1000, ablationGradient: 0.007 },
    run: { years: 10, outputEvery: 1 },
    ...overrides,
  };
}

const NO_MARGIN: PlotSize = { width: 400, height: 300, margin: { top: 0, right: 0, bottom: 0, left: 0 } };

describe('sampleScenario', () => {
  it('samples bed and surface at cell centres and clips the surface to the bed', () => {
    const s = sampleScenario(threeCells());
    expect(s.x).toEqual([50, 150, 250]);
    expect(s.bed).toEqual([995, 985, 975]);
    // The third surface value (970) lies 5 m below the bed: no ice there, surface on the bed.
    expect(s.thickness).toEqual([20, 10, 0]);
    expect(s.surface).toEqual([1015, 995, 975]);
  });

  it('treats a scenario without a surface as ice-free', () => {
    const s = sampleScenario(threeCells({ surface: undefined }));
    expect(s.thickness).toEqual([0, 0, 0]);
    expect(s.surface).toEqual(s.bed);
  });

  it('holds the bed constant beyond its first and last point', () => {
    const s = sampleScenario(
      threeCells({
        bed: [
          [100, 1000],
          [200, 900],
        ],
      }),
    );
    expect(s.bed).toEqual([1000, 950, 900]);
  });
});

describe('scenarioEla', () => {
  it('gives the ELA of the linear model and none for the others', () => {
    expect(scenarioEla(threeCells())).toBe(1000);
    expect(
      scenarioEla(threeCells({ massBalance: { model: 'table', points: [[900, -1], [1100, 1]] } })),
    ).toBeNull();
  });
});

describe('longProfileGeometry', () => {
  const g = longProfileGeometry(sampleScenario(threeCells()), 300, 1000, NO_MARGIN);

  it('pads the elevation range and rounds it out to whole tick steps', () => {
    // Data 975..1015 m, padded by 10 m to 965..1025, rounded out to 10 m steps.
    expect(g.zDomain).toEqual([960, 1030]);
    expect(g.xDomainKm).toEqual([0, 0.3]);
    expect(g.zTicks.map((t) => t.label)).toEqual(['960', '980', '1000', '1020']);
    expect(g.xTicks.map((t) => t.label)).toEqual(['0', '0.1', '0.2', '0.3']);
  });

  it('maps cell centres to pixels', () => {
    // x: 50 m of 300 m across 400 px; z: (1030 - 995) m of 70 m down 300 px.
    expect(g.bedLine[0][0]).toBeCloseTo(66.667, 3);
    expect(g.bedLine[0][1]).toBeCloseTo(150, 9);
    expect(g.bedLine).toHaveLength(3);
  });

  it('closes the ice polygon down to the bed at the first ice-free cell', () => {
    expect(g.iceBodies).toHaveLength(1);
    const [body] = g.iceBodies;
    // Surface at cells 0, 1, 2, then bed at cells 2, 1, 0.
    expect(body.polygon).toHaveLength(6);
    expect(body.surface).toHaveLength(3);
    expect(body.polygon[2]).toEqual(g.bedLine[2]);
    expect(body.polygon[3]).toEqual(g.bedLine[2]);
    expect(body.polygon[5]).toEqual(g.bedLine[0]);
    // Surface of cell 0 at 1015 m: (1030 - 1015) / 70 * 300 px from the top.
    expect(body.polygon[0][1]).toBeCloseTo(64.286, 3);
  });

  it('places and labels the ELA line', () => {
    expect(g.ela?.label).toBe('ELA 1000 m a.s.l.');
    expect(g.ela?.y).toBeCloseTo((30 / 70) * 300, 9);
  });

  it('states the exaggeration from the drawn scales', () => {
    // 300 m over 400 px horizontally, 70 m over 300 px vertically.
    expect(g.verticalExaggeration).toBeCloseTo(0.75 / (70 / 300), 12);
  });

  it('splits separate ice bodies and draws none for an ice-free valley', () => {
    const twoBodies: ProfileSamples = {
      x: [50, 150, 250, 350],
      bed: [1000, 1000, 1000, 1000],
      surface: [1005, 1000, 1000, 1005],
      thickness: [5, 0, 0, 5],
    };
    const split = longProfileGeometry(twoBodies, 400, null, NO_MARGIN);
    expect(split.iceBodies.map((b) => b.surface.length)).toEqual([2, 2]);
    expect(split.ela).toBeNull();

    const bare = longProfileGeometry(sampleScenario(threeCells({ surface: undefined })), 300, 1000, NO_MARGIN);
    expect(bare.iceBodies).toEqual([]);
    expect(bare.bedLine).toHaveLength(3);
  });
});

describe('verticalExaggeration', () => {
  it('is horizontal over vertical metres per pixel', () => {
    // 12 km over 600 px = 20 m/px; 1500 m over 300 px = 5 m/px.
    expect(verticalExaggeration(12000, 600, 1500, 300)).toBe(4);
    expect(verticalExaggeration(1000, 100, 1000, 100)).toBe(1);
  });

  it('is printed to one decimal', () => {
    expect(exaggerationLabel(2.4)).toBe('Vertical exaggeration ×2.4');
    expect(exaggerationLabel(3.6149)).toBe('Vertical exaggeration ×3.6');
  });
});

describe('longProfileGeometry with very many samples', () => {
  it('lays out 200,000 samples (a long surveyed profile) without overflowing the call stack', () => {
    // Math.min(...array) passes every element as an argument: about 130,000 exceed V8's stack.
    const n = 200_000;
    const x = Array.from({ length: n }, (_, i) => (i + 0.5) * 0.1);
    const bed = x.map((xi) => 3000 - 0.05 * xi);
    const thickness = x.map((xi) => (xi < 10_000 ? 100 : 0));
    const samples = { x, bed, thickness, surface: bed.map((b, i) => b + thickness[i]) };
    const g = longProfileGeometry(samples, n * 0.1, null, { width: 860, height: 500, margin: { top: 48, right: 20, bottom: 66, left: 86 } });
    // The axis covers the lowest bed (2000 m) and the highest surface (3100 m), rounded outwards.
    expect(g.zDomain[0]).toBeLessThanOrEqual(2000);
    expect(g.zDomain[1]).toBeGreaterThanOrEqual(3100);
  });
});
