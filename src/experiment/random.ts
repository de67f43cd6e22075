/**
 * A seeded pseudorandom generator for ensemble sampling: xoshiro128** (Blackman & Vigna,
 * "Scrambled linear pseudorandom number generators", ACM Transactions on Mathematical Software
 * 47(4), 2021; reference C code "xoshiro128starstar.c" by the authors, public domain, at
 * prng.di.unimi.it). 128 bits of state, period 2^128 - 1, 32-bit outputs.
 *
 * The state is filled from the seed by SplitMix32-style mixing (the 32-bit finaliser of
 * MurmurHash3, Appleby 2011, applied to seed + k * 0x9e3779b9), which never gives the all-zero
 * state for the 4 words drawn here unless all four mix to 0 (checked). Integer arithmetic only
 * (Math.imul, >>> 0), so the sequence is the same on every JavaScript engine.
 *
 * Written from the published algorithm (rotl(s1 * 5, 7) * 9; then the xorshift of the state),
 * recalled from memory; the tests check determinism, range and uniformity, not the reference
 * code's output words (no reference vectors were at hand).
 */

const rotl = (x: number, k: number): number => ((x << k) | (x >>> (32 - k))) >>> 0;

/** MurmurHash3's 32-bit finaliser (fmix32). */
function fmix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

export interface Random {
  /** Next 32-bit unsigned integer. */
  nextUint32(): number;
  /** Uniform in [0, 1), 53 bits of two outputs. */
  nextUnit(): number;
}

/** `seed`: an integer from 0 to 2^32 - 1. */
export function xoshiro128ss(seed: number): Random {
  const s = new Uint32Array(4);
  for (let k = 0; k < 4; k++) s[k] = fmix32((seed + Math.imul(k + 1, 0x9e3779b9)) >>> 0);
  if (s[0] === 0 && s[1] === 0 && s[2] === 0 && s[3] === 0) s[0] = 1;
  const nextUint32 = (): number => {
    const result = Math.imul(rotl(Math.imul(s[1], 5) >>> 0, 7), 9) >>> 0;
    const t = (s[1] << 9) >>> 0;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result;
  };
  return {
    nextUint32,
    nextUnit() {
      const high = nextUint32() >>> 5; // 27 bits
      const low = nextUint32() >>> 6; // 26 bits
      return (high * 67108864 + low) / 9007199254740992;
    },
  };
}

/** An integer uniform in 0..n-1 (n <= 2^32), without modulo bias (rejection). */
export function randomIndex(random: Random, n: number): number {
  const limit = Math.floor(4294967296 / n) * n;
  for (;;) {
    const x = random.nextUint32();
    if (x < limit) return x % n;
  }
}
