/**
 * `npm run bench`: speed of the flowline engine on this machine. Prints
 *  - cell updates per second of the flux + update kernel (explicitStep) on the demo valley
 *    resampled to 100, 400 and 1600 cells, starting from its sketched surface;
 *  - wall time to spin the demo up from ice-free to steady state (50 m cells).
 * No pass/fail: the figures go into docs/performance.md. Speed targets are a later issue.
 */
import { cpus } from 'node:os';
import demo from '../examples/demo-valley.json';
import { createFlowlineModel } from '../src/model/createFlowlineModel';
import type { Scenario } from '../src/model/scenario';
import { spinUp } from '../src/model/spinUp';
import { createMassBudgetTotals, createStepWorkspace, explicitStep } from '../src/model/stepper/explicitStep';

const demoScenario = demo as unknown as Scenario;

function kernelThroughput(cells: number): { cellUpdatesPerSecond: number; steps: number; meanStepYears: number } {
  const scenario: Scenario = { ...demoScenario, grid: { length: demoScenario.grid.length, spacing: demoScenario.grid.length / cells } };
  const model = createFlowlineModel(scenario);
  const thickness = Float64Array.from(model.initialThickness);
  const work = createStepWorkspace(cells);
  const budget = createMassBudgetTotals();
  // Warm up the JIT, then time for about one second.
  for (let k = 0; k < 2000; k++) explicitStep(model, thickness, 0, 1, work, budget);
  let steps = 0;
  let simulated = 0;
  const start = performance.now();
  while (performance.now() - start < 1000) {
    for (let k = 0; k < 200; k++) simulated += explicitStep(model, thickness, 0, 1, work, budget).step;
    steps += 200;
  }
  const seconds = (performance.now() - start) / 1000;
  return { cellUpdatesPerSecond: (steps * cells) / seconds, steps, meanStepYears: simulated / steps };
}

function demoSpinUpFromIceFree(): { seconds: number; years: number; converged: boolean; steps: number } {
  const scenario: Scenario = { ...demoScenario, surface: undefined };
  const model = createFlowlineModel(scenario);
  const start = performance.now();
  const result = spinUp(model, model.initialThickness);
  return { seconds: (performance.now() - start) / 1000, years: result.years, converged: result.converged, steps: result.steps };
}

console.log(`Firnline benchmark — node ${process.version}, ${cpus().length} x ${cpus()[0]?.model ?? 'unknown CPU'}`);
console.log('\nFlux + update kernel (explicit scheme), demo valley resampled:');
console.log('cells  spacing_m  cell_updates_per_s  mean_step_a');
for (const cells of [100, 400, 1600]) {
  const r = kernelThroughput(cells);
  console.log(
    `${String(cells).padStart(5)}  ${(demoScenario.grid.length / cells).toFixed(1).padStart(9)}  ` +
      `${r.cellUpdatesPerSecond.toExponential(3).padStart(18)}  ${r.meanStepYears.toExponential(2).padStart(11)}`,
  );
}
const spin = demoSpinUpFromIceFree();
console.log(
  `\nDemo spin-up from ice-free (${demoScenario.grid.length / demoScenario.grid.spacing} cells): ` +
    `${spin.seconds.toFixed(2)} s wall, ${spin.years} model years, ${spin.steps} steps, converged: ${spin.converged}`,
);
