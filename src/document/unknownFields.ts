// Fields this version does not know are ignored (and not saved again); say
// so, since they may be a misspelling ("emisivity") or from a newer program.
import { quoteName, shapeLabel } from './labels';
import {
  circleSchema,
  rowSchema,
  settingsSchema,
  surfacePropertiesSchema,
  tubeSchema,
  wallLayerSchema,
  wallSchema,
} from './schema';

const TOP = ['version', 'units', 'shapes', 'surfaces', 'settings', 'rows'];
const SHAPE = ['kind', 'points', 'circle', 'surface', 'row'];
const ROW = Object.keys(rowSchema.shape);
const CIRCLE = Object.keys(circleSchema.shape);
// The known fields are the schema's own, so a new field is never reported as unknown.
const SURFACE = Object.keys(surfacePropertiesSchema.shape);
const WALL = Object.keys(wallSchema.shape);
const LAYER = Object.keys(wallLayerSchema.shape);
const TUBE = Object.keys(tubeSchema.shape);
const SETTINGS = Object.keys(settingsSchema.shape);

/** Warnings for unknown fields of a document that passed the schema. */
export function unknownFieldWarnings(doc: Record<string, unknown>): string[] {
  const warnings: string[] = [];
  const note = (where: string, obj: unknown, known: string[]) => {
    if (obj === null || typeof obj !== 'object') return;
    const extra = Object.keys(obj).filter((k) => !known.includes(k));
    if (extra.length > 0) {
      const names = extra.slice(0, 3).map(quoteName).join(', ') + (extra.length > 3 ? ', …' : '');
      warnings.push(`${where}: ignored unknown field${extra.length === 1 ? '' : 's'} ${names}`);
    }
  };
  note('the sketch', doc, TOP);
  (Array.isArray(doc.shapes) ? doc.shapes : []).forEach((shape, i) => {
    note(shapeLabel(i, shape), shape, SHAPE);
    note(`${shapeLabel(i, shape)} circle`, (shape as { circle?: unknown } | null)?.circle, CIRCLE);
  });
  for (const [name, props] of Object.entries((doc.surfaces ?? {}) as Record<string, unknown>)) {
    note(`surface ${quoteName(name)}`, props, SURFACE);
    const { wall, tube } = (props ?? {}) as { wall?: { layers?: unknown }; tube?: unknown };
    note(`surface ${quoteName(name)} wall`, wall, WALL);
    note(`surface ${quoteName(name)} tube`, tube, TUBE);
    const layers = Array.isArray(wall?.layers) ? (wall.layers as unknown[]) : [];
    layers.forEach((layer, k) => note(`surface ${quoteName(name)} wall layer ${k + 1}`, layer, LAYER));
  }
  note('settings', doc.settings, SETTINGS);
  for (const [name, row] of Object.entries((doc.rows ?? {}) as Record<string, unknown>)) {
    note(`row ${quoteName(name)}`, row, ROW);
    // The schema passed: `from` is one of its two forms.
    const from = (row as { from: object }).from;
    note(`row ${quoteName(name)} from`, from, 'wall' in from ? ['wall', 'distance'] : ['start', 'angle']);
  }
  return warnings;
}
