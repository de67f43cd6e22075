/** Surface speed (with its sliding part) and driving stress along the flowline at the selected year. */
import { memo, useDeferredValue, useMemo } from 'react';
import { valueRange, withinRange, type ValueWithError } from '../../chart/observationMarks';
import { useScenarioStore } from '../../state/scenarioStore';
import { useCurrentFrame } from '../../state/playbackStore';
import { useRunStore, type RunFrame } from '../../state/runStore';
import type { RunGrid } from '../../worker/protocol';
import { AlongFlowPlot } from './AlongFlowPlot';

export function FlowFieldsView() {
  // Deferred: while frames stream in, React renders these plots in interruptible slices instead
  // of one long task (React 19 useDeferredValue).
  const frame = useDeferredValue(useCurrentFrame());
  const grid = useRunStore((s) => s.grid);
  const maxSpeed = useRunStore((s) => s.ranges?.maxSpeed ?? 0);
  const maxStress = useRunStore((s) => s.ranges?.maxStress ?? 0);
  const observedSpeed = useScenarioStore((s) => s.scenario.observations?.surfaceSpeed);
  const observationYear = useScenarioStore((s) => s.scenario.observations?.year ?? 0);
  const length = grid?.length ?? 0;
  const speedPoints = useMemo(() => (observedSpeed?.length ? withinRange(observedSpeed, length) : []), [observedSpeed, length]);
  if (!frame || !grid) return null;
  return (
    <FlowFieldsPlots
      frame={frame}
      grid={grid}
      maxSpeed={maxSpeed}
      maxStress={maxStress}
      observedSpeed={speedPoints}
      observationYear={observationYear}
    />
  );
}

interface PlotsProps {
  frame: RunFrame;
  grid: RunGrid;
  maxSpeed: number;
  maxStress: number;
  /** Measured surface speeds inside the domain [x m, m a^-1]. */
  observedSpeed: readonly ValueWithError[];
  observationYear: number;
}

/** The plots themselves, from plain data (exported for tests). */
export const FlowFieldsPlots = memo(function FlowFieldsPlots({ frame, grid, maxSpeed, maxStress, observedSpeed, observationYear }: PlotsProps) {
  const { fields } = frame;
  // The speed axis covers the measurements and their bars too.
  const speedTop = Math.max(maxSpeed, valueRange(observedSpeed)?.[1] ?? 0);
  return (
    <>
      <section className="plot-section" aria-label="Speed along the flowline">
        <AlongFlowPlot
          title="Speed along the flowline"
          yTitle="Speed (m a⁻¹)"
          x={grid.x}
          lengthM={grid.length}
          thickness={fields.thickness}
          yMax={speedTop}
          time={frame.time}
          observed={observedSpeed.length ? { label: 'Measured speed', points: observedSpeed, year: observationYear } : undefined}
          series={[
            { key: 'surface-speed', label: 'Surface speed', values: fields.surfaceSpeed, className: 'speed' },
            { key: 'sliding-speed', label: 'Sliding speed', values: fields.slidingSpeed, className: 'sliding' },
          ]}
        />
      </section>
      <section className="plot-section" aria-label="Driving stress along the flowline">
        <AlongFlowPlot
          title="Driving stress along the flowline"
          yTitle="Driving stress (kPa)"
          x={grid.x}
          lengthM={grid.length}
          thickness={fields.thickness}
          yMax={maxStress}
          time={frame.time}
          series={[{ key: 'driving-stress', label: 'Driving stress', values: fields.drivingStress, className: 'stress' }]}
        />
      </section>
    </>
  );
});
