import { seeded } from './seeded';

/** A random symmetric matrix made positive definite by a dominant diagonal (like the scaled radiosity matrix). */
export function spd(m: number, seed: number): Float64Array {
  const r = seeded(seed);
  const s = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < i; j++) {
      const v = -r();
      s[i * m + j] = v;
      s[j * m + i] = v;
    }
  }
  for (let i = 0; i < m; i++) {
    let row = 0;
    for (let j = 0; j < m; j++) if (j !== i) row += Math.abs(s[i * m + j]);
    s[i * m + i] = row * (1 + r()) + 1e-3;
  }
  return s;
}
