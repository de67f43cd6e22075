/**
 * Units of the flow parameters a calibration fits, with the scenario's exponents written in:
 * A in Pa^-3 s^-1 for n = 3 (Pa^-n s^-1 in general), C in m a^-1 Pa^-3 for m = 3.
 */
import type { Scenario } from '../scenario';

/** The pointers a flow calibration fits. */
export const FLOW_POINTERS: ReadonlySet<string> = new Set(['/ice/A', '/ice/enhancement', '/sliding/C']);

export function flowParameterUnit(scenario: Scenario, pointer: string): string {
  if (pointer === '/ice/A') return `Pa^-${scenario.ice.n} s^-1`;
  if (pointer === '/sliding/C') return `m a^-1 Pa^-${scenario.sliding?.m ?? 'm'}`;
  return '-';
}
