import { describe, expect, it } from 'vitest';
import type { FlowlineGrid, FlowParameters } from '../../../src/model/flowlineModel';
import {
  thicknessForFlux,
  columnForFlux,
  computeFaceFluxes,
  createFaceFields,
  createFaceJacobian,
  type ColumnState,
} from '../../../src/model/flux/faceFlux';
import { nyeShapeFactor } from '../../../src/model/physics/shapeFactor';
import { sectionArea, surfaceWidth, type ValleySection } from '../../../src/model/physics/valleySection';
import { SECONDS_PER_YEAR } from '../../../src/model/units';

const A_PER_YEAR = 2.4e-24 * SECONDS_PER_YEAR;

function flow(overrides: Partial<FlowParameters> = {}): FlowParameters {
  return {
    n: 3,
    rateFactorPerYear: A_PER_YEAR,
    rateFactorPerSecond: A_PER_YEAR / SECONDS_PER_YEAR,
    density: 910,
    gravity: 9.81,
    slidingCoefficient: 0,
    slidingExponent: 3,
    shapeFactor: { kind: 'constant', value: 1 },
    ...overrides,
  };
}

function grid(bed: number[], width: number | ((x: number) => number) = 1, spacing = 50): FlowlineGrid {
  const N = bed.length;
  const widthAt = typeof width === 'number' ? () => width : width;
  return {
    cellCount: N,
    spacing,
    x: Float64Array.from({ length: N }, (_, i) => (i + 0.5) * spacing),
    bed: Float64Array.from(bed),
    bedBeyondEnd: bed[N - 1] - 5,
    widthAtCells: Float64Array.from({ length: N }, (_, i) => widthAt((i + 0.5) * spacing)),
    widthAtFaces: Float64Array.from({ length: N + 1 }, (_, j) => widthAt(j * spacing)),
  };
}

/** A deterministic pseudo-random sequence (a linear congruential generator), so failures repeat. */
function sequence(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 1664525 + 1013904223) % 4294967296;
    return state / 4294967296;
  };
}

