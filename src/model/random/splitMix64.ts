/**
 * SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number generators",
 * OOPSLA '14; the 64-bit finaliser as published there and in Vigna's reference C code):
 *
 *   z = seed + (counter + 1) * 0x9E3779B97F4A7C15            (mod 2^64)
 *   z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9
 *   z = (z ^ (z >>> 27)) * 0x94D049BB133111EB
 *   out = z ^ (z >>> 31)
 *
 * Used here counter-based: draw number `counter` of stream `seed` is a pure function of the two,
 * so the weather of a model year does not depend on the order of calls, the step size or the
 * program (command line, worker, experiment member) that asks. BigInt keeps it exact; the model
 * draws a few numbers per model year, so speed does not matter.
 */
const MASK = (1n << 64n) - 1n;
const GAMMA = 0x9e3779b97f4a7c15n;
const M1 = 0xbf58476d1ce4e5b9n;
const M2 = 0x94d049bb133111ebn;

/** The 64-bit output number `counter` (0, 1, ...) of the stream seeded with `seed`. */
export function splitMix64(seed: bigint, counter: bigint): bigint {
  let z = (seed + (counter + 1n) * GAMMA) & MASK;
  z = ((z ^ (z >> 30n)) * M1) & MASK;
  z = ((z ^ (z >> 27n)) * M2) & MASK;
  return z ^ (z >> 31n);
}

/** A uniform number in (0, 1]: the top 53 bits plus one, over 2^53 (never 0, so log is finite). */
export function uniformOpenClosed(seed: bigint, counter: bigint): number {
  return Number((splitMix64(seed, counter) >> 11n) + 1n) / 2 ** 53;
}

/**
 * A standard normal number by the Box–Muller transform (Box & Muller 1958, Ann. Math. Stat.
 * 29(2), 610–611): z = sqrt(-2 ln u1) cos(2 pi u2), from draws 2k and 2k + 1 of the stream.
 */
export function standardNormal(seed: bigint, k: bigint): number {
  const u1 = uniformOpenClosed(seed, 2n * k);
  const u2 = uniformOpenClosed(seed, 2n * k + 1n);
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}
