#!/usr/bin/env node
import {realpathSync} from 'node:fs';
import {availableParallelism} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {Command, CommanderError, Option} from 'commander';
import {loadPlan, packJsonSchema} from '../config/index.js';
import type {OutputFormat} from '../config/plan.js';
import {formatProblem, InputError, type Problem} from '../errors.js';
import {pdfSession} from '../render/pdfSession.js';
import {build, check} from '../run.js';
import {packageRoot, toolVersion} from '../version.js';
import {initPack} from './init.js';
import {builtPeriod, jsonText, type BuildOutput, type BuiltPeriod, type CheckOutput} from './jsonOutput.js';
import {parseFormats, parseJobs} from './options.js';
import {expandPeriodRange, isPeriodRange} from './periods.js';
import {cliLogger, type TextStream, type Verbosity} from './progress.js';
import {parseShard, selectShard, type Shard} from './shard.js';

/** Where the CLI writes: the process streams in the bin, string collectors in tests. */
export interface Io {
  stdout: {write(text: string): unknown};
  /** Messages and progress; a progress bar is drawn when `isTTY` is true. */
  stderr: TextStream;
  /** Environment for EBBFLOW_DEBUG. Default: `process.env`. */
  env?: NodeJS.ProcessEnv;
}

/** `--json`, `--quiet`, `--verbose`, shared by build and check. */
interface OutputOptions {
  json: boolean;
  quiet?: boolean;
  verbose?: boolean;
}

interface BuildOptions extends OutputOptions {
  period?: string;
  out?: string;
  formats?: OutputFormat[];
  force: boolean;
  jobs: number;
  shard?: Shard;
  allowDir: string[];
}

/** A failed command: bad input (exit 2, every problem) or a failure while working (exit 1, one message). */
interface Failure {
  code: 1 | 2;
  problems: Problem[];
  error: string | null;
}

function classify(error: unknown): Failure {
  if (error instanceof InputError) return {code: 2, problems: error.problems, error: null};
  const message = error instanceof Error ? error.message : String(error);
  return {code: 1, problems: [], error: message.split('\n')[0]};
}

/**
 * Report a failure on stderr and give its exit code: 2 with every problem for bad input (left to the JSON document
 * with `--json`), 1 with one line for anything else (the stack only when EBBFLOW_DEBUG=1).
 */
function fail(error: unknown, io: Io, json = false, kept = 0): Failure {
  const failure = classify(error);
  if (failure.code === 2) {
    if (json) return failure;
    for (const p of failure.problems) io.stderr.write(`${formatProblem(p)}\n`);
    const n = failure.problems.reduce((sum, p) => sum + (p.count ?? 1), 0);
    const after =
      kept > 0 ? `the ${kept} period folder${kept === 1 ? '' : 's'} built before were kept` : 'nothing was written';
    io.stderr.write(`${n} problem${n === 1 ? '' : 's'}; ${after}\n`);
    return failure;
  }
  io.stderr.write(`ebbflow: ${failure.error}\n`);
  const debug = (io.env ?? process.env).EBBFLOW_DEBUG === '1';
  if (debug && error instanceof Error && error.stack) io.stderr.write(`${error.stack}\n`);
  return failure;
}

function verbosity(opts: OutputOptions): Verbosity {
  return opts.quiet ? 'quiet' : opts.verbose ? 'verbose' : 'normal';
}

/**
 * Validate every pack first (so bad input stops the batch before anything is written), then build in order. With
 * `--shard i/n` only the packs of part i are validated and built (see `selectShard`). stdout carries the folders
 * built (or, with `--json`, one {@link BuildOutput} document, also when the run fails).
 */
