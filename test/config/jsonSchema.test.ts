/**
 * The pack file's JSON Schema: generated from the zod schema (never hand-written), committed in sample-config/,
 * every key described, and checked with an independent validator (ajv 8, draft 2020-12) against every pack file in
 * sample-config/ and test/fixtures/: it accepts exactly what `check`'s schema stage accepts, except the rules JSON
 * Schema cannot state, which are named below.
 */
import {readdirSync, readFileSync, statSync} from 'node:fs';
import {join, relative} from 'node:path';
import {fileURLToPath} from 'node:url';
import Ajv2020 from 'ajv/dist/2020.js';
import {describe, expect, it} from 'vitest';
import {parseDocument} from 'yaml';
import {packJsonSchema, PACK_SCHEMA_FILE} from '../../src/config/jsonSchema.js';
import {packSchema} from '../../src/config/schema.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const committed = readFileSync(join(root, 'sample-config', PACK_SCHEMA_FILE), 'utf8');
const schema = JSON.parse(packJsonSchema()) as Record<string, unknown>;

/** Bad-input cases whose rule is a zod refinement with no JSON Schema form (left to `ebbflow check`). */
const REFINEMENT_ONLY: Record<string, string> = {
  'bad/bad-holiday/pack.yaml': 'a real calendar date (2026-02-30 matches the YYYY-MM-DD pattern)',
  'bad/seasonal-window-even/pack.yaml': 'an odd window',
};

function yamlFiles(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const p = join(dir, name);
      if (statSync(p).isDirectory()) return yamlFiles(p);
      return /\.ya?ml$/.test(name) ? [p] : [];
    });
}

/** Every object property schema, with its dotted path, in `properties` of the schema and its `$defs`. */
function properties(node: unknown, path: string, out: {path: string; schema: Record<string, unknown>}[] = []) {
  if (Array.isArray(node)) node.forEach((n) => properties(n, path, out));
  else if (node !== null && typeof node === 'object') {
    for (const [key, value] of Object.entries(node as Record<string, unknown>)) {
      if (key === 'properties') {
        for (const [name, prop] of Object.entries(value as Record<string, Record<string, unknown>>)) {
          out.push({path: `${path}.${name}`, schema: prop});
          properties(prop, `${path}.${name}`, out);
        }
      } else properties(value, key === '$defs' ? '' : path, out);
    }
  }
  return out;
}

describe('pack JSON Schema', () => {
  it('the committed sample-config/pack.schema.json is what the zod schema gives now', () => {
    // When this fails: `npm run build` rewrites the file from src/config/schema.ts; commit it.
    expect(committed, 'sample-config/pack.schema.json is stale: run npm run build and commit it').toBe(
      packJsonSchema(),
    );
  });

  it('every key has a description, and a value key a default or a description saying what decides it', () => {
    const props = properties(schema, '');
    expect(props.length).toBeGreaterThan(80);
    const undescribed = props.filter((p) => typeof p.schema.description !== 'string').map((p) => p.path);
    expect(undescribed, 'add .meta(doc(…)) to these keys in src/config/schema.ts').toEqual([]);
    const section = (p: {schema: object}) => /"properties"|"\$ref"/.test(JSON.stringify(p.schema));
    const undecided = props
      .filter((p) => !section(p) && !('default' in p.schema) && !/Default:|Required/.test(String(p.schema.description)))
      .map((p) => p.path);
    expect(undecided, "give these keys a default, or say 'Default: …' or 'Required'").toEqual([]);
    const pack = (schema.properties as Record<string, {properties: Record<string, {default?: unknown}>}>).pack;
    expect(pack.properties.locale.default).toBe('en-GB');
    expect(pack.properties.formats.default).toEqual(['html', 'pdf', 'json', 'csv', 'xlsx']);
  });

  it('closes every object, so a misspelt key is an error in an editor as in check', () => {
    const text = JSON.stringify(schema);
    expect(text.match(/"type":"object"/g)?.length).toBe(text.match(/"additionalProperties":false/g)?.length);
  });

  describe('validated by ajv against every pack in sample-config/ and test/fixtures/', () => {
    const ajv = new Ajv2020({allErrors: true, strict: true});
    const validate = ajv.compile(JSON.parse(committed));
    const files = [...yamlFiles(join(root, 'sample-config')), ...yamlFiles(join(root, 'test', 'fixtures'))];

    it('finds the packs', () => expect(files.length).toBeGreaterThan(50));

    it.each(files.map((f) => [relative(root, f), f]))('%s', (name, file) => {
      const doc = parseDocument(readFileSync(file, 'utf8'), {uniqueKeys: true});
      let value: unknown;
      try {
        if (doc.errors.length > 0) return; // YAML syntax cases: no document to validate
        value = doc.toJS();
      } catch {
        return; // alias cases: yaml refuses to expand the document
      }
      const byAjv = validate(value);
      const byZod = packSchema.safeParse(value).success;
      const fixture = relative(join(root, 'test', 'fixtures'), file);
      const good = name.startsWith('sample-config/') || name.startsWith('test/fixtures/config/');
      if (good) expect(byAjv, JSON.stringify(validate.errors)).toBe(true);
      if (fixture in REFINEMENT_ONLY) expect([byAjv, byZod]).toEqual([true, false]);
      else expect(byAjv, JSON.stringify(validate.errors)).toBe(byZod);
    });

    it('rejects the misspelt keys of the bad-input suite, naming the key', () => {
      const read = (p: string) => parseDocument(readFileSync(join(root, 'test', 'fixtures', 'bad', p), 'utf8')).toJS();
      const cases = {'unknown-key': ['/sources/0', 'dateColum'], 'unknown-top-key': ['', 'serie']};
      for (const [name, [at, key]] of Object.entries(cases)) {
        expect(validate(read(`${name}/pack.yaml`))).toBe(false);
        const extra = validate.errors?.find((e) => e.keyword === 'additionalProperties');
        expect([extra?.instancePath, extra?.params.additionalProperty]).toEqual([at, key]);
      }
    });
  });
});
