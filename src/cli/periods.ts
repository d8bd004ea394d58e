import {periodExample} from '../config/crossCheck.js';
import {InputError} from '../errors.js';
import {formatPeriod, parsePeriod, type Frequency} from '../time/period.js';

/** True when `--period` names a range `A..B` rather than one period. */
export function isPeriodRange(spec: string): boolean {
  return spec.includes('..');
}

/** Longest range accepted in one command (ten years of weeks). */
const MAX_PERIODS = 530;

/**
 * Expand `A..B` (both ends included) into period labels in order, e.g. `2026-01..2026-03` →
 * `2026-01, 2026-02, 2026-03`. Both ends must be labels of the pack's frequency and A ≤ B.
 *
 * @throws InputError (reported against the command line) for a bad label, a reversed or too long range.
 */
export function expandPeriodRange(frequency: Frequency, spec: string): string[] {
  const problem = (message: string) => new InputError([{file: 'command line', line: null, column: null, message}]);
  const parts = spec.split('..');
  if (parts.length !== 2) throw problem(`--period ${spec} is not a range; write it like 2026-01..2026-10`);
  const [from, to] = parts.map((p) => parsePeriod(frequency, p));
  if (from === undefined || to === undefined) {
    const bad = parts[from === undefined ? 0 : 1];
    throw problem(`--period ${spec}: ${bad} is not a ${frequency} period; write it like ${periodExample[frequency]}`);
  }
  if (from > to) throw problem(`--period ${spec} runs backwards; put the earlier period first`);
  if (to - from + 1 > MAX_PERIODS) throw problem(`--period ${spec} spans more than ${MAX_PERIODS} periods`);
  return Array.from({length: to - from + 1}, (_, i) => formatPeriod(frequency, from + i));
}
