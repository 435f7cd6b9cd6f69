// What a study may vary: the refusals as data (parameterRefusal, which the studies
// panel asks of every choice after each edit) and the same refusals in words
// (parameterProblem, for the command line and the panel's messages).
import { describe, expect, it } from 'vitest';
import { restore, toScene } from '../../src/document';
import { parameterProblem, parameterRefusal, type StudyParameter } from '../../src/document/study';
import { block, enclosure } from './restoreHelpers';

const read = restore({
  version: 1,
  units: 'm',
  // The reader tests' box and block (restoreHelpers.ts), named for these cases.
  shapes: [
    { ...enclosure, surface: ['floor', 'mouth', 'constructor', 'wall'] },
    { ...block, surface: 'wall' },
  ],
  surfaces: {
    floor: { emissivity: 0.9, temperature: 1200 },
    mouth: { opening: true },
    wall: { emissivity: 0.8, heatFlux: 0 },
  },
});
if (!read.ok) throw new Error(read.errors.map((e) => e.message).join('; '));
const sketch = read.sketch;
const names = toScene(sketch).surfaceNames;
const surface = (name: string, property: 'temperature' | 'heatFlux' | 'emissivity') =>
  ({ kind: 'surface', surface: name, property }) as StudyParameter;

describe('parameters a study may not vary', () => {
  const cases: [StudyParameter, string | null, RegExp | null][] = [
    [surface('floor', 'temperature'), null, null],
    [surface('wall', 'heatFlux'), null, null],
    [surface('roof', 'emissivity'), 'no-surface', /the sketch has no surface named 'roof'; its surfaces: /],
    [
      surface('floor', 'heatFlux'),
      'no-heat-flux',
      /'floor' has no heat-flux condition to vary.*\(it is held at a temperature\)/,
    ],
    // A name such as "constructor" is a plain name: no inherited member stands for its properties.
    [
      surface('constructor', 'temperature'),
      'no-temperature',
      /'constructor' has no temperature condition.*\(it is adiabatic\)/,
    ],
    [surface('mouth', 'emissivity'), 'opening-emissivity', /'mouth' is an opening: it is black/],
    [{ kind: 'shape', surface: 'wall', measure: 'x' }, 'several-shapes', /'wall' names edges of 2 shapes \(1, 2\)/],
    [{ kind: 'shape', surface: 'floor', measure: 'radius' }, 'not-circle', /'floor' is not on a circle/],
    [{ kind: 'row', row: 'upper', measure: 'pitch' }, 'no-row', /no tube row named 'upper' \(it has no rows\)/],
    [{ kind: 'setting', setting: 'depth' }, null, null],
  ];
  for (const [p, kind, words] of cases) {
    it(`${JSON.stringify(p)}: ${kind ?? 'allowed'}`, () => {
      expect(parameterRefusal(sketch, names, p)?.kind ?? null).toBe(kind);
      const problem = parameterProblem(sketch, names, p);
      if (words) expect(problem).toMatch(words);
      else expect(problem).toBeNull();
    });
  }
});

describe('a parameter named by a split surface', () => {
  it('names the parts of a tube split into arcs, and a part moves the whole tube', () => {
    const split = restore({
      version: 2,
      units: 'm',
      shapes: [
        { ...enclosure, surface: 'wall' },
        {
          kind: 'solid',
          circle: { center: [2, 1], radius: 0.1 },
          surface: ['tube 1 1', 'tube 1 2', 'tube 1 3', 'tube 1 4'],
        },
      ],
    });
    if (!split.ok) throw new Error(split.errors.map((e) => e.message).join('; '));
    const all = toScene(split.sketch).surfaceNames;
    const whole: StudyParameter = { kind: 'shape', surface: 'tube 1', measure: 'x' };
    expect(parameterRefusal(split.sketch, all, whole)?.kind).toBe('no-surface');
    expect(parameterProblem(split.sketch, all, whole)).toBe(
      "the sketch has no surface named 'tube 1', but 4 parts of it ('tube 1 1', 'tube 1 2', 'tube 1 3', …): name one part (a position or radius moves or sizes the whole shape it lies on)",
    );
    expect(parameterRefusal(split.sketch, all, { kind: 'shape', surface: 'tube 1 3', measure: 'x' })).toBeNull();
    // Parts add one word to the name: 'tube 1 3' is a part of 'tube 1', not of 'tube'.
    expect(parameterProblem(split.sketch, all, { kind: 'shape', surface: 'tube', measure: 'x' })).toMatch(
      /its surfaces: /,
    );
  });
});
