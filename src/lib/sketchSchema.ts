// The sketch file's JSON Schema, generated from the zod schema the program
// reads files with, so editors and other tools can check a file before it is
// opened. Written to public/sketch.schema.json by `npm run schema`; a test
// checks the committed file equals what this function gives.
import { z } from 'zod';
import { CURRENT_VERSION, sketchFileSchemaV1 } from '../document';

/** Where the schema is published, relative to the repository root. */
export const SKETCH_SCHEMA_PATH = 'public/sketch.schema.json';

/**
 * The JSON Schema (draft 2020-12) of the newest sketch file version, as a
 * plain object. Rules zod checks in code (the
 * geometry is valid) are not in it: the program still checks those on reading.
 */
export function sketchJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(sketchFileSchemaV1, { io: 'input', target: 'draft-2020-12' });
  return {
    ...generated,
    title: `Tautline sketch file, version ${CURRENT_VERSION}`,
    description:
      'A 2D cross-section: shapes (enclosures and solids) whose edges carry surface names, per-surface radiative properties and conditions, and settings. Lengths in the file units; temperatures K; heat flux W/m^2; depth m.',
  };
}

/** The schema as the committed file holds it: two-space indented JSON and a final newline. */
export function sketchSchemaText(): string {
  return `${JSON.stringify(sketchJsonSchema(), null, 2)}\n`;
}
