// An arc of a solid circle as a member of the line sweep (lineSweep.ts): along a line
// that crosses the circle, what the arc sends or receives is where the line first meets
// the circle from the partner's side, so the arc's interval at angle θ is the part of
// it facing the partner (the half of the circle whose outward normal points against the
// line's direction of travel there) projected on the normal. For an arc under half a
// turn that part is empty, the whole arc, or the arc from one end to the half's edge,
// a tangent point; it changes only where an end of the arc is such a tangent point, so
// the sweep is cut there and each part has fixed interval ends: an end point of the
// arc (x, y, 0) or a tangent (cx, cy, +-r). Sketch units; angles in radians.

/** Is angle a (radians) on the arc from `start` over `span` anticlockwise? */
function onArc(a: number, start: number, span: number): boolean {
  const turn = 2 * Math.PI;
  const u = (((a - start) % turn) + turn) % turn;
  return u <= span;
}

/**
 * The first angle in (from, to) at which an end of the arc (start, start + span) is a
 * tangent point of the lines at that angle (the end's radius along the normal), or `to`.
 */
export function nextArcSwitch(start: number, span: number, from: number, to: number): number {
  let cut = to;
  for (const a of [start, start + span]) {
    let t = a + Math.PI * Math.ceil((from - a) / Math.PI);
    if (t <= from) t += Math.PI;
    if (t < cut) cut = t;
  }
  return cut;
}

/**
 * The interval ends of the arc (centre cx, cy about the sweep's origin, radius r,
 * start, span < pi) for lines at angle t travelling along (dx, dy) when they reach it,
 * written as x, y, s into out[0..5] (two ends). False when no part of the arc faces
 * that way.
 */
export function arcEnds(
  cx: number,
  cy: number,
  r: number,
  start: number,
  span: number,
  t: number,
  dx: number,
  dy: number,
  out: Float64Array,
): boolean {
  const c0 = Math.cos(start),
    s0 = Math.sin(start),
    c1 = Math.cos(start + span),
    s1 = Math.sin(start + span);
  const front0 = c0 * dx + s0 * dy < 0,
    front1 = c1 * dx + s1 * dy < 0;
  if (!front0 && !front1) return false;
  // The edge of the facing half inside the arc: the tangent point at +n or at -n.
  const plus = onArc(t, start, span);
  const put = (k: number, front: boolean, c: number, s: number) => {
    out[3 * k] = front ? cx + r * c : cx;
    out[3 * k + 1] = front ? cy + r * s : cy;
    out[3 * k + 2] = front ? 0 : plus ? r : -r;
  };
  put(0, front0, c0, s0);
  put(1, front1, c1, s1);
  return true;
}
