import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CURRENT_VERSION } from '../../src/document';
import { SKETCH_SCHEMA_PATH, sketchSchemaText } from '../../src/lib/sketchSchema';

describe('public/sketch.schema.json', () => {
  it('is what `npm run schema` generates from the zod schema (run it after changing src/document/schema.ts)', () => {
    expect(readFileSync(SKETCH_SCHEMA_PATH, 'utf8')).toBe(sketchSchemaText());
  });

  it('describes the newest file version and its required fields', () => {
    const schema = JSON.parse(readFileSync(SKETCH_SCHEMA_PATH, 'utf8')) as {
      properties: { version: { const: number } };
      required: string[];
    };
    expect(schema.properties.version.const).toBe(CURRENT_VERSION);
    expect(schema.required).toEqual(expect.arrayContaining(['version', 'units', 'shapes']));
  });
});
