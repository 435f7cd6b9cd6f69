// From a sketch file and its view factors to the whole surface balance.
// The one place where the file's lengths become metres and its `surfaces` and
// `settings` become solver input, so the command line and the app agree.
// Defaults for a surface with no properties: src/core/exchange/setup.ts; the
// one-condition rule: src/document/exchange/conditions.ts; wording of
// failures: src/document/exchange/messages.ts. Wall thicknesses and tube
// diameters are metres in the file whatever the sketch's units.
import {
  balanceInputFor,
  solveBalance,
  type BalanceCondition,
  type BalanceInput,
  type BalanceResult,
} from '../core/balance';
import { conditionOf, type SketchCondition } from './exchange/conditions';
import { exchangeFailureMessage, type ConditionsFailure, type SketchExchangeFailure } from './exchange/messages';
import type { SketchSettings, SurfaceProperties } from './schema';
import { METRES_PER_UNIT, type Units } from './units';
import type { SolverMemory } from '../core/exchange';

// For the app, which reaches the core through this layer.
export { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../core/exchange';
export type { SurfaceCondition } from '../core/exchange';
export type { BalanceCondition, BalanceResult, TubeCondition, WallCondition, WallLayer } from '../core/balance';
/** The solved exchange as the app and the command line see it: the whole balance (radiation, convection, the back). */
export type ExchangeResult = BalanceResult;

/** What the exchange needs of a sketch: its units, surface properties and settings (as the file holds them). */
export interface SketchExchangePart {
  units: Units;
  surfaces?: Record<string, SurfaceProperties>;
  settings?: SketchSettings;
}

/** View factors of the sketch's named surfaces (as the core returns them). */
export interface SurfaceFactors {
  /** n x n row-major, row = from (dimensionless). */
  F: ArrayLike<number>;
  /** Surface lengths in the sketch's units. */
  surfaceLength: ArrayLike<number>;
}

/**
 * Solver input for a sketch: lengths converted from the file's units to metres
 * (area per metre of depth), properties per surface name with the defaults
 * applied, a linked face and the face it names both linked (by index),
 * surroundings and gas temperature (K) and depth (m) from the settings;
 * `depth` overrides settings.depth. Refused (code 'more-than-one-condition')
 * when a surface gives more than one condition.
 */
export function sketchExchangeInput(
  sketch: SketchExchangePart,
  surfaceNames: ReadonlyArray<string>,
  factors: SurfaceFactors,
  depth?: number,
): { ok: true; input: BalanceInput } | ConditionsFailure {
  const surfaces = sketch.surfaces ?? {};
  // Own keys only: a surface named 'constructor' has no inherited properties.
  const props = surfaceNames.map((name) => (Object.hasOwn(surfaces, name) ? surfaces[name] : undefined));
  const given: (SketchCondition | undefined)[] = [];
  for (let i = 0; i < props.length; i++) {
    const c = conditionOf(props[i]);
    if (!c.ok) return { ok: false, code: 'more-than-one-condition', surface: i, kinds: c.kinds };
    given.push(c.condition);
  }
  const index = new Map(surfaceNames.map((name, i) => [name, i]));
  const conditions: (BalanceCondition | undefined)[] = given.map((c) =>
    c?.kind === 'linked' ? { kind: 'linked', other: index.get(c.surface) ?? -1 } : c,
  );
  // The named face is linked back, unless it gives a condition of its own (the core then refuses the link).
  given.forEach((c, i) => {
    const j = c?.kind === 'linked' ? index.get(c.surface) : undefined;
    if (j !== undefined && given[j] === undefined) conditions[j] = { kind: 'linked', other: i };
  });
  const metres = METRES_PER_UNIT[sketch.units];
  const input = balanceInputFor({
    conditions,
    emissivity: props.map((p) => p?.emissivity),
    convectionCoefficient: props.map((p) => p?.convectionCoefficient),
    viewFactors: factors.F,
    lengthMetres: Array.from(factors.surfaceLength, (L) => L * metres),
    surroundingsTemperature: sketch.settings?.surroundingsTemperature,
    gasTemperature: sketch.settings?.gasTemperature,
    depth: depth ?? sketch.settings?.depth,
  });
  return { ok: true, input };
}

/** The balance of a sketch, or the coded reason there is none (word it with exchangeFailureMessage). */
export function sketchExchange(
  sketch: SketchExchangePart,
  surfaceNames: ReadonlyArray<string>,
  factors: SurfaceFactors,
  depth?: number,
  memory?: SolverMemory,
): { ok: true; input: BalanceInput; result: BalanceResult } | SketchExchangeFailure {
  const prepared = sketchExchangeInput(sketch, surfaceNames, factors, depth);
  if (!prepared.ok) return prepared;
  const solved = solveBalance(prepared.input, memory);
  return solved.ok ? { ok: true, input: prepared.input, result: solved.result } : solved;
}

export type SketchExchangeOutcome =
  | { ok: true; input: BalanceInput; result: BalanceResult }
  /** `surface`: index of the surface concerned, when the solver names one. */
  | { ok: false; message: string; surface: number | undefined };

/**
 * Solves the sketch's surface balance (SI results: W per metre of depth,
 * W/m^2, K; see solveBalance). Problems that are out of range or have no
 * unique answer come back as a message naming the surface, never as an exception.
 * `memory`: solvers and scratch kept between solves by a caller that solves often.
 */
export function solveSketchExchange(
  sketch: SketchExchangePart,
  surfaceNames: ReadonlyArray<string>,
  factors: SurfaceFactors,
  depth?: number,
  memory?: SolverMemory,
): SketchExchangeOutcome {
  const outcome = sketchExchange(sketch, surfaceNames, factors, depth, memory);
  if (outcome.ok) return outcome;
  return { ok: false, message: exchangeFailureMessage(outcome, surfaceNames), surface: outcome.surface };
}
