// Random sketch files for the fuzz suite: sketches drawn at every scale (bodies
// that may overlap the wall or each other), names that are also properties of
// every object, surface properties and settings from ordinary to absurd, and
// mutations of valid files (text cut, tokens spliced in, values replaced).
import fc from 'fast-check';

/** numRuns: the short run of `npm test`, or FUZZ_RUNS for `npm run fuzz`. */
export function runs(short: number): number {
  const asked = Number(process.env.FUZZ_RUNS);
  return Number.isFinite(asked) && asked > 0 ? Math.round(asked) : short;
}

/** Per-test time limit: vitest's usual one for the short run, a day for a long one. */
export const FUZZ_TIMEOUT = process.env.FUZZ_RUNS ? 86_400_000 : 60_000;

/** Seed: fixed for `npm test` (a failure reproduces), or FUZZ_SEED, or fast-check's own for a long run. */
export function seed(fixed: number): number | undefined {
  const asked = Number(process.env.FUZZ_SEED);
  if (Number.isInteger(asked)) return asked;
  return process.env.FUZZ_RUNS ? undefined : fixed;
}

/**
 * Sketches drawn far from the origin (1e6 to 1e12 with small features) are
 * generated only in the long run (`npm run fuzz`) until the core computes
 * them: the winding of a polygon is taken from its signed area in unshifted
 * coordinates, which cancels there (knownFaults.test.ts pins the cases).
 */
const FAR_FROM_ORIGIN = Boolean(process.env.FUZZ_RUNS) && process.env.FUZZ_FAR !== '0'; // FUZZ_FAR=0 leaves them out

/** Positive numbers from the ordinary to the absurd (JSON cannot hold NaN or Infinity). */
export const magnitude = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 1e-3, max: 3000, noNaN: true }) },
  {
    weight: 3,
    arbitrary: fc.constantFrom(5e-324, 1e-300, 1e-30, 1e-6, 0.02, 1, 3001, 1e5, 1e6, 1e15, 1e30, 1e80, 1e100, 1e308),
  },
  { weight: 1, arbitrary: fc.double({ min: 0, noNaN: true, noDefaultInfinity: true }) },
);
export const signed = fc.tuple(magnitude, fc.boolean()).map(([m, negative]) => (negative ? -m : m));
const anyValue = fc.oneof(magnitude, signed, fc.constantFrom(0, -0));

export const NAMES = [
  'wall',
  'roof',
  'floor',
  '__proto__',
  'constructor',
  'toString',
  'hasOwnProperty',
  'valueOf',
  'é',
  '0',
];

/** An axis-aligned rectangle or a triangle, as points, scaled and shifted. */
function outline(cx: number, cy: number, w: number, h: number, triangle: boolean): [number, number][] {
  if (triangle)
    return [
      [cx - w / 2, cy - h / 2],
      [cx + w / 2, cy - h / 2],
      [cx, cy + h / 2],
    ];
  return [
    [cx - w / 2, cy - h / 2],
    [cx + w / 2, cy - h / 2],
    [cx + w / 2, cy + h / 2],
    [cx - w / 2, cy + h / 2],
  ];
}

// Mostly well inside the enclosure; now and then through its wall or into another body.
const body = fc.record({
  x: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  y: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  w: fc.double({ min: 0.01, max: 0.12, noNaN: true }),
  h: fc.double({ min: 0.01, max: 0.12, noNaN: true }),
  triangle: fc.boolean(),
  name: fc.constantFrom(...NAMES),
});

/** Mostly a plausible value of a field, now and then anything at all. */
const field = (min: number, max: number) =>
  fc.oneof({ weight: 12, arbitrary: fc.double({ min, max, noNaN: true }) }, { weight: 1, arbitrary: anyValue });

const condition = fc.oneof(
  fc.record({ temperature: field(200, 2500) }),
  fc.record({ heatFlux: field(-2e4, 2e4) }),
  fc.constant({ adiabatic: true }),
  fc.constant({ opening: true }),
  fc.constant({}),
);
const properties = fc
  .tuple(condition, fc.option(field(0.02, 1), { nil: undefined }))
  .map(([c, emissivity]) => (emissivity === undefined ? c : { ...c, emissivity }));

