import { describe, expect, it } from 'vitest';
import { cliJson, exchangeOf, kiln, runCli, type ExchangeJson } from './studyHelpers';

// The sensitivity command against central finite differences of `exchange
// --json` runs on edited files (independent of the derivative code). Central
// differences with step h have truncation error h^2/6 |f'''|: emissivity steps
// of 1e-4 on values of order 1 and temperature steps of 0.05 K at 300-1250 K
// (f ~ T^4, f'''/f' ~ 6/T^2, so (h/T)^2 < 3e-8) stay below 1e-7 of the largest
// derivative. Rounding: the printed net heats are exact to ~1e-12 of the largest
// (an adiabatic surface's zero comes out as ~1e-11 W/m), so a difference carries up to
// 1e-12 max|q'| / h. Tolerance: 1e-6 of the row's largest derivative plus that floor.
const TOLERANCE = 1e-6;
const ROUNDING = 1e-12;

interface SensitivityJson {
  surfaces: string[];
  rows: { parameter: string; unit: string; netHeat: number[]; surroundingsNetHeat?: number }[];
  bounds?: {
    corners: number;
    method: string;
    surfaces: { name: string; lowest: number; highest: number; mayNotBeMonotone: boolean }[];
  };
}

type Kiln = ReturnType<typeof kiln>;

function edit(file: Kiln, parameter: string, delta: number): Kiln {
  const copy = structuredClone(file);
  const dot = parameter.lastIndexOf('.');
  const [owner, property] = [parameter.slice(0, dot), parameter.slice(dot + 1)];
  if (owner === 'settings') copy.settings[property] += delta;
  else (copy.surfaces[owner][property] as number) += delta;
  return copy;
}

function checkAgainstDifferences(file: Kiln) {
  const got = cliJson({ 'k.json': file }, 'sensitivity', 'k.json') as SensitivityJson;
  expect(got.rows.length).toBeGreaterThan(0);
  for (const row of got.rows) {
    const h = row.unit === 'W/(m K)' ? 0.05 : 1e-4;
    const up: ExchangeJson = exchangeOf(edit(file, row.parameter, h));
    const down: ExchangeJson = exchangeOf(edit(file, row.parameter, -h));
    const fd = up.surfaces.map((s, i) => (s.netHeat - down.surfaces[i].netHeat) / (2 * h));
    expect(up.surfaces.map((s) => s.name)).toEqual(got.surfaces);
    const scale = Math.max(...fd.map(Math.abs));
    const floor = (ROUNDING * Math.max(...up.surfaces.map((s) => Math.abs(s.netHeat)))) / h;
    row.netHeat.forEach((d, i) => expect(Math.abs(d - fd[i])).toBeLessThanOrEqual(TOLERANCE * scale + floor));
  }
  return got;
}

describe('sensitivity --json against central differences of exchange runs', () => {
  it('closed kiln: emissivities and the two fixed temperatures', () => {
    const got = checkAgainstDifferences(kiln());
    expect(got.rows.map((r) => r.parameter)).toEqual([
      'hearth.emissivity',
      'wall.emissivity',
      'crown.emissivity',
      'ware stack.2.emissivity',
      'hearth.temperature',
      'ware stack.2.temperature',
    ]);
    expect(got.rows[0].unit).toBe('W/m per unit emissivity');
  });

  it('convection on surfaces held at a temperature leaves the radiosity equations linear', () => {
    const file = kiln() as Kiln & { version: number };
    file.version = 2;
    file.surfaces.hearth.convectionCoefficient = 12;
    file.settings.gasTemperature = 950;
    checkAgainstDifferences(file);
  });

  it('kiln with a door slot to a 300 K room: the surroundings temperature is a parameter too', () => {
    const got = checkAgainstDifferences(kiln(true));
    expect(got.rows.at(-1)?.parameter).toBe('settings.surroundingsTemperature');
    expect(got.rows.map((r) => r.parameter)).not.toContain('door.emissivity');
  });
});

describe('sensitivity with emissivity ranges', () => {
  it('lowest and highest net heat are those of the corner cases, and no inner case falls outside here', () => {
    const file = kiln();
    const got = cliJson(
      { 'k.json': file },
      ...[
        'sensitivity',
        'k.json',
        '--emissivity-range',
        'ware stack.2=0.6:0.9',
        '--emissivity-range',
        'hearth=0.8:0.9',
      ],
    ) as SensitivityJson;
    expect(got.bounds?.corners).toBe(4);
    const cases = (values: number[]) =>
      values.flatMap((w) =>
        [0.8, 0.85, 0.9].map((hv) => {
          const f = structuredClone(file);
          f.surfaces['ware stack.2'].emissivity = w;
          f.surfaces.hearth.emissivity = hv;
          return exchangeOf(f);
        }),
      );
    const corners = [0.6, 0.9].flatMap((w) =>
      [0.8, 0.9].map((hv) => {
        const f = structuredClone(file);
        f.surfaces['ware stack.2'].emissivity = w;
        f.surfaces.hearth.emissivity = hv;
        return exchangeOf(f);
      }),
    );
    const inner = cases([0.6, 0.7, 0.8, 0.9]);
    got.bounds!.surfaces.forEach((s, i) => {
      const atCorners = corners.map((c) => c.surfaces[i].netHeat);
      expect(s.lowest).toBe(Math.min(...atCorners));
      expect(s.highest).toBe(Math.max(...atCorners));
      expect(s.mayNotBeMonotone).toBe(false);
      // Monotone here, so inner cases stay inside the corner bounds (to rounding).
      const slack = 1e-9 * Math.max(Math.abs(s.lowest), Math.abs(s.highest), 1);
      for (const c of inner) {
        expect(c.surfaces[i].netHeat).toBeGreaterThanOrEqual(s.lowest - slack);
        expect(c.surfaces[i].netHeat).toBeLessThanOrEqual(s.highest + slack);
      }
    });
  });

  it('bad ranges are usage errors; a range on an opening is refused', () => {
    const r = runCli({ 'k.json': kiln() }, 'sensitivity', 'k.json', '--emissivity-range', 'hearth=0.9:0.8');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/must have 0 < LOW <= HIGH <= 1/);
    const open = runCli({ 'k.json': kiln(true) }, 'sensitivity', 'k.json', '--emissivity-range', 'door=0.5:0.6');
    expect(open.code).toBe(1);
    expect(open.err).toMatch(/'door' is an opening/);
  });

  it('follows the whole balance where it is not linear: convection on a solved surface, a lined wall', () => {
    const file = kiln() as ReturnType<typeof kiln> & { version: number };
    file.version = 2;
    file.surfaces.crown.convectionCoefficient = 10;
    file.settings.gasTemperature = 900;
    delete file.surfaces.wall.heatFlux;
    (file.surfaces.wall as Record<string, unknown>).wall = {
      layers: [{ thickness: 0.23, conductivity: 1.2 }],
      outsideTemperature: 300,
      outsideCoefficient: 12,
    };
    const got = checkAgainstDifferences(file);
    expect(got.rows.map((r) => r.parameter)).toContain('crown.emissivity');
  });
});
