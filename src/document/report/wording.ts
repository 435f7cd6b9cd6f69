// The report's fixed sentences: the method with its references, and the caution.
import { RESULTS_CAUTION } from '../exchange/cautions';

/** The method in two sentences. */
export const METHOD_TEXT = [
  'View factors between the named surfaces of a long (two-dimensional) cross-section are computed exactly: ' +
    "every edge pair is integrated along the edge over the directions in which it is seen, which is Hottel's " +
    'crossed-strings method where nothing blocks the view and its exact generalisation where bodies or walls do.',
  'Heat exchange follows the gray-diffuse net-radiation (radiosity) method: one radiosity per surface, solved from ' +
    'the emissivities and the temperature or heat-flux conditions, with the surroundings of an open sketch taken ' +
    'as a black surface at the surroundings temperature.',
];

/**
 * Above this many surfaces the report leaves out the two n x n matrices (they would
 * run to many pages and megabytes) and says so, naming the commands that give them.
 */
export const MAX_MATRIX_SURFACES = 60;

/** Said in place of a matrix left out. */
export function matrixLeftOut(what: string, n: number, command: string): string {
  return `The ${what} has ${n} × ${n} entries; the report lists matrices up to ${MAX_MATRIX_SURFACES} surfaces. Get it with ${command}.`;
}

export const REFERENCES = [
  'H. C. Hottel and A. F. Sarofim, Radiative Transfer, McGraw-Hill, 1967 (crossed strings).',
  'M. F. Modest, Radiative Heat Transfer, 3rd ed., Academic Press, 2013, ch. 4 (view factors).',
  'F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007, ch. 13 (radiation exchange between surfaces).',
];

export const REPORT_CAUTION = `${RESULTS_CAUTION} Hot equipment can burn people and start fires; have these results checked before they are used for design or safety decisions.`;

/** Sign and unit conventions under the heat tables. */
export const SIGN_NOTE =
  "Net heat > 0: the surface gives off more radiation than it absorbs; < 0: it takes heat up. Supplied = net heat + convection: the heat from behind. q'_ij is the net heat from the row's surface to the column's.";
