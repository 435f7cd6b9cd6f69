// Grouping, renaming and splitting named surfaces. Surface properties
// (doc.surfaces) follow their name and are dropped when no edge uses it.
import { setOwn } from '../../document/ownRecord';
import { surfaceNameSchema } from '../../document/schema';
import type { Point, SketchFile, SurfaceProps } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';
import { compactSurface, uniqueName, usedSurfaceNames } from './surfaceNames';

export interface EdgeRef {
  shape: number;
  index: number;
}

/** Own properties only: a surface named "toString" must not find Object.prototype's. */
function own(props: Record<string, SurfaceProps>, name: string): SurfaceProps | undefined {
  return Object.hasOwn(props, name) ? props[name] : undefined;
}

function relabel(doc: SketchFile, nameOf: (shape: number, edge: number, old: string) => string): SketchFile {
  const shapes = doc.shapes.map((shape, s) => {
    const old = edgeNames(shape);
    const next = old.map((n, k) => nameOf(s, k, n));
    if (next.every((n, k) => n === old[k])) return shape;
    // A circle keeps one name per arc: its arcs are equal parts, so their number must not change.
    return { ...shape, surface: shape.circle && next.length > 1 ? next : compactSurface(next) };
  });
  return { ...doc, shapes };
}

function pruneProps(doc: SketchFile, props: Record<string, SurfaceProps> | undefined): SketchFile {
  if (!props) return doc;
  const used = usedSurfaceNames(doc);
  const kept = Object.fromEntries(Object.entries(props).filter(([n]) => used.has(n)));
  const { surfaces: _old, ...rest } = doc;
  return Object.keys(kept).length ? { ...rest, surfaces: kept } : rest;
}

/** Give the chosen edges one surface name (a new or an existing one). */
export function groupEdges(doc: SketchFile, edges: readonly EdgeRef[], name: string): SketchFile {
  const target = name.trim();
  if (!target || edges.length === 0) return doc;
  const chosen = new Set(edges.map((e) => `${e.shape}:${e.index}`));
  const firstOld = edgeNames(doc.shapes[edges[0].shape])[edges[0].index];
  const props = { ...(doc.surfaces ?? {}) };
  // A brand-new name inherits the properties of the first edge's old surface.
  const inherited = firstOld !== undefined ? own(props, firstOld) : undefined;
  if (!own(props, target) && inherited) setOwn(props, target, { ...inherited });
  const next = relabel(doc, (s, k, old) => (chosen.has(`${s}:${k}`) ? target : old));
  return pruneProps(next, Object.keys(props).length ? props : doc.surfaces);
}

/** Why a typed surface name cannot be used (the file's own rule: not empty, not too long), or null. */
export function surfaceNameProblem(name: string): string | null {
  const r = surfaceNameSchema.safeParse(name);
  return r.success ? null : `the name ${r.error.issues[0]?.message ?? 'is not allowed'}`;
}

/** Rename a surface everywhere; renaming onto an existing name merges the two. */
export function renameSurface(doc: SketchFile, from: string, to: string): SketchFile {
  const target = to.trim();
  if (!target || target === from) return doc;
  const props = { ...(doc.surfaces ?? {}) };
  const moving = own(props, from);
  if (moving && !own(props, target)) setOwn(props, target, moving);
  delete props[from];
  const next = relabel(doc, (_s, _k, old) => (old === from ? target : old));
  return pruneProps(next, doc.surfaces ? props : undefined);
}

/** Give each edge of a surface its own name again ("roof 1", "roof 2", ...), copying its properties. */
export function splitSurface(doc: SketchFile, name: string): SketchFile {
  const taken = usedSurfaceNames(doc);
  taken.delete(name);
  const props = { ...(doc.surfaces ?? {}) };
  const original = own(props, name);
  let count = 0;
  const next = relabel(doc, (_s, _k, old) => {
    if (old !== name) return old;
    const fresh = uniqueName(`${name} ${++count}`, taken);
    taken.add(fresh);
    if (original) setOwn(props, fresh, { ...original });
    return fresh;
  });
  if (count < 2) return doc;
  delete props[name];
  return pruneProps(next, doc.surfaces ? props : undefined);
}

/**
 * Cut every edge of a surface into `parts` equal edges (new points on the
 * edges; a circle into `parts` times as many equal arcs, anticlockwise from +x)
 * and name each piece "name 1", "name 2"... along the shape, copying the
 * properties: a wall whose flux varies along it becomes a profile. parts = 1
 * gives each existing edge its own name (as splitSurface). Null when parts is
 * not a whole number from 1 to 1000.
 */
export function splitSurfaceParts(doc: SketchFile, name: string, parts: number): SketchFile | null {
  if (!Number.isInteger(parts) || parts < 1 || parts > 1000) return null;
  if (parts === 1) return splitSurface(doc, name);
  const shapes = doc.shapes.map((shape) => {
    const names = edgeNames(shape);
    if (!names.includes(name)) return shape;
    // A circle: every arc is cut into `parts` (arcs must stay equal); the others keep their names.
    if (shape.circle) return { ...shape, surface: names.flatMap((n) => new Array<string>(parts).fill(n)) };
    const points: Point[] = [];
    const surface: string[] = [];
    shape.points.forEach((a, k) => {
      points.push(a);
      surface.push(names[k]);
      if (names[k] !== name) return;
      const b = shape.points[(k + 1) % shape.points.length];
      for (let i = 1; i < parts; i++) {
        const t = i / parts;
        // 15 digits: a third of 2.4 reads 0.8, not 0.7999999999999999.
        points.push([
          Number((a[0] + (b[0] - a[0]) * t).toPrecision(15)),
          Number((a[1] + (b[1] - a[1]) * t).toPrecision(15)),
        ]);
        surface.push(name);
      }
    });
    return { ...shape, points, surface };
  });
  return splitSurface({ ...doc, shapes }, name);
}

/** Join several surfaces into the first one's name; the others' properties are dropped. */
export function joinSurfaces(doc: SketchFile, names: readonly string[]): SketchFile {
  if (names.length < 2) return doc;
  const [target, ...rest] = names;
  const others = new Set(rest.filter((n) => n !== target));
  const props = doc.surfaces ? { ...doc.surfaces } : undefined;
  if (props) for (const n of others) delete props[n];
  const next = relabel(doc, (_s, _k, old) => (others.has(old) ? target : old));
  return pruneProps(next, props);
}
