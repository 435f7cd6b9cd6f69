// Surface ids and order, computed in one place for the command line, the
// results pipeline and the canvas: surfaces are numbered by first appearance
// along the edges (shape by shape, edge by edge).

/** What the index needs of a shape: a name for all edges, or one per edge. */
export interface NamedShape {
  points: readonly unknown[];
  surface: string | readonly string[];
  /** An exact circle has one edge (arc) per surface name and no points. */
  circle?: unknown;
}

export interface SurfaceIndex {
  /** names[i] is surface i's name. */
  names: readonly string[];
  /** Surface id of every edge, edges numbered shape by shape. */
  edgeSurface: Int32Array;
  /** Name to surface id. */
  order: ReadonlyMap<string, number>;
}

/** The surface name of each edge of a shape; a list shorter than the edges names the rest "edge k". */
export function edgeSurfaceNames(shape: NamedShape): string[] {
  const s = shape.surface;
  if (shape.circle !== undefined) return typeof s === 'string' ? [s] : [...s];
  const n = shape.points.length;
  if (typeof s === 'string') return new Array<string>(n).fill(s);
  return shape.points.map((_, k) => s[k] ?? `edge ${k + 1}`);
}

/** Number the surfaces of a sketch's shapes (see the file's header for the order). */
export function surfaceIndex(shapes: readonly NamedShape[]): SurfaceIndex {
  const order = new Map<string, number>();
  const edgeSurface: number[] = [];
  // Edges in the core's order: every polygon's edges first, then the circles' arcs.
  const ordered = [...shapes.filter((s) => s.circle === undefined), ...shapes.filter((s) => s.circle !== undefined)];
  for (const shape of ordered) {
    for (const name of edgeSurfaceNames(shape)) {
      let id = order.get(name);
      if (id === undefined) order.set(name, (id = order.size));
      edgeSurface.push(id);
    }
  }
  return { names: [...order.keys()], edgeSurface: Int32Array.from(edgeSurface), order };
}

/** True when two indexes name the same surfaces for the same edges. */
export function sameSurfaceIndex(a: SurfaceIndex, b: SurfaceIndex): boolean {
  if (a === b) return true;
  if (a.names.length !== b.names.length || a.edgeSurface.length !== b.edgeSurface.length) return false;
  for (let i = 0; i < a.names.length; i++) if (a.names[i] !== b.names[i]) return false;
  for (let i = 0; i < a.edgeSurface.length; i++) if (a.edgeSurface[i] !== b.edgeSurface[i]) return false;
  return true;
}
