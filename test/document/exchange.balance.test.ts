import { describe, expect, it } from 'vitest';
import { restore, serialize } from '../../src/document';
import { solveSketchExchange } from '../../src/document/exchangeInput';
import { burnWarning } from '../../src/document/exchange/cautions';

// File version 2: the surface balance's fields (wall, tube, linked,
// convectionCoefficient, settings.gasTemperature), their ranges and the
// messages that name the surface and the field; version 1 files read unchanged.

const duct = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [4, 0],
    [4, 2],
    [0, 2],
  ],
  surface: ['hearth', 'right', 'roof', 'left'],
};
const plate = {
  kind: 'solid',
  points: [
    [1, 0.9],
    [3, 0.9],
    [3, 1.1],
    [1, 1.1],
  ],
  surface: ['baffle bottom', 'baffle end', 'baffle top', 'baffle end'],
};
const tube = {
  kind: 'solid',
  points: [
    [0.4, 1.5],
    [0.6, 1.5],
    [0.6, 1.7],
    [0.4, 1.7],
  ],
  surface: 'tube 1',
};

/** The example, on a drawing where each named surface exists. */
const furnace = {
  version: 2,
  units: 'm',
  shapes: [duct, plate, tube],
  surfaces: {
    hearth: { emissivity: 0.9, temperature: 1450, convectionCoefficient: 15 },
    roof: {
      emissivity: 0.75,
      wall: {
        layers: [
          { thickness: 0.23, conductivity: 1.3 },
          { thickness: 0.115, conductivity: 0.2 },
        ],
        outsideTemperature: 300,
        outsideCoefficient: 12,
      },
    },
    'tube 1': {
      emissivity: 0.85,
      convectionCoefficient: 10,
      tube: {
        fluidTemperature: 650,
        insideCoefficient: 900,
        outerDiameter: 0.1143,
        innerDiameter: 0.0953,
        wallConductivity: 24,
      },
    },
    'baffle top': { emissivity: 0.6, linked: 'baffle bottom' },
    'baffle bottom': { emissivity: 0.3 },
  },
  settings: { gasTemperature: 1500 },
};

type Doc = typeof furnace & Record<string, unknown>;
const clone = (): Doc => JSON.parse(JSON.stringify(furnace)) as Doc;

function errorsOf(doc: unknown): string[] {
  const r = restore(doc);
  if (r.ok) throw new Error(`expected a refusal, got a sketch (warnings: ${r.warnings.join('; ')})`);
  return r.errors.map((e) => e.message);
}

describe('file version 2', () => {
  it('reads the surface balance fields and writes them back unchanged', () => {
    const r = restore(furnace);
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
    expect(r.warnings).toEqual([]);
    expect(r.sketch.version).toBe(2);
    expect(r.sketch.surfaces).toEqual(furnace.surfaces);
    expect(r.sketch.settings).toEqual({ gasTemperature: 1500 });
    const text = serialize(r.sketch);
    expect((JSON.parse(text) as { version: unknown }).version).toBe(2);
    const again = restore(text);
    expect(again.ok && again.sketch).toEqual(r.sketch);
  });

  it('a version-1 file opens unchanged, as version 2', () => {
    const v1 = {
      version: 1,
      units: 'mm',
      shapes: [duct],
      surfaces: {
        hearth: { temperature: 1200, emissivity: 0.8 },
        roof: { heatFlux: -500 },
        right: { adiabatic: true },
      },
      settings: { surroundingsTemperature: 300, depth: 2 },
    };
    const r = restore(v1);
    if (!r.ok) throw new Error('a valid version-1 file must be read');
    expect(r.sketch.version).toBe(2);
    expect(r.sketch.units).toBe('mm');
    expect(r.sketch.surfaces).toEqual(v1.surfaces);
    expect(r.sketch.settings).toEqual(v1.settings);
  });

  it('solves the example: every surface has a temperature, the baffle faces share one', () => {
    const r = restore(furnace);
    if (!r.ok) throw new Error('example refused');
    const names = ['hearth', 'right', 'roof', 'left', 'baffle bottom', 'baffle end', 'baffle top', 'tube 1'];
    // A stand-in for the view factors (reciprocal, rows of one): the document's mapping is under test here, not geometry.
    const L = [4, 2, 4, 2, 2, 0.4, 2, 0.8];
    const n = names.length;
    const F = new Float64Array(n * n);
    const total = L.reduce((a, b) => a + b, 0);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) F[i * n + j] = L[j] / total;
    const out = solveSketchExchange(r.sketch, names, { F, surfaceLength: L });
    if (!out.ok) throw new Error(out.message);
    const res = out.result;
    expect(res.temperature[4]).toBe(res.temperature[6]);
    expect(out.input.conditions[4]).toEqual({ kind: 'linked', other: 6 });
    expect(out.input.conditions[6]).toEqual({ kind: 'linked', other: 4 });
    // Convection coefficients reach the solver per surface; the gas temperature too.
    expect(Array.from(out.input.convectionCoefficient ?? [])).toEqual([15, 0, 0, 0, 0, 0, 0, 10]);
    expect(out.input.gasTemperature).toBe(1500);
    expect(res.layerTemperatures[2]).toHaveLength(3);
    expect(res.innerTemperature[7]).toBeLessThan(res.temperature[7]);
  });
});

