// Worker thread for the experiment benchmark: runs the scenarios it is sent, one at a time, and
// answers with the final volume and length of each (so the work cannot be optimised away).
import { parentPort } from 'node:worker_threads';
import { glacierExtent, iceVolume } from '../src/model/glacierExtent';
import { runScenario } from '../src/model/runScenario';
import type { Scenario } from '../src/model/scenario';

parentPort?.on('message', (scenarios: Scenario[]) => {
  const results = scenarios.map((scenario) => {
    const report = runScenario(scenario);
    const last = report.frames[report.frames.length - 1].fields.thickness;
    return { volume: iceVolume(report.model.grid, last), length: glacierExtent(report.model.grid, last).length };
  });
  parentPort?.postMessage(results);
});
