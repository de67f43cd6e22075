/**
 * `firnline commit` and `firnline sensitivity`: the browser's two analyses with the browser's
 * numbers. Both call what the analysis worker calls (src/worker/analysisJobs.ts) on the same
 * inputs: the committed change holds the warming of an output year of the run (the browser takes
 * the frame selected in the playback, so the year must be an output year) and runs to a steady
 * state; the sensitivity curve steps the held warming up and back down from the scenario's
 * initial ice. Each writes a CSV, a JSON of the numbers (committed change) and an SVG figure.
 */
import { committedChange } from '../model/analysis/committedChange';
import { sensitivityCurve, warmingLadder } from '../model/analysis/sensitivityCurve';
import { createFlowlineModel } from '../model/createFlowlineModel';
import { NumericalFailure } from '../model/numericalFailure';
import { outputTimes, ScenarioRun } from '../model/runScenario';
import { committedChangeFigure, sensitivityFigure } from '../figures/analysisFigures';
import { committedCsv, committedJson, sensitivityCsv } from '../outputs/analysisOutputs';
import { describeFailure } from '../outputs/failureText';
import type { AnalysisCommand } from './analysisArgs';
import { CommandFailure, prepareOutDir, writeOutput } from './commandFiles';
import { readValidScenario } from './scenarioInput';

type Io = { out: (t: string) => void; err: (t: string) => void };

const km = (m: number) => (Number.isFinite(m) ? `${Number((m / 1000).toFixed(3))} km` : 'none');
const signed = (v: number, unit: string) => `${v > 0 ? '+' : ''}${Number(v.toPrecision(4))} ${unit}`;

export function commitCommand(command: Extract<AnalysisCommand, { kind: 'commit' }>, io: Io, version: string): number {
  const scenario = readValidScenario(command.scenarioPath, command.quiet, io.err);
  const times = outputTimes(scenario.run);
  if (!times.some((t) => t === command.year)) {
    const every = scenario.run.outputEvery;
    throw new CommandFailure(
      `--from ${command.year} is not an output year of the scenario (every ${every} a from 0 to ${scenario.run.years}, and ${scenario.run.years}): ` +
        'the committed change starts from an output of the run, as in the browser',
      2,
    );
  }
  prepareOutDir(command.outDir);
  const run = new ScenarioRun(scenario);
  let phase: 'spinup' | 'run' = scenario.spinup ? 'spinup' : 'run';
  let result;
  const runSoFar: { time: number; length: number; volume: number }[] = [];
  try {
    while (!run.advanceSpinUp(50));
    phase = 'run';
    let thickness: Float64Array | undefined;
    for (let frame = run.nextFrame(); frame; frame = frame.time < command.year ? run.nextFrame() : undefined) {
      runSoFar.push({ time: frame.time, length: frame.numbers.length, volume: frame.numbers.volume });
      if (frame.time === command.year) thickness = frame.fields.thickness;
    }
    result = committedChange(run.model, thickness!, run.model.warmingAt(command.year), command.year);
  } catch (error) {
    if (error instanceof NumericalFailure) throw new CommandFailure(describeFailure(error, phase), 3);
    throw error;
  }
  writeOutput(command.outDir, 'committed.csv', [committedCsv(runSoFar, result)]);
  writeOutput(command.outDir, 'committed.json', [JSON.stringify(committedJson(scenario, result, version), null, 2) + '\n']);
  writeOutput(command.outDir, 'committed.svg', [committedChangeFigure({ scenario, firnlineVersion: version, runSoFar, result })]);
  io.out(
    `firnline: committed change from year ${command.year} (warming held at ${Number(result.warming.toFixed(3))} K): ` +
      `length ${signed(result.lengthChange, 'm')}, volume ${signed(result.volumeChange, 'm^3')}, ` +
      `${result.converged ? `steady after ${result.yearsToSteady} a` : `not steady within ${result.yearsToSteady} a`}; ` +
      `wrote committed.csv, committed.json and committed.svg to ${command.outDir}\n`,
  );
  return 0;
}

export function sensitivityCommand(command: Extract<AnalysisCommand, { kind: 'sensitivity' }>, io: Io, version: string): number {
  const scenario = readValidScenario(command.scenarioPath, command.quiet, io.err);
  prepareOutDir(command.outDir);
  const model = createFlowlineModel(scenario);
  let points;
  try {
    points = sensitivityCurve(model, model.initialThickness, warmingLadder(command.from, command.to, command.step));
  } catch (error) {
    if (error instanceof NumericalFailure) throw new CommandFailure(describeFailure(error, 'spinup').replace('spin-up', 'run to a steady state'), 3);
    throw error;
  }
  writeOutput(command.outDir, 'sensitivity.csv', [sensitivityCsv(points)]);
  writeOutput(command.outDir, 'sensitivity.svg', [sensitivityFigure({ scenario, firnlineVersion: version, points })]);
  const up = points.filter((p) => p.branch === 'up');
  const unconverged = points.filter((p) => !p.converged).length;
  io.out(
    `firnline: ${points.length} steady states from ${command.from} to ${command.to} K and back; ` +
      `terminus ${km(up[0].terminus)} at ${command.from} K, ${km(up[up.length - 1].terminus)} at ${command.to} K` +
      `${unconverged > 0 ? `; ${unconverged} not steady within their limit` : ''}; wrote sensitivity.csv and sensitivity.svg to ${command.outDir}\n`,
  );
  return 0;
}
