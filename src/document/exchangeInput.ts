// From a sketch file and its view factors to a gray-diffuse exchange solve.
// The one place where the file's lengths become metres and its `surfaces` and
// `settings` become solver input, so the command line and the app agree.
// Defaults for a surface with no properties: src/core/exchangeSetup.ts.
import { ExchangeError, solveExchange, type ExchangeInput, type ExchangeResult } from '../core/exchange';
import { exchangeInputFor } from '../core/exchangeSetup';
import type { SketchSettings, SurfaceProperties } from './schema';
import { METRES_PER_UNIT, type Units } from './units';

// For the app, which reaches the core through this layer.
export { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../core/exchangeSetup';
export type { ExchangeResult, SurfaceCondition } from '../core/exchange';

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
 * applied, surroundings temperature (K) and depth (m) from the settings;
 * `depth` overrides settings.depth. Throws ExchangeError when a surface gives
 * more than one condition.
 */
export function sketchExchangeInput(
  sketch: SketchExchangePart,
  surfaceNames: ReadonlyArray<string>,
  factors: SurfaceFactors,
  depth?: number,
): ExchangeInput {
  const metres = METRES_PER_UNIT[sketch.units];
  return exchangeInputFor({
    names: surfaceNames,
    properties: sketch.surfaces ?? {},
    viewFactors: factors.F,
    lengthMetres: Array.from(factors.surfaceLength, (L) => L * metres),
    surroundingsTemperature: sketch.settings?.surroundingsTemperature,
    depth: depth ?? sketch.settings?.depth,
  });
}

export type SketchExchangeOutcome =
  | { ok: true; input: ExchangeInput; result: ExchangeResult }
  /** `surface`: index of the surface concerned, when the solver names one. */
  | { ok: false; message: string; surface: number | undefined };

/**
 * Solves the sketch's exchange (SI results: W per metre of depth, W/m^2, K;
 * see solveExchange). Problems that are out of range or have no unique answer
 * come back as a message instead of an exception.
 */
export function solveSketchExchange(
  sketch: SketchExchangePart,
  surfaceNames: ReadonlyArray<string>,
  factors: SurfaceFactors,
  depth?: number,
): SketchExchangeOutcome {
  try {
    const input = sketchExchangeInput(sketch, surfaceNames, factors, depth);
    return { ok: true, input, result: solveExchange(input) };
  } catch (error) {
    if (error instanceof ExchangeError) return { ok: false, message: error.message, surface: error.surface };
    throw error;
  }
}
