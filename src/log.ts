/** Replaceable logger: the CLI prints, tests collect, and every warning also goes into the manifest. */
export interface Logger {
  info(message: string): void;
  warn(message: string): void;
  /** Told as each stage of a build starts (`config`, `ingest`, `analyse`, …), so a verbose logger can time them. */
  stage?(name: string): void;
}

/** Prints progress to stderr, so stdout stays clean for scripts. */
export const consoleLogger: Logger = {
  info: (message) => process.stderr.write(`${message}\n`),
  warn: (message) => process.stderr.write(`warning: ${message}\n`),
};

/** A logger that keeps messages, for tests and for the manifest. */
export function collectingLogger(inner?: Logger): Logger & {infos: string[]; warnings: string[]} {
  const infos: string[] = [];
  const warnings: string[] = [];
  return {
    infos,
    warnings,
    info(message) {
      infos.push(message);
      inner?.info(message);
    },
    warn(message) {
      warnings.push(message);
      inner?.warn(message);
    },
  };
}
