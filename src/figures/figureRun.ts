/**
 * What a figure is drawn from: the scenario, the fixed grid and the output frames of a run. The
 * browser fills it from the run store (frames received from the worker), the command line from
 * its RunReport; both hold the same numbers for the same scenario, so the figures are identical.
 */
import type { DiagnosedFrame } from '../model/diagnostics';
import type { RunReport } from '../model/runScenario';
import type { ValleySection } from '../model/physics/valleySection';
import type { Scenario } from '../model/scenario';

/** A figure reads the run's diagnosed frames as they are (the one frame type). */
export type FigureFrame = DiagnosedFrame;

export interface FigureGrid {
  x: ArrayLike<number>;
  bed: ArrayLike<number>;
  width: ArrayLike<number>;
  /** Domain length [m]. */
  length: number;
  /** The valley section (then `width` is the floor width); absent: fixed walls. */
  section?: ValleySection;
}

export interface FigureRun {
  scenario: Scenario;
  grid: FigureGrid;
  frames: readonly FigureFrame[];
  firnlineVersion: string;
}

export function figureRunFromReport(report: RunReport, scenario: Scenario, firnlineVersion: string): FigureRun {
  const { grid } = report.model;
  const frames = report.frames;
  return {
    scenario,
    grid: { x: grid.x, bed: grid.bed, width: grid.widthAtCells, length: scenario.grid.length, ...(grid.section ? { section: grid.section } : {}) },
    frames,
    firnlineVersion,
  };
}

/** The frame at a model year, or the nearest one. */
export function frameAt(run: FigureRun, year: number): FigureFrame {
  let best = run.frames[0];
  for (const f of run.frames) if (Math.abs(f.time - year) < Math.abs(best.time - year)) best = f;
  return best;
}
