import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { BodyClipper } from './bodyClip';
import type { EdgeGroups } from './edgeGroups';
import { GroupCull } from './groupCull';
import type { ObstaclePieces } from './obstaclePieces';
import { PairCandidates } from './pairCandidates';
import type { ViewRegion } from './viewRegion';

// Which edges can block the view of an edge pair: every edge that enters the interior
// of the view region H, clipped to H (bodyClip.ts). Obstacles that blocked earlier
// pairs of the same edges are tried first; then bodies and walls of re-entrant pockets
// come from the lists shared by the pairs of two groups of edges (pairCandidates.ts).

export class ObstacleGatherer {
  private readonly clip: BodyClipper;
  private readonly candidates: PairCandidates;
  private readonly cull: GroupCull;
  private readonly visitWall: (id: number) => boolean;
  private readonly visitBody: (id: number) => boolean;
  /**
   * Per edge, the obstacle that last blocked a pair of it (a body b as b, a wall edge e
   * as -2 - e, none as -1): tried first, so that a pair it blocks ends before any
   * search. Only a hint: a blocked pair returns 0 whichever obstacle shows it; for any
   * other pair a probed obstacle keeps the very pieces the search would have made, and
   * the pieces are read in edge order, so no result depends on what came before.
   */
  private readonly hint: Int32Array;
  /** The one before (a pair is often blocked by one of two neighbours). */
  private readonly hint2: Int32Array;
  /** Per edge group, the body that last blocked a pair of one of its edges (-1: none). */
  private readonly groupHider: Int32Array;
  /** Bodies probed for the current pair (-1: none), one slot per hint tried. */
  private readonly probed = new Int32Array(4);

  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly region: ViewRegion,
    private readonly pieces: ObstaclePieces,
    private readonly groups: EdgeGroups,
  ) {
    this.clip = new BodyClipper(e, ob, region, pieces);
    this.candidates = new PairCandidates(e, ob, region.extent, groups);
    this.cull = new GroupCull(e, ob, groups, region.extent);
    this.hint = new Int32Array(e.count).fill(-1);
    this.hint2 = new Int32Array(e.count).fill(-1);
    this.groupHider = new Int32Array(groups.r.length).fill(-1);
    this.visitWall = (id: number) => {
      const edge = this.ob.wallEdges[id];
      if (!this.pieces.has(edge)) this.clip.clipEdge(edge); // kept already by a probe
      return false;
    };
    this.visitBody = (id: number) => {
      if (!this.wasProbed(id)) this.clip.placeLater(id);
      return this.clip.blocked; // one body blocks it all: stop the search
    };
  }

  /**
   * Can nothing block edges i and j? True when the lists shared by the row edge and the
   * other edge's group hold no possible obstacle: every sight line is then clear, and
   * the pair needs no region, hints or pieces. The lists are made here when neither
   * edge remembers an obstacle; otherwise only lists made already are read (a
   * remembered obstacle often ends the pair before any list is needed).
   */
  nothingBetween(i: number, j: number): boolean {
    const lists = this.candidates;
    if (lists.nothingBetween(i, j)) return true;
    // Lists not made yet, and no obstacle remembered by either edge: make them now
    // (the gather would), so the first pair of the group can be clear too.
    if (this.hint[i] !== -1 || this.hint[j] !== -1 || lists.made(i, j)) return false;
    lists.find(i, j);
    return lists.nothingBetween(i, j);
  }

  /**
   * Does polygon edge i surely exchange nothing with every edge of polygon edge j's
   * group (groupCull.ts)? Then the rows can leave those pairs out: each would be 0.
   */
  silentGroup(i: number, j: number): boolean {
    const b = this.groups.groupOf[j];
    if (this.cull.behind(i, b)) return true;
    // The bodies that blocked i's latest pairs, and b's latest, are the likely hiders.
    const cull = this.cull,
      h1 = this.hint[i],
      h2 = this.hint2[i],
      h3 = this.groupHider[b];
    if (cull.hides(i, b, h1) || (h2 !== h1 && cull.hides(i, b, h2))) return true;
    if (h3 === h1 || h3 === h2 || !cull.hides(i, b, h3)) return false;
    this.hint2[i] = h1;
    this.hint[i] = h3;
    return true;
  }

  /**
   * Append to `out` (from `count` on) the polygon edges j > i that may exchange with
   * polygon edge i, ascending: whole groups that are surely silent (silentGroup),
   * edges that surely do not face i, and edges one body of the pair's lists hides from
   * all of i (shadowCull) are left out. Returns the new count.
   */
  liveColumns(i: number, out: Int32Array, count: number): number {
    const n = this.e.count,
      groupEnd = this.groups.groupEnd;
    let c = count;
    for (let j = i + 1; j < n;) {
      const end = groupEnd[j];
      if (!this.silentGroup(i, j)) {
        const from = c;
        c = this.cull.facingIn(i, j, end, out, c);
        if (c > from) c = this.shadowCull(i, j, out, from, c);
      }
      j = end;
    }
    return c;
  }

  /**
   * Leave out of out[from, to) (edges of j's group) those that one body of the lists
   * shared by i and that group hides from all of i. The lists hold every body that may
   * enter a view region of i with the group; making them here costs little, since the
   * pairs left would make them anyway. Returns the new end.
   */
  private shadowCull(i: number, j: number, out: Int32Array, from: number, to: number): number {
    const lists = this.candidates;
    lists.find(i, j);
    const ownI = this.ob.bodyOfPolygon[this.e.polygon[i]],
      ownJ = this.ob.bodyOfPolygon[this.e.polygon[j]];
    const bodies = lists.bodies;
    let c = to;
    for (let k = lists.bodyStart; k < lists.bodyEnd && c > from; k++) {
      const h = bodies[k];
      if (h !== ownI && h !== ownJ) c = this.cull.shadowFilter(i, h, out, from, c);
    }
    return c;
  }

  /**
   * Fill `pieces` with the obstructions of edges i and j inside the region (set for
   * this pair). Returns true when one body, or one chain of edges from one side string
   * to the other, blocks every sight line: the pair then exchanges nothing, and the
   * pieces are incomplete.
   */
  gather(i: number, j: number): boolean {
    const clip = this.clip;
    clip.begin(i, j);
    const hi = this.hint[i],
      hj = this.hint[j],
      hi2 = this.hint2[i],
      hj2 = this.hint2[j];
    this.pieces.begin();
    const probed = this.probed; // four stores: a call to fill costs more than the work
    probed[0] = probed[1] = probed[2] = probed[3] = -1;
    // Hinted bodies whose disc blocks the pair end it before anything is clipped.
    // (A hint repeated is tried once.)
    if (
      this.discBlocks(i, j, hi) ||
      (hj !== hi && this.discBlocks(i, j, hj)) ||
      (hi2 !== hi && hi2 !== hj && this.discBlocks(i, j, hi2)) ||
      (hj2 !== hi && hj2 !== hj && hj2 !== hi2 && this.discBlocks(i, j, hj2))
    )
      return true;
    this.region.measure(); // the side lengths and margins, for everything below
    // Lists made already with every body surely outside H: nothing can block (the
    // pieces stay empty), no hint need be probed.
    if (this.listedOutside(i, j)) return false;
    // Probed obstacles keep their pieces; the searches below skip them.
    if (this.probe(hi, 0) || (hj !== hi && this.probe(hj, 1))) return true;
    if (hi2 !== hi && hi2 !== hj && this.probe(hi2, 2)) return true;
    if (hj2 !== hi && hj2 !== hj && hj2 !== hi2 && this.probe(hj2, 3)) return true;
    // Bodies are placed first and clipped after, so a pair that one body blocks
    // clips none in vain, and one whose chain blocks stops at that body.
    const lists = this.candidates;
    lists.find(i, j);
    const bodies = lists.bodies;
    for (let k = lists.bodyStart; k < lists.bodyEnd; k++) if (this.visitBody(bodies[k])) break;
    if (clip.blocked) {
      this.remember(i, j, clip.blocker);
      return true;
    }
    const nextEdge = this.e.nextEdge;
    for (let d = 0; d < clip.deferredCount; d++) {
      const from = this.pieces.count;
      clip.clipDeferred(d);
      const chain = this.pieces.blockingChain(nextEdge, from);
      if (chain >= 0) return this.blockedByChain(i, j, chain);
    }
    const walls = lists.walls;
    for (let k = lists.wallStart; k < lists.wallEnd; k++) this.visitWall(walls[k]);
    const chain = this.pieces.blockingChain(nextEdge, 0);
    if (chain >= 0) return this.blockedByChain(i, j, chain);
    this.pieces.sortByEdge();
    return false;
  }

  /** Are the pair's lists made, with no wall edge, and every listed body surely outside H? */
  private listedOutside(i: number, j: number): boolean {
    const lists = this.candidates;
    if (!lists.madeWithoutWalls(i, j)) return false;
    lists.find(i, j);
    const bodies = lists.bodies;
    for (let k = lists.bodyStart; k < lists.bodyEnd; k++) if (!this.clip.surelyOutside(bodies[k])) return false;
    return true;
  }

  /** Remember the obstacle of the blocking chain that starts at piece `chain`; true. */
  private blockedByChain(i: number, j: number, chain: number): boolean {
    const edge = this.pieces.edge[chain];
    const body = this.ob.bodyOfPolygon[this.e.polygon[edge]];
    this.remember(i, j, body >= 0 ? body : -2 - edge);
    return true;
  }

  /** Make obstacle h the first hint of edges i and j, the previous first hint the second. */
  private remember(i: number, j: number, h: number): void {
    if (h >= 0) {
      const G = this.groups.groupOf;
      this.groupHider[G[i]] = h;
      this.groupHider[G[j]] = h;
    }
    if (this.hint[i] !== h) {
      this.hint2[i] = this.hint[i];
      this.hint[i] = h;
    }
    if (this.hint[j] !== h) {
      this.hint2[j] = this.hint[j];
      this.hint[j] = h;
    }
  }

  /**
   * Does obstacle h (a hint: body, wall edge or none, as in `hint`) block every sight
   * line of the pair by itself? A body is clipped whole; a wall edge with the run of
   * wall edges joined to it inside H. The pieces stay: they are part of the gather.
   */
  private probe(h: number, slot: number): boolean {
    if (h === -1) return false;
    if (h >= 0) {
      this.probed[slot] = h;
      this.clip.clipBody(h);
    } else {
      this.clipWallRun(-2 - h);
    }
    return this.clip.blocked || this.pieces.blockingChain(this.e.nextEdge) >= 0;
  }

  /** Does hinted body h (when it is a body) block the pair by its disc alone? Then remember it. */
  private discBlocks(i: number, j: number, h: number): boolean {
    if (h < 0 || !this.clip.cutsView(h)) return false;
    this.remember(i, j, h);
    return true;
  }

  /** Was body b probed for this pair (its pieces kept already)? */
  private wasProbed(b: number): boolean {
    const p = this.probed;
    return p[0] === b || p[1] === b || p[2] === b || p[3] === b;
  }

  /** Clip wall edge `edge` and the wall edges joined to it by corners inside H, both ways. */
  private clipWallRun(edge: number): void {
    const E = this.e,
      P = this.pieces,
      clip = this.clip;
    clip.clipEdge(edge);
    if (!P.has(edge)) return;
    const limit = E.polygonStart[E.polygon[edge] + 1] - E.polygonStart[E.polygon[edge]];
    let cur = edge;
    for (let steps = 0; steps < limit && P.endInside[P.pieceOf(cur)]; steps++) {
      const next = E.nextEdge[cur];
      if (P.has(next)) break;
      clip.clipEdge(next);
      if (!P.has(next)) break;
      cur = next;
    }
    cur = edge;
    for (let steps = 0; steps < limit && P.startInside[P.pieceOf(cur)]; steps++) {
      const prev = E.prevEdge[cur];
      if (P.has(prev)) break;
      clip.clipEdge(prev);
      if (!P.has(prev)) break;
      cur = prev;
    }
  }
}
