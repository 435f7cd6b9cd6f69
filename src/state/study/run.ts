// A study as the app runs it: a request (plain data, so it can go to a worker)
// in, a reply (plain data) out. The same document functions as the command
// line, so the panel shows what `sweep` and `solve-for` print.
import {
  QUANTITY_UNIT,
  describeParameter,
  describeQuantity,
  parameterProblem,
  parameterUnit,
  parseParameter,
  parseTarget,
  sensitivityTable,
  solveForTarget,
  sweepCsv,
  sweepShare,
  targetQuantity,
  type Quantity,
  type SweepShare,
  type ViewFactorsOf,
  caseFactors,
  sweepRowOf,
} from '../../document/study';
import { toScene } from '../../document';
import { solveSketchExchange } from '../../document/exchangeInput';
import type { CheckedSketch } from '../documentApi';
import type { ViewFactorResult } from '../../core/scene';
import { knownFactorsOf } from './known';

/**
 * A study to run. `factors`: the surface view factors of `sketch`'s geometry when
 * the results pipeline holds them (known.ts); cases with that geometry use them
 * instead of computing them again.
 */
export type StudyRequest = (
  | {
      kind: 'sweep';
      sketch: CheckedSketch;
      address: string;
      from: number;
      to: number;
      steps: number;
      /** One worker's share of the cases (shares.ts); none: every case. */
      share?: SweepShare;
    }
  /** How each net heat changes with each emissivity and fixed temperature (no parameter, no range). */
  | { kind: 'effects'; sketch: CheckedSketch }
  | {
      kind: 'solve';
      sketch: CheckedSketch;
      address: string;
      from: number;
      to: number;
      steps: number;
      surface: string;
      quantity: Quantity;
      target: number;
    }
) & { factors?: ViewFactorResult };

/** One sweep, ready for a plot, a table and a CSV file. */
export interface SweepTable {
  label: string;
  unit: string;
  names: string[];
  values: number[];
  /** netHeat[k][i]: surface i at values[k], W per metre of depth. */
  netHeat: number[][];
  /** temperature[k][i], K. */
  temperature: number[][];
  /** The command line's `sweep --csv` for the same study. */
  csv: string;
}

export interface SolveAnswer {
  /** The lowest value found and every one found, ascending (unit of the parameter). */
  value: number;
  values: number[];
  /** "temperature of 'hearth' = 1180.238 K gives net heat of 'ware' = -150000 W/m". */
  summary: string;
}

/** Rows of derivatives of each surface's net heat, signed as net heat (see src/document/study/sensitivity.ts). */
export interface EffectsTable {
  names: string[];
  rows: { parameter: string; unit: string; netHeat: number[] }[];
}

/** One worker's share of a sweep: the cases at `indices` (of `values`), in order. */
export interface SweepShareTable {
  label: string;
  unit: string;
  names: string[];
  values: number[];
  indices: number[];
  netHeat: number[][];
  temperature: number[][];
}

export type StudyReply =
  | { kind: 'progress'; done: number; total: number }
  | { kind: 'effects'; table: EffectsTable }
  | { kind: 'sweep'; table: SweepTable }
  | { kind: 'sweepShare'; table: SweepShareTable }
  | { kind: 'solve'; answer: SolveAnswer }
  /** `index`: with a share, the case that could not be solved (-1: the range was refused). */
  | { kind: 'failed'; message: string; index?: number };

const shown = (x: number) => String(Number(x.toPrecision(10)));

/** Runs the request to the end; `onProgress(done, total)` after each case of a sweep. */
export function runStudy(
  request: StudyRequest,
  onProgress: (done: number, total: number) => void = () => {},
): StudyReply {
  const { sketch } = request;
  const base = toScene(sketch);
  // Cases one after another keep the pairs a moved shape cannot change (caseFactors).
  const compute = caseFactors();
  const viewFactors = request.factors ? knownFactorsOf(base.scene, request.factors, compute) : compute;
  if (request.kind === 'effects') return effects(sketch, base, viewFactors);
  const parsed = parseParameter(request.address);
  if (!parsed.ok) return { kind: 'failed', message: parsed.message };
  const p = parsed.value;
  const names = base.surfaceNames;
  const problem = parameterProblem(sketch, names, p);
  if (problem) return { kind: 'failed', message: problem };
  const unit = parameterUnit(p, sketch.units);
  if (request.kind === 'sweep') {
    // A whole sweep is the one share of one; a share also says which cases it holds.
    const { share } = request;
    const out = sweepShare(sketch, p, request.from, request.to, request.steps, share ?? { part: 0, of: 1 }, {
      onProgress,
      viewFactors,
      keep: sweepRowOf, // a whole run holds its surfaces^2 exchange: thousands of cases of many surfaces held gigabytes
    });
    if (!out.ok)
      return share
        ? { kind: 'failed', message: out.message, index: out.index }
        : { kind: 'failed', message: out.message };
    const rows = {
      label: describeParameter(p),
      unit,
      names,
      values: out.values,
      netHeat: out.runs.map((r) => Array.from(r.result.netHeat)),
      temperature: out.runs.map((r) => Array.from(r.result.temperature)),
    };
    if (share) return { kind: 'sweepShare', table: { ...rows, indices: out.indices } };
    return { kind: 'sweep', table: { ...rows, csv: sweepCsv(p, sketch.units, out.runs) } };
  }
  const target = parseTarget(`${request.surface}.${request.quantity}=${request.target}`);
  if (!target.ok) return { kind: 'failed', message: target.message };
  const out = solveForTarget(sketch, names, p, request.from, request.to, target.value, request.steps, viewFactors);
  if (!out.ok) return { kind: 'failed', message: out.message };
  const got = targetQuantity(out.run, target.value);
  const withUnit = (x: number, u: string) => (u ? `${shown(x)} ${u}` : shown(x));
  const summary = `${describeParameter(p)} = ${withUnit(out.value, unit)} gives ${describeQuantity(request.surface, request.quantity)} = ${withUnit(got, QUANTITY_UNIT[request.quantity])}`;
  return { kind: 'solve', answer: { value: out.value, values: out.values, summary } };
}

function effects(sketch: CheckedSketch, base: ReturnType<typeof toScene>, viewFactors: ViewFactorsOf): StudyReply {
  const { scene, surfaceNames: names } = base;
  const factors = viewFactors(scene);
  const solved = solveSketchExchange(sketch, names, factors);
  if (!solved.ok) return { kind: 'failed', message: solved.message };
  const table = sensitivityTable(names, solved.input, solved.result);
  if (!table.ok) return { kind: 'failed', message: table.message };
  return {
    kind: 'effects',
    table: { names, rows: table.rows.map(({ parameter, unit, netHeat }) => ({ parameter, unit, netHeat })) },
  };
}
