// Documented limits of a sketch. Numbers beyond them are refused with a
// message rather than computed badly (or slowly enough to freeze a tab).

/**
 * Most edges in one sketch. The work grows with edges^2 pairs; memory does not:
 * past 5000 edges (a 200 MB edge matrix) the view factors are summed straight to
 * surfaces (core surfaceRows.ts), and a 20,000-edge sketch with 300 surfaces
 * peaks well under 1 GB (test/bench/pool.ts, `npm run bench -- --scale`).
 */
export const MAX_EDGES = 20_000;

/**
 * Most surfaces in one sketch: the surface factors and the heat exchange hold
 * surfaces^2 numbers (5000 surfaces: 200 MB of doubles each) and the exchange
 * solves a dense system of that size.
 */
export const MAX_SURFACES = 5000;

/**
 * Largest |coordinate|, in file units. Squares and products of coordinate
 * differences (lengths, orientation tests) must stay far from overflow,
 * including the error terms of the exact predicates.
 */
export const MAX_COORDINATE = 1e100;

/** Shortest edge, in file units: keeps squared lengths and predicate error terms far from underflow. */
export const MIN_EDGE_LENGTH = 1e-100;

/**
 * Shortest edge relative to the size of its coordinates (2^-40, about 1e-12):
 * shorter edges sit within a few thousand rounding steps of their own
 * coordinates, so their direction and length are mostly rounding.
 */
export const MIN_RELATIVE_EDGE_LENGTH = 2 ** -40;

/**
 * Shortest edge (or arc) relative to the whole sketch's size (2^-26, about 1.5e-8):
 * the core's computed points carry a rounding of about 1e-16 of the size, so a
 * shorter edge's factors could be off by more than 1e-9 (sketchSize.ts).
 */
export const MIN_SIZE_FRACTION = 2 ** -26;

/**
 * Longest sketch file, in characters (20 MB of ASCII text). A sketch at the edge
 * limit takes well under 1 MB; the limit is checked before the text is parsed,
 * so a huge or runaway file is turned away at once instead of filling memory.
 */
export const MAX_FILE_CHARS = 20_000_000;

/**
 * Deepest nesting of lists and objects in a sketch file. A sketch needs 4
 * (sketch, shapes, shape, points, point); deeper text is not a sketch, and
 * refusing it up front keeps every later step (messages, warnings) shallow.
 */
export const MAX_JSON_DEPTH = 32;

/** Longest surface name, in characters. */
export const MAX_NAME_LENGTH = 200;

/** Most messages returned for one file (the last says how many more); fix the first ones first. */
export const MAX_MESSAGES = 5;