async function runBuild(given: string[], opts: BuildOptions, io: Io): Promise<number> {
  // Progress and warnings go to stderr so stdout carries only results (folders, next steps).
  const log = cliLogger(io.stderr, {verbosity: verbosity(opts)});
  const built: BuiltPeriod[] = [];
  const done = (failure: Failure | null): number => {
    if (opts.json) {
      const output: BuildOutput = {built, warnings: log.warnings, problems: failure?.problems ?? []};
      if (failure?.error) output.error = failure.error;
      io.stdout.write(jsonText(output));
    }
    return failure?.code ?? 0;
  };
  let packs = given;
  if (opts.shard) {
    const {index, count} = opts.shard;
    packs = selectShard(given, opts.shard);
    const total = new Set(given.map((p) => path.resolve(p))).size;
    log.info(`shard ${index}/${count}: ${packs.length} of ${total} pack${total === 1 ? '' : 's'}`);
    if (packs.length === 0) return done(null);
  }
  const allowDirs = opts.allowDir.map((d) => path.resolve(d));
  const jobs: {packFile: string; period: string | undefined}[] = [];
  const problems: Problem[] = [];
  for (const packFile of packs) {
    try {
      const range = opts.period !== undefined && isPeriodRange(opts.period);
      const single = range ? undefined : opts.period;
      const plan = await loadPlan(packFile, {period: single, outDir: opts.out, formats: opts.formats, allowDirs});
      const periods = range ? expandPeriodRange(plan.frequency, opts.period ?? '') : [opts.period];
      for (const period of periods) jobs.push({packFile, period});
    } catch (e) {
      if (!(e instanceof InputError)) return done(fail(e, io, opts.json));
      problems.push(...e.problems);
    }
  }
  if (problems.length > 0) return done(fail(new InputError(problems), io, opts.json));

  // One browser for the whole batch (per browser setting) instead of one launch per period.
  const pdf = pdfSession();
  // A missing browser is said once for the batch, not once per period.
  const said = new Set<string>();
  let finished = 0;
  try {
    for (const job of jobs) {
      const {packFile, period} = job;
      const {out: outDir, formats, force, jobs: threads} = opts;
      const summary = await build({packFile, period, outDir, formats, force, jobs: threads, pdf, allowDirs}, log);
      if (summary.pdfSkipped && !said.has(summary.pdfSkipped)) {
        said.add(summary.pdfSkipped);
        log.warn(summary.pdfSkipped);
      }
      log.finish(`${summary.packId} ${summary.period}`);
      if (opts.json) built.push(await builtPeriod(summary));
      else if (!opts.quiet) io.stdout.write(`${summary.folder}\n`);
      finished++;
    }
  } catch (e) {
    log.close(); // a progress bar left by the failure goes before the message
    return done(fail(e, io, opts.json, finished));
  } finally {
    await pdf.close();
  }
  return done(null);
}

/** Check every pack, collecting the problems of all of them; with `--json`, one {@link CheckOutput} on stdout. */
async function runCheck(packs: string[], opts: OutputOptions & {allowDir: string[]}, io: Io): Promise<number> {
  const log = cliLogger(io.stderr, {verbosity: verbosity(opts)});
  const allowDirs = opts.allowDir.map((d) => path.resolve(d));
  const problems: Problem[] = [];
  let failure: Failure | null = null;
  for (const packFile of packs) {
    try {
      await check(packFile, log, allowDirs);
    } catch (e) {
      if (!(e instanceof InputError)) {
        failure = fail(e, io, opts.json);
        break;
      }
      problems.push(...e.problems);
    }
  }
  if (failure === null && problems.length > 0) failure = fail(new InputError(problems), io, opts.json);
  if (opts.json) {
    const output: CheckOutput = {problems: failure?.problems ?? []};
    if (failure?.error) output.error = failure.error;
    io.stdout.write(jsonText(output));
  }
  return failure?.code ?? 0;
}

async function runInit(dir: string, io: Io): Promise<number> {
  try {
    const {packFile, files} = await initPack(dir, path.join(packageRoot(), 'sample-config'));
    const shown = path.relative(process.cwd(), packFile) || packFile;
    io.stdout.write(`Wrote a starter pack (${files.length} files) to ${path.dirname(shown)}\n`);
    io.stdout.write(`Next: ebbflow build ${shown}\n`);
    return 0;
  } catch (e) {
    return fail(e, io).code;
  }
}

const ALLOW_DIR_HELP =
  "let packs read files from this folder too (repeatable); by default only the pack's own folder and below";

function collect(value: string, previous: string[]): string[] {
  return [...previous, value];
}

/** `--json`, `--quiet` and `--verbose` on a command. */
function outputOptions(command: Command, json: string): Command {
  return command
    .option('--json', json, false)
    .addOption(new Option('-q, --quiet', 'print only problems and warnings').conflicts('verbose'))
    .option('-v, --verbose', 'stamp each message with the time since start and print the time of each stage');
}

