// Limits of a tube row.

/** Most tubes one row may hold: a row is one line of tubes in one section, and each tube adds at least one edge. */
export const MAX_ROW_TUBES = 500;