describe('version 2 refusals name the surface and the field', () => {
  it('ranges of wall, tube and convection fields', () => {
    const d = clone();
    d.surfaces.roof.wall.layers[1].thickness = 0;
    expect(errorsOf(d)).toEqual(["surface 'roof': wall.layers[2].thickness must be at least 0.000001 m (got 0)"]);
    const e = clone();
    e.surfaces['tube 1'].tube.innerDiameter = 0.2;
    expect(errorsOf(e)).toEqual([
      "surface 'tube 1': tube.innerDiameter must be below outerDiameter (0.1143 m) (got 0.2)",
    ]);
    const f = clone();
    f.surfaces.hearth.convectionCoefficient = -1;
    expect(errorsOf(f)).toEqual(["surface 'hearth': convectionCoefficient must be 0 or more (got -1)"]);
    const g = clone();
    g.surfaces.roof.wall.layers = [];
    expect(errorsOf(g)).toEqual(["surface 'roof': wall.layers must list at least one layer (got an empty list)"]);
  });

  it('a missing field', () => {
    const d = clone();
    delete (d.surfaces['tube 1'].tube as Partial<(typeof d.surfaces)['tube 1']['tube']>).wallConductivity;
    expect(errorsOf(d)).toEqual(["surface 'tube 1': tube.wallConductivity is missing; it must be a number of W/(m·K)"]);
  });

  it('two conditions on one surface', () => {
    const d = clone();
    (d.surfaces.roof as Record<string, unknown>).temperature = 400;
    expect(errorsOf(d)).toEqual(["surface 'roof': give one condition, not temperature and wall together"]);
  });

  it('links: to a face with its own condition, to itself, to no edge, or twice', () => {
    const own = clone();
    (own.surfaces['baffle bottom'] as Record<string, unknown>).adiabatic = true;
    expect(errorsOf(own)).toEqual([
      "surface 'baffle top': linked names 'baffle bottom', which gives a condition of its own; the other face of a plate gives none (only its emissivity and convectionCoefficient)",
    ]);
    const self = clone();
    self.surfaces['baffle top'].linked = 'baffle top';
    expect(errorsOf(self)).toEqual([
      "surface 'baffle top': linked names the surface itself; name the other face of the plate",
    ]);
    const nowhere = clone();
    nowhere.surfaces['baffle top'].linked = 'muffle';
    expect(errorsOf(nowhere)).toEqual([
      "surface 'baffle top': linked names 'muffle', which no edge uses; name the other face of the plate",
    ]);
    const twice = clone();
    (twice.surfaces as Record<string, unknown>)['baffle end'] = { linked: 'baffle bottom' };
    expect(errorsOf(twice)).toEqual([
      "surface 'baffle end': linked names 'baffle bottom', which another surface already links to; a plate has two faces",
    ]);
  });

  it('convection needs a gas temperature and is refused on an opening', () => {
    const d = clone();
    d.settings = {} as typeof d.settings;
    expect(errorsOf(d)).toEqual([
      "surface 'hearth': convectionCoefficient above 0 needs a gas temperature; set settings.gasTemperature",
      "surface 'tube 1': convectionCoefficient above 0 needs a gas temperature; set settings.gasTemperature",
    ]);
    const e = clone();
    (e.surfaces as Record<string, unknown>).left = { opening: true, convectionCoefficient: 5 };
    (e.settings as Record<string, unknown>).surroundingsTemperature = 300;
    expect(errorsOf(e)).toEqual(["surface 'left': an opening takes no convectionCoefficient; remove it"]);
    // A coefficient of 0 needs no gas temperature.
    const f = clone();
    f.settings = {} as typeof f.settings;
    f.surfaces.hearth.convectionCoefficient = 0;
    f.surfaces['tube 1'].convectionCoefficient = 0;
    expect(restore(f).ok).toBe(true);
  });

  it('warns about unknown fields inside a wall and a tube', () => {
    const d = clone();
    (d.surfaces.roof.wall.layers[0] as Record<string, unknown>).density = 2000;
    (d.surfaces['tube 1'].tube as Record<string, unknown>).length = 6;
    const r = restore(d);
    expect(r.ok && r.warnings).toEqual([
      "surface 'roof' wall layer 1: ignored unknown field 'density'",
      "surface 'tube 1' tube: ignored unknown field 'length'",
    ]);
  });
});

describe('the burn warning', () => {
  it('above 60 °C (333.15 K) only, citing a published touch-temperature guide', () => {
    expect(burnWarning('roof', 333.15)).toBeNull();
    expect(burnWarning('roof', 353.15)).toBe(
      "burn hazard: the casing of 'roof' is at 80 °C, above 60 °C (touch-temperature guides for hot surfaces: ASTM C1055, ISO 13732-1); guard or insulate it",
    );
  });
});