describe('computeFaceFluxes: the flux law at a face', () => {
  it('a uniform slab on an incline carries 2A/(n+2) (rho g H sin a)^n H^2 per unit width (Cuffey & Paterson 2010, section 8.3), to 1e-12', () => {
    const H = 200;
    const tanSlope = 0.05;
    const N = 40;
    const g = grid(Array.from({ length: N }, (_, i) => 3000 - tanSlope * (i + 0.5) * 50));
    const thickness = new Float64Array(N).fill(H);
    const faces = createFaceFields(N);
    computeFaceFluxes(g, flow(), thickness, faces);
    const tau = 910 * 9.81 * H * tanSlope;
    const expected = ((2 * A_PER_YEAR) / 5) * tau ** 3 * H * H;
    for (let j = 2; j < N - 1; j++) expect(faces.volumeFlux[j] / expected - 1).toBeCloseTo(0, 12);
  });

  it("a parabolic channel's flux is the slab's times f^n, f from Nye's (1965) table at the face thickness, to 1e-12", () => {
    const H = 200;
    const N = 40;
    const halfWidth = 600; // W = 3: f = 0.746 for a parabola (Nye 1965, Table 8.1 of Cuffey & Paterson 2010)
    const bed = Array.from({ length: N }, (_, i) => 3000 - 0.05 * (i + 0.5) * 50);
    const thickness = new Float64Array(N).fill(H);
    const plain = createFaceFields(N);
    const shaped = createFaceFields(N);
    computeFaceFluxes(grid(bed, 2 * halfWidth), flow(), thickness, plain);
    computeFaceFluxes(grid(bed, 2 * halfWidth), flow({ shapeFactor: { kind: 'cross-section', crossSection: 'parabolic' } }), thickness, shaped);
    expect(shaped.shapeFactor[10]).toBe(nyeShapeFactor('parabolic', halfWidth, H));
    expect(shaped.shapeFactor[10]).toBeCloseTo(0.746, 12);
    expect(shaped.volumeFlux[10] / plain.volumeFlux[10]).toBeCloseTo(0.746 ** 3, 12);
  });

  it("a slab in a parabolic valley section: Nye's f at the section's own W = w_s/2H (W = 3: f = 0.746, Nye 1965 via Cuffey & Paterson 2010 Table 8.1), and the flux is the slab's q f^n times the section area A over H, to 1e-12", () => {
    const H = 200;
    const N = 40;
    // Floor 400 m; the widening that makes the surface 1200 m wide at 200 m of ice (W = 600 / 200 = 3):
    // w_s^2 = w0^2 + p H with p = 6400 m, and (w0 + L)^2 = w0^2 + 100 p.
    const floor = 400;
    const widening = Math.sqrt(floor * floor + 100 * 6400) - floor;
    const section: ValleySection = { shape: 'parabolic', widening };
    const bed = Array.from({ length: N }, (_, i) => 3000 - 0.05 * (i + 0.5) * 50);
    const thickness = new Float64Array(N).fill(H);
    const faces = createFaceFields(N);
    computeFaceFluxes({ ...grid(bed, floor), section }, flow({ shapeFactor: { kind: 'cross-section', crossSection: 'parabolic' } }), thickness, faces);
    expect(surfaceWidth(section, floor, H)).toBeCloseTo(1200, 9);
    expect(faces.shapeFactor[10]).toBeCloseTo(0.746, 12);
    const tau = 0.746 * 910 * 9.81 * H * 0.05;
    const q = ((2 * A_PER_YEAR) / 5) * tau ** 3 * H * H;
    expect(faces.volumeFlux[10] / ((q * sectionArea(section, floor, H)) / H) - 1).toBeCloseTo(0, 12);
  });

  it('a rectangular valley section carries exactly the fixed-width flux, to 1e-15', () => {
    const N = 30;
    const bed = Array.from({ length: N }, (_, i) => 3000 - 25 * i);
    const thickness = Float64Array.from({ length: N }, (_, i) => (i < 22 ? 120 + 40 * Math.sin(i / 4) : 0));
    const parameters = flow({ slidingCoefficient: 3e-14, shapeFactor: { kind: 'cross-section', crossSection: 'rectangular' } });
    const fixed = createFaceFields(N);
    const sectioned = createFaceFields(N);
    const fixedStep = computeFaceFluxes(grid(bed, 500), parameters, thickness, fixed);
    const sectionStep = computeFaceFluxes({ ...grid(bed, 500), section: { shape: 'rectangular', widening: 0 } }, parameters, thickness, sectioned);
    for (let j = 0; j <= N; j++) expect(Math.abs(sectioned.volumeFlux[j] - fixed.volumeFlux[j])).toBeLessThanOrEqual(1e-15 * Math.abs(fixed.volumeFlux[j]));
    expect(sectionStep.stableStep / fixedStep.stableStep - 1).toBeCloseTo(0, 14);
  });

  it('an empty upwind cell sends nothing, whatever the slope', () => {
    const bed = [3000, 2990, 2900, 2800, 2700];
    const thickness = Float64Array.from([100, 80, 0, 0, 0]);
    const faces = createFaceFields(5);
    computeFaceFluxes(grid(bed), flow(), thickness, faces);
    expect(faces.volumeFlux[2]).toBeGreaterThan(0);
    expect(faces.volumeFlux[3]).toBe(0);
    expect(faces.volumeFlux[4]).toBe(0);
    expect(faces.volumeFlux[0]).toBe(0);
  });

  describe.each<[string, FlowParameters, ValleySection | undefined]>([
    ['n = 3, sliding m = 3, constant f', flow({ slidingCoefficient: 3e-14 * 1e-0 }), undefined],
    ['n = 3, no sliding, parabolic section', flow({ shapeFactor: { kind: 'cross-section', crossSection: 'parabolic' } }), undefined],
    ['n = 4, sliding m = 2, rectangular section', flow({ n: 4, rateFactorPerYear: 1e-30, slidingCoefficient: 1e-9, slidingExponent: 2, shapeFactor: { kind: 'cross-section', crossSection: 'rectangular' } }), undefined],
    // Valley sections: the width that carries the flux and Nye's W both change with the face thickness.
    ['n = 3, parabolic valley section, parabolic table', flow({ shapeFactor: { kind: 'cross-section', crossSection: 'parabolic' } }), { shape: 'parabolic', widening: 400 }],
    ['n = 3, sliding m = 3, trapezoidal valley section, rectangular table', flow({ slidingCoefficient: 3e-14, shapeFactor: { kind: 'cross-section', crossSection: 'rectangular' } }), { shape: 'trapezoidal', widening: 250 }],
    ['n = 3, trapezoidal valley section, constant f', flow(), { shape: 'trapezoidal', widening: 600 }],
  ])('analytic Jacobian (%s)', (_label, parameters, section) => {
    it('every dW_j/dH_k agrees with a centred finite difference to 1e-5 of the largest entry at that face', () => {
      const random = sequence(7);
      const N = 30;
      const bed = Array.from({ length: N }, (_, i) => 3000 - 20 * i + (i === 15 ? -60 : 0) + 8 * random());
      // Thick ice with a margin, some bumps, and a reverse slope or two from the bed bumps.
      const thickness = Float64Array.from({ length: N }, (_, i) => (i < 24 ? 150 + 60 * Math.sin(i / 3) + 20 * random() : 0));
      // A valley section over a narrower floor, so that W = w_s / 2H crosses the table's rows.
      const g = section ? { ...grid(bed, (x) => 300 - 0.005 * x), section } : grid(bed, (x) => 900 - 0.02 * x);
      const faces = createFaceFields(N);
      const jacobian = createFaceJacobian(N);
      computeFaceFluxes(g, parameters, thickness, faces, jacobian);
      // The same fluxes whether or not the derivatives are asked for (two code paths).
      const withoutDerivatives = createFaceFields(N);
      computeFaceFluxes(g, parameters, thickness, withoutDerivatives);
      expect(Array.from(withoutDerivatives.volumeFlux)).toEqual(Array.from(faces.volumeFlux));
      const plus = createFaceFields(N);
      const minus = createFaceFields(N);
      let compared = 0;
      let largestEntry = 0;
      for (const column of [jacobian.farLeft, jacobian.left, jacobian.right, jacobian.farRight]) {
        for (const entry of column) largestEntry = Math.max(largestEntry, Math.abs(entry));
      }
      for (let j = 1; j <= N; j++) {
        const analytic = [jacobian.farLeft[j], jacobian.left[j], jacobian.right[j], jacobian.farRight[j]];
        const scale = Math.max(...analytic.map(Math.abs));
        for (let k = 0; k < 4; k++) {
          const cell = j - 2 + k;
          if (cell < 0 || cell >= N) continue;
          const h = 1e-6 * Math.max(1, thickness[cell]);
          const bumped = Float64Array.from(thickness);
          bumped[cell] = thickness[cell] + h;
          computeFaceFluxes(g, parameters, bumped, plus);
          bumped[cell] = thickness[cell] - h;
          computeFaceFluxes(g, parameters, bumped, minus);
          const numeric = (plus.volumeFlux[j] - minus.volumeFlux[j]) / (2 * h);
          // Where no ice flows the flux is flat to first order; a nudge of h gives O(h^3) at most.
          if (scale === 0) expect(Math.abs(numeric)).toBeLessThan(1e-6 * largestEntry);
          else expect(Math.abs(numeric - analytic[k]) / scale).toBeLessThan(1e-5);
          compared++;
        }
      }
      expect(compared).toBeGreaterThan(3 * N);
    });
  });
});

