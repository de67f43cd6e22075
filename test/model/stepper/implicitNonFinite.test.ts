/**
 * A Newton correction that is not finite (here: a balance gradient poisoned with NaN, which makes
 * the Jacobian's diagonal NaN while the residual stays finite) must fail the iteration so the
 * step is retried shorter. Before, NaN > 0 being false turned the cell into bare rock.
 */
import { describe, expect, it } from 'vitest';
import { NumericalFailure } from '../../../src/model/numericalFailure';
import { FlowlineSimulation } from '../../../src/model/simulation';
import { createMassBudgetTotals } from '../../../src/model/stepper/explicitStep';
import { createImplicitWorkspace, implicitStep } from '../../../src/model/stepper/implicitStep';
import { handBuiltModel } from '../../verification/helpers/handBuiltModel';

const POISONED_CELL = 20;

function glacier() {
  return handBuiltModel({
    scheme: 'implicit',
    length: 5000,
    spacing: 100,
    rateFactorPerYear: 1e-16,
    bed: (x) => 2000 - 0.08 * x,
    balance: (_x, s) => 0.006 * (s - 1800),
    initialThickness: (x) => (x < 3500 ? 150 * Math.sqrt(1 - x / 3500) : 0),
  });
}

/** The same model, whose balance is NaN at one cell on the `poisonedCall`-th evaluation only. */
function poisoned(poisonedCall: number) {
  const model = glacier();
  const clean = model.iceBalance;
  let calls = 0;
  model.iceBalance = (surface, warming, precipitationFactor, out) => {
    clean(surface, warming, precipitationFactor, out);
    calls++;
    if (calls === poisonedCall) out[POISONED_CELL] = Number.NaN;
  };
  return model;
}

describe('implicit step: a non-finite Newton correction', () => {
  it('fails the iteration and leaves the thickness and the budget untouched', () => {
    // Call 2 is the first evaluation's balance probe (db/ds): only the Jacobian sees the NaN.
    const model = poisoned(2);
    const thickness = Float64Array.from(model.initialThickness);
    const before = Float64Array.from(thickness);
    const budget = createMassBudgetTotals();
    const outcome = implicitStep(model, thickness, 0, 1, 1, createImplicitWorkspace(model.grid.cellCount), budget);
    expect(outcome.converged).toBe(false);
    expect(thickness).toEqual(before);
    expect(budget.appliedBalance.value).toBe(0);
  });

  it('is retried with a shorter step: no ice lost, same glacier as an unpoisoned run within 0.5 %, budget closed to 1e-9', () => {
    const model = poisoned(2);
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    simulation.advanceTo(1);
    const reference = glacier();
    const clean = new FlowlineSimulation(reference, reference.initialThickness);
    clean.advanceTo(1);
    expect(simulation.smallestStableStep).toBeLessThan(1);
    expect(simulation.thickness[POISONED_CELL]).toBeGreaterThan(50);
    expect(Math.abs(simulation.thickness[POISONED_CELL] / clean.thickness[POISONED_CELL] - 1)).toBeLessThan(5e-3);
    expect(Math.abs(simulation.volume() / clean.volume() - 1)).toBeLessThan(5e-3);
    expect(simulation.massBudget().relativeResidual).toBeLessThan(1e-9);
  });

  it('that never goes away stops the run with a NumericalFailure naming the model year and the position', () => {
    const model = glacier();
    const clean = model.iceBalance;
    let calls = 0;
    // Every balance probe (every second evaluation) is poisoned at the same cell.
    model.iceBalance = (surface, warming, precipitationFactor, out) => {
      clean(surface, warming, precipitationFactor, out);
      if (++calls % 2 === 0) out[POISONED_CELL] = Number.NaN;
    };
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    let failure: unknown;
    try {
      simulation.advanceTo(1);
    } catch (error) {
      failure = error;
    }
    expect(failure).toBeInstanceOf(NumericalFailure);
    const { year, position, message } = failure as NumericalFailure;
    expect(year).toBe(0);
    expect(position).toBe(model.grid.x[POISONED_CELL]);
    expect(message).toMatch(/model year 0\.00 at x = 2050 m/);
  });
});
