/**
 * Long profile along the flowline: bedrock, ice and the ELA, drawn as SVG from the plain geometry
 * in chart/longProfile.ts. Without a result it shows the scenario's initial state; with one, the
 * ice, ELA, terminus and crevasse-prone stretches at that model year. The SVG scales uniformly
 * with its container (viewBox), so the stated vertical exaggeration stays true at any size. The
 * editing layer is drawn last, on top, so that it receives the pointer.
 */
import { max } from 'd3';
import { memo, useId, useMemo } from 'react';
import type { ExposedLake } from '../model/analysis/exposedLakes';
import type { Point } from '../model/piecewiseLinear';
import type { Scenario } from '../model/scenario';
import { ProfileEditLayer } from './edit/ProfileEditLayer';
import { lakeShapes } from '../chart/lakeShapes';
import { errorBarMarks, impliedBed, valueRange } from '../chart/observationMarks';
import { observedTerminus as observedTerminusAt } from '../model/observedTerminus';
import { interpolateAt } from '../model/analysis/observationMisfit';
import { indexRuns } from '../chart/linePath';
import { MIN_GLACIER_THICKNESS } from '../model/glacierExtent';
import { useAnalysisStore } from '../state/analysisStore';
import { useEditorStore } from '../state/editorStore';
import { useScenarioStore } from '../state/scenarioStore';
import { debrisBandLabel, debrisBands } from '../chart/debrisBands';
import { pathData, screenPoints } from '../chart/screenPath';
import './lakes.css';
import './results/steadyPreview.css';
import { GridLines, XTicks, YTicks } from './plot/TickMarks';
import {
  exaggerationLabel,
  longProfileGeometry,
  profileFrame,
  sampleScenario,
  scenarioEla,
  type PixelPoint,
  type PlotSize,
  type ProfileSamples,
} from '../chart/longProfile';

/** The state of the glacier at one model year, as the profile draws it. */
export interface ProfileResult {
  /** Model year [a]. */
  time: number;
  samples: ProfileSamples;
  /** Nye crevasse depth at the cell centres [m]. */
  crevasseDepth: ArrayLike<number>;
  /** ELA at this year [m a.s.l.]; NaN when undefined. */
  ela: number;
  /** Down-valley end of the glacier [m]; NaN when ice-free. */
  terminus: number;
  /** Water that would stand in overdeepenings the ice has left (model/analysis/exposedLakes.ts). */
  lakes?: readonly ExposedLake[];
  /** Elevations the axis must cover over the whole run [m a.s.l.]. */
  alsoShow: number[];
  /** Shown instead of "Year N" (the spin-up preview is not a model year of the run). */
  label?: string;
}

/** The steady glacier of the current climate, drawn over the profile as a dotted surface. */
export interface SteadyOverlay {
  /** Cell centres [m], ice thickness [m], ice surface [m a.s.l.]. */
  x: ArrayLike<number>;
  thickness: ArrayLike<number>;
  surface: ArrayLike<number>;
  /** Down-valley end of the ice [m]. */
  terminus: number;
}

/**
 * Drawing size in SVG user units, near the usual on-screen width so text renders at about its
 * nominal size. The legend sits in the top margin so it never hides data.
 */
const SIZE: PlotSize = { width: 860, height: 500, margin: { top: 48, right: 20, bottom: 66, left: 86 } };
/** Height of each further legend row (observations, the bed-from-the-surface preview) [px]. */
const LEGEND_ROW = 26;
/** With observations or a preview, a legend row for each: the plot starts lower. */
/** Smallest drawing the layout may ask for [px]: below it, labels would collide. */
const MIN_FRAME = { width: 300, height: 200 };
/** Narrower than this, the exaggeration note takes a line of its own under the distance axis [px]. */
const NOTE_BESIDE_TITLE_WIDTH = 560;
/**
 * The drawing size: the frame the layout measured (at least MIN_FRAME), the legend rows taken
 * from its height; unmeasured, the default size with the rows added.
 */
const sizeFor = (frame: { width: number; height: number } | undefined, rows: number): PlotSize => {
  const margin = { ...SIZE.margin, top: SIZE.margin.top + LEGEND_ROW * rows };
  if (!frame) return rows === 0 ? SIZE : { ...SIZE, height: SIZE.height + LEGEND_ROW * rows, margin };
  const width = Math.max(MIN_FRAME.width, frame.width);
  if (width < NOTE_BESIDE_TITLE_WIDTH) margin.bottom += LEGEND_ROW;
  return { width, height: Math.max(MIN_FRAME.height, frame.height), margin };
};
const LEGEND_Y = 20;
/**
 * Narrower than this, or with a long state label (the spin-up's), the legend takes a row of its
 * own under the label instead of sharing the top line with it [px].
 */
