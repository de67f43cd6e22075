/** The selected frame as the long profile draws it, or undefined when there is none to show. */
import { useMemo } from 'react';
import { useCurrentFrame } from '../../state/playbackStore';
import { useResultsStale, useRunStore } from '../../state/runStore';
import type { ProfileResult } from '../LongProfileView';
import { frameLakes } from './frameLakes';
import { gridSamples } from './gridSamples';

export function useProfileResult(): ProfileResult | undefined {
  const frame = useCurrentFrame();
  const grid = useRunStore((s) => s.grid);
  const maxSurface = useRunStore((s) => s.ranges?.maxSurface);
  const minEla = useRunStore((s) => s.ranges?.minEla);
  const maxEla = useRunStore((s) => s.ranges?.maxEla);
  // After an edit the profile shows the edited scenario, which is what the editor works on; the
  // other views keep the old results under an "out of date" marker.
  const stale = useResultsStale();
  return useMemo(() => {
    if (!frame || !grid || stale) return undefined;
    const { fields, numbers } = frame;
    const base = gridSamples(grid);
    return {
      time: frame.time,
      samples: {
        x: base.x,
        bed: base.bed,
        surface: Array.from(fields.surface),
        thickness: Array.from(fields.thickness),
      },
      crevasseDepth: fields.crevasseDepth,
      ela: numbers.ela,
      terminus: numbers.terminus,
      lakes: frameLakes(frame, grid),
      alsoShow: [maxSurface, minEla, maxEla].filter((v): v is number => v !== undefined && Number.isFinite(v)),
    };
  }, [frame, grid, stale, maxSurface, minEla, maxEla]);
}
