// Documented ranges of the heat-exchange inputs, with the reason for each.
// Beyond a limit a value is refused with a message naming the field, the value
// and the limit; within the limits every result is a finite number. Values that
// are legal but unusual get a warning, not a refusal.

/**
 * Highest temperature, K. Arc furnaces and plasma torches stay below about
 * 6000 K; at 10 000 K, sigma T^4 is 5.7e8 W/m^2, so every product and sum in
 * the exchange (up to 5000 surfaces, lengths to 1e100) stays far from overflow.
 */
export const MAX_TEMPERATURE = 10_000;

/** Above this a temperature is legal but unusual for furnace work (K): warned. */
export const UNUSUAL_TEMPERATURE = 3000;

/**
 * Lowest emissivity. Polished silver and gold are about 0.01 to 0.02 (common
 * practice); the floor keeps (1 - e)/e in the radiosity equations at most 999.
 */
export const MIN_EMISSIVITY = 1e-3;

/** Below this an emissivity is legal but unusual (a polished noble metal): warned. */
export const UNUSUAL_EMISSIVITY = 0.02;

/**
 * Largest |heat flux|, W/m^2: sigma (10 000 K)^4 is about 5.7e8, so no surface
 * within the temperature limit can give off or take up more.
 */
export const MAX_HEAT_FLUX = 1e9;

/** Longest depth, m: 100 km is longer than any duct or furnace, and catches a slip of units. */
export const MAX_DEPTH = 1e5;

/**
 * Largest film or outside coefficient, W/(m^2 K): boiling and condensing reach
 * about 1e5 (common practice); above 1e6 the surface is simply held at the
 * fluid's temperature, which a temperature condition says better.
 */
export const MAX_COEFFICIENT = 1e6;

/** Lengths in properties (layer thickness, tube diameters), m: from 1 micrometre to 100 m. */
export const MIN_PROPERTY_LENGTH = 1e-6;
export const MAX_PROPERTY_LENGTH = 100;

/** Conductivity, W/(m K): from 1e-3 (below any insulation, aerogel is about 0.013) to 1e4 (above diamond, about 2000). */
export const MIN_CONDUCTIVITY = 1e-3;
export const MAX_CONDUCTIVITY = 1e4;
