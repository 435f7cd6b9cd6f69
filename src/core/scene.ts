// Plain-data input of the view-factor core. Lengths are in the sketch's own
// units (m, mm, ...); view factors are dimensionless, so the core never converts.

/** One closed polygon of the cross-section. */
export interface PolygonInput {
  /** 'enclosure' radiates to its inside, 'solid' to its outside. */
  kind: 'enclosure' | 'solid';
  /** Vertices as flat [x0, y0, x1, y1, ...], either winding. Edge k runs from point k to k+1; the last edge closes the polygon. */
  points: ArrayLike<number>;
}

export interface SceneInput {
  polygons: PolygonInput[];
  /** Surface index of every edge, edges numbered polygon by polygon in input order. */
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
