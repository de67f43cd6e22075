/**
 * Water that would stand in exposed overdeepenings at one model year (depression filling, see
 * src/model/analysis/exposedLakes.ts), drawn over the bed with its depth and volume. The figure's
 * footer carries the caution: a lake here is a hazard precursor to be assessed by others.
 */
import { exposedLakes, type ExposedLake } from '../model/analysis/exposedLakes';
import type { LongProfileGeometry } from '../chart/longProfile';
import { lakeLabel as profileLakeLabel } from '../chart/lakeShapes';
import type { FigureFrame, FigureGrid } from './figureRun';
import { COLOURS, TYPE } from './figureTheme';
import { element, pathData, text } from './svgMarkup';
import { textWidth } from './textWidth';

export function lakesAt(grid: FigureGrid, frame: FigureFrame): ExposedLake[] {
  const n = grid.x.length;
  const spacing = n > 0 ? grid.length / n : 1;
  return exposedLakes(
    {
      cellCount: n,
      spacing,
      x: Float64Array.from(grid.x),
      bed: Float64Array.from(grid.bed),
      widthAtCells: Float64Array.from(grid.width),
      section: grid.section,
    },
    frame.fields.thickness,
  );
}

/** "Lake, up to 43 m deep, ≈ 2.1 × 10⁶ m³" (per m of width for a unit-width flowline): the screen's label on one line. */
export function lakeLabel(lake: ExposedLake, unitWidth: boolean): string {
  return profileLakeLabel(lake, unitWidth).join(', ');
}

export function lakesMarkup(lakes: readonly ExposedLake[], grid: FigureGrid, g: LongProfileGeometry, unitWidth: boolean): string {
  const parts = lakes.map((lake) => {
    // Water surface at the lip's height over the wet cells, closed along the bed beneath.
    const top: [number, number][] = [];
    const bottom: [number, number][] = [];
    for (let i = 0; i < grid.x.length; i++) {
      const x = grid.x[i];
      if (x < lake.start || x > lake.end || grid.bed[i] >= lake.waterLevel) continue;
      top.push([g.xPixel(x), g.zPixel(lake.waterLevel)]);
      bottom.push([g.xPixel(x), g.zPixel(grid.bed[i])]);
    }
    if (top.length === 0) return '';
    // The label sits just down-valley of the lake, above the lip: the bed falls beyond the lip, so
    // the text clears it. In a narrow figure it takes two lines; failing that it goes above the lake.
    const label = lakeLabel(lake, unitWidth);
    const [depth, volume] = label.split(', ');
    const waterY = g.zPixel(lake.waterLevel);
    const right = top[top.length - 1][0] + 4;
    const room = g.plotArea.right - 2 - right;
    const style = { size: TYPE.tick, fill: COLOURS.water };
    const labelMarkup =
      textWidth(label, TYPE.tick) <= room
        ? text(label, right, waterY - 3, style)
        : Math.max(textWidth(`${depth},`, TYPE.tick), textWidth(volume, TYPE.tick)) <= room
          ? text(`${depth},`, right, waterY - 3 - TYPE.tick * 1.2, style) + text(volume, right, waterY - 3, style)
          : text(label, (top[0][0] + top[top.length - 1][0]) / 2, waterY - 24, { ...style, anchor: 'middle' });
    return element('g', { class: 'lake' }, [
      element('path', { d: pathData([...top, ...bottom.reverse()], true), fill: COLOURS.water, 'fill-opacity': 0.75, stroke: COLOURS.water, 'stroke-width': 0.6 }),
      labelMarkup,
    ]);
  });
  return element('g', { class: 'lakes' }, parts);
}
