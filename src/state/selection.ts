// What the user has picked on the canvas. Indices refer to the document's
// shapes and their points/edges; they are view state, never saved.
export type Pick =
  | { type: 'vertex'; shape: number; index: number }
  | { type: 'edge'; shape: number; index: number }
  | { type: 'shape'; shape: number };

export function pickKey(p: Pick): string {
  return p.type === 'shape' ? `s${p.shape}` : `${p.type[0]}${p.shape}:${p.index}`;
}

export function samePick(a: Pick, b: Pick): boolean {
  return pickKey(a) === pickKey(b);
}

/** Shift-click toggles a pick in or out; a plain click replaces the selection. */
export function togglePick(selection: readonly Pick[], pick: Pick, additive: boolean): Pick[] {
  if (!additive) return [pick];
  const has = selection.some((s) => samePick(s, pick));
  return has ? selection.filter((s) => !samePick(s, pick)) : [...selection, pick];
}

/** Drop picks that no longer exist (after undo, redo or a delete). */
export function validPicks(shapes: readonly { points: readonly unknown[] }[], selection: readonly Pick[]): Pick[] {
  return selection.filter((p) => {
    const s = shapes[p.shape];
    return s !== undefined && (p.type === 'shape' || p.index < s.points.length);
  });
}
