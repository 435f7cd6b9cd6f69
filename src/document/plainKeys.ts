// The schema check with surface names as plain keys. zod's record drops a key
// named "__proto__" (assigning it would replace the prototype), so that one
// entry is checked on its own and written back as an own property, in the
// file's key order. Any other name needs nothing special.
import type { z } from 'zod';
import { copyRecord, setOwn } from './ownRecord';
import { sketchFileSchemaV1, surfacePropertiesSchema, type SketchFileV1, type SurfaceProperties } from './schema';

const RESERVED = '__proto__';

type Parsed = { success: true; data: SketchFileV1 } | { success: false; issues: z.core.$ZodIssue[] };

/** Check a migrated document against the file schema, keeping a surface named "__proto__". */
export function parseSketchFile(doc: Record<string, unknown>): Parsed {
  const surfaces = doc.surfaces;
  const hasReserved = surfaces !== null && typeof surfaces === 'object' && Object.hasOwn(surfaces, RESERVED);
  if (!hasReserved) {
    const r = sketchFileSchemaV1.safeParse(doc, { reportInput: true });
    return r.success ? { success: true, data: r.data } : { success: false, issues: r.error.issues };
  }
  const raw = surfaces as Record<string, unknown>;
  const rest = copyRecord(raw);
  delete rest[RESERVED];
  const main = sketchFileSchemaV1.safeParse({ ...doc, surfaces: rest }, { reportInput: true });
  const own = surfacePropertiesSchema.safeParse(raw[RESERVED], { reportInput: true });
  const issues = [
    ...(main.success ? [] : main.error.issues),
    ...(own.success ? [] : own.error.issues.map((i) => ({ ...i, path: ['surfaces', RESERVED, ...i.path] }))),
  ];
  if (!main.success || !own.success) return { success: false, issues };
  // Rebuild in the file's order so a save writes the names where they were.
  const parsed = main.data.surfaces ?? {};
  const ordered: Record<string, SurfaceProperties> = {};
  for (const name of Object.keys(raw))
    if (name === RESERVED) setOwn(ordered, name, own.data);
    else if (Object.hasOwn(parsed, name)) setOwn(ordered, name, parsed[name]);
  return { success: true, data: { ...main.data, surfaces: ordered } };
}
