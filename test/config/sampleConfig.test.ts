import {readdir} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {expect, test} from 'vitest';
import {loadPlan} from '../../src/config/index.js';

const sampleDir = fileURLToPath(new URL('../../sample-config/', import.meta.url));
const packs = (await readdir(sampleDir)).filter((f) => /\.ya?ml$/.test(f));

test('the sample folder has packs', () => {
  expect(packs.length).toBeGreaterThan(0);
});

test.each(packs)('sample-config/%s passes every config check', async (name) => {
  const plan = await loadPlan(path.join(sampleDir, name));
  expect(plan.series.length + (plan.fromSource?.length ?? 0)).toBeGreaterThan(0);
  for (const s of plan.sources) expect(path.isAbsolute(s.file)).toBe(true);
});
