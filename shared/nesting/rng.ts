/**
 * Seeded pseudo-random numbers for the search (shared/ may not call Math.random).
 * mulberry32: a 32-bit generator by Tommy Ettinger, public domain; small, fast and good enough for
 * shuffling orderings. The same seed always gives the same sequence.
 */
export type Rng = () => number;

export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Integer in [0, n). */
export function randomInt(rng: Rng, n: number): number {
  return Math.floor(rng() * n);
}

/** Fisher–Yates shuffle in place. */
export function shuffleInPlace<T>(rng: Rng, xs: T[]): T[] {
  for (let i = xs.length - 1; i > 0; i--) {
    const j = randomInt(rng, i + 1);
    const t = xs[i]!;
    xs[i] = xs[j]!;
    xs[j] = t;
  }
  return xs;
}
