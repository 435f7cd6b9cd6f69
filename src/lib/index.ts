/**
 * Tautline as a library: read a sketch file, compute exact 2D view factors and
 * the gray-diffuse heat exchange, and run design studies, with the same results
 * the command line prints. In a checkout, a TypeScript script run with tsx
 * (`npx tsx script.ts`) imports it by the package name:
 *
 * ```ts
 * import { readFileSync } from 'node:fs';
 * import { readSketch, exchange, sweep } from 'tautline';
 * const read = readSketch(readFileSync('kiln.json', 'utf8'));
 * if (!read.ok) throw new Error(read.messages.join('\n'));
 * const one = exchange(read.sketch); // the object `exchange --json` prints
 * const many = sweep(read.sketch, 'hearth.temperature', 1100, 1400, 7);
 * ```
 *
 * Units: lengths in the file's units; temperatures K; heat flux and radiosity
 * W/m^2; net heat W per metre of depth (positive when a surface gives off more
 * radiation than it absorbs); totals W. Every function returns `{ ok: false,
 * message }` for bad input instead of throwing. Results support, not replace,
 * local codes and licensed engineering practice.
 */
import { computeViewFactors } from '../core/viewFactors';
import { restore, toScene, type Sketch } from '../document';
import { solveSketchExchange } from '../document/exchangeInput';
import { exchangeJson } from '../document/exchangeJson';
import {
  DEFAULT_SCAN_STEPS,
  parameterProblem,
  parseParameter,
  parseTarget,
  runSweep,
  sensitivityTable,
  solveForTarget,
  type SensitivityRow,
  type StudyParameter,
} from '../document/study';

export type { Sketch } from '../document';
export type { SensitivityRow } from '../document/study';
export { sketchJsonSchema } from './sketchSchema';

/** A refusal: what is wrong and where, worded for people. */
export interface Refusal {
  ok: false;
  message: string;
}

/** The object `exchange --json` prints (surfaces, exchange, energyBalance, and surroundings/depth where they apply). */
export type ExchangeJson = Record<string, unknown>;

/**
 * Read and check a sketch from JSON text or an already-parsed object (any file
 * version this program reads). `warnings` name repairs and ignored content.
 */
export function readSketch(
  input: unknown,
): { ok: true; sketch: Sketch; warnings: string[] } | { ok: false; messages: string[] } {
  const read = restore(input);
  if (!read.ok) return { ok: false, messages: read.errors.map((e) => e.message) };
  return { ok: true, sketch: read.sketch, warnings: read.warnings };
}

/**
 * View factors between the named surfaces: `names` in matrix order (first
 * appearance along the edges), `viewFactors[i][j]` from i to j (dimensionless),
 * `lengths` in the file's units.
 */
export function viewFactors(sketch: Sketch): { names: string[]; lengths: number[]; viewFactors: number[][] } {
  const { scene, surfaceNames } = toScene(sketch);
  const f = computeViewFactors(scene);
  const n = f.surfaceCount;
  return {
    names: surfaceNames,
    lengths: Array.from(f.surfaceLength),
    viewFactors: Array.from({ length: n }, (_, i) => Array.from(f.F.subarray(i * n, (i + 1) * n))),
  };
}

/** The heat exchange of the sketch: exactly the object `exchange --json` prints; `depth` (m) as its --depth. */
export function exchange(sketch: Sketch, options: { depth?: number } = {}): { ok: true; json: ExchangeJson } | Refusal {
  const { scene, surfaceNames: names } = toScene(sketch);
  const factors = computeViewFactors(scene);
  if (!factors.F.every(Number.isFinite))
    return { ok: false, message: 'internal error: the view factors came out non-finite; please report this sketch' };
  const solved = solveSketchExchange(sketch, names, factors, options.depth);
  if (!solved.ok) return { ok: false, message: solved.message };
  return { ok: true, json: exchangeJson({ names, factors, result: solved.result }) };
}

function parameterOf(sketch: Sketch, vary: string): { ok: true; p: StudyParameter } | Refusal {
  const parsed = parseParameter(vary);
  if (!parsed.ok) return parsed;
  const problem = parameterProblem(sketch, toScene(sketch).surfaceNames, parsed.value);
  return problem ? { ok: false, message: problem } : { ok: true, p: parsed.value };
}

/**
 * The exchange at `steps` evenly spaced values of one parameter from `from` to
 * `to` (both included). `vary` is written as on the command line:
 * "SURFACE.temperature" (K), ".emissivity", ".heatFlux" (W/m^2), ".x"/".y" (the
 * shape's middle, file units), "settings.surroundingsTemperature" (K),
 * "settings.depth" (m). Each run is what `exchange --json` prints for the edited file.
 */
export function sweep(
  sketch: Sketch,
  vary: string,
  from: number,
  to: number,
  steps: number,
): { ok: true; values: number[]; runs: ExchangeJson[] } | Refusal {
  const parameter = parameterOf(sketch, vary);
  if (!parameter.ok) return parameter;
  const out = runSweep(sketch, parameter.p, from, to, steps);
  if (!out.ok) return out;
  return { ok: true, values: out.values, runs: out.runs.map((r) => r.json()) };
}

/**
 * The value of `vary` in [from, to] where `target` ("SURFACE.QUANTITY=VALUE";
 * netHeat W/m, netFlux W/m^2, temperature K, radiosity W/m^2) is met, to 1e-9 of
 * the value: the range is scanned at `steps` values, then Brent's method runs
 * in each bracket. `value` is the lowest root, `values` every root found.
 */
export function solveFor(
  sketch: Sketch,
  vary: string,
  from: number,
  to: number,
  target: string,
  steps = DEFAULT_SCAN_STEPS,
): { ok: true; value: number; values: number[]; run: ExchangeJson } | Refusal {
  const parameter = parameterOf(sketch, vary);
  if (!parameter.ok) return parameter;
  const t = parseTarget(target);
  if (!t.ok) return t;
  const names = toScene(sketch).surfaceNames;
  const out = solveForTarget(sketch, names, parameter.p, from, to, t.value, steps);
  if (!out.ok) return { ok: false, message: out.message };
  return { ok: true, value: out.value, values: out.values, run: out.run.json() };
}

/**
 * d(net heat of each surface)/d(each emissivity and each fixed temperature),
 * from the derivative of the radiosity solution: W/m per unit emissivity, W/(m K).
 */
export function sensitivity(sketch: Sketch): { ok: true; names: string[]; rows: SensitivityRow[] } | Refusal {
  const { scene, surfaceNames: names } = toScene(sketch);
  const factors = computeViewFactors(scene);
  const solved = solveSketchExchange(sketch, names, factors);
  if (!solved.ok) return { ok: false, message: solved.message };
  const table = sensitivityTable(names, solved.input, solved.result);
  return table.ok ? { ok: true, names, rows: table.rows } : table;
}