const legendFitsBesideLabel = (label: string, width: number, legendWidth: number): boolean =>
  // The label is 22 px bold (about 13 px a character) from the plot's left edge; a 24 px gap.
  SIZE.margin.left + 13 * label.length + 24 <= width - SIZE.margin.right - legendWidth;
/** Width of the distance axis's exaggeration note at 16 px italic (about 8 px a character) [px]. */
const exaggerationWidth = (text: string) => 8 * text.length;
/** Observed terminus marker: a triangle pointing down at the ground [px]. */
const TERMINUS_MARK = 'M0,0 L-7,-12 L7,-12 Z';
/** Height of the crevasse band drawn above the surface, and its gap to the surface [px]. */
const CREVASSE_BAND = 12;
const CREVASSE_GAP = 3;
/** Half the width of a lake's two-line label [px]. */
const LAKE_LABEL_HALF_WIDTH = 110;

// Re-rendered only when its scales change, not with every frame of a run.
const EditLayer = memo(ProfileEditLayer);
// Lines are thinned to what the screen can show (chart/screenPath.ts): with 1,600 cells the full
// paths made playback drop frames.
const polyline = (points: readonly Point[]): string => pathData(screenPoints(points));
const closedPath = (points: readonly Point[]): string => pathData(points, true);

export function LongProfileView({
  scenario,
  result,
  frame: frameSize,
  steady,
}: {
  scenario: Scenario;
  result?: ProfileResult;
  /** The space to draw in [CSS px]; absent: a default size, scaled to the container's width. */
  frame?: { width: number; height: number };
  steady?: SteadyOverlay | null;
}) {
  const titleId = useId();
  const descId = useId();
  const hatchId = useId();
  const plotClipId = useId();
  // An image has no interactive parts for assistive technology: while the profile is edited, its
  // points and drawing area must stay reachable, so the plot is then a named group instead (and
  // takes touches itself: edit.css).
  const editing = useEditorStore((s) => s.mode !== 'view');
  const initial = useMemo(() => sampleScenario(scenario), [scenario]);
  const initialTop = useMemo(() => max(initial.surface) ?? -Infinity, [initial]);
  const observations = scenario.observations;
  const observedThickness = observations?.thickness;
  // The terminus of the observation year: a single position, or the record's at that year.
  const observedTerminus = useMemo(() => observedTerminusAt(observations) ?? null, [observations]);
  const hasObservations = Boolean(observedThickness?.length) || observedTerminus !== null;
  // The bed from the surface (Analyses), previewed until applied or discarded.
  const preview = useAnalysisStore((s) => (s.inversionPreview && s.inversion.result ? s.inversion.result : null));
  const previewStale = useAnalysisStore((s) => s.inversion.revision) !== useScenarioStore((s) => s.revision);
  const stateLabel = result ? (result.label ?? `Year ${formatYear(result.time)}`) : 'Initial state';
  const frameWidth = frameSize?.width;
  const debrisMax = scenario.debris?.length ? Math.max(...scenario.debris.map((p) => p[1])) : null;
  // Reckoned with every entry a result may bring (crevasses, a lake), so the legend does not jump
  // between rows during playback.
  const legendOwnRow = !legendFitsBesideLabel(stateLabel, frameWidth ?? SIZE.width, legendWidth(legendEntries(Boolean(result), Boolean(result), debrisMax)));
  const legendY = LEGEND_Y + (legendOwnRow ? LEGEND_ROW : 0);
  const legendRows = (legendOwnRow ? 1 : 0) + (hasObservations ? 1 : 0) + (preview ? 1 : 0);
  const frameHeight = frameSize?.height;
  const size = useMemo(
    () => sizeFor(frameWidth === undefined || frameHeight === undefined ? undefined : { width: frameWidth, height: frameHeight }, legendRows),
    [frameWidth, frameHeight, legendRows],
  );
  const previewLabel = `Bed from the surface (preview${previewStale ? ', out of date' : ''})`;
  const previewLegendY = legendY + LEGEND_ROW * (hasObservations ? 2 : 1);
  // The beds that measured thickness implies under the initial surface, bars included, stay in
  // view, so the axis does not jump when a run starts.
  const observedRange = useMemo(() => {
    if (!observedThickness?.length) return [];
    return valueRange(impliedBed(observedThickness, initial.x, initial.surface, scenario.grid.length)) ?? [];
  }, [observedThickness, initial, scenario.grid.length]);
  // The steady glacier does not set the elevation range: the axes would move under the user's
  // pointer with every edit. Where it stands above the range it is cut at the top.
  const previewRange = useMemo(() => {
    if (!preview) return [];
    const { surface, thicknessHigh } = preview.bed.inversion;
    let lowest = Infinity;
    for (let i = 0; i < surface.length; i++) lowest = Math.min(lowest, surface[i] - thicknessHigh[i]);
    return Number.isFinite(lowest) ? [lowest] : [];
  }, [preview]);
  const g = useMemo(() => {
    if (!result) return longProfileGeometry(initial, scenario.grid.length, scenarioEla(scenario), size, [...observedRange, ...previewRange]);
    const ela = Number.isFinite(result.ela) ? result.ela : null;
    // The initial surface is included too, so that switching between initial state and results
    // does not rescale the plot.
    const alsoShow = [...result.alsoShow, initialTop, ...observedRange, ...previewRange];
    return longProfileGeometry(result.samples, scenario.grid.length, ela, size, alsoShow);
  }, [initial, initialTop, result, scenario, size, observedRange, previewRange]);
  const { left, right, top, bottom } = g.plotArea;
  // The axes hold still through a run, so the pixel mapping, the editing layer's scale functions
  // and the bed are rebuilt only when a domain changes, not with the geometry object, which is
  // new with every frame.
  const [x0, x1] = g.xDomainKm;
  const [z0, z1] = g.zDomain;
  const frame = useMemo(() => profileFrame([x0, x1], [z0, z1], { left, right, top, bottom }), [x0, x1, z0, z1, left, right, top, bottom]);
  const scales = useMemo(() => ({ x: frame.xPixel, z: frame.zPixel, invertX: frame.xMetres, invertZ: frame.zMetres }), [frame]);
  const exaggeration = exaggerationLabel(g.verticalExaggeration);
  const noteBelow = size.width < NOTE_BESIDE_TITLE_WIDTH;

  // A hatched strip following the surface just above it, where the Nye crevasse depth is > 0.
  const crevasses = useMemo(() => {
    if (!result) return [];
    const { samples, crevasseDepth } = result;
    const half = samples.x.length > 1 ? (samples.x[1] - samples.x[0]) / 2 : 0;
    return indexRuns(samples.x.length, (i) => crevasseDepth[i] > 0 && samples.thickness[i] > 0).map(([a, b]) => {
      const lower: PixelPoint[] = [];
      for (let i = a; i <= b; i++) lower.push([g.xPixel(samples.x[i]), g.zPixel(samples.surface[i]) - CREVASSE_GAP]);
      // Widen a run to its cells' edges, so that a single cell still shows.
      lower.unshift([g.xPixel(samples.x[a] - half), lower[0][1]]);
      lower.push([g.xPixel(samples.x[b] + half), lower[lower.length - 1][1]]);
      const edge = screenPoints(lower);
      const upper = edge.map(([x, y]): Point => [x, y - CREVASSE_BAND]).reverse();
      return { key: a, d: closedPath([...edge, ...upper]) };
    });
  }, [g, result]);

  // The debris cover as a brown band along the ice surface, with its thickness in a tooltip.
  const debris = useMemo(
    () => debrisBands(scenario.debris, result ? result.samples : initial, g.xPixel, g.zPixel),
    [scenario.debris, result, initial, g],
  );

  const lakes = useMemo(
    () => (result?.lakes?.length ? lakeShapes(result.lakes, result.samples.x, result.samples.bed, g.xPixel, g.zPixel, !scenario.width) : []),
    [g, result, scenario.width],
  );

  // The bed holds still through a run: its paths are rebuilt only when the bed or the axes change,
  // so React leaves those elements alone on every frame.
  const bedSamples = result ? result.samples.bed : initial.bed;
  const bedX = result ? result.samples.x : initial.x;
  const bedPaths = useMemo(() => {
    const line = screenPoints(bedSamples.map((z, i) => frame.point(bedX[i], z)));
    if (!line.length) return { line: '', area: '' };
    const area: Point[] = [...line, [line[line.length - 1][0], bottom], [line[0][0], bottom]];
    return { line: pathData(line), area: pathData(area, true) };
  }, [bedSamples, bedX, frame, bottom]);
  // The preview over the glacier only (beyond the terminus the inverted bed is the surface):
  // the band of beds from thicknessLow/High, and the inverted bed as a dashed line.
  const previewPaths = useMemo(() => {
    if (!preview) return null;
    const { x, surface, bed, thicknessLow, thicknessHigh, terminus } = preview.bed.inversion;
    const line: Point[] = [];
    const upper: Point[] = [];
    const lower: Point[] = [];
    for (let i = 0; i < x.length && x[i] <= terminus; i++) {
      line.push(frame.point(x[i], bed[i]));
      upper.push(frame.point(x[i], surface[i] - thicknessLow[i]));
      lower.push(frame.point(x[i], surface[i] - thicknessHigh[i]));
    }
    if (line.length < 2) return null;
    return { line: pathData(screenPoints(line)), band: pathData([...upper, ...lower.reverse()], true) };
  }, [preview, frame]);
  const icePaths = useMemo(
    () =>
      g.iceBodies.map((body) => {
        const top = screenPoints(body.surface);
        const base = screenPoints(body.polygon.slice(body.surface.length).reverse()).reverse();
        return { outline: pathData([...top, ...base], true), surface: pathData(top) };
      }),
    [g],
  );

  // The steady glacier: its surface over the cells that hold ice, and a tick at its terminus.
  const steadyPaths = useMemo(() => {
    if (!steady) return null;
    const { x, thickness, surface } = steady;
    const runs = indexRuns(x.length, (i) => thickness[i] >= MIN_GLACIER_THICKNESS);
    const surfaces = runs.map(([a, b]) => {
      const line: Point[] = [];
      for (let i = a; i <= b; i++) line.push(frame.point(x[i], surface[i]));
      return pathData(screenPoints(line));
    });
    const last = runs.length ? runs[runs.length - 1][1] : -1;
    const tick = last >= 0 ? { x: frame.xPixel(steady.terminus), y: frame.zPixel(surface[last]) } : null;
    return { surfaces, tick };
  }, [steady, frame]);

  // Measured thickness as the bed it implies under the surface shown (chart/observationMarks.ts).
  const shown = result ? result.samples : initial;
  const thicknessMarks = useMemo(
    () =>
      observedThickness?.length
        ? errorBarMarks(impliedBed(observedThickness, shown.x, shown.surface, scenario.grid.length), g.xPixel, g.zPixel, top, bottom)
        : [],
    [observedThickness, shown, scenario.grid.length, g, top, bottom],
  );
  const observedTerminusMark =
    observedTerminus !== null && observedTerminus >= 0 && observedTerminus <= scenario.grid.length
      ? { x: g.xPixel(observedTerminus), y: g.zPixel(interpolateAt(shown.x, shown.surface, observedTerminus)) }
      : null;
  const observationYear = observations?.year ?? 0;

  const terminusX = result && Number.isFinite(result.terminus) ? g.xPixel(result.terminus) : null;
  const terminusLabel = result && Number.isFinite(result.terminus) ? `Terminus ${(result.terminus / 1000).toFixed(2)} km` : null;
  // The terminus label's horizontal extent (about 9 px a character of 17 px text), on the side of
  // the line that faces the middle of the plot.
  const terminusSpan: [number, number] | null =
    terminusX === null || terminusLabel === null
      ? null
      : terminusX > (left + right) / 2
        ? [terminusX - 6 - 9 * terminusLabel.length, terminusX - 6]
        : [terminusX + 6, terminusX + 6 + 9 * terminusLabel.length];

  return (
    <svg
      className={editing ? 'long-profile editing' : 'long-profile'}
      viewBox={`0 0 ${size.width} ${size.height}`}
      role={editing ? 'group' : 'img'}
      aria-labelledby={titleId}
      aria-describedby={descId}
    >
      <title id={titleId}>Long profile of the flowline</title>
      <desc id={descId}>
        {((result ? `${result.label ?? `Model year ${formatYear(result.time)}`}. ` : 'Initial state. ') +
          `Bed and ice surface from 0 to ${g.xDomainKm[1]} km down-valley, elevations ${g.zDomain[0]} to ${g.zDomain[1]} m a.s.l.` +
          (g.ela ? `, ${g.ela.label}` : '') +
          (terminusLabel ? `, ${terminusLabel}` : '') +
          (steady ? `, steady glacier for this climate (preview, dotted) to ${(steady.terminus / 1000).toFixed(2)} km` : '') +
          (thicknessMarks.length ? `, ${thicknessMarks.length} measured thicknesses (year ${observationYear}) drawn as the bed they imply under this surface` : '') +
          (observedTerminusMark ? `, observed terminus ${((observedTerminus ?? 0) / 1000).toFixed(2)} km (year ${observationYear})` : '') +
          `. ${exaggeration}.`).replace('a.s.l.. ', 'a.s.l. ')}
      </desc>
      <defs>
        <pattern id={hatchId} width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line className="crevasse-hatch" x1="0" y1="0" x2="0" y2="8" />
        </pattern>
        <clipPath id={plotClipId}>
          <rect x={left} y={top} width={right - left} height={bottom - top} />
        </clipPath>
      </defs>

      <GridLines ticks={g.zTicks} left={left} right={right} />

      <path className="bed-area" d={bedPaths.area} data-layer="bed-area" />
      {icePaths.map((body, i) => (
        <g key={i}>
          <path className="ice" d={body.outline} data-layer="ice" />
          <path className="ice-surface" d={body.surface} data-layer="ice-surface" />
        </g>
      ))}
      {lakes.length > 0 && (
        <g className="lakes" data-layer="lakes">
          {lakes.map((lake, k) => (
            <g key={k} className="lake">
              <path className="lake-water" d={closedPath(lake.polygon)} />
              <path className="lake-surface" d={polyline(lake.surface)} />
            </g>
          ))}
        </g>
      )}
      <path className="bed" d={bedPaths.line} data-layer="bed" />
      {previewPaths && (
        <g className={previewStale ? 'bed-preview stale' : 'bed-preview'} data-layer="bed-preview">
          <title>Bed from the surface (preview): not applied to the scenario{previewStale ? '; made before the last change to the scenario' : ''}</title>
          <path className="bed-preview-band" d={previewPaths.band} />
          <path className="bed-preview-line" d={previewPaths.line} />
        </g>
      )}

      {steadyPaths && (
        <g className="steady-glacier" data-layer="steady-glacier" clipPath={`url(#${plotClipId})`}>
          <title>Steady glacier for this climate (preview, not a run result)</title>
          {steadyPaths.surfaces.map((d, k) => (
            <path key={k} className="steady-surface" d={d} />
          ))}
          {steadyPaths.tick && <line className="steady-terminus" x1={steadyPaths.tick.x} x2={steadyPaths.tick.x} y1={steadyPaths.tick.y - 14} y2={steadyPaths.tick.y + 6} />}
        </g>
      )}

      {crevasses.length > 0 && (
        <g className="crevasses" data-layer="crevasses">
          {crevasses.map((c) => (
            <path key={c.key} d={c.d} fill={`url(#${hatchId})`} />
          ))}
        </g>
      )}

      {debris.length > 0 && (
        <g className="debris" data-layer="debris">
          {debris.map((band, k) => (
            <path key={k} className="debris-band" d={polyline(band.line)}>
              <title>{debrisBandLabel(band)}</title>
            </path>
          ))}
        </g>
      )}

      {g.ela && (
        <g className="ela" data-layer="ela">
          <line x1={left} x2={right} y1={g.ela.y} y2={g.ela.y} />
          <text x={right - 8} y={g.ela.y - 8} textAnchor="end">
            {g.ela.label}
          </text>
        </g>
      )}

      {terminusX !== null && (
        <g className="terminus" data-layer="terminus" transform={`translate(${terminusX},0)`}>
          <line y1={top} y2={bottom} />
          <text
            x={terminusX > (left + right) / 2 ? -6 : 6}
            y={top + 20}
            textAnchor={terminusX > (left + right) / 2 ? 'end' : 'start'}
          >
            {terminusLabel}
          </text>
        </g>
      )}

      {thicknessMarks.length > 0 && (
        <g className="observation obs-thickness" data-layer="observed-thickness">
          {thicknessMarks.map((m) => (
            <g key={m.index}>
              <title>{`Measured thickness ${observedThickness?.[m.index][1]} ± ${m.source.sigma} m at ${(m.source.x / 1000).toFixed(2)} km: bed ${Math.round(m.source.value)} m a.s.l. under this surface`}</title>
              {m.y2 > m.y1 && (
                <>
                  <line x1={m.cx} x2={m.cx} y1={m.y1} y2={m.y2} />
                  <line x1={m.cx - 4} x2={m.cx + 4} y1={m.y1} y2={m.y1} />
                  <line x1={m.cx - 4} x2={m.cx + 4} y1={m.y2} y2={m.y2} />
                </>
              )}
              <circle cx={m.cx} cy={m.cy} r={3.5} />
            </g>
          ))}
        </g>
      )}
      {observedTerminusMark && (
        <g className="observation obs-terminus" data-layer="observed-terminus" transform={`translate(${observedTerminusMark.x},${observedTerminusMark.y - 3})`}>
          <title>{`Observed terminus ${((observedTerminus ?? 0) / 1000).toFixed(2)} km (year ${observationYear})`}</title>
          <path d={TERMINUS_MARK} />
        </g>
      )}

      {lakes.length > 0 && (
        <g className="lake-labels" data-layer="lake-labels">
          {lakes.map((lake, k) => {
            const x = Math.min(right - 120, Math.max(left + 120, lake.labelAt[0]));
            // Under the terminus label where the two would share a line (short plots).
            const underTerminus = terminusSpan !== null && x - LAKE_LABEL_HALF_WIDTH < terminusSpan[1] && terminusSpan[0] < x + LAKE_LABEL_HALF_WIDTH;
            const y = underTerminus ? Math.max(lake.labelAt[1] - 20, top + 48) : lake.labelAt[1] - 20;
            return (
              <text key={k} x={x} y={y} textAnchor="middle">
                <tspan x={x}>{lake.label[0]}</tspan>
                <tspan x={x} dy="1.2em">
                  {lake.label[1]}
                </tspan>
              </text>
            );
          })}
        </g>
      )}

      <g className="axis axis-x">
        <line x1={left} x2={right} y1={bottom} y2={bottom} />
        <XTicks ticks={g.xTicks} bottom={bottom} labelY={24} />
        <text
          className="axis-title"
          x={noteBelow ? (left + right) / 2 : (left + right - exaggerationWidth(exaggeration) - 12) / 2}
          y={size.height - 10 - (noteBelow ? LEGEND_ROW : 0)}
          textAnchor="middle"
        >
          Distance down-valley (km)
        </text>
      </g>

      <g className="axis axis-z">
        <line x1={left} x2={left} y1={top} y2={bottom} />
        <YTicks ticks={g.zTicks} left={left} />
        <text
          className="axis-title"
          transform={`translate(18,${(top + bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          dy="0.35em"
        >
          Elevation (m a.s.l.)
        </text>
      </g>

      {/* The model year above the plot from the elevation axis on (clear of that axis's title),
          opposite the legend; the exaggeration under the
          distance axis, at its right end, clear of the axis title. */}
      <text className="model-year" x={left} y={LEGEND_Y} dy="0.35em" data-layer="model-year">
        {stateLabel}
      </text>
      <text className="exaggeration" x={right} y={size.height - 10} textAnchor="end">
        {exaggeration}
      </text>
      <Legend right={right} y={legendY} hatchId={hatchId} withResult={Boolean(result)} withLakes={lakes.length > 0} debrisMax={debris.length ? Math.max(...debris.map((b) => b.maxThickness)) : null} />
      {hasObservations && (
        <ObservationLegend right={right} y={legendY + LEGEND_ROW} thickness={Boolean(observedThickness?.length)} terminus={observedTerminus !== null} year={observationYear} />
      )}
      {previewPaths && (
        <g className="legend preview-legend" data-layer="preview-legend" transform={`translate(${right - 30 - 9 * previewLabel.length},${previewLegendY})`}>
          <rect className="bed-preview-band" x={0} y={-7} width={24} height={14} />
          <line className="bed-preview-line" x1={0} x2={24} y1={0} y2={0} />
          <text x={30} dy="0.35em">
            {previewLabel}
          </text>
        </g>
      )}

      <EditLayer
        xScale={scales.x}
        yScale={scales.z}
        invertX={scales.invertX}
        invertY={scales.invertZ}
        width={right - left}
        height={bottom - top}
        plotTop={top}
      />
    </svg>
  );
}

function formatYear(time: number): string {
  return Number.isInteger(time) ? String(time) : time.toFixed(1);
}

/** The legend's entries and their label widths [px]. */
function legendEntries(withResult: boolean, withLakes: boolean, debrisMax: number | null) {
  return [
    { key: 'bed', label: 'Bed', width: 40 },
    { key: 'ice', label: 'Ice', width: 32 },
    { key: 'ela', label: 'ELA', width: 40 },
    // The terminus line carries its own label; crevasses need a key.
    ...(withResult ? [{ key: 'crevasses', label: 'Crevasse-prone', width: 128 }] : []),
    ...(withLakes ? [{ key: 'lake', label: 'Lake', width: 40 }] : []),
    ...(debrisMax !== null ? [{ key: 'debris', label: `Debris ≤ ${Number(debrisMax.toPrecision(2))} m`, width: 120 }] : []),
  ];
}

/** Each entry takes a 30 px swatch and a 16 px gap besides its label. */
const legendWidth = (entries: { width: number }[]) => entries.reduce((sum, e) => sum + e.width + 46, 0);

/** One row of swatches, right-aligned above the plot area. */
function Legend({ right, y, hatchId, withResult, withLakes, debrisMax }: { right: number; y: number; hatchId: string; withResult: boolean; withLakes: boolean; debrisMax: number | null }) {
  const entries = legendEntries(withResult, withLakes, debrisMax);
  const total = legendWidth(entries);
  let x = right - total;
  return (
    <g className="legend" data-layer="legend">
      {entries.map((e) => {
        const at = x;
        x += e.width + 46;
        return (
          <g key={e.key} transform={`translate(${at},${y})`}>
            <LegendSwatch kind={e.key} hatchId={hatchId} />
            <text x={30} dy="0.35em">
              {e.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}

/** The observations' row of the legend, under the model's, with the year they were made. */
function ObservationLegend({ right, y, thickness, terminus, year }: { right: number; y: number; thickness: boolean; terminus: boolean; year: number }) {
  const entries = [
    // Widths at about 9 px a character of the 16 px legend text.
    ...(thickness ? [{ key: 'thickness', label: 'Bed implied by measured thickness', width: 300 }] : []),
    ...(terminus ? [{ key: 'terminus', label: 'Observed terminus', width: 156 }] : []),
  ];
  const total = entries.reduce((sum, e) => sum + e.width + 46, 0);
  let x = right - total;
  return (
    <g className="legend observation-legend" data-layer="observation-legend">
      <text x={x - 12} dy="0.35em" y={y} textAnchor="end" className="legend-note">
        Observed, year {year}:
      </text>
      {entries.map((e) => {
        const at = x;
        x += e.width + 46;
        return (
          <g key={e.key} transform={`translate(${at},${y})`}>
            {e.key === 'thickness' ? (
              <g className="observation obs-thickness">
                <line x1={12} x2={12} y1={-8} y2={8} />
                <line x1={8} x2={16} y1={-8} y2={-8} />
                <line x1={8} x2={16} y1={8} y2={8} />
                <circle cx={12} cy={0} r={4} />
              </g>
            ) : (
              <g className="observation obs-terminus" transform="translate(12,6)">
                <path d={TERMINUS_MARK} />
              </g>
            )}
            <text x={30} dy="0.35em">
              {e.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function LegendSwatch({ kind, hatchId }: { kind: string; hatchId: string }) {
  if (kind === 'bed') {
    return (
      <g>
        <rect className="bed-area" x={0} y={0} width={24} height={9} />
        <line className="bed" x1={0} x2={24} y1={0} y2={0} />
      </g>
    );
  }
  if (kind === 'ice') {
    return (
      <g>
        <rect className="ice" x={0} y={-9} width={24} height={18} />
        <line className="ice-surface" x1={0} x2={24} y1={-9} y2={-9} />
      </g>
    );
  }
  if (kind === 'lake') {
    return (
      <g>
        <rect className="lake-water" x={0} y={-7} width={24} height={14} />
        <line className="lake-surface" x1={0} x2={24} y1={-7} y2={-7} />
      </g>
    );
  }
  if (kind === 'debris') return <line className="debris-band" x1={0} x2={24} y1={0} y2={0} />;
  if (kind === 'crevasses') return <rect className="crevasse-swatch" x={0} y={-6} width={24} height={12} fill={`url(#${hatchId})`} />;
  return <line className="ela-swatch" x1={0} x2={24} y1={0} y2={0} />;
}
