import {mkdtempSync, writeFileSync, readFileSync, copyFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {test} from 'vitest';
import {runCli} from './run.js';
test('probe', async () => {
  const d = mkdtempSync(tmpdir() + '/p-');
  const src = readFileSync('test/fixtures/bad/control/data.csv', 'utf8').trim().split('\n');
  for (const big of ['1e300', '1e-300']) {
    const rows = src.slice(1).map((r, i) => (i % 5 === 0 ? r.replace(/,[^,]*,/, `,${big},`) : r));
    writeFileSync(d + '/data.csv', ['date,sales,budget', ...rows].join('\n') + '\n');
    copyFileSync('test/fixtures/bad/control/pack.yaml', d + '/pack.yaml');
    const r = await runCli(['build', d + '/pack.yaml', '--out', d + '/out', '--formats', 'json', '--jobs', '1', '--force']);
    console.log(big, r.code, r.stderr);
  }
});
