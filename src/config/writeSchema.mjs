// Writes sample-config/pack.schema.json from the compiled zod schema (run by `npm run build`, after tsc).
// The file is committed; test/config/jsonSchema.test.ts fails when it differs from what the schema gives.
import {writeFileSync} from 'node:fs';
import {fileURLToPath} from 'node:url';
import {packJsonSchema, PACK_SCHEMA_FILE} from '../../dist/src/config/jsonSchema.js';

const target = fileURLToPath(new URL(`../../sample-config/${PACK_SCHEMA_FILE}`, import.meta.url));
writeFileSync(target, packJsonSchema());
