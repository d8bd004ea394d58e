import {readFileSync, writeFileSync, mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, describe, expect, it} from 'vitest';
import type {Aggregate} from '../../src/config/plan.js';
import {formatPeriod, parsePeriod, periodLength, type Frequency} from '../../src/time/period.js';
import {plan, readPack, series, source} from '../ingest/plan.js';
import {worded} from '../fixtures/notes.js';

/**
 * Aggregation checked against R: test/reference/aggregate.R aggregates R's datasets::airquality (daily, 1 May to
 * 30 September 1973, Ozone with missing days) by stats::aggregate into months, quarters and ISO weeks
 * (strftime %G-W%V) and writes test/reference/aggregate.json with R's version; the daily rows are
 * test/fixtures/derive/airquality.csv, written by the same script. Whole periods must match R to 1e-12; the
 * periods the data cover only in part (the week of Tuesday 1 May, the second quarter from May) are left out.
 */
interface Groups {
  periods: string[];
  days: number[];
  [column: string]: unknown;
}
const reference = JSON.parse(readFileSync(join(import.meta.dirname, '../reference/aggregate.json'), 'utf8'));
const csv = join(import.meta.dirname, '../fixtures/derive/airquality.csv');
const METHODS: Aggregate[] = ['sum', 'mean', 'min', 'max', 'first', 'last', 'count'];
const temp = mkdtempSync(join(tmpdir(), 'ebbflow-derive-'));
afterAll(() => rmSync(temp, {recursive: true, force: true}));

/** Every column × method at one frequency, through ingest and derive, against R's groups. */
async function check(frequency: Frequency, groups: Groups, file: string): Promise<{first: string; last: string; notes: string[]}> {
  const src = source('air', file, {dateColumn: 'date'});
  const list = ['ozone', 'wind', 'temp'].flatMap((column) =>
    METHODS.map((method) => series(`${column}-${method}`, 'air', {column, aggregate: method})),
  );
  const data = await readPack(plan(frequency, [src], list));
  const whole = groups.periods.flatMap((label, i) => {
    const p = parsePeriod(frequency, label)!;
    return groups.days[i] === periodLength(frequency, p) ? [{p, i}] : [];
  });
  for (const s of data.series) {
    const [column, method] = s.id.split('-');
    const expected = (groups[column] as Record<string, (number | null)[]>)[method];
    expect(formatPeriod(frequency, s.start), s.id).toBe(formatPeriod(frequency, whole[0].p));
    expect(s.values.length, s.id).toBe(whole.length);
    whole.forEach(({p, i}) => {
      const got = s.values[p - s.start];
      expect(Math.abs(got - expected[i]!), `${s.id} ${groups.periods[i]}: ${got} vs R ${expected[i]}`).toBeLessThan(1e-12);
    });
  }
  return {
    first: formatPeriod(frequency, data.series[0].start),
    last: formatPeriod(frequency, data.period),
    notes: data.notes.map(worded),
  };
}

describe('aggregation against R stats::aggregate (datasets::airquality, daily)', () => {
  it('months: every method equals R to 1e-12', async () => {
    const r = await check('monthly', reference.monthly, csv);
    expect([r.first, r.last]).toEqual(['1973-05', '1973-09']);
  });

  it('quarters: the second quarter (data from 1 May) is left out, the third equals R', async () => {
    const r = await check('quarterly', reference.quarterly, csv);
    expect([r.first, r.last]).toEqual(['1973-Q3', '1973-Q3']);
    expect(r.notes).toContain('Q2 1973 has data for 61 of 91 days (the data start inside it) and is left out');
  });

  it('ISO weeks: the week of Tuesday 1 May is left out, the others equal R', async () => {
    const r = await check('weekly', reference.weekly, csv);
    expect([r.first, r.last]).toEqual(['1973-W19', '1973-W39']);
    expect(r.notes).toContain('W18 1973 has data for 6 of 7 days (the data start inside it) and is left out');
  });

  it('data up to 12 September: September is left out and the review period is August', async () => {
    const rows = readFileSync(csv, 'utf8').split('\n');
    const cut = rows.filter((line, i) => i === 0 || (line !== '' && line.slice(0, 10) <= reference.truncated.to));
    const file = join(temp, 'airquality-to-0912.csv');
    writeFileSync(file, cut.join('\n') + '\n');
    const monthly = await check('monthly', reference.truncated.monthly, file);
    expect(monthly.last).toBe('1973-08');
    expect(monthly.notes).toContain('September 1973 has data for 12 of 30 days (the data stop inside it) and is left out');
    const weekly = await check('weekly', reference.truncated.weekly, file);
    // Wednesday 12 September 1973 is in 1973-W37.
    expect(weekly.last).toBe('1973-W36');
  });
});
