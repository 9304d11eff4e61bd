/**
 * A seeded pseudo-random number generator for the engine's Monte-Carlo runs
 * (docs/style.md §3: the engine takes its seed as an argument, never a clock or
 * Math.random). xoshiro128** 1.0 (D. Blackman and S. Vigna, "Scrambled
 * linear pseudorandom number generators", ACM TOMS 47(4), 2021; reference
 * C code at prng.di.unimi.it), its 128-bit state filled from the seed by
 * SplitMix32 (the 32-bit finaliser of Steele, Lea and Flood's SplitMix),
 * as the xoshiro authors recommend seeding from a different generator.
 * 32-bit integer arithmetic only, so every platform draws the same numbers.
 */

/** A stream of uniform numbers in [0, 1) with 53 random bits each. */
export interface SeededRandom {
  /** Next uniform double in [0, 1). */
  next(): number;
  /** Next 32-bit unsigned integer. */
  nextUint32(): number;
  /** Uniform integer in [0, n) for 1 <= n <= 2^32 (rejection sampling, no modulo bias). */
  nextInt(n: number): number;
}

/** SplitMix32 step: returns [output, next state] for a 32-bit state. */
function splitMix32(state: number): readonly [number, number] {
  const s = (state + 0x9e3779b9) | 0;
  let z = s;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  z ^= z >>> 16;
  return [z >>> 0, s];
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/**
 * xoshiro128** seeded with `seed` (an integer 0..2^32-1; other numbers are
 * reduced to their low 32 bits after truncation). The same seed gives the
 * same stream on every run and platform.
 */
export function seededRandom(seed: number): SeededRandom {
  let state = Math.trunc(seed) >>> 0;
  const words: number[] = [];
  for (let i = 0; i < 4; i++) {
    const [out, next] = splitMix32(state);
    words.push(out);
    state = next;
  }
  let s0 = words[0]! | 0;
  let s1 = words[1]! | 0;
  let s2 = words[2]! | 0;
  let s3 = words[3]! | 0;
  // An all-zero state would stay zero; SplitMix32 outputs make that impossible in practice, but guard it.
  if ((s0 | s1 | s2 | s3) === 0) s0 = 1;

  function nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(s1, 5), 7), 9) >>> 0;
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = rotl(s3, 11);
    return result;
  }

  return {
    nextUint32,
    next() {
      // 27 high bits of one draw and 26 of the next: a double on the 2^-53 grid in [0, 1).
      const a = nextUint32() >>> 5;
      const b = nextUint32() >>> 6;
      return (a * 67108864 + b) / 9007199254740992;
    },
    nextInt(n) {
      if (!(n >= 1 && n <= 4294967296 && Number.isInteger(n))) throw new RangeError(`nextInt: n is ${n}, expected a whole number 1..2^32`);
      const limit = 4294967296 - (4294967296 % n);
      for (;;) {
        const x = nextUint32();
        if (x < limit) return x % n;
      }
    },
  };
}
