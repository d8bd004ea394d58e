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
