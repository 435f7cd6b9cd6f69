// Plain-data input of the view-factor core. Lengths are in the sketch's own
// units (m, mm, ...); view factors are dimensionless, so the core never converts.

/** One closed polygon of the cross-section. */
export interface PolygonInput {
  /** 'enclosure' radiates to its inside, 'solid' to its outside. */
  kind: 'enclosure' | 'solid';
  /** Vertices as flat [x0, y0, x1, y1, ...], either winding. Edge k runs from point k to k+1; the last edge closes the polygon. */
  points: ArrayLike<number>;
}

/**
 * One exact circle of the cross-section, split into `arcs` equal arcs running
 * anticlockwise from the +x direction about the centre (arc k spans angles
 * [2 pi k / arcs, 2 pi (k+1) / arcs], radians).
 */
export interface CircleInput {
  /** 'enclosure' radiates to its inside (a cylindrical shell), 'solid' to its outside (a tube). */
  kind: 'enclosure' | 'solid';
  cx: number;
  cy: number;
  /** Radius, sketch units, > 0. */
  radius: number;
  /** Number of equal arcs (each its own edge), >= 1. */
  arcs: number;
}

export interface SceneInput {
  polygons: PolygonInput[];
  /** Exact circles; their arcs are numbered after every polygon edge, circle by circle. */
  circles?: CircleInput[];
  /** Surface index of every edge (polygon edges polygon by polygon in input order, then the arcs). */
  edgeSurface: ArrayLike<number>;
  /** Number of surfaces; surface indices run 0..surfaceCount-1. */
  surfaceCount: number;
}

export interface ViewFactorResult {
  edgeCount: number;
  surfaceCount: number;
  /** Edge lengths (area per unit depth), sketch units. */
  edgeLength: Float64Array;
  /** Surface lengths (sum of their edges), sketch units. */
  surfaceLength: Float64Array;
  /** Surface view factors, row-major surfaceCount x surfaceCount; row = from, column = to. */
  F: Float64Array;
  /** 1 - sum_j F_ij per surface row (in an open sketch: the factor to the surroundings). */
  rowSumResidual: Float64Array;
  /** max over pairs |L_I F_IJ - L_J F_JI| / max(L_I F_IJ, L_J F_JI); 0 when no pair sees another. */
  reciprocityResidual: number;
  /** True when the sketch has an enclosure, so every row should sum to one. */
  closed: boolean;
}
