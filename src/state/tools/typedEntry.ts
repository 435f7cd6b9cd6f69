// Typing exact values while drawing: digits go into a short entry shown in the
// status line, Enter uses it. One or two numbers separated by a comma (the
// decimal mark is a point): "x,y" for a first point, "length" or
// "length,angle" for the next edge of an outline, "width,height" for a
// rectangle, a diameter (or a radius ending in r) for a tube.
import type { Point } from '../sketchFile';
import { readNumber } from '../edits/numberInput';

const TYPING = /^[0-9.,\-+eE]$/;

/** The entry after `key`, or null when the key is not part of typing (then it is a command). */
export function editEntry(entry: string, key: string, extra = ''): string | null {
  if (key === 'Backspace' && entry) return entry.slice(0, -1);
  if (key.length !== 1) return null;
  // "e" is the enclosure key: it only counts as an exponent inside a number already begun.
  if ((key === 'e' || key === 'E') && !/\d$/.test(entry)) return null;
  if (TYPING.test(key) || (extra.includes(key) && entry !== '')) return entry + key;
  return null;
}

/** The numbers of an entry (one or two), or why it cannot be used. */
export function readEntry(entry: string): { numbers: number[] } | { problem: string } {
  const parts = entry.split(',');
  if (parts.length > 2) return { problem: `"${entry}" has more than two numbers` };
  const numbers: number[] = [];
  for (const p of parts) {
    const r = readNumber(p, { min: -1e100, max: 1e100 });
    if (!r.ok) return { problem: `"${p}" ${r.problem}` };
    numbers.push(r.value);
  }
  return { numbers };
}

/** cos and sin of an angle in degrees, exact at multiples of 90°. */
export function direction(degrees: number): Point {
  const q = ((degrees % 360) + 360) % 360;
  if (q === 0) return [1, 0];
  if (q === 90) return [0, 1];
  if (q === 180) return [-1, 0];
  if (q === 270) return [0, -1];
  const a = (q * Math.PI) / 180;
  return [Math.cos(a), Math.sin(a)];
}

/** The pointer's direction from `from`, in degrees rounded to the nearest 15° (0 when they coincide). */
export function pointerAngle(from: Point, pointer: Point | null): number {
  if (!pointer) return 0;
  const dx = pointer[0] - from[0];
  const dy = pointer[1] - from[1];
  if (dx === 0 && dy === 0) return 0;
  return Math.round((Math.atan2(dy, dx) * 180) / Math.PI / 15) * 15;
}

/** Trim float noise: 0.3 + 2.4 gives 2.7, as typed, not 2.6999999999999997 (15 digits); trigonometry to 12. */
const tidy = (v: number, digits: number) => Number(v.toPrecision(digits));

/**
 * The next outline point from an entry: the first point is "x,y"; later
 * points are "length" (towards the pointer, to the nearest 15°) or
 * "length,angle" (degrees anticlockwise from +x). Sketch units.
 */
export function nextOutlinePoint(
  entry: string,
  draft: readonly Point[],
  pointer: Point | null,
): Point | { problem: string } {
  const r = readEntry(entry);
  if ('problem' in r) return r;
  const n = r.numbers;
  if (!draft.length) {
    if (n.length !== 2) return { problem: 'type the first point as x,y' };
    return [n[0], n[1]];
  }
  const last = draft[draft.length - 1];
  const length = n[0];
  if (!(length > 0)) return { problem: 'the length must be greater than 0' };
  const angle = n.length === 2 ? n[1] : pointerAngle(last, pointer);
  const [c, s] = direction(angle);
  const exact = c === 0 || s === 0;
  const x = last[0] + length * c;
  const y = last[1] + length * s;
  const digits = exact ? 15 : 12;
  return [tidy(x, digits), tidy(y, digits)];
}