/** A version-1 sketch file as a plain object: an enclosure, up to three bodies, properties and settings. */
export const sketchFile = fc
  .record({
    width: fc.double({ min: 0.1, max: 10, noNaN: true }),
    height: fc.double({ min: 0.1, max: 10, noNaN: true }),
    scale: fc.oneof(
      { weight: 6, arbitrary: fc.constant(1) },
      { weight: 1, arbitrary: fc.constantFrom(1e-3, 1e3, 1e-60, 1e60, 1e99, 1e101) },
    ),
    shift: FAR_FROM_ORIGIN
      ? fc.oneof({ weight: 6, arbitrary: fc.constant(0) }, { weight: 1, arbitrary: fc.constantFrom(1e6, -1e9, 1e12) })
      : fc.constant(0),
    wallNames: fc.array(fc.constantFrom(...NAMES), { minLength: 4, maxLength: 4 }),
    bodies: fc.array(body, { maxLength: 3 }),
    props: fc.uniqueArray(fc.tuple(fc.constantFrom(...NAMES), properties), { selector: (t) => t[0], maxLength: 4 }),
    settings: fc.option(
      fc.record({ surroundingsTemperature: field(200, 2500), depth: field(0.01, 100) }, { requiredKeys: [] }),
      { nil: undefined },
    ),
    units: fc.constantFrom('m', 'cm', 'mm', 'in', 'ft'),
  })
  .map(({ width, height, scale, shift, wallNames, bodies, props, settings, units }) => {
    const place = ([x, y]: [number, number]): [number, number] => [x * scale + shift, y * scale + shift];
    const shapes = [
      {
        kind: 'enclosure',
        points: outline(width / 2, height / 2, width, height, false).map(place),
        surface: wallNames,
      },
      ...bodies.map((b) => ({
        kind: 'solid',
        points: outline(b.x * width, b.y * height, b.w * width, b.h * height, b.triangle).map(place),
        surface: b.name,
      })),
    ];
    // fromEntries defines own keys, so "__proto__" is a surface name like "constructor", not the prototype.
    const surfaces = Object.fromEntries(props);
    return { version: 1, units, shapes, surfaces, ...(settings ? { settings } : {}) };
  });

const TOKENS = [
  '1e999',
  '-1e999',
  'null',
  '[',
  ']',
  '{',
  '}',
  ',',
  ':',
  '"',
  '"__proto__"',
  'NaN',
  '1e308',
  '-0',
  'true',
  '"x"',
  '\\u0000',
  '5e-324',
];

/** A text edit of a file: cut it short, drop a stretch, or splice in a token. */
export const textMutation = fc.oneof(
  fc.record({ kind: fc.constant('cut' as const), at: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({
    kind: fc.constant('drop' as const),
    at: fc.double({ min: 0, max: 1, noNaN: true }),
    length: fc.integer({ min: 1, max: 12 }),
  }),
  fc.record({
    kind: fc.constant('splice' as const),
    at: fc.double({ min: 0, max: 1, noNaN: true }),
    token: fc.constantFrom(...TOKENS),
  }),
);
export type TextMutation = typeof textMutation extends fc.Arbitrary<infer T> ? T : never;

export function mutateText(text: string, m: TextMutation): string {
  const at = Math.floor(m.at * text.length);
  if (m.kind === 'cut') return text.slice(0, at);
  if (m.kind === 'drop') return text.slice(0, at) + text.slice(at + m.length);
  return text.slice(0, at) + m.token + text.slice(at);
}

/** A value edit: the node at a random place replaced by any JSON value, an extreme number or a deep list. */
export const valueMutation = fc.record({
  pick: fc.double({ min: 0, max: 1, noNaN: true }),
  value: fc.oneof(
    fc.jsonValue({ maxDepth: 2 }),
    anyValue,
    fc.constantFrom(-1, Number.MAX_VALUE, 'x'.repeat(300), [[[[[[]]]]]], { __proto__: null, constructor: 1 }),
  ),
});
export type ValueMutation = typeof valueMutation extends fc.Arbitrary<infer T> ? T : never;

/** Replace one node of a parsed file (chosen by `pick` among all its nodes). */
export function mutateValue(file: unknown, m: ValueMutation): unknown {
  const nodes: { parent: Record<string, unknown> | unknown[]; key: string | number }[] = [];
  const visit = (v: unknown) => {
    if (Array.isArray(v))
      v.forEach((child: unknown, i) => {
        nodes.push({ parent: v, key: i });
        visit(child);
      });
    else if (v !== null && typeof v === 'object')
      for (const [k, child] of Object.entries(v)) {
        nodes.push({ parent: v as Record<string, unknown>, key: k });
        visit(child);
      }
  };
  const copy: unknown = JSON.parse(JSON.stringify(file));
  visit(copy);
  if (nodes.length === 0) return m.value;
  const { parent, key } = nodes[Math.min(nodes.length - 1, Math.floor(m.pick * nodes.length))];
  if (Array.isArray(parent)) parent[key as number] = m.value;
  else Object.defineProperty(parent, key, { value: m.value, enumerable: true, writable: true, configurable: true });
  return copy;
}
