import {readFileSync, writeFileSync} from 'node:fs';
import {test} from 'vitest';
import {runCli} from './run.js';
test('probe', async () => {
  const cases = JSON.parse(readFileSync('test/fixtures/bad/cases.json', 'utf8'));
  let s = '';
  for (const c of cases) {
    const r = await runCli(['check', `test/fixtures/bad/${c.pack}`]);
    s += `== ${c.name} (${r.code})\n${r.stderr}`;
  }
  writeFileSync('/tmp/gen/probe.txt', s);
});
