/** One line saying where the run is, in model years. */
import type { RunSummary } from '../../model/runScenario';
import type { RunFailure, RunProgress, RunStatus } from '../../state/runStore';

/** The start from today's glacier in words: how it started and the change committed at year 0. */
function startText(start: RunSummary['start']): string {
  if (!start) return '';
  const how =
    start.from === 'observed'
      ? 'from the observed glacier'
      : `from a transient past since year ${formatYear(start.startYear ?? 0)} (climate offset ${(start.climateOffset ?? 0).toFixed(3).replace(/^-/, '\u2212')} K${start.fitted ? ', fitted' : ''})`;
  const committed = start.committed.lengthChange;
  return ` ${how}; committed at year 0: ${committed > 0 ? '+' : committed < 0 ? '\u2212' : ''}${formatYear(Math.abs(committed))} m of length`;
}

export function runStatusText(
  status: RunStatus,
  progress: RunProgress | null,
  frames: number,
  failure: RunFailure | null,
  summary: RunSummary | null = null,
): string {
  const year = progress ? formatYear(progress.year) : '0';
  switch (status) {
    case 'idle':
      return 'Not run yet.';
    case 'starting':
      return 'Starting…';
    case 'spinning-up':
      return `Spin-up to a steady state under the year-0 climate: ${year} model years (at most ${formatYear(progress?.of ?? 0)}).`;
    case 'running':
      // Spin-up progress while 'running' comes only from a start from today's glacier (no spin-up asked).
      if (progress?.phase === 'spinup') return 'Working out the start from the glacier as it is today…';
      return `Running: year ${year} of ${formatYear(progress?.of ?? 0)}.`;
    case 'paused':
      return progress?.phase === 'spinup' ? `Paused in spin-up at ${year} model years.` : `Paused at year ${year}.`;
    case 'stopped':
      return `Stopped at year ${year}; ${frames} output${frames === 1 ? '' : 's'} kept.`;
    case 'done': {
      const spin = summary?.spinup;
      const spun = spin
        ? ` after a spin-up of ${formatYear(spin.years)} model years${spin.converged ? ' to a steady state' : ' that did not reach a steady state'}`
        : '';
      return `Done: ${formatYear(progress?.of ?? 0)} years, ${frames} outputs${spun}${startText(summary?.start)}.`;
    }
    case 'failed': {
      const where =
        failure?.year !== undefined
          ? ` at year ${formatYear(failure.year)}` + (failure.position !== undefined ? `, ${(failure.position / 1000).toFixed(2)} km down-valley` : '')
          : '';
      const kept = frames === 1 ? '1 output before it is kept' : `${frames} outputs before it are kept`;
      // Messages may end in their own full stop; never print two.
      const reason = (failure?.message ?? 'unknown reason').replace(/\.$/, '');
      return `The run failed${where}: ${reason}. ${kept}.`;
    }
  }
}

// Made once: a number format costs milliseconds to build, and this runs on every progress message.
const wholeYears = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0, useGrouping: 'min2' as unknown as boolean });

function formatYear(year: number): string {
  return Number.isInteger(year) ? wholeYears.format(year) : year.toFixed(1);
}
