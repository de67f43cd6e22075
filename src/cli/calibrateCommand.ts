/**
 * `firnline calibrate <scenario.json> --parameter <JSON Pointer> [--parameter <JSON Pointer>] --out <dir>`:
 * one parameter fitted to the scenario's observations (src/model/analysis/calibrateParameter.ts),
 * or two together where the observations constrain them together (calibrateJoint.ts). Writes
 * <dir>/scenario.json, the scenario with the fitted value in place (valid: it is checked by the
 * one validator before it is written), and <dir>/calibration.json. Exit 2: the pointer names no
 * number, or no observation in the scenario constrains it (the message names the one needed);
 * exit 3: the fit found no bracket (the message says what was tried) or the model failed.
 */
import { calibrateJoint, type JointCalibration } from '../model/analysis/calibrateJoint';
import { calibrateParameter } from '../model/analysis/calibrateParameter';
import { CalibrationNotBracketed, CalibrationRefusal, type ParameterCalibration } from '../model/analysis/calibrationTypes';
import { NumericalFailure } from '../model/numericalFailure';
import { calibrationJson, jointCalibrationJson } from '../outputs/analysisOutputs';
import { oneLine } from '../outputs/failureText';
import { formatMessage, validateScenario } from '../scenario/validateScenario';
import type { AnalysisCommand } from './analysisArgs';
import { CommandFailure, prepareOutDir, writeOutput } from './commandFiles';
import { readValidScenario } from './scenarioInput';

function short(value: number): string {
  return String(Number(value.toPrecision(4)));
}

function summaryLine(c: ParameterCalibration, dir: string): string {
  const range = c.range ? ` (${c.range.kind === 'delta-chi-square' ? 'one-sigma range' : c.range.kind === 'match-band' ? 'matching band' : 'bracket'} ${short(c.range.low)} to ${short(c.range.high)})` : '';
  return (
    `firnline: ${c.pointer} = ${short(c.value)} ${c.unit}${range}, was ${short(c.before)}; ` +
    `${c.observation}: RMS misfit ${short(c.misfitBefore.rms)} -> ${short(c.misfitAfter.rms)} ${c.misfitAfter.unit}; ` +
    `${c.runs.count} model evaluations, each a ${c.runs.kind}; wrote scenario.json and calibration.json to ${dir}\n`
  );
}

function jointSummaryLine(c: JointCalibration, dir: string): string {
  const values = c.parameters
    .map((p) => `${p.pointer} = ${short(p.value)} ${p.unit} (${p.range.kind === 'hessian' ? 'one-sigma range' : p.range.kind === 'match-band' ? 'matching band' : 'bracket'} ${short(p.range.low)} to ${short(p.range.high)}), was ${short(p.before)}`)
    .join('; ');
  const misfits = c.observations.map((k) => `${k}: RMS misfit ${short(c.misfitBefore[k]!.rms)} -> ${short(c.misfitAfter[k]!.rms)} ${c.misfitAfter[k]!.unit}`).join('; ');
  return `firnline: ${values}; correlation ${c.correlation.toFixed(3)}; ${misfits}; ${c.runs.count} model evaluations, each a ${c.runs.kind}; wrote scenario.json and calibration.json to ${dir}\n`;
}

function jointCommand(command: Extract<AnalysisCommand, { kind: 'calibrate' }>, scenario: Parameters<typeof calibrateJoint>[0], io: { out: (t: string) => void }, version: string): number {
  const names = command.pointers.join(' with ');
  let calibration: JointCalibration;
  try {
    calibration = calibrateJoint(scenario, command.pointers);
  } catch (error) {
    if (error instanceof CalibrationRefusal) throw new CommandFailure(`cannot calibrate ${names}: ${oneLine(error.message)}${error.needed ? ` (needed: ${error.needed})` : ''}`, 2);
    if (error instanceof CalibrationNotBracketed) throw new CommandFailure(`calibration of ${names} failed: ${oneLine(error.message)}`, 3);
    if (error instanceof NumericalFailure) {
      throw new CommandFailure(`calibration of ${names} failed: numerical failure in a trial run (model year ${error.year.toFixed(2)}): ${oneLine(error.message)}`, 3);
    }
    throw error;
  }
  const checked = validateScenario(calibration.scenario);
  if (!checked.ok) {
    throw new CommandFailure(
      `calibration of ${names} gave ${calibration.parameters.map((p) => p.value).join(' and ')}, which the scenario format refuses: ${oneLine(formatMessage(checked.errors[0]))}`,
      3,
    );
  }
  writeOutput(command.outDir, 'scenario.json', [JSON.stringify(checked.scenario, null, 2) + '\n']);
  writeOutput(command.outDir, 'calibration.json', [JSON.stringify(jointCalibrationJson(scenario, calibration, version), null, 2) + '\n']);
  io.out(jointSummaryLine(calibration, command.outDir));
  return 0;
}

export function calibrateCommand(command: Extract<AnalysisCommand, { kind: 'calibrate' }>, io: { out: (t: string) => void; err: (t: string) => void }, version: string): number {
  const scenario = readValidScenario(command.scenarioPath, command.quiet, io.err);
  prepareOutDir(command.outDir);
  if (command.pointers.length > 1) return jointCommand(command, scenario, io, version);
  let calibration: ParameterCalibration;
  try {
    calibration = calibrateParameter(scenario, command.pointer, command.observation ? { observation: command.observation } : {});
  } catch (error) {
    if (error instanceof CalibrationRefusal) {
      throw new CommandFailure(`cannot calibrate ${command.pointer}: ${oneLine(error.message)}${error.needed ? ` (needed: ${error.needed})` : ''}`, 2);
    }
    if (error instanceof CalibrationNotBracketed) throw new CommandFailure(`calibration of ${command.pointer} failed: ${oneLine(error.message)}`, 3);
    if (error instanceof NumericalFailure) {
      throw new CommandFailure(`calibration of ${command.pointer} failed: numerical failure in a trial run (model year ${error.year.toFixed(2)}): ${oneLine(error.message)}`, 3);
    }
    throw error;
  }
  const checked = validateScenario(calibration.scenario);
  if (!checked.ok) {
    throw new CommandFailure(
      `calibration of ${command.pointer} gave ${calibration.value}, which the scenario format refuses: ${oneLine(formatMessage(checked.errors[0]))}`,
      3,
    );
  }
  writeOutput(command.outDir, 'scenario.json', [JSON.stringify(checked.scenario, null, 2) + '\n']);
  writeOutput(command.outDir, 'calibration.json', [JSON.stringify(calibrationJson(scenario, calibration, version), null, 2) + '\n']);
  io.out(summaryLine(calibration, command.outDir));
  return 0;
}
