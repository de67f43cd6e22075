/**
 * The grid: domain length and cell spacing, with the cross-field rule that the spacing divides
 * the length into a whole number of cells (2 to 100,000).
 */
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

/** Cell counts in messages: a few significant digits show why 171.4285... is not whole. */
function formatCells(cells: number): string {
  return formatNumber(Number(cells.toPrecision(8)));
}

export const gridSchema = strictObjectField('the grid', {
  length: numberField(
    'the domain length',
    'm',
    { min: 0, minExclusive: true, max: L.gridLengthMax },
    'Length of the flowline domain [m]; x = 0 is the head of the valley and x increases down-glacier.',
  ),
  spacing: numberField(
    'the cell spacing',
    'm',
    { min: L.spacingMin },
    'Cell size [m]; length / spacing must be a whole number of cells, 2 to 100,000. ' +
      'Cell i is centred at x = (i + 0.5) * spacing.',
  ),
})
  .superRefine((grid, ctx) => {
    const { length, spacing } = grid;
    // Only judge the ratio once both sides passed their own ranges.
    if (!(length > 0 && length <= L.gridLengthMax && spacing >= L.spacingMin)) return;
    const cells = length / spacing;
    const tolerance = L.cellsWholeTolerance * Math.max(1, cells);
    const ratio = `${formatNumber(length)} m / ${formatNumber(spacing)} m = ${formatCells(cells)} cell${cells === 1 ? '' : 's'}`;
    let message: string | undefined;
    if (cells > L.cellsMax + tolerance) {
      message = `the grid may have at most ${formatNumber(L.cellsMax)} cells, but ${ratio}; use a spacing of at least ${formatNumber(length / L.cellsMax)} m`;
    } else if (cells < L.cellsMin - tolerance) {
      message = `the grid needs at least ${L.cellsMin} cells, but ${ratio}; use a spacing of at most ${formatNumber(length / L.cellsMin)} m`;
    } else if (Math.abs(cells - Math.round(cells)) > tolerance) {
      message = `the cell spacing must divide the domain length into a whole number of cells, but ${ratio}`;
    }
    if (message !== undefined) ctx.addIssue({ code: 'custom', path: ['spacing'], input: spacing, message });
  })
  .describe('The flowline grid [m]: cells of equal size from the head of the valley down-glacier.');
