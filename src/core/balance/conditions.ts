// What lies behind a surface, for the whole surface balance: the conditions of
// the radiation exchange (temperature, heat flux, adiabatic, opening) plus a
// lined wall to outside air, a tube carrying a fluid, and a thin plate whose
// two faces are two surfaces. Units SI: m, K, W/(m K), W/(m^2 K); heat fluxes
// per m^2 of the surface's front (the hot face, the tube's outer surface).
import { emissivePower, STEFAN_BOLTZMANN, type SurfaceCondition } from '../exchange/exchange';

export interface WallLayer {
  /** Thickness, m (> 0). */
  thickness: number;
  /** Conductivity, W/(m K) (> 0), constant: take it at the layer's mean temperature. */
  conductivity: number;
}

/** A plane lining, hot face to casing, then outside air: Incropera et al. (6th ed., sec. 3.1). */
export interface WallCondition {
  kind: 'wall';
  /** Layers from the hot face outwards; at least one. */
  layers: ReadonlyArray<WallLayer>;
  /** Outside air (and, with outsideEmissivity, outside surroundings) temperature, K. */
  outsideTemperature: number;
  /** Outside coefficient, W/(m^2 K): convection and casing radiation combined, or convection only with outsideEmissivity. */
  outsideCoefficient: number;
  /** Casing emissivity to the outside, in (0, 1]; when given the casing also radiates to outsideTemperature. */
  outsideEmissivity?: number;
}

/** A tube carrying a fluid: film and cylindrical wall, both referred to the outer area (Incropera et al., 6th ed., sec. 3.3). */
export interface TubeCondition {
  kind: 'tube';
  /** Fluid temperature, K. */
  fluidTemperature: number;
  /** Inside film coefficient, W/(m^2 K) (> 0). */
  insideCoefficient: number;
  /** Outer and inner diameter, m (0 < inner < outer). */
  outerDiameter: number;
  innerDiameter: number;
  /** Tube wall conductivity, W/(m K) (> 0). */
  wallConductivity: number;
}

/** One face of a thin plate of no resistance: `other` (a surface index) is the plate's other face, linked back. */
export interface LinkedCondition {
  kind: 'linked';
  other: number;
}

/** What lies behind a surface. */
export type BalanceCondition = SurfaceCondition | WallCondition | TubeCondition | LinkedCondition;

/** Resistance of the layers alone, sum t/k, m^2 K/W. */
export function layerResistance(layers: ReadonlyArray<WallLayer>): number {
  let r = 0;
  for (const l of layers) r += l.thickness / l.conductivity;
  return r;
}

/**
 * Tube resistance from the outer surface to the fluid per m^2 of outer area,
 * R''_o = d_o/(d_i h_i) + d_o ln(d_o/d_i)/(2 k_w), m^2 K/W (film plus wall, Incropera et al., 6th ed., sec. 3.3.1).
 */
export function tubeResistance(t: TubeCondition): number {
  return t.outerDiameter / (t.innerDiameter * t.insideCoefficient) + tubeWallResistance(t);
}

/** The tube wall's share of R''_o, d_o ln(d_o/d_i)/(2 k_w), m^2 K/W. */
export function tubeWallResistance(t: TubeCondition): number {
  return (t.outerDiameter * Math.log(t.outerDiameter / t.innerDiameter)) / (2 * t.wallConductivity);
}

/** Heat through a wall at hot-face temperature T: flux q'' (W/m^2, > 0 outwards), its derivative dq''/dT (W/(m^2 K)) and the casing temperature (K). */
export interface WallFlux {
  flux: number;
  slope: number;
  casingTemperature: number;
}

/**
 * The heat a wall loses per m^2 of hot face at hot-face temperature T (K).
 * Without outsideEmissivity, q'' = (T - T_out)/(sum t/k + 1/h). With it, the
 * casing temperature T_c solves (T - T_c)/R = h (T_c - T_out) + e sigma (T_c^4 - T_out^4),
 * one increasing equation, by Newton safeguarded with bisection inside [min, max] of T and T_out.
 */
export function wallFlux(w: WallCondition, T: number): WallFlux {
  const R = layerResistance(w.layers);
  const h = w.outsideCoefficient;
  const To = w.outsideTemperature;
  const e = w.outsideEmissivity;
  if (e === undefined) {
    const flux = (T - To) / (R + 1 / h);
    return { flux, slope: 1 / (R + 1 / h), casingTemperature: T - flux * R };
  }
  const Eo = emissivePower(To);
  // f(Tc) = (T - Tc)/R - h (Tc - To) - e sigma (Tc^4 - To^4): decreasing in Tc, root between T and To.
  let lo = Math.min(T, To);
  let hi = Math.max(T, To);
  let Tc = To + (T - To) / (1 + h * R); // the root without casing radiation: inside the bracket
  for (let k = 0; k < 200; k++) {
    const f = (T - Tc) / R - h * (Tc - To) - e * (emissivePower(Tc) - Eo);
    if (f > 0) lo = Tc;
    else hi = Tc;
    const df = -1 / R - h - 4 * e * STEFAN_BOLTZMANN * Tc ** 3;
    let next = Tc - f / df;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - Tc) <= 1e-15 * Tc || hi - lo <= 1e-15 * hi) {
      Tc = next;
      break;
    }
    Tc = next;
  }
  const g = h + 4 * e * STEFAN_BOLTZMANN * Tc ** 3; // outside conductance at the casing, W/(m^2 K)
  return { flux: (T - Tc) / R, slope: g / (1 + g * R), casingTemperature: Tc };
}

/**
 * Temperatures through a wall, K, from the hot face (T) through each
 * interface to the cold face, for the flux q'' (W/m^2) that crosses it:
 * T_{k+1} = T_k - q'' t_k / k_k (plane wall, constant conductivity).
 */
export function layerTemperatures(w: WallCondition, T: number, flux: number): Float64Array {
  const out = new Float64Array(w.layers.length + 1);
  out[0] = T;
  for (let k = 0; k < w.layers.length; k++) {
    out[k + 1] = out[k] - (flux * w.layers[k].thickness) / w.layers[k].conductivity;
  }
  return out;
}

/** Heat supplied from behind at temperature T (W/m) and its derivative in T (W/(m K)). */
export function backHeat(c: BalanceCondition, T: number, area: number): { heat: number; slope: number } {
  switch (c.kind) {
    case 'heatFlux':
      return { heat: area * c.heatFlux, slope: 0 };
    case 'wall': {
      const w = wallFlux(c, T);
      return { heat: -area * w.flux, slope: -area * w.slope };
    }
    case 'tube': {
      const R = tubeResistance(c);
      return { heat: (-area * (T - c.fluidTemperature)) / R, slope: -area / R };
    }
    default:
      return { heat: 0, slope: 0 };
  }
}
