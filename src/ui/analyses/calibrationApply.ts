/**
 * Turning a calibration result into the scenario edit it offers: the found value, rounded where
 * rounding keeps it inside the band of matching values, applied to the scenario the calibration
 * was made from. Pure, for tests; the panel commits it through commitEdit.
 */
import { withCalibrationParameter, type CalibrationParameter, type CalibrationResult } from '../../model/analysis/calibrateTerminus';
import type { Scenario } from '../../model/scenario';

/** Decimals a found value is written with: centimetres of ELA or shift, millikelvin of offset. */
const DECIMALS: Record<CalibrationParameter, number> = { ela: 2, 'table-shift': 2, 'temperature-offset': 3 };

export function parameterLabel(name: CalibrationParameter): string {
  switch (name) {
    case 'ela':
      return 'ELA';
    case 'table-shift':
      return 'Shift of the balance table';
    case 'temperature-offset':
      return 'Temperature offset';
  }
}

/** The value to apply: rounded when the rounded value still lies in the matching band. */
export function valueToApply(result: Pick<CalibrationResult, 'parameterName' | 'parameter' | 'matchBand'>): number {
  const rounded = Number(result.parameter.toFixed(DECIMALS[result.parameterName]));
  const band = result.matchBand;
  return band && rounded >= band[0] && rounded <= band[1] ? rounded : result.parameter;
}

export function formatParameter(name: CalibrationParameter, value: number, unit: string): string {
  return `${value.toFixed(DECIMALS[name]).replace('-', '\u2212')} ${unit}`;
}

/** The scenario with the found value applied, and the label of that edit in the undo history. */
export function calibratedScenario(from: Scenario, result: CalibrationResult, observedTerminus: number): { scenario: Scenario; label: string } {
  const value = valueToApply(result);
  return {
    scenario: withCalibrationParameter(from, value),
    label: `${parameterLabel(result.parameterName)} calibrated to a terminus at ${(observedTerminus / 1000).toFixed(2)} km`,
  };
}
