/**
 * One quantity (length or volume) against model year for every finished member, one line each in
 * its member style, over a min–max band per variant when the experiment sweeps a parameter, or,
 * for an uncertainty ensemble, the 5–95 % and 17–83 % percentile bands of each ensemble group.
 */
import { useId } from 'react';
import { linearAxis } from '../../chart/axisTicks';
import { linePath } from '../../chart/linePath';
import type { FinishedMember } from './finishedMembers';
import { bandPath, ENSEMBLE_BANDS, minMaxBand, percentileBand } from '../../chart/spreadBand';
import { GridLines, XTicks, YTicks } from '../plot/TickMarks';

export interface MemberSeriesChartProps {
  /** Shown above the plot and read by screen readers. */
  title: string;
  /** Vertical axis title with its unit. */
  yTitle: string;
  members: readonly FinishedMember[];
  /** Members the bands are made from (default: `members`); may be more than are drawn as lines. */
  bandMembers?: readonly FinishedMember[];
  /** The plotted value of a member at output k, in the axis unit. */
  value: (member: FinishedMember, k: number) => number;
  /** Draw a min–max band per variant (the experiment has a sweep). */
  bands: boolean;
  /** Draw percentile bands per ensemble group (the experiment has an ensemble); replaces `bands`. */
  percentileBands?: boolean;
  /** Longest run [a]: the end of the time axis. */
  years: number;
}

const W = 860;
const H = 330;
const M = { top: 44, right: 24, bottom: 62, left: 96 };

export function MemberSeriesChart({ title, yTitle, members, bandMembers = members, value, bands, percentileBands = false, years }: MemberSeriesChartProps) {
  const titleId = useId();
  const left = M.left;
  const right = W - M.right;
  const top = M.top;
  const bottom = H - M.bottom;
  const valuesOf = (m: FinishedMember) => Float64Array.from(m.result.series.times, (_, k) => value(m, k));
  const lines = members.map((m) => ({ member: m, values: valuesOf(m) }));
  const banded = bands || percentileBands ? (bandMembers === members ? lines : bandMembers.map((m) => ({ member: m, values: valuesOf(m) }))) : [];
  let hi = -Infinity;
  for (const l of [...lines, ...banded]) for (const v of l.values) if (Number.isFinite(v)) hi = Math.max(hi, v);
  // Amounts: the axis starts at zero so that a change is seen against the whole.
  const yAxis = linearAxis(0, Number.isFinite(hi) ? hi * 1.05 : 1, [bottom, top], 5);
  const tAxis = linearAxis(0, years, [left, right], 8);

  const groups = new Map<number, typeof lines>();
  const groupOf = (m: FinishedMember) => (percentileBands ? m.ensembleGroup : m.group);
  for (const l of banded) groups.set(groupOf(l.member), [...(groups.get(groupOf(l.member)) ?? []), l]);
  const ensemblePaths = !percentileBands
    ? []
    : [...groups.entries()].flatMap(([group, grouped]) => {
        const colours = new Set(grouped.map((l) => l.member.style.colour));
        const fill = groups.size > 1 && colours.size === 1 ? [...colours][0] : undefined;
        return ENSEMBLE_BANDS.flatMap((b) => {
          const band = percentileBand(grouped.map((l) => ({ times: l.member.result.series.times, values: l.values })), b.low, b.high);
          return band ? [{ key: `${group}-${b.key}`, group, band: b.key, d: bandPath(band, tAxis.px, yAxis.px), fill }] : [];
        });
      });
  const bandPaths = !bands || percentileBands ? [] : [...groups.entries()].flatMap(([group, grouped]) => {
    const band = minMaxBand(grouped.map((l) => ({ times: l.member.result.series.times, values: l.values })));
    // In the variant's colour when colours name variants (its members share one), else grey.
    const colours = new Set(grouped.map((l) => l.member.style.colour));
    return band ? [{ group, d: bandPath(band, tAxis.px, yAxis.px), fill: groups.size > 1 && colours.size === 1 ? [...colours][0] : undefined }] : [];
  });

  return (
    <svg className="plot member-series" viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={titleId}>
      <title id={titleId}>{`${title}: ${members.length} member${members.length === 1 ? '' : 's'}`}</title>
      <text className="plot-title" x={left} y={24}>
        {title}
      </text>
      <GridLines ticks={yAxis.ticks} left={left} right={right} />
      <g className="percentile-bands">
        {ensemblePaths.map((b) => (
          <path key={b.key} className={`percentile-band ${b.band}`} d={b.d} data-band={b.group} style={b.fill ? { fill: b.fill } : undefined} />
        ))}
      </g>
      <g className="spread-bands">
        {bandPaths.map((b) => (
          <path key={b.group} className="spread-band" d={b.d} data-band={b.group} style={b.fill ? { fill: b.fill } : undefined} />
        ))}
      </g>
      <g className="member-lines">
        {lines.map(({ member, values }) => (
          <path
            key={member.index}
            className="series member-line"
            d={linePath(member.result.series.times, values, tAxis.px, yAxis.px)}
            stroke={member.style.colour}
            strokeDasharray={member.style.dash || undefined}
            data-member={member.name}
          >
            <title>{`${member.label} (${member.name})`}</title>
          </path>
        ))}
      </g>
      <g className="axis">
        <line x1={left} x2={right} y1={bottom} y2={bottom} />
        <line x1={left} x2={left} y1={top} y2={bottom} />
        <XTicks ticks={tAxis.ticks} bottom={bottom} />
        <YTicks ticks={yAxis.ticks} left={left} />
        <text className="axis-title" x={(left + right) / 2} y={H - 10} textAnchor="middle">
          Model year (a)
        </text>
        <text className="axis-title" transform={`translate(22,${(top + bottom) / 2}) rotate(-90)`} textAnchor="middle">
          {yTitle}
        </text>
      </g>
    </svg>
  );
}
