import type { SketchFile } from '../../state/sketchFile';

/**
 * A shape as the canvas and the tables name it: a one-surface shape by its
 * surface name ("tube 3"), the enclosure as such; the shape number as in the
 * file and in geometry messages (counted from 1).
 */
export function shapeTitle(doc: SketchFile, s: number): string {
  const shape = doc.shapes[s];
  const kind = shape?.kind === 'enclosure' ? 'enclosure' : 'body';
  const one = shape && (typeof shape.surface === 'string' || new Set(shape.surface).size === 1);
  const name = one ? (typeof shape.surface === 'string' ? shape.surface : shape.surface[0]) : null;
  return name ? `${name} (${kind}, shape ${s + 1})` : `${kind === 'enclosure' ? 'Enclosure' : 'Body'} (shape ${s + 1})`;
}
