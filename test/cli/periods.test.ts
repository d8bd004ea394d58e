import {InvalidArgumentError} from 'commander';
import {describe, expect, test} from 'vitest';
import {parseFormats, parseJobs} from '../../src/cli/options.js';
import {expandPeriodRange, isPeriodRange} from '../../src/cli/periods.js';
import {InputError} from '../../src/errors.js';

describe('expandPeriodRange', () => {
  test('months across a year end, both ends included', () => {
    expect(expandPeriodRange('monthly', '2025-11..2026-02')).toEqual(['2025-11', '2025-12', '2026-01', '2026-02']);
    expect(expandPeriodRange('monthly', '2026-10..2026-10')).toEqual(['2026-10']);
  });

  test('quarters', () => {
    expect(expandPeriodRange('quarterly', '2025-Q4..2026-Q2')).toEqual(['2025-Q4', '2026-Q1', '2026-Q2']);
  });

  test('ISO weeks through a 53-week year', () => {
    // Python 3: datetime.date(2026, 12, 31).isocalendar() -> (2026, 53, 4), so 2026 has a week 53.
    expect(expandPeriodRange('weekly', '2026-W52..2027-W02')).toEqual(['2026-W52', '2026-W53', '2027-W01', '2027-W02']);
  });

  test('bad ranges are input errors against the command line', () => {
    const message = (spec: string) => {
      try {
        expandPeriodRange('monthly', spec);
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        return (e as InputError).problems.map((p) => `${p.file}: ${p.message}`);
      }
      return [];
    };
    expect(message('2026-03..2026-01')).toEqual([
      'command line: --period 2026-03..2026-01 runs backwards; put the earlier period first',
    ]);
    expect(message('2026-01..2026-13')).toEqual([
      'command line: --period 2026-01..2026-13: 2026-13 is not a monthly period; write it like 2026-10',
    ]);
    expect(message('2026-01..2026-02..2026-03')).toEqual([
      'command line: --period 2026-01..2026-02..2026-03 is not a range; write it like 2026-01..2026-10',
    ]);
    expect(message('1900-01..2026-01')).toEqual([
      'command line: --period 1900-01..2026-01 spans more than 530 periods',
    ]);
  });

  test('isPeriodRange', () => {
    expect(isPeriodRange('2026-01..2026-03')).toBe(true);
    expect(isPeriodRange('2026-01')).toBe(false);
  });
});

describe('option parsers', () => {
  test('--formats', () => {
    expect(parseFormats('html, PDF,json,html')).toEqual(['html', 'pdf', 'json']);
    expect(() => parseFormats('html,')).toThrow(InvalidArgumentError);
    expect(() => parseFormats('docx')).toThrow(/unknown format "docx" \(choose from html, pdf, json, csv, xlsx\)/);
  });

  test('--jobs', () => {
    expect(parseJobs('4')).toBe(4);
    for (const bad of ['0', '-1', '2.5', 'many', '1000']) {
      expect(() => parseJobs(bad)).toThrow(/whole number from 1 to 256/);
    }
  });
});