describe('columnForFlux: the column the flux law needs to carry a flux', () => {
  const column: ColumnState = { basalStress: 0, surfaceSpeed: 0, slidingSpeed: 0 };

  it.each([
    ['deformation only', flow()],
    ['with sliding, m = n', flow({ slidingCoefficient: 3e-14 })],
    ['with sliding, m = 2 (n = 3)', flow({ slidingCoefficient: 1e-9, slidingExponent: 2 })],
  ])('%s: the stress found gives back the flux to 1e-10, and 1 <= u_s / (q/H) <= (n+2)/(n+1)', (_label, parameters) => {
    for (const [H, q] of [[10, 5], [120, 4000], [400, 20000], [50, 1e-6]]) {
      columnForFlux(parameters, H, q, column);
      const tau = column.basalStress;
      const { n, slidingExponent: m, slidingCoefficient: C } = parameters;
      const back = ((2 * parameters.rateFactorPerYear) / (n + 2)) * tau ** n * H * H + C * tau ** m * H;
      expect(back / q - 1).toBeCloseTo(0, 10);
      const ratio = column.surfaceSpeed / (q / H);
      expect(ratio).toBeGreaterThanOrEqual(1 - 1e-12);
      expect(ratio).toBeLessThanOrEqual((n + 2) / (n + 1) + 1e-12);
      // Plane flow without sliding: u_s = (n+2)/(n+1) times the mean (Cuffey & Paterson 2010, section 8.3).
      if (C === 0) expect(ratio).toBeCloseTo((n + 2) / (n + 1), 12);
    }
  });

  it('no flux or no ice: no stress and no speed', () => {
    expect(columnForFlux(flow(), 0, 100, column).surfaceSpeed).toBe(0);
    expect(columnForFlux(flow(), 100, 0, column).basalStress).toBe(0);
  });
});

