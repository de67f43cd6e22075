/** Names the members drawn on the charts, with their line colour and style. */
import type { FinishedMember } from './finishedMembers';

/** Entries listed; more members are counted (the table names them all). */
const LEGEND_ENTRIES = 21;

export function MemberLegend({ members }: { members: readonly FinishedMember[] }) {
  const shown = members.slice(0, LEGEND_ENTRIES);
  return (
    <ul className="member-legend" aria-label="Members on the charts">
      {shown.map((m) => (
        <li key={m.index}>
          <svg width="36" height="12" aria-hidden="true">
            <line x1="2" x2="34" y1="6" y2="6" stroke={m.style.colour} strokeWidth="3" strokeDasharray={m.style.dash || undefined} />
          </svg>
          <span title={m.name}>{m.label}</span>
        </li>
      ))}
      {members.length > shown.length && <li>… and {members.length - shown.length} more (see the table)</li>}
    </ul>
  );
}