/**
 * The command line: `ebbflow build|check|init|schema`. Returns the exit code instead of exiting, so tests
 * can run it in-process: 0 success, 1 the run failed while working, 2 bad input or usage.
 */
export async function main(argv: string[], io: Io): Promise<number> {
  let code = 0;
  const program = new Command('ebbflow')
    .description(
      'Trend review packs: seasonal adjustment, trend and cycle, forecasts, and a branded report from a YAML pack file.',
    )
    .version(toolVersion, '-V, --version', 'print the version')
    .helpOption('-h, --help', 'show help')
    .helpCommand('help [command]', 'show help for a command')
    .exitOverride()
    .configureOutput({writeOut: (s) => io.stdout.write(s), writeErr: (s) => io.stderr.write(s)})
    .showHelpAfterError('(add --help for usage)');

  const buildCommand = program
    .command('build')
    .description('build the report for each pack file and write it under <out>/<pack id>/<period>/')
    .argument('<pack...>', 'pack files (YAML)')
    .option(
      '-p, --period <period>',
      "review period (2026-10, 2026-Q3, 2026-W41) or a range A..B built one by one; default: the pack's, " +
        'else the last period with data',
    )
    .option('-o, --out <dir>', "output folder; default: the pack's outDir, else ./out")
    .option(
      '-f, --formats <list>',
      "comma-separated outputs from html, pdf, json, csv, xlsx; default: the pack's",
      parseFormats,
    )
    .option('--force', 'replace a period folder that already exists', false)
    .option('-j, --jobs <n>', 'threads at once (analysis; one fewer when drawing)', parseJobs, availableParallelism())
    .option('--allow-dir <dir>', ALLOW_DIR_HELP, collect, [])
    .option(
      '--shard <i/n>',
      'build only part i of n of the packs (sorted by full path, every n-th from the i-th), for batch schedulers',
      parseShard,
    );
  outputOptions(buildCommand, 'print what was written (folders, files with SHA-256, skipped formats, warnings) as JSON')
    .addHelpText(
      'after',
      '\nExamples:\n  ebbflow build pack.yaml\n' +
        '  ebbflow build pack.yaml --period 2026-01..2026-10 --formats html,json --force\n' +
        '  ebbflow build packs/*.yaml --shard 3/8    # the third of eight parts of a batch\n',
    )
    .action(async (packs: string[], opts: BuildOptions) => {
      code = await runBuild(packs, opts, io);
    });

  const checkCommand = program
    .command('check')
    .description('validate pack files and their data, print every problem, write nothing')
    .argument('<pack...>', 'pack files (YAML)')
    .option('--allow-dir <dir>', ALLOW_DIR_HELP, collect, []);
  outputOptions(checkCommand, 'print the problems as JSON: {problems: [{file, line, column, message}]}').action(
    async (packs: string[], opts: OutputOptions & {allowDir: string[]}) => {
      code = await runCheck(packs, opts, io);
    },
  );

  program
    .command('init')
    .description("write a starter pack with example data and the pack file's JSON Schema into a new folder")
    .argument('[dir]', 'folder to create', './ebbflow-pack')
    .action(async (dir: string) => {
      code = await runInit(dir, io);
    });

  program
    .command('schema')
    .description("print the pack file's JSON Schema (for editors and other validators)")
    .action(() => {
      io.stdout.write(packJsonSchema());
    });

  try {
    await program.parseAsync(argv, {from: 'user'});
  } catch (e) {
    if (e instanceof CommanderError) {
      return e.code === 'commander.helpDisplayed' || e.code === 'commander.version' ? 0 : 2;
    }
    return fail(e, io).code;
  }
  return code;
}

/** True when this file is the program being run (also through npm's bin symlink), not an import. */
function isEntryPoint(): boolean {
  const script = process.argv[1];
  if (!script) return false;
  try {
    return realpathSync(script) === fileURLToPath(import.meta.url);
  } catch {
    return false;
  }
}

if (isEntryPoint()) {
  process.exitCode = await main(process.argv.slice(2), {stdout: process.stdout, stderr: process.stderr});
}
