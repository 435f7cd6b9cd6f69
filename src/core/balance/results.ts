// The solved balance as results per surface: net radiation (as the exchange
// reports it), convection, the heat supplied from behind, and the temperatures
// inside walls and tubes. SI units, heat per metre of depth.
import { layerTemperatures, tubeWallResistance, wallFlux } from './conditions';
import type { BalanceInput, BalanceResult } from './types';

/** The converged state (per surface: T K, E J G W/m^2, emissivity, view to the surroundings, h W/(m^2 K)). */
export interface Solved {
  T: Float64Array;
  E: Float64Array;
  J: Float64Array;
  G: Float64Array;
  eps: Float64Array;
  Fs: Float64Array;
  Es: number;
  h: Float64Array;
  Tg: number;
  iterations: number;
  reciprocalCondition: number;
}

/** Assembles the result from the converged state (units in BalanceResult). */
export function balanceResult(input: BalanceInput, s: Solved): BalanceResult {
  const n = input.conditions.length;
  const F = input.viewFactors;
  const A = input.area;
  const { T, E, J, G, eps, Fs, Es, h, Tg } = s;
  const q = new Float64Array(n);
  const netHeat = new Float64Array(n);
  const convectionHeat = new Float64Array(n);
  const suppliedHeat = new Float64Array(n);
  const exchange = new Float64Array(n * n);
  const toSurr = new Float64Array(n);
  const layers: (Float64Array | undefined)[] = new Array<Float64Array | undefined>(n).fill(undefined);
  const coldFace = new Float64Array(n).fill(Number.NaN);
  const inner = new Float64Array(n).fill(Number.NaN);
  let gasConvectionHeat = 0;
  for (let i = 0; i < n; i++) {
    // e (E - G) equals J - G without its cancellation when e is small.
    q[i] = eps[i] * (E[i] - G[i]);
    convectionHeat[i] = h[i] > 0 ? A[i] * h[i] * (T[i] - Tg) : 0;
    gasConvectionHeat -= convectionHeat[i];
    const c = input.conditions[i];
    if (c.kind === 'heatFlux' || c.kind === 'adiabatic') {
      // The back fixes the heat exactly; the solve meets it to the tolerance (then polished to rounding).
      suppliedHeat[i] = c.kind === 'heatFlux' ? A[i] * c.heatFlux : 0;
      netHeat[i] = suppliedHeat[i] - convectionHeat[i];
      q[i] = netHeat[i] / A[i];
    } else {
      // Elsewhere the radiation is the accurate side: a stiff back (a film of 1e12 W/(m^2 K)) magnifies the rounding of T.
      netHeat[i] = A[i] * q[i];
      suppliedHeat[i] = netHeat[i] + convectionHeat[i];
    }
    // Flux through a wall or a tube, W/m^2 outwards: what the balance sends through the back.
    const through = -suppliedHeat[i] / A[i];
    if (c.kind === 'wall') {
      layers[i] = layerTemperatures(c, T[i], through);
      // With casing radiation the casing temperature comes from its own balance; equal to the last layer to rounding.
      if (c.outsideEmissivity !== undefined) layers[i]![c.layers.length] = wallFlux(c, T[i]).casingTemperature;
      coldFace[i] = layers[i]![c.layers.length];
    } else if (c.kind === 'tube') {
      inner[i] = T[i] - through * tubeWallResistance(c);
    }
    const ri = i * n;
    for (let j = 0; j < n; j++) exchange[ri + j] = A[i] * F[ri + j] * (J[i] - J[j]);
    toSurr[i] = A[i] * Fs[i] * (J[i] - Es);
  }
  let surroundingsNetHeat = 0;
  for (let i = 0; i < n; i++) surroundingsNetHeat -= toSurr[i];
  let sum = surroundingsNetHeat + gasConvectionHeat;
  let radiated = 0; // sum of A_i J_i, W/m
  for (let i = 0; i < n; i++) {
    sum += suppliedHeat[i];
    radiated += A[i] * Math.abs(J[i]);
  }
  const depth = input.depth;
  const Ts = input.surroundingsTemperature;
  return {
    surfaceCount: n,
    radiosity: J,
    irradiation: G,
    temperature: Float64Array.from(T, (t, i) => (input.conditions[i].kind === 'opening' ? (Ts as number) : t)),
    emissivity: eps,
    netFlux: q,
    netHeat,
    exchange,
    surroundingsViewFactor: Fs,
    surroundingsExchange: toSurr,
    surroundingsNetHeat,
    surroundingsTemperature: Ts,
    energyBalance: radiated > 0 ? Math.abs(sum) / radiated : 0,
    reciprocalCondition: s.reciprocalCondition,
    depth,
    netHeatTotal: depth === undefined ? undefined : netHeat.map((v) => v * depth),
    surroundingsNetHeatTotal: depth === undefined ? undefined : surroundingsNetHeat * depth,
    convectionHeat,
    suppliedHeat,
    layerTemperatures: layers,
    coldFaceTemperature: coldFace,
    innerTemperature: inner,
    gasTemperature: input.gasTemperature,
    gasConvectionHeat,
    iterations: s.iterations,
  };
}
