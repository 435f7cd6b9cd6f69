import type { SketchFile } from '../../state/sketchFile';

export function shapeTitle(doc: SketchFile, s: number): string {
  const shape = doc.shapes[s];
  return `Shape ${s + 1} (${shape?.kind === 'enclosure' ? 'enclosure' : 'body'})`;
}
