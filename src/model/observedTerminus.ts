/**
 * The terminus position that the observations give for their own year: a single position as it
 * is; a record [[year a, x m], ...] interpolated at `observations.year` (default 0), held at its
 * end values outside it (as every point list of the format). undefined: no terminus observed.
 */
import { piecewiseLinear } from './piecewiseLinear';
import type { Observations } from './scenario';

export function observedTerminus(observations: Observations | undefined): number | undefined {
  const terminus = observations?.terminus;
  if (terminus === undefined) return undefined;
  if (typeof terminus === 'number') return terminus;
  return piecewiseLinear(terminus)(observations?.year ?? 0);
}