describe('thicknessForFlux: the inverse of the face flux for the bed inversion', () => {
  it.each([
    ['deformation only, constant f', flow()],
    ['sliding m = 3, parabolic section', flow({ slidingCoefficient: 3e-14, shapeFactor: { kind: 'cross-section', crossSection: 'parabolic' } })],
    ['n = 4, sliding m = 2, rectangular section', flow({ n: 4, rateFactorPerYear: 1e-30, slidingCoefficient: 1e-9, slidingExponent: 2, shapeFactor: { kind: 'cross-section', crossSection: 'rectangular' } })],
  ])('%s: gives back the slab thickness whose face flux was computed, to 1e-9', (_label, parameters) => {
    const N = 30;
    const halfWidth = 400;
    for (const H of [5, 60, 250, 700]) {
      const g = grid(Array.from({ length: N }, (_, i) => 3000 - 0.04 * (i + 0.5) * 50), 2 * halfWidth);
      const faces = createFaceFields(N);
      computeFaceFluxes(g, parameters, new Float64Array(N).fill(H), faces);
      const q = faces.volumeFlux[10] / (2 * halfWidth);
      expect(thicknessForFlux(parameters, q, 0.04, halfWidth) / H - 1).toBeCloseTo(0, 9);
    }
  });

  it('a larger rate factor needs thinner ice: H scales as k^(-1/(n+2)) without sliding, to 1e-9', () => {
    const H1 = thicknessForFlux(flow(), 1000, 0.05, 1e6, 1);
    const H5 = thicknessForFlux(flow(), 1000, 0.05, 1e6, 5);
    expect(H5 / H1 / 5 ** (-1 / 5) - 1).toBeCloseTo(0, 9);
  });

  it('no flux needs no ice; a flat surface cannot carry any (NaN)', () => {
    expect(thicknessForFlux(flow(), 0, 0.05, 500)).toBe(0);
    expect(thicknessForFlux(flow(), 100, 0, 500)).toBeNaN();
  });
});
