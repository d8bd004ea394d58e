import {describe, expect, test} from 'vitest';
import {cliLogger} from '../../src/cli/progress.js';

function stream(isTTY: boolean) {
  const out = {text: '', isTTY, columns: 100, write: (s: string) => ((out.text += s), true)};
  return out;
}

/** The visible text: escape sequences (cursor moves, line clears) removed. */
const visible = (s: string) => s.replace(/\x1b\[[0-9;?]*[A-Za-z]|\x1b[78]/g, '');

describe('cliLogger', () => {
  test('not a terminal: plain lines and no progress bar (the pool then writes lines every 10%)', () => {
    const err = stream(false);
    const log = cliLogger(err);
    expect(log.progress).toBeUndefined();
    log.info('pack 2026-10: 10 series read');
    log.warn('no browser');
    expect(err.text).toBe('pack 2026-10: 10 series read\nwarning: no browser\n');
  });

  test('a terminal: a bar while analysing, one line when done', () => {
    const err = stream(true);
    const log = cliLogger(err);
    for (let done = 1; done <= 300; done++) log.progress!(done, 300);
    const text = visible(err.text);
    expect(text).toMatch(/^analysing -+ 0\/300 series, 0%/);
    expect(text).toContain('analysing ============================== 300/300 series, 100%');
    expect(text.endsWith('analysed 300/300 series\n')).toBe(true);
    log.close();
  });

  test('a message during the bar removes it first; close removes a bar left by a failure', () => {
    const err = stream(true);
    const log = cliLogger(err);
    log.progress!(5, 300);
    log.info('something happened');
    expect(visible(err.text)).toMatch(/5\/300 series.*\n?something happened\n$/s);
    log.progress!(6, 300);
    log.close();
    const before = err.text.length;
    log.close();
    expect(err.text.length).toBe(before);
  });
});
