import {cpSync, mkdirSync, mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, describe, expect, it} from 'vitest';
import {main} from '../../src/cli/main.js';

// The file-access rule through the command line: a pack may read only from its own folder unless the operator
// allows another folder with --allow-dir.
const root = mkdtempSync(join(tmpdir(), 'ebbflow-allow-'));
afterAll(() => rmSync(root, {recursive: true, force: true}));
mkdirSync(join(root, 'packs'));
mkdirSync(join(root, 'shared-data'));
cpSync('test/fixtures/check/costs.csv', join(root, 'shared-data', 'costs.csv'));
writeFileSync(join(root, 'shared-data', 'costs.csv'), 'month,costs\n2024-01,50\n2024-02,51\n2024-03,52\n');
writeFileSync(
  join(root, 'packs', 'pack.yaml'),
  'pack:\n  title: Allow test\n  frequency: monthly\nsources:\n  - id: costs\n    file: ../shared-data/costs.csv\n    dateColumn: month\nseries:\n  - id: costs\n    source: costs\n',
);

function sink() {
  let text = '';
  return {stream: {write: (s: string) => ((text += s), true)}, text: () => text};
}

describe('--allow-dir', () => {
  it('refuses a source outside the pack folder, naming the flag', async () => {
    const err = sink();
    const code = await main(['check', join(root, 'packs', 'pack.yaml')], {stdout: sink().stream, stderr: err.stream});
    expect(code).toBe(2);
    expect(err.text()).toMatch(/pack\.yaml:6:\d+: sources\[0\]\.file is outside the pack's folder.*--allow-dir/);
  });

  it('accepts it when the operator allows the folder', async () => {
    const err = sink();
    const code = await main(['check', join(root, 'packs', 'pack.yaml'), '--allow-dir', join(root, 'shared-data')], {
      stdout: sink().stream,
      stderr: err.stream,
    });
    expect(err.text()).toContain('no problems');
    expect(code).toBe(0);
  });
});
