/** Refusals of an edit of a point list, each cell's range in the unit its column shows. */
import { formatMessage } from '../../scenario/validateScenario';
import { errorsAt, type CommitResult } from './commitEdit';
import { refusalShown } from './refusalShown';

/** A column of a point list as the editor shows it: shown value = stored value * scale, in unit. */
export interface ShownColumn {
  unit: string;
  scale?: number;
}

/**
 * What to show where an edit of the point list at `path` was made (null: applied), each cell's
 * range refusal in its column's unit, the others as the validator wrote them ("path: message").
 */
export function pointListRefusal(result: CommitResult, path: string, columns: readonly ShownColumn[]): string | null {
  if (result.ok) return null;
  return errorsAt(result.errors, path)
    .map((e) => {
      const cell = e.path.startsWith(`${path}/`) ? /^\/(\d+)\/(\d+)$/.exec(e.path.slice(path.length)) : null;
      const column = cell ? columns[Number(cell[2])] : undefined;
      return formatMessage(column ? { ...e, message: refusalShown(e.message, column.scale ?? 1, column.unit) } : e);
    })
    .join('; ');
}
