/**
 * What a user reads along the flowline must be what moves the ice, also over a rock step.
 *
 * Independent expectation: at a steady state, continuity says the ice flux through a cross
 * section equals the balance integrated from the head (e.g. Cuffey & Paterson 2010, section 8.4,
 * "balance flux"), so the depth-averaged speed is that flux over the section; and in a shallow-ice
 * column the surface speed is between 1 (plug flow by sliding) and (n+2)/(n+1) (no sliding) times
 * the depth-averaged speed (Cuffey & Paterson 2010, section 8.3, plane flow). Nye (1957) crevasses
 * cannot be deeper than the ice that holds them. Before these checks, the speed below a 300 m step
 * at 20 m spacing read tens of thousands of m a^-1 from a slope taken across the step.
 */
import { describe, expect, it } from 'vitest';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { profileFields } from '../../src/model/diagnostics';
import { MIN_GLACIER_THICKNESS } from '../../src/model/glacierExtent';
import { FlowlineSimulation } from '../../src/model/simulation';
import { spinUp } from '../../src/model/spinUp';
import { checkedJson } from '../helpers/checkedScenario';

/** The invented Fennimow valley with its riegel replaced by a rock step of `height` m at 8 km. */
function stepValley(height: number, scheme: 'implicit' | 'explicit') {
  return checkedJson({
    format: 'firnline-scenario',
    version: 1,
    name: `Invented valley with a ${height} m rock step`,
    grid: { length: 12000, spacing: 20 },
    bed: [
      [0, 3350], [1000, 3080], [2500, 2800], [4000, 2600], [5200, 2480], [5900, 2410], [6600, 2470],
      [7400, 2440], [8000, 2400], [8020, 2400 - height], [9500, 2270 - height], [12000, 2050 - height],
    ],
    width: [[0, 2100], [1500, 1650], [4000, 1200], [8000, 900], [12000, 700]],
    shapeFactor: { crossSection: 'parabolic' },
    surface: [[0, 3420], [4000, 2800], [8000, 2500], [8020, 2500 - height], [12000, 2050 - height]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 3e-14, m: 3 },
    massBalance: { model: 'linear', ela: 2780, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 },
    run: { years: 100, outputEvery: 10 },
    numerics: { scheme },
  });
}

/** The steady glacier: spun up implicitly; the explicit scheme then runs 50 years towards its own. */
function steadyOverStep(height: number, scheme: 'implicit' | 'explicit') {
  const implicitModel = createFlowlineModel(stepValley(height, 'implicit'));
  const spun = spinUp(implicitModel, implicitModel.initialThickness);
  expect(spun.converged).toBe(true);
  const model = createFlowlineModel(stepValley(height, scheme));
  if (scheme === 'implicit') return { model, thickness: spun.thickness };
  const simulation = new FlowlineSimulation(model, spun.thickness);
  simulation.advanceTo(50);
  return { model, thickness: simulation.thickness };
}

describe.each([200, 300])('steady glacier over a %i m rock step at 20 m spacing', (height) => {
  describe.each(['implicit', 'explicit'] as const)('%s scheme', (scheme) => {
    it('surface speed is 1 to (n+2)/(n+1) times the balance-flux depth-averaged speed, and the shown depth average within 2 % of it, in every glacier cell; crevasses never deeper than the ice', () => {
      const { model, thickness } = steadyOverStep(height, scheme);
      const profile = profileFields(model, thickness, 0);
      const { grid } = model;
      const n = model.flow.n;
      // Balance flux at cell centres [m^3 a^-1]: the applied balance (ice equivalent) integrated from the head.
      let upstream = 0;
      let largestFlux = 0;
      let checked = 0;
      let worst = 0;
      const stepCell = Math.floor(8000 / grid.spacing);
      let fastest = 0;
      for (let i = 0; i < grid.cellCount; i++) {
        const cellBalance = (profile.balance[i] / model.iceToWaterEquivalent) * grid.widthAtCells[i] * grid.spacing;
        const balanceFlux = upstream + 0.5 * cellBalance;
        upstream += cellBalance;
        largestFlux = Math.max(largestFlux, balanceFlux);
        const H = thickness[i];
        expect(profile.crevasseDepth[i]).toBeLessThanOrEqual(H);
        if (H < MIN_GLACIER_THICKNESS) continue;
        // The last few cells carry almost nothing; their ratio is round-off over round-off.
        if (balanceFlux < 0.02 * largestFlux) continue;
        const meanSpeed = balanceFlux / (grid.widthAtCells[i] * H);
        const ratio = profile.surfaceSpeed[i] / meanSpeed;
        expect(ratio).toBeGreaterThan(1 - 0.02);
        expect(ratio).toBeLessThan((n + 2) / (n + 1) + 0.02);
        // Sharper: the depth average of what is shown, u_b + (n+1)/(n+2) (u_s - u_b), is the balance speed.
        const shownMean = profile.slidingSpeed[i] + ((n + 1) / (n + 2)) * (profile.surfaceSpeed[i] - profile.slidingSpeed[i]);
        const deviation = Math.abs(shownMean / meanSpeed - 1);
        worst = Math.max(worst, deviation);
        expect(deviation).toBeLessThan(0.02);
        if (Math.abs(i - stepCell) <= 2) checked++;
        fastest = Math.max(fastest, Math.abs(profile.surfaceSpeed[i]));
      }
      expect(checked).toBeGreaterThanOrEqual(3); // the cells at the step were among those checked
      console.log(`${height} m step, ${scheme}: fastest surface ${fastest.toFixed(0)} m/a, depth-averaged speed within ${(100 * worst).toFixed(3)} % of the balance speed`);
    });
  });
});
