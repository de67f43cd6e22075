/**
 * The results of the last run: length and volume against time for every member (with a min–max
 * band per variant when there is a sweep), the final glaciers over the bed, and the outcomes
 * table. Members are opened in the workbench from the table.
 */
import { useDeferredValue, useMemo } from 'react';
import type { ExperimentMember, ValidExperiment } from '../../experiment/validateExperiment';
import { useShallow } from 'zustand/react/shallow';
import { useExperimentStore } from '../../state/experimentStore';
import { useRunClient } from '../run/RunClientContext';
import { ExperimentExport } from './ExperimentExport';
import { FinalProfilesChart } from './FinalProfilesChart';
import { finishedMembers, memberLabel, volumeScale } from './finishedMembers';
import { MemberLegend } from './MemberLegend';
import { memberStyler } from './memberStyles';
import { MemberSeriesChart } from './MemberSeriesChart';
import { openMemberInWorkbench } from './openMemberInWorkbench';
import type { OutcomeRowData } from './outcomeColumns';
import { OutcomesTable } from './OutcomesTable';

/** Members drawn as lines (and named in the legend); the bands and the table cover all of them. */
const MAX_LINES = 100;

export function ExperimentResults({ experiment, members }: { experiment: ValidExperiment; members: readonly ExperimentMember[] }) {
  // Only what the charts and the table show, compared item by item: the progress that streams in
  // several times a second redraws nothing here. Deferred, so redrawing the charts as members
  // finish never holds up the page.
  const results = useDeferredValue(useExperimentStore(useShallow((s) => s.runs.map((r) => r.result))));
  const statuses = useDeferredValue(useExperimentStore(useShallow((s) => s.runs.map((r) => r.status))));
  const messages = useDeferredValue(useExperimentStore(useShallow((s) => s.runs.map((r) => r.message))));
  const client = useRunClient();
  const hasSweep = Object.keys(experiment.sweep ?? {}).length > 0;
  const styleOf = useMemo(() => memberStyler(members, hasSweep), [members, hasSweep]);
  const finished = useMemo(() => finishedMembers(members, results, styleOf), [members, results, styleOf]);
  const rows = useMemo<OutcomeRowData[]>(
    () =>
      statuses.map((status, k) => ({
        index: k,
        name: members[k]?.name ?? '',
        label: members[k] ? memberLabel(members[k]) : '',
        status: status === 'done' ? 'ok' : status,
        outcome: results[k]?.outcome ?? null,
        message: messages[k] ?? '',
      })),
    [statuses, results, messages, members],
  );
  // The same array while nothing new has finished, so the charts' memos hold.
  const drawn = useMemo(() => (finished.length > MAX_LINES ? finished.slice(0, MAX_LINES) : finished), [finished]);
  if (statuses.length === 0) return <p className="experiment-note">Run the experiment to see its members' length, volume and final glaciers here.</p>;

  // Volumes per metre of width when no member gives widths (as the workbench shows them).
  const unitWidth = members.every((m) => !m.scenario.width);
  const volume = volumeScale(unitWidth);
  const years = Math.max(...members.map((m) => m.scenario.run.years));
  const ensemble = experiment.ensemble !== undefined;
  // An ensemble draws its percentile bands instead of the sweep's min–max range.
  const bands = hasSweep && !ensemble;

  return (
    <div className="experiment-results">
      {finished.length > 0 && (
        <>
          <MemberLegend members={drawn} />
          {drawn.length < finished.length && (
            <p className="field-help">
              Lines for the first {MAX_LINES} of {finished.length} finished members{bands || ensemble ? '; the shaded ranges cover all of them' : ''}. The table lists every member.
            </p>
          )}
          <MemberSeriesChart title="Glacier length" yTitle="Length (km)" members={drawn} bandMembers={finished} value={(m, k) => m.result.series.length[k] / 1000} bands={bands} percentileBands={ensemble} years={years} />
          <MemberSeriesChart
            title="Ice volume"
            yTitle={`Volume (${volume.unit})`}
            members={drawn}
            bandMembers={finished}
            value={(m, k) => m.result.series.volume[k] / volume.divisor}
            bands={bands}
            percentileBands={ensemble}
            years={years}
          />
          {bands && <p className="field-help">Shaded: the range (minimum to maximum) over the sweep values of each variant.</p>}
          {ensemble && (
            <p className="field-help">
              Shaded: the 5–95 % (light) and 17–83 % (dark) percentiles of the ensemble at each output time, per variant and sweep value (linear
              between closest ranks).
            </p>
          )}
          <FinalProfilesChart members={drawn} />
        </>
      )}
      {finished.length > 0 && <ExperimentExport experiment={experiment} finished={finished} bands={bands} percentileBands={ensemble} />}
      <OutcomesTable rows={rows} unitWidth={unitWidth} colourOf={styleOf} onOpenMember={(k) => members[k] && openMemberInWorkbench(members[k], client)} />
    </div>
  );
}
