import type { MassBalanceSpec } from '../../scenario';
import { degreeDayBalance } from './degreeDayBalance';
import { linearBalance } from './linearBalance';
import type { MassBalanceModel } from './massBalanceModel';
import { tableBalance } from './tableBalance';

/** The mass-balance formulation a scenario asks for. */
export function createMassBalance(spec: MassBalanceSpec): MassBalanceModel {
  switch (spec.model) {
    case 'linear':
      return linearBalance(spec);
    case 'table':
      return tableBalance(spec);
    case 'degree-day':
      return degreeDayBalance(spec);
  }
}
