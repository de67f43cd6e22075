/**
 * A synthetic valley long profile from a few numbers: a power-law profile between the head and
 * the foot, with an optional overdeepening (a smooth basin) and an optional bedrock step (a drop
 * over a short distance). Head and foot keep the elevations asked for.
 *
 *   z(x) = z_foot + (z_head - z_foot) (1 - x/L)^p,
 *
 * p = 1 is a straight slope; p > 1 is concave up (steep head, gentle floor), as most glaciated
 * valleys are; p < 1 is convex.
 */
import type { Point } from '../../../model/scenario';
import { simplifyProfile } from '../../../chart/simplifyProfile';

export interface ValleyOptions {
  /** Bed elevation at the head, x = 0 [m a.s.l.]. */
  headElevation: number;
  /** Bed elevation at the foot, x = length [m a.s.l.]. */
  footElevation: number;
  /** Valley length [m]. */
  length: number;
  /** Concavity exponent p [-], 0.3 to 5. */
  concavity: number;
  /** Optional basin: centre [m from the head], greatest depth below the profile [m], length [m]. */
  overdeepening?: { position: number; depth: number; length: number };
  /** Optional step: position [m], drop in elevation down-valley [m]. */
  step?: { position: number; height: number };
}

/** Horizontal distance over which a bedrock step drops [m]; steep but not vertical. */
export const STEP_WIDTH_M = 100;

export function valleyElevation(o: ValleyOptions, x: number): number {
  const t = Math.min(1, Math.max(0, x / o.length));
  let z = o.footElevation + (o.headElevation - o.footElevation) * (1 - t) ** o.concavity;
  if (o.overdeepening && o.overdeepening.length > 0) {
    const r = (x - o.overdeepening.position) / (o.overdeepening.length / 2);
    // Cosine-bell basin: smooth, depth at its centre, zero at its ends.
    if (Math.abs(r) < 1) z -= o.overdeepening.depth * 0.5 * (1 + Math.cos(Math.PI * r));
  }
  if (o.step && o.step.height !== 0) {
    const s = Math.min(1, Math.max(0, (x - o.step.position + STEP_WIDTH_M / 2) / STEP_WIDTH_M));
    // The drop is taken out of the overall fall (a linear tilt) so head and foot stay put.
    z += o.step.height * (1 - s) - o.step.height * (1 - t);
  }
  return z;
}

/** Bed points, sampled every `sampleM` metres and simplified to 0.5 m. */
export function generateValley(o: ValleyOptions, sampleM = Math.max(10, o.length / 1000)): Point[] {
  const samples: Point[] = [];
  const n = Math.max(2, Math.ceil(o.length / sampleM));
  const extra: number[] = [];
  if (o.step) extra.push(o.step.position - STEP_WIDTH_M / 2, o.step.position + STEP_WIDTH_M / 2);
  const xs = new Set<number>();
  for (let i = 0; i <= n; i++) xs.add((i / n) * o.length);
  for (const x of extra) if (x > 0 && x < o.length) xs.add(x);
  for (const x of [...xs].sort((a, b) => a - b)) samples.push([x, valleyElevation(o, x)]);
  const rounded: Point[] = [];
  for (const [x, z] of simplifyProfile(samples, 0.5)) {
    const p: Point = [Math.round(x * 10) / 10, Math.round(z * 10) / 10];
    // Rounding must not make two x equal: the format needs them strictly increasing.
    if (rounded.length === 0 || p[0] > rounded[rounded.length - 1][0]) rounded.push(p);
  }
  return rounded;
}
