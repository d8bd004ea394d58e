import {SingleBar} from 'cli-progress';
import type {ProgressLogger} from '../analyse/pool.js';

/** A stream the command line writes to; `isTTY` (as on `process.stderr`) selects the progress bar. */
export interface TextStream {
  write(text: string): unknown;
  isTTY?: boolean;
}

/** `--quiet`: problems and warnings only; `--verbose`: every line stamped with the time since start, stage timings. */
export type Verbosity = 'quiet' | 'normal' | 'verbose';

/** The command line's logger, with what the commands need besides logging. */
export interface CliLogger extends ProgressLogger {
  /** Every warning given so far, in order (for `--json`). */
  readonly warnings: string[];
  /** Remove a bar still drawn (a run that failed part-way); its redraw timer would keep the process alive. */
  close(): void;
  /** End of one period's build: with `--verbose`, one line with the time each stage took. */
  finish(label: string): void;
}

/**
 * The command line's logger: messages and warnings as lines on `stderr` (stdout carries only results).
 *
 * On a terminal (`stderr.isTTY`) it also draws a progress bar for the analysis (cli-progress); the bar is removed
 * before any other message and when it completes, so messages never land inside it. Elsewhere (CI, log files) the
 * logger has no `progress`, and the analysis pool writes a plain line every 10% (`analysed 1000/10000 series`).
 *
 * `quiet` drops messages and the bar (warnings stay); `verbose` stamps each line with the seconds since the command
 * started (`[  1.25 s] …`) and times the stages the build announces (`stage`), printed by `finish`. `now` is the
 * clock in milliseconds (replaceable for tests; it only ever reaches stderr, never an output file).
 */
export function cliLogger(
  stderr: TextStream,
  {verbosity = 'normal', now = () => performance.now()}: {verbosity?: Verbosity; now?: () => number} = {},
): CliLogger {
  const started = now();
  const stamp = () => (verbosity === 'verbose' ? `[${seconds(now() - started).padStart(8)}] ` : '');
  const line = (text: string) => stderr.write(`${stamp()}${text}\n`);
  const warnings: string[] = [];
  let bar: SingleBar | null = null;
  const clearBar = () => {
    bar?.stop();
    bar = null;
  };
  let stages: {name: string; at: number}[] = [];

  const log: CliLogger = {
    warnings,
    info(message) {
      if (verbosity === 'quiet') return;
      clearBar();
      line(message);
    },
    warn(message) {
      warnings.push(message);
      clearBar();
      line(`warning: ${message}`);
    },
    close: clearBar,
    finish(label) {
      if (verbosity === 'verbose' && stages.length > 0) {
        const end = now();
        const parts = stages.map((s, i) => `${s.name} ${seconds((stages[i + 1]?.at ?? end) - s.at)}`);
        line(`timings ${label}: ${parts.join(', ')} (total ${seconds(end - stages[0].at)})`);
      }
      stages = [];
    },
  };
  if (verbosity === 'verbose') log.stage = (name) => stages.push({name, at: now()});
  if (stderr.isTTY !== true || verbosity === 'quiet') return log;

  log.progress = (done, total) => {
    if (bar === null) {
      bar = new SingleBar({
        stream: stderr as NodeJS.WritableStream,
        format: 'analysing {bar} {value}/{total} series, {percentage}%, about {eta_formatted} left',
        barsize: 30,
        hideCursor: true,
        clearOnComplete: true,
        etaBuffer: 200,
      });
      bar.start(total, 0);
    }
    bar.update(done);
    if (done >= total) {
      clearBar();
      line(`analysed ${done}/${total} series`);
    }
  };
  return log;
}

function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(2)} s`;
}
