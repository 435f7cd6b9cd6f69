// What every output of the fuzz suite must satisfy: no non-finite number, no
// null where a number belongs, refusals that say something, and the view-factor
// invariants: summation rule and reciprocity (Incropera et al., Fundamentals of
// Heat and Mass Transfer, 6th ed., eqs. 13.3 and 13.4).
import { expect } from 'vitest';

/**
 * Paths of every number in `value` that is not finite, and of every null (JSON
 * writes NaN and Infinity as null). `sentinels` names fields documented to
 * hold NaN for "not this kind of surface"; there NaN passes, Infinity does not.
 */
export function nonFinite(
  value: unknown,
  sentinels: readonly string[] = [],
  path = '$',
  found: string[] = [],
): string[] {
  const sentinel = sentinels.some((k) => path.endsWith(`.${k}`) || path.includes(`.${k}[`));
  const visit = (v: unknown, p: string) => nonFinite(v, sentinels, p, found);
  if (typeof value === 'number') {
    if (!Number.isFinite(value) && !(sentinel && Number.isNaN(value))) found.push(`${path} = ${value}`);
  } else if (value === null) found.push(`${path} = null`);
  else if (ArrayBuffer.isView(value) && !(value instanceof DataView))
    Array.from(value as unknown as ArrayLike<number>).forEach((x, i) => visit(x, `${path}[${i}]`));
  else if (Array.isArray(value)) value.forEach((x: unknown, i) => visit(x, `${path}[${i}]`));
  else if (typeof value === 'object' && value !== undefined)
    for (const [k, v] of Object.entries(value)) if (typeof v !== 'function') visit(v, `${path}.${k}`);
  return found;
}

/** NaN or Infinity written as a word in table or CSV text. */
export const NON_FINITE_WORD = /(?<![\w.])-?(NaN|Infinity)(?![\w])/;

/** A stack trace line must never reach the user. */
export const STACK_LINE = /^\s+at .+:\d+/m;

/** A message for people: some words, no leaked internals. */
export function expectMessage(text: string): void {
  expect(text.trim().length).toBeGreaterThan(5);
  // Bounded: long names are cut in messages (a notice lists at most a few messages).
  expect(text.length).toBeLessThan(2000);
  expect(text).not.toMatch(/\bundefined\b|\[object Object\]/);
  expect(text).not.toMatch(STACK_LINE);
}

/** Exact methods: summation and reciprocity hold to rounding; 1e-9 leaves room for sums over many terms. */
export const TOL = 1e-9;

/** Rows sum to one (closed sketch) or at most one (open), 0 <= F <= 1, and L_i F_ij = L_j F_ji, from the numbers alone. */
export function expectInvariants(F: ArrayLike<number>, lengths: ArrayLike<number>, closed: boolean): void {
  const n = lengths.length;
  expect(F.length).toBe(n * n);
  const Lmax = Math.max(...Array.from(lengths));
  for (let i = 0; i < n; i++) {
    let row = 0;
    for (let j = 0; j < n; j++) {
      const f = F[i * n + j];
      row += f;
      expect(f).toBeGreaterThanOrEqual(-TOL);
      expect(f).toBeLessThanOrEqual(1 + TOL);
      expect(Math.abs(lengths[i] * f - lengths[j] * F[j * n + i])).toBeLessThanOrEqual(TOL * Lmax);
    }
    if (closed) expect(Math.abs(1 - row)).toBeLessThan(TOL);
    else expect(row).toBeLessThanOrEqual(1 + TOL);
  }
}
