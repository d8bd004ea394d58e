import {SingleBar} from 'cli-progress';
import type {ProgressLogger} from '../analyse/pool.js';

/** A stream the command line writes to; `isTTY` (as on `process.stderr`) selects the progress bar. */
export interface TextStream {
  write(text: string): unknown;
  isTTY?: boolean;
}

/**
 * The command line's logger: messages and warnings as lines on `stderr` (stdout carries only results).
 *
 * On a terminal (`stderr.isTTY`) it also draws a progress bar for the analysis (cli-progress); the bar is removed
 * before any other message and when it completes, so messages never land inside it. Elsewhere (CI, log files) the
 * logger has no `progress`, and the analysis pool writes a plain line every 10% (`analysed 1000/10000 series`).
 */
export function cliLogger(stderr: TextStream): ProgressLogger & {close(): void} {
  const line = (text: string) => stderr.write(`${text}\n`);
  if (stderr.isTTY !== true) return {info: line, warn: (m) => line(`warning: ${m}`), close: () => undefined};

  let bar: SingleBar | null = null;
  const clearBar = () => {
    bar?.stop();
    bar = null;
  };
  return {
    info(message) {
      clearBar();
      line(message);
    },
    warn(message) {
      clearBar();
      line(`warning: ${message}`);
    },
    /** Remove a bar still drawn (a run that failed part-way); its redraw timer would keep the process alive. */
    close: clearBar,
    progress(done, total) {
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
    },
  };
}
