/** The run's status line names a start from today's glacier and the change committed at year 0. */
import { describe, expect, it } from 'vitest';
import type { RunSummary } from '../../src/model/runScenario';
import { runStatusText } from '../../src/ui/run/runStatusText';

const summaryWith = (start: object) => ({ start }) as unknown as RunSummary;

describe('run status with a start from today', () => {
  it('says the start is being worked out while it is', () => {
    expect(runStatusText('running', { phase: 'spinup', year: 0, of: 0 }, 0, null)).toBe('Working out the start from the glacier as it is today…');
  });

  it('says how the run started and what was committed', () => {
    const transient = summaryWith({ from: 'transient', startYear: -170, climateOffset: 0.42236, fitted: true, committed: { lengthChange: -2350 } });
    expect(runStatusText('done', { phase: 'run', year: 200, of: 200 }, 41, null, transient)).toBe(
      'Done: 200 years, 41 outputs from a transient past since year -170 (climate offset 0.422 K, fitted); committed at year 0: \u22122350 m of length.',
    );
    const observed = summaryWith({ from: 'observed', committed: { lengthChange: 0 } });
    expect(runStatusText('done', { phase: 'run', year: 50, of: 50 }, 6, null, observed)).toBe(
      'Done: 50 years, 6 outputs from the observed glacier; committed at year 0: 0 m of length.',
    );
  });
});
