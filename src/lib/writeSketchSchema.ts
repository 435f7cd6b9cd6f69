// `npm run schema`: write the sketch file's JSON Schema to public/sketch.schema.json.
import { writeFileSync } from 'node:fs';
import { SKETCH_SCHEMA_PATH, sketchSchemaText } from './sketchSchema';

writeFileSync(SKETCH_SCHEMA_PATH, sketchSchemaText());
process.stdout.write(`wrote ${SKETCH_SCHEMA_PATH}\n`);
