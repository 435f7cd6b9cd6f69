import { expect } from 'vitest';
import { restore } from '../../src/document';

// Shared by the reader's refusal tests (restore.errors.test.ts, restore.geometry.test.ts).

export const enclosure = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [4, 0],
    [4, 2],
    [0, 2],
  ],
  surface: ['floor', 'right', 'roof', 'left'],
};
export const block = {
  kind: 'solid',
  points: [
    [1.75, 0.75],
    [2.25, 0.75],
    [2.25, 1.25],
    [1.75, 1.25],
  ],
  surface: 'block',
};
export const minimal = {
  version: 1,
  units: 'm',
  shapes: [enclosure, block],
  surfaces: { floor: { emissivity: 0.9, temperature: 1100 } },
};

export function errorsOf(input: unknown): string[] {
  const result = restore(input);
  if (result.ok) throw new Error(`expected refusal, got a sketch (warnings: ${result.warnings.join('; ')})`);
  expect(result.errors.length).toBeGreaterThan(0);
  const messages = result.errors.map((e) => e.message);
  for (const m of messages) {
    expect(m.length).toBeLessThan(300);
    expect(m).not.toMatch(/Invalid input|undefined|\[object|NaN NaN/); // no library defaults or leaks
  }
  return messages;
}
export const only = (input: unknown) => {
  const errors = errorsOf(input);
  expect(errors).toHaveLength(1);
  return errors[0];
};
export const withShapes = (...shapes: unknown[]) => ({ ...minimal, shapes });
export const solid = (points: unknown, surface: unknown = 'a') => ({ kind: 'solid', points, surface });
export const surfaceOf = (props: unknown) => ({ ...minimal, surfaces: { floor: props } });
