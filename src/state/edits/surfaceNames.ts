import type { Shape, SketchFile } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';

export function usedSurfaceNames(doc: SketchFile): Set<string> {
  const used = new Set<string>();
  for (const s of doc.shapes) for (const n of edgeNames(s)) used.add(n);
  return used;
}

/** base, or base (2), base (3)... whichever is not yet taken. */
export function uniqueName(base: string, taken: Set<string>): string {
  if (!taken.has(base)) return base;
  for (let i = 2; ; i++) if (!taken.has(`${base} (${i})`)) return `${base} (${i})`;
}

/** Default names for a new shape: every edge its own surface ("wall 3", "body 2 edge 1"). */
export function autoEdgeNames(doc: SketchFile, kind: Shape['kind'], shapeIndex: number, n: number): string[] {
  const taken = usedSurfaceNames(doc);
  const bodies = doc.shapes.slice(0, shapeIndex).filter((s) => s.kind === 'solid').length;
  const stem = kind === 'enclosure' ? 'wall' : `body ${bodies + 1} edge`;
  const names: string[] = [];
  for (let k = 1; k <= n; k++) {
    const name = uniqueName(`${stem} ${k}`, taken);
    taken.add(name);
    names.push(name);
  }
  return names;
}

/** Store one string when every edge shares the name, else one name per edge. */
export function compactSurface(names: string[]): Shape['surface'] {
  return names.every((n) => n === names[0]) ? names[0] : names;
}
