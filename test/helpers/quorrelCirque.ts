/**
 * Quorrel cirque (invented): a small valley glacier for quick tests of writers and the command
 * line, 3 km at 100 m, no spin-up, 50 years with outputs every 15 years (0, 15, 30, 45, 50).
 * Returned as plain JSON, fresh each call, so tests can break it to check error messages.
 */
export function quorrelCirque(changes: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    format: 'firnline-scenario',
    version: 1,
    name: 'Quorrel cirque (invented)',
    grid: { length: 3000, spacing: 100 },
    bed: [[0, 3000], [3000, 2500]],
    surface: [[0, 3080], [1200, 2880], [1800, 2700], [3000, 2500]],
    ice: { n: 3, A: 2.4e-24 },
    massBalance: { model: 'linear', ela: 2880, ablationGradient: 0.007 },
    run: { years: 50, outputEvery: 15 },
    ...changes,
  };
}
