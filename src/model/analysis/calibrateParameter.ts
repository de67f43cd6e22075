/**
 * Calibration of one scalar parameter, named by a JSON Pointer (RFC 6901) into the scenario, to
 * the scenario's observations. Which observation constrains which parameter:
 *
 *   /ice/A, /ice/enhancement    surface speeds (weighted least squares over log p), or thickness
 *                               points (through the bed inversion)          calibrateFlow.ts
 *   /sliding/C                  surface speeds only                          calibrateFlow.ts
 *   the balance model's own     one terminus (spin-ups), a terminus record   calibrateClimate.ts
 *   parameter: /massBalance/ela (transient runs), the geodetic balance
 *   (linear), .../meanTemperature
 *   (degree-day, a temperature
 *   offset), .../points (table,
 *   shifted as a whole)
 *   any other number under      the geodetic balance only                    calibrateClimate.ts
 *   /massBalance
 *
 * A pointer that names no number, or that no observation in the scenario constrains, is refused
 * (CalibrationRefusal) with the observation that would be needed; a search that finds no bracket
 * ends in CalibrationNotBracketed, saying what was tried. When several observations constrain the
 * pointer, the first of the list above is used unless `observation` chooses; the others are named
 * in the statements (one observation per fit: joint fits are not done).
 */
import type { Scenario } from '../scenario';
import { balanceParameter, calibrateToGeodeticBalance, calibrateToTerminus, calibrateToTerminusRecord, terminusPointer, type RecordFitOptions } from './calibrateClimate';
import { calibrateToSpeeds, calibrateToThickness } from './calibrateFlow';
import { FLOW_POINTERS, flowParameterUnit } from './flowParameterUnit';
import { CalibrationRefusal, OBSERVATION_POINTER, type ObservationKind, type ParameterCalibration } from './calibrationTypes';
import { parameterValue, pointerProblem } from './scenarioParameter';

export interface CalibrateOptions extends RecordFitOptions {
  /** The observation to fit to, when several constrain the parameter. */
  observation?: ObservationKind;
}


/** The observations in the scenario that constrain `pointer`, in order of use, and those that would. */
export function constrainingObservations(scenario: Scenario, pointer: string): { present: ObservationKind[]; possible: ObservationKind[] } {
  const obs = scenario.observations ?? {};
  const has: Record<ObservationKind, boolean> = {
    surfaceSpeed: (obs.surfaceSpeed?.length ?? 0) > 0,
    thickness: (obs.thickness?.length ?? 0) > 0,
    terminus: typeof obs.terminus === 'number',
    terminusRecord: Array.isArray(obs.terminus) && obs.terminus.length > 0,
    geodeticBalance: obs.geodeticBalance !== undefined,
  };
  let possible: ObservationKind[] = [];
  if (pointer === '/sliding/C') possible = ['surfaceSpeed'];
  else if (FLOW_POINTERS.has(pointer)) possible = ['surfaceSpeed', 'thickness'];
  else if (pointer === terminusPointer(scenario)) possible = ['terminus', 'terminusRecord', 'geodeticBalance'];
  else if (pointer.startsWith('/massBalance/')) possible = ['geodeticBalance'];
  return { present: possible.filter((kind) => has[kind]), possible };
}

function describeKinds(kinds: readonly ObservationKind[]): string {
  const words: Record<ObservationKind, string> = {
    surfaceSpeed: `surface speeds (${OBSERVATION_POINTER.surfaceSpeed})`,
    thickness: `thickness points (${OBSERVATION_POINTER.thickness})`,
    terminus: `a terminus position (${OBSERVATION_POINTER.terminus})`,
    terminusRecord: `a terminus record (${OBSERVATION_POINTER.terminusRecord} as [year, x] pairs)`,
    geodeticBalance: `a geodetic balance (${OBSERVATION_POINTER.geodeticBalance})`,
  };
  return kinds.map((k) => words[k]).join(' or ');
}

