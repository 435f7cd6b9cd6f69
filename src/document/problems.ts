// A reason a sketch was refused: the wording for people (made here, in the
// document layer, once) and the place it concerns as data, so the canvas can
// mark it without reading the words.
import type { CircleFinding } from '../core/arc/circleChecks';
import type { GeometryFinding } from '../core/sketchChecks';

/**
 * What a problem concerns. Shape and edge indices count from 0 into the
 * document's shapes as written (the form the app holds and draws), also when
 * reading removed repeated points; edge k runs from point k to point k+1.
 * Points are locations in sketch units.
 */
export interface ProblemPlace {
  shapes: number[];
  edges: { shape: number; edge: number }[];
  points: [number, number][];
}

/** Which rule a problem breaks: a geometry rule of the core, or a stage of reading the file. */
export type ProblemKind =
  | GeometryFinding['rule']
  | CircleFinding['rule']
  | 'json' // the text is not JSON (or is empty, or another kind of file)
  | 'not-a-sketch'
  | 'version'
  | 'limit' // more shapes or edges than the program computes
  | 'schema' // a field is missing or has the wrong type or range
  | 'surface-list' // a list of surface names that does not match the edges
  | 'coordinate-range'
  | 'edge-too-short'
  | 'conditions' // more than one thermal condition on a surface
  | 'row' // a tube row whose tubes or numbers break its rules (rows/check.ts)
  | 'internal' // a fault of the program, still reported as a message
  | 'more'; // the last entry when there are too many: counts the rest, and its place covers them

export interface SketchProblem {
  kind: ProblemKind;
  message: string;
  place: ProblemPlace;
}

export function emptyPlace(): ProblemPlace {
  return { shapes: [], edges: [], points: [] };
}

/** A problem with no place on the drawing (file-level trouble). */
export function problemAt(kind: ProblemKind, message: string, place: Partial<ProblemPlace> = {}): SketchProblem {
  return { kind, message, place: { ...emptyPlace(), ...place } };
}

/** All places in one, shapes without repeats. */
export function mergePlaces(places: readonly ProblemPlace[]): ProblemPlace {
  const shapes = new Set<number>();
  const merged = emptyPlace();
  for (const p of places) {
    for (const s of p.shapes) shapes.add(s);
    merged.edges.push(...p.edges);
    merged.points.push(...p.points);
  }
  merged.shapes = [...shapes];
  return merged;
}
