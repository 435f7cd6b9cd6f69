// From named surfaces with optional properties to the exchange solver's input.
// Shared by the command line and the app so both apply the same defaults.

import { ExchangeError, type ExchangeInput, type SurfaceCondition } from './exchange';

/** Emissivity (dimensionless) of a surface that gives none (typical of oxidised metals and refractories). */
export const DEFAULT_EMISSIVITY = 0.9;

/**
 * Condition of a surface that gives none: adiabatic (insulated, reradiating),
 * the least assuming choice; it neither adds nor removes heat.
 */
export const DEFAULT_CONDITION: SurfaceCondition = { kind: 'adiabatic' };

/** A surface's properties as the sketch file holds them (kelvin, W/m^2 positive leaving, dimensionless). */
export interface SurfacePropertiesLike {
  emissivity?: number;
  temperature?: number;
  heatFlux?: number;
  adiabatic?: boolean;
  opening?: boolean;
}

export interface ExchangeSetup {
  /** Surface names, in matrix order. */
  names: ReadonlyArray<string>;
  /** Properties per surface name; names without an entry get the defaults. */
  properties: Readonly<Record<string, SurfacePropertiesLike | undefined>>;
  /** View factors n x n row-major, row = from (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Surface lengths in metres (area per metre of depth). */
  lengthMetres: ArrayLike<number>;
  /** Surroundings temperature in K, if set. */
  surroundingsTemperature?: number;
  /** Depth in m, if set. */
  depth?: number;
}

/** The one condition a surface's properties impose (defaults: adiabatic). Throws ExchangeError when more than one is given. */
export function conditionOf(name: string, props: SurfacePropertiesLike | undefined): SurfaceCondition {
  if (!props) return DEFAULT_CONDITION;
  const given: SurfaceCondition[] = [];
  if (props.temperature !== undefined) given.push({ kind: 'temperature', temperature: props.temperature });
  if (props.heatFlux !== undefined) given.push({ kind: 'heatFlux', heatFlux: props.heatFlux });
  if (props.adiabatic === true) given.push({ kind: 'adiabatic' });
  if (props.opening === true) given.push({ kind: 'opening' });
  if (given.length > 1) {
    throw new ExchangeError(`surface '${name}': give one condition, not ${given.map((c) => c.kind).join(' and ')} together`);
  }
  return given[0] ?? DEFAULT_CONDITION;
}

/** The solver input for named surfaces, with the defaults applied (emissivity 0.9, adiabatic; openings black). */
export function exchangeInputFor(setup: ExchangeSetup): ExchangeInput {
  const { names, properties } = setup;
  const conditions = names.map((name) => conditionOf(name, Object.hasOwn(properties, name) ? properties[name] : undefined));
  const emissivity = Float64Array.from(names, (name, i) =>
    conditions[i].kind === 'opening' ? 1 : ((Object.hasOwn(properties, name) ? properties[name]?.emissivity : undefined) ?? DEFAULT_EMISSIVITY),
  );
  return {
    viewFactors: setup.viewFactors,
    area: setup.lengthMetres,
    emissivity,
    conditions,
    surroundingsTemperature: setup.surroundingsTemperature,
    depth: setup.depth,
    names,
  };
}
