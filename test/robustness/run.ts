import {execFile} from 'node:child_process';
import {fileURLToPath} from 'node:url';
import {main} from '../../src/cli/main.js';

/** What one in-process CLI run printed and returned. */
export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Run the command line in-process with string collectors for its streams (EBBFLOW_DEBUG off). */
export async function runCli(argv: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: {write: (s: string) => (stdout += s)},
    stderr: {write: (s: string) => (stderr += s)},
    env: {},
  });
  return {code, stdout, stderr};
}

/** A stack frame as Node prints it (`    at fn (file:1:2)`), or an uncaught type error's name. */
export const CRASH_TEXT = /^\s+at |TypeError|RangeError|ReferenceError|SyntaxError: (?!.*YAML)/m;

/**
 * Run the command line in a child node process (TypeScript sources through the test module hooks) with a time
 * limit, for inputs that might make the analysis never return. `hung` is true when the limit killed it.
 */
export async function runCliInChild(argv: string[], limitMs: number): Promise<CliRun & {hung: boolean}> {
  const cli = fileURLToPath(new URL('../../src/cli/main.ts', import.meta.url));
  const hooks = fileURLToPath(new URL('../archive/fixtures/ts-register.mjs', import.meta.url));
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['--import', hooks, cli, ...argv],
      {timeout: limitMs, killSignal: 'SIGKILL', env: {...process.env, TZ: 'UTC', EBBFLOW_DEBUG: ''}},
      (error, stdout, stderr) => {
        const failed = error as (Error & {code?: unknown; killed?: boolean}) | null;
        const code = failed ? (typeof failed.code === 'number' ? failed.code : -1) : 0;
        resolve({code, stdout, stderr, hung: failed?.killed === true});
      },
    );
  });
}
