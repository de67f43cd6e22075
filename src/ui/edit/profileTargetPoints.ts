/** The point list a profile edit works on; an ice-free valley's surface starts on the bed. */
import type { Point, Scenario } from '../../model/scenario';
import type { ProfileTarget } from '../../state/editorStore';

export function profileTargetPoints(scenario: Scenario, target: ProfileTarget): readonly Point[] {
  return target === 'bed' ? scenario.bed : (scenario.surface ?? scenario.bed);
}

/** The scenario with the target list replaced. */
export function withProfileTarget(scenario: Scenario, target: ProfileTarget, points: Point[]): Scenario {
  return target === 'bed' ? { ...scenario, bed: points } : { ...scenario, surface: points };
}

/** Fewest points each list may keep (the format's minimum). */
export const MIN_POINTS: Record<ProfileTarget, number> = { bed: 2, surface: 1 };

export const TARGET_NAMES: Record<ProfileTarget, string> = { bed: 'bed', surface: 'ice surface' };