/** Refusals that need no model run: the pointer, and what could constrain it. */
export function checkCalibration(scenario: Scenario, pointer: string, observation?: ObservationKind): ObservationKind {
  const tableShift = pointer === '/massBalance/points' && scenario.massBalance.model === 'table';
  const problem = tableShift ? undefined : pointerProblem(scenario, pointer);
  if (problem) throw new CalibrationRefusal(pointer, `${pointer} names no number in the scenario: ${problem}`);
  if (pointer === '/ice/enhancement' && scenario.ice.A !== undefined) {
    throw new CalibrationRefusal(pointer, '/ice/enhancement multiplies only the rate factor from /ice/temperature; this scenario gives /ice/A: calibrate /ice/A');
  }
  const { present, possible } = constrainingObservations(scenario, pointer);
  if (possible.length === 0) {
    throw new CalibrationRefusal(
      pointer,
      `no observation constrains ${pointer}: the calibration fits /ice/A, /ice/enhancement and /sliding/C to surface speeds ` +
        `(and the first two to thickness points), and numbers under /massBalance to the geodetic balance ` +
        `(the balance model's ${terminusPointer(scenario)} also to the terminus)`,
    );
  }
  if (observation !== undefined && !possible.includes(observation)) {
    throw new CalibrationRefusal(pointer, `${describeKinds([observation])} does not constrain ${pointer}; ${describeKinds(possible)} would`, OBSERVATION_POINTER[possible[0]]);
  }
  const wanted = observation !== undefined ? [observation] : possible;
  const usable = present.filter((k) => wanted.includes(k));
  if (usable.length === 0) {
    throw new CalibrationRefusal(
      pointer,
      `the scenario has no observation that constrains ${pointer}: it needs ${describeKinds(wanted)}` +
        (pointer === '/sliding/C' && present.length === 0 && (scenario.observations?.thickness?.length ?? 0) > 0
          ? ' (thickness points alone cannot tell sliding from deformation: the bed inversion scales the rate factor only)'
          : ''),
      OBSERVATION_POINTER[wanted[0]],
    );
  }
  const kind = usable[0];
  if ((kind === 'surfaceSpeed' || kind === 'thickness' || kind === 'geodeticBalance') && !(scenario.surface && scenario.surface.length >= 2)) {
    throw new CalibrationRefusal(pointer, `fitting to ${describeKinds([kind])} needs the observed glacier: its surface (/surface)`, '/surface');
  }
  if (kind === 'surfaceSpeed' || kind === 'thickness') {
    const value = parameterValue(scenario, pointer);
    if (!(value > 0)) {
      throw new CalibrationRefusal(pointer, `${pointer} is ${value}: the fit searches over log ${pointer}, so it needs a positive starting value`);
    }
  }
  return kind;
}

export function calibrateParameter(scenario: Scenario, pointer: string, options: CalibrateOptions = {}): ParameterCalibration {
  const kind = checkCalibration(scenario, pointer, options.observation);
  const { present } = constrainingObservations(scenario, pointer);
  const unused = present.filter((k) => k !== kind);
  let result: ParameterCalibration;
  switch (kind) {
    case 'surfaceSpeed':
      result = calibrateToSpeeds(scenario, pointer, flowParameterUnit(scenario, pointer));
      break;
    case 'thickness':
      result = calibrateToThickness(scenario, pointer, flowParameterUnit(scenario, pointer));
      break;
    case 'terminus':
      result = calibrateToTerminus(scenario, balanceParameter(scenario, pointer), options);
      break;
    case 'terminusRecord':
      result = calibrateToTerminusRecord(scenario, balanceParameter(scenario, pointer), options);
      break;
    case 'geodeticBalance':
      result = calibrateToGeodeticBalance(scenario, balanceParameter(scenario, pointer));
      break;
  }
  if (unused.length > 0) result.statements.push(`not used (one observation per fit): ${describeKinds(unused)}`);
  return result;
}
