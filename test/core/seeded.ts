// A seeded uniform generator for test data: a linear congruential generator
// (Numerical Recipes' constants), cheap and the same on every machine.

/** Numbers in [0, 1) from `seed`; the same seed gives the same sequence. */
export function seeded(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    return s / 4294967296;
  };
}
