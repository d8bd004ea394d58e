import {z} from 'zod';
import {packSchema} from './schema.js';

/** File name of the pack file's JSON Schema, beside the starter pack and in `sample-config/`. */
export const PACK_SCHEMA_FILE = 'pack.schema.json';

/**
 * The pack file's JSON Schema (draft 2020-12), generated from the zod schema (`schema.ts`) with zod's
 * `z.toJSONSchema`, so it never drifts from what `ebbflow check` accepts: every key with its description and, where
 * fixed, its default; objects closed (`additionalProperties: false`), so a misspelt key fails in an editor as it
 * does in `check`. Checks that JSON Schema cannot state (odd windows, real dates, language tags, references between
 * entries, files on disk) are left to `check`. Deterministic: the same schema gives the same text.
 *
 * `npm run build` writes it to `sample-config/pack.schema.json`; `ebbflow schema` prints it and `ebbflow init`
 * writes it beside the starter pack, whose first line points editors at it
 * (`# yaml-language-server: $schema=pack.schema.json`).
 */
export function packJsonSchema(): string {
  const schema = z.toJSONSchema(packSchema, {
    target: 'draft-2020-12',
    io: 'input',
    unrepresentable: 'throw',
  });
  const {$schema, ...rest} = schema;
  const generated = {
    $schema,
    $comment: 'Generated from src/config/schema.ts by npm run build (ebbflow schema prints it); do not edit.',
    ...rest,
  };
  return `${JSON.stringify(generated, null, 2)}\n`;
}
