/**
 * The export form's typed values, checked before anything is made: each problem is a message that
 * names the field and what is allowed. Pure, so every limit is unit-tested.
 */
import { MAX_SNAPSHOTS } from '../../figures/snapshotYears';

export const WIDTH_MM_RANGE = [40, 500] as const;
export const DPI_RANGE = [72, 1200] as const;
/** Largest PNG side [px]: browsers refuse canvases much beyond this. */
export const MAX_PNG_SIDE_PX = 12000;

export interface ExportSettings {
  widthMm: number;
  dpi: number;
  /** Years between snapshots in a series. */
  every: number;
}

export type Checked = { ok: true; settings: ExportSettings } | { ok: false; messages: string[] };

/** A typed number of the export form; a decimal comma reads as a point, blank as NaN. */
export function formNumber(text: string): number {
  const t = text.trim().replace(',', '.');
  return t === '' ? Number.NaN : Number(t);
}

/** Problems with a figure's printed width and PNG resolution, each naming the field. */
export function figureSizeProblems(input: { widthMm: string; dpi: string }): string[] {
  const messages: string[] = [];
  const widthMm = formNumber(input.widthMm);
  const dpi = formNumber(input.dpi);
  if (!(widthMm >= WIDTH_MM_RANGE[0] && widthMm <= WIDTH_MM_RANGE[1])) {
    messages.push(`Figure width: "${input.widthMm}" is not allowed; give a width from ${WIDTH_MM_RANGE[0]} to ${WIDTH_MM_RANGE[1]} mm.`);
  }
  if (!(dpi >= DPI_RANGE[0] && dpi <= DPI_RANGE[1])) {
    messages.push(`PNG resolution: "${input.dpi}" is not allowed; give ${DPI_RANGE[0]} to ${DPI_RANGE[1]} dots per inch.`);
  } else if (widthMm >= WIDTH_MM_RANGE[0] && (widthMm / 25.4) * dpi > MAX_PNG_SIDE_PX) {
    messages.push(`PNG size: ${widthMm} mm at ${dpi} dpi is ${Math.round((widthMm / 25.4) * dpi)} pixels wide; at most ${MAX_PNG_SIDE_PX} are allowed. Lower the width or the resolution.`);
  }
  return messages;
}

export function checkExportSettings(input: { widthMm: string; dpi: string; every: string }, runYears: number): Checked {
  const messages = figureSizeProblems(input);
  const every = formNumber(input.every);
  const fewest = runYears / (MAX_SNAPSHOTS - 1);
  if (!(every > 0 && every <= Math.max(runYears, 1))) {
    messages.push(`Years between snapshots: "${input.every}" is not allowed; give a number of years above 0 and at most the run length (${runYears} a).`);
  } else if (every < fewest) {
    messages.push(`Years between snapshots: ${every} a would give more than ${MAX_SNAPSHOTS} snapshots; give at least ${Math.ceil(fewest)} a.`);
  }
  return messages.length > 0 ? { ok: false, messages } : { ok: true, settings: { widthMm: formNumber(input.widthMm), dpi: formNumber(input.dpi), every } };
}
