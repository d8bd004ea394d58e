import {mkdtempSync, readdirSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {describe, expect, it} from 'vitest';
import {main} from '../../src/cli/main.js';

function capture() {
  let text = '';
  return {stream: {write: (s: string) => ((text += s), true)}, text: () => text};
}

describe('ebbflow check reports every problem at once', () => {
  it('lists a typo, a missing CSV, a duplicate month and a non-numeric cell with file:line, exit 2', async () => {
    const out = capture();
    const err = capture();
    const code = await main(['check', 'test/fixtures/check/pack.yaml'], {stdout: out.stream, stderr: err.stream});
    expect(code).toBe(2);
    const text = err.text();
    expect(text).toMatch(/pack\.yaml:6:\d+: .*acent.*did you mean accent/);
    expect(text).toMatch(/pack\.yaml:15:\d+: .*web-missing\.csv/);
    expect(text).toMatch(/sales\.csv:4:\d+: 2024-02 appears twice, on lines 3 and 4/);
    expect(text).toMatch(/costs\.csv:3:2: .*abc/);
    expect(text).not.toMatch(/\n\s+at /);
  });

  it('build on the same pack writes nothing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ebbflow-check-'));
    try {
      const err = capture();
      const code = await main(['build', 'test/fixtures/check/pack.yaml', '--out', dir], {stdout: capture().stream, stderr: err.stream});
      expect(code).toBe(2);
      expect(readdirSync(dir)).toEqual([]);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });
});
