/**
 * The glacier as the spin-up shapes it, drawn on the long profile until the run's first output:
 * the user sees at once that Run is doing something, and how far from steady the sketch was.
 */
import { useMemo } from 'react';
import { useRunStore } from '../../state/runStore';
import type { ProfileResult } from '../LongProfileView';
import { MIN_GLACIER_THICKNESS } from '../../model/glacierExtent';
import { gridSamples } from './gridSamples';

export function useSpinUpPreview(): ProfileResult | undefined {
  const preview = useRunStore((s) => s.spinUpPreview);
  const grid = useRunStore((s) => s.incoming?.grid ?? s.grid);
  return useMemo(() => {
    if (!preview || !grid || preview.thickness.length !== grid.x.length) return undefined;
    const { x, bed } = gridSamples(grid);
    const thickness = Array.from(preview.thickness);
    let terminus = Number.NaN;
    thickness.forEach((h, i) => {
      if (h >= MIN_GLACIER_THICKNESS) terminus = x[i] + (x.length > 1 ? (x[1] - x[0]) / 2 : 0);
    });
    return {
      time: preview.year,
      samples: { x, bed, surface: bed.map((b, i) => b + thickness[i]), thickness },
      crevasseDepth: new Float64Array(x.length),
      ela: Number.NaN,
      terminus,
      alsoShow: [],
      label: `Spin-up, ${Math.round(preview.year)} model years under the year-0 climate`,
    };
  }, [preview, grid]);
}
