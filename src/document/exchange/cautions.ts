// The cautions that go with surface-balance results, the same words in the
// command line and the app: a hot casing is a burn hazard; the gas is
// transparent; walls and tubes rest on simple models.

/** The caution that goes with every result, in the app, the command line and reports. */
export const RESULTS_CAUTION =
  'Gray-diffuse radiation, with convection to a transparent gas and conduction through linings and tube walls only where you give them; no absorbing gas. Results support, and do not replace, local codes and licensed engineering practice.';

/** Cold faces above this are a burn hazard on touch, K (60 °C, as published touch-temperature guides for hot surfaces use, e.g. ASTM C1055, ISO 13732-1). */
export const BURN_TEMPERATURE = 333.15;

/** The published guides the burn warning cites. */
export const BURN_GUIDES = 'ASTM C1055, ISO 13732-1';

/** Why a wall's cold face (K) warrants a burn warning, or null when it is at most BURN_TEMPERATURE. */
export function burnWarning(name: string, coldFaceKelvin: number): string | null {
  if (!(coldFaceKelvin > BURN_TEMPERATURE)) return null;
  const celsius = (coldFaceKelvin - 273.15).toFixed(0);
  return `burn hazard: the casing of '${name}' is at ${celsius} °C, above 60 °C (touch-temperature guides for hot surfaces: ${BURN_GUIDES}); guard or insulate it`;
}

/** Shown whenever the sketch sets a gas temperature. */
export const GAS_CAUTION =
  'The gas is treated as transparent: it exchanges heat with the surfaces by convection only (its own radiation is not modelled), and openings carry no gas flow.';

/** Shown whenever a wall or a tube is modelled. */
export const WALL_TUBE_CAUTION =
  'Walls are plane linings with constant conductivities (take each at its layer mean temperature); without outsideEmissivity the outside coefficient combines convection and casing radiation and must suit the casing temperature found. Tubes: film and wall referred to the outer area, no conduction around the tube. Interface and metal temperatures are shown, not judged: your code and materials set the limits.';
