import {InvalidArgumentError} from 'commander';
import type {OutputFormat} from '../config/plan.js';
import {hint} from '../config/suggest.js';

const FORMATS: readonly OutputFormat[] = ['html', 'pdf', 'json', 'csv', 'xlsx'];

/** `--formats html,pdf` → `['html', 'pdf']`; an unknown or empty entry is a usage error. */
export function parseFormats(value: string): OutputFormat[] {
  const out: OutputFormat[] = [];
  for (const item of value.split(',').map((s) => s.trim().toLowerCase())) {
    if (!(FORMATS as readonly string[]).includes(item))
      throw new InvalidArgumentError(
        `unknown format "${item}"${hint(item, FORMATS)} (choose from ${FORMATS.join(', ')})`,
      );
    if (!out.includes(item as OutputFormat)) out.push(item as OutputFormat);
  }
  return out;
}

/** `--jobs 4` → 4; anything but a whole number from 1 to 256 is a usage error. */
export function parseJobs(value: string): number {
  const n = Number(value);
  if (!/^\d+$/.test(value.trim()) || n < 1 || n > 256) {
    throw new InvalidArgumentError('must be a whole number from 1 to 256');
  }
  return n;
}
