/**
 * Geometry of the long-profile plot as plain data: scales, pixel polylines, ticks and the
 * vertical exaggeration. No React and no DOM, so it is unit-tested on hand-worked cases and the
 * SVG component only has to draw what it is given.
 */
import { max, min, scaleLinear } from 'd3';
import { piecewiseLinear } from '../model/piecewiseLinear';
import type { Scenario } from '../model/scenario';
import type { Tick } from './axisTicks';

/** Cell-centre samples of a flowline; all arrays have one entry per cell. */
export interface ProfileSamples {
  /** Cell-centre positions [m from the head of the valley]. */
  x: number[];
  /** Bed elevation [m a.s.l.]. */
  bed: number[];
  /** Ice surface elevation [m a.s.l.], never below the bed. */
  surface: number[];
  /** Ice thickness [m], >= 0. */
  thickness: number[];
}

/** Plot size in SVG user units (pixels before any CSS scaling). */
export interface PlotSize {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

export type PixelPoint = [number, number];

export interface IceBody {
  /** Closed outline: surface down-valley, then bed back up-valley. */
  polygon: PixelPoint[];
  /** The ice surface alone, drawn as a line over the fill. */
  surface: PixelPoint[];
}

export interface LongProfileGeometry {
  /** Horizontal axis domain [km]. */
  xDomainKm: [number, number];
  /** Vertical axis domain [m a.s.l.], widened to round tick values. */
  zDomain: [number, number];
  /** Plot-area edges in pixels. */
  plotArea: { left: number; right: number; top: number; bottom: number };
  bedLine: PixelPoint[];
  /** Bedrock fill: the bed line closed along the bottom of the plot area. */
  bedArea: PixelPoint[];
  iceBodies: IceBody[];
  /** Horizontal ELA line, or null when the balance model has no fixed ELA. */
  ela: { elevation: number; y: number; label: string } | null;
  xTicks: Tick[];
  zTicks: Tick[];
  /** (metres per pixel horizontally) / (metres per pixel vertically). */
  verticalExaggeration: number;
  /** Distance down-valley [m] to pixels, and back. */
  xPixel: (xMetres: number) => number;
  xMetres: (px: number) => number;
  /** Elevation [m a.s.l.] to pixels, and back. */
  zPixel: (elevation: number) => number;
  zMetres: (px: number) => number;
}

/** Pixel mapping of a plot area, fixed by its two domains. */
export interface ProfileFrame {
  /** Distance down-valley [m] to pixels, and back. */
  xPixel: (xMetres: number) => number;
  xMetres: (px: number) => number;
  /** Elevation [m a.s.l.] to pixels, and back. */
  zPixel: (elevation: number) => number;
  zMetres: (px: number) => number;
  /** One sample to pixels by a plain affine map (cheaper per call than a d3 scale). */
  point: (xMetres: number, elevation: number) => PixelPoint;
}

/**
 * The mapping alone, so that a view can keep it (and whatever it draws with it) while the axes
 * hold still, rather than rebuild it with each frame's geometry.
 */
export function profileFrame(
  xDomainKm: readonly [number, number],
  zDomain: readonly [number, number],
  plotArea: { left: number; right: number; top: number; bottom: number },
): ProfileFrame {
  const xScale = scaleLinear().domain(xDomainKm).range([plotArea.left, plotArea.right]);
  const zScale = scaleLinear().domain(zDomain).range([plotArea.bottom, plotArea.top]);
  const xK = (plotArea.right - plotArea.left) / (xDomainKm[1] - xDomainKm[0]);
  const zK = (plotArea.top - plotArea.bottom) / (zDomain[1] - zDomain[0]);
  return {
    xPixel: (xMetres) => xScale(xMetres / 1000),
    xMetres: (px) => xScale.invert(px) * 1000,
    zPixel: (elevation) => zScale(elevation),
    zMetres: (px) => zScale.invert(px),
    point: (xMetres, elevation) => [plotArea.left + (xMetres / 1000 - xDomainKm[0]) * xK, plotArea.bottom + (elevation - zDomain[0]) * zK],
  };
}

/** Samples bed and initial surface at the cell centres x_i = (i + 1/2) * spacing. */
export function sampleScenario(scenario: Scenario): ProfileSamples {
  const { length, spacing } = scenario.grid;
  const cells = Math.round(length / spacing);
  const bedAt = piecewiseLinear(scenario.bed);
  // No surface key means an ice-free valley: the surface is the bed.
  const surfaceAt = scenario.surface ? piecewiseLinear(scenario.surface) : bedAt;
  const x: number[] = [];
  const bed: number[] = [];
  const surface: number[] = [];
  const thickness: number[] = [];
  for (let i = 0; i < cells; i++) {
    const xi = (i + 0.5) * spacing;
    const b = bedAt(xi);
    const h = Math.max(0, surfaceAt(xi) - b);
    x.push(xi);
    bed.push(b);
    thickness.push(h);
    surface.push(b + h);
  }
  return { x, bed, surface, thickness };
}

/** The ELA drawn on the profile; only the linear model has one that is fixed in advance. */
export function scenarioEla(scenario: Scenario): number | null {
  return scenario.massBalance.model === 'linear' ? scenario.massBalance.ela : null;
}

/**
 * Lays out the profile in a plot of the given size. `lengthM` is the domain length, so that the
 * axis runs from the head (0) to the end of the last cell rather than between cell centres.
 * `alsoShow` lists further elevations the axis must cover (the highest surface and the ELA range
 * over a run), so that the axis holds still while the run plays.
 */
export function longProfileGeometry(
  samples: ProfileSamples,
  lengthM: number,
  ela: number | null,
  size: PlotSize,
  alsoShow: readonly number[] = [],
  /** Distance between labelled ticks aimed at [px]; printed figures want them closer. */
  tickSpacing: { x: number; z: number } = { x: 90, z: 80 },
): LongProfileGeometry {
  const { bed, surface, thickness } = samples;
  const plotArea = {
    left: size.margin.left,
    right: size.width - size.margin.right,
    top: size.margin.top,
    bottom: size.height - size.margin.bottom,
  };
  const plotWidth = plotArea.right - plotArea.left;
  const plotHeight = plotArea.bottom - plotArea.top;

  const xDomainKm: [number, number] = [0, lengthM / 1000];
  const xScale = scaleLinear().domain(xDomainKm).range([plotArea.left, plotArea.right]);
  const xTickCount = Math.max(2, Math.round(plotWidth / tickSpacing.x));

  // The vertical range covers bed, surface and ELA, rounded outwards to tick steps.
  // d3's min/max loop; spreading 100,000 cells into Math.min would overflow the call stack.
  let zMin = min(bed) ?? Infinity;
  let zMax = max(surface) ?? -Infinity;
  for (const z of ela === null ? alsoShow : [ela, ...alsoShow]) {
    if (!Number.isFinite(z)) continue;
    zMin = Math.min(zMin, z);
    zMax = Math.max(zMax, z);
  }
  // A little air above and below the data, then rounding to a step finer than the labelled
  // ticks, so the axis does not grow by most of a tick interval at either end.
  const pad = Math.max(0.04 * (zMax - zMin), 10);
  zMin -= pad;
  zMax += pad;
  const zTickCount = Math.max(2, Math.round(plotHeight / tickSpacing.z));
  const zScale = scaleLinear()
    .domain([zMin, zMax])
    .range([plotArea.bottom, plotArea.top])
    .nice(zTickCount * 2);
  const zDomain = zScale.domain() as [number, number];

  // Plain affine maps for the per-cell points: d3's general scales cost more per call, and this
  // runs for every cell on every frame of a run.
  const frame = profileFrame(xDomainKm, zDomain, plotArea);
  const point = (i: number, z: number): PixelPoint => frame.point(samples.x[i], z);
  const bedLine = bed.map((z, i) => point(i, z));
  const bedArea: PixelPoint[] = bedLine.length
    ? [...bedLine, [bedLine[bedLine.length - 1][0], plotArea.bottom], [bedLine[0][0], plotArea.bottom]]
    : [];

  const xTickFormat = xScale.tickFormat(xTickCount, '~f');
  const zTickFormat = zScale.tickFormat(zTickCount, '~f');

  return {
    xDomainKm,
    zDomain,
    plotArea,
    bedLine,
    bedArea,
    iceBodies: iceRuns(thickness).map(([first, last]) => {
      const top: PixelPoint[] = [];
      const base: PixelPoint[] = [];
      for (let i = first; i <= last; i++) {
        top.push(point(i, surface[i]));
        base.push(point(i, bed[i]));
      }
      return { polygon: [...top, ...base.reverse()], surface: top };
    }),
    ela: ela === null ? null : { elevation: ela, y: zScale(ela), label: `ELA ${Math.round(ela)} m a.s.l.` },
    xTicks: xScale.ticks(xTickCount).map((v) => ({ value: v, label: xTickFormat(v), px: xScale(v) })),
    zTicks: zScale.ticks(zTickCount).map((v) => ({ value: v, label: zTickFormat(v), px: zScale(v) })),
    verticalExaggeration: verticalExaggeration(lengthM, plotWidth, zDomain[1] - zDomain[0], plotHeight),
    xPixel: frame.xPixel,
    xMetres: frame.xMetres,
    zPixel: frame.zPixel,
    zMetres: frame.zMetres,
  };
}

/** (metres per pixel horizontally) / (metres per pixel vertically); 1 means true scale. */
export function verticalExaggeration(
  horizontalM: number,
  widthPx: number,
  verticalM: number,
  heightPx: number,
): number {
  return horizontalM / widthPx / (verticalM / heightPx);
}

/** The exaggeration as printed on the plot, to one decimal. */
export function exaggerationLabel(ve: number): string {
  return `Vertical exaggeration ×${ve.toFixed(1)}`;
}

/**
 * Index ranges [first, last] of the ice bodies. Each run of ice-covered cells is widened by one
 * ice-free neighbour on either side, so that the surface, drawn straight between cell centres,
 * comes down to the bed instead of ending in a cliff one cell thick.
 */
function iceRuns(thickness: number[]): [number, number][] {
  const runs: [number, number][] = [];
  const n = thickness.length;
  let i = 0;
  while (i < n) {
    if (thickness[i] <= 0) {
      i++;
      continue;
    }
    let j = i;
    while (j + 1 < n && thickness[j + 1] > 0) j++;
    runs.push([Math.max(0, i - 1), Math.min(n - 1, j + 1)]);
    i = j + 1;
  }
  return runs;
}
