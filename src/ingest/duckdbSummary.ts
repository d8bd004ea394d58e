import {createHash} from 'node:crypto';
import {DuckDBDecimalType, DuckDBTypeId, type DuckDBConnection} from '@duckdb/node-api';
import {daysFromCivil} from '../time/period.js';
import {periodOfDay} from '../time/stamp.js';
import type {CellReader} from './cells.js';
import {line} from './queryRows.js';
import type {PeriodStore} from './periodStore.js';
import type {LongVisitor} from './readLong.js';
import type {Wanted} from './sourceData.js';
import type {InputFile} from './types.js';

/** A SQL identifier. */
const ident = (s: string) => `"${s.replace(/"/g, '""')}"`;

/** Value column types whose DOUBLE cast equals the number ingest reads from the engine's text of the value. */
const EXACT_NUMBERS = new Set([
  DuckDBTypeId.TINYINT,
  DuckDBTypeId.SMALLINT,
  DuckDBTypeId.INTEGER,
  DuckDBTypeId.BIGINT,
  DuckDBTypeId.UTINYINT,
  DuckDBTypeId.USMALLINT,
  DuckDBTypeId.UINTEGER,
  DuckDBTypeId.DOUBLE,
]);

/**
 * Largest |value| taken: its millionths stay below 2^53, so the engine's check `round(v * 1000000) / 1000000 = v`
 * (with this bound) implies decimalUnits.ts's microUnits is exact too. (A NaN passes that check, as the engine
 * holds NaN equal to itself, but its cast to BIGINT fails, and the rows are then read one by one.)
 */
const LARGEST = 9e9;

/** 1000-01-01 and 9999-12-31 as days since 1970-01-01: the years ingest reads from the engine's text of a date. */
const FIRST_DAY = daysFromCivil(1000, 1, 1);
const LAST_DAY = daysFromCivil(9999, 12, 31);

/**
 * Have DuckDB sum a long source's rows up by key and pack period, and fill the period stores from the summaries,
 * instead of handing every row to JavaScript as text: 10 million rows become 10,000 keys × 33 months. Returns null
 * when the summaries could differ in any way from reading the rows one by one (ingest/readLong.ts); the caller then
 * reads the rows, and their problems are reported as usual.
 *
 * The query is run as `SELECT … FROM (query) GROUP BY key, period`, with per group: rows, values (not NULL), the
 * exact sum in millionths (PeriodStore's rule; 128-bit integers, so no order of addition matters), minimum, maximum,
 * first and last day and instant. The summaries are read column by column from the engine's chunks. It is used
 * only when
 *
 * - the pack reads no series of the source by `first` or `last` (those follow the rows' order, which a query
 *   without ORDER BY does not have) and the source has no `dateFormat`;
 * - the date column is DATE, TIMESTAMP, or TIMESTAMPTZ with `timeZone: UTC` (whole milliseconds, years 1000–9999),
 *   and the value column DOUBLE, a DECIMAL of at most 15 digits, or an integer up to BIGINT (their DOUBLE is the
 *   number ingest reads from their text);
 * - every value is NULL or a whole number of millionths (decimalUnits.ts: no NaN, no 1/3, below about 9·10^9), every
 *   date within the years 1000–9999; keys are neither NULL nor blank, no two differ only by surrounding blanks, and rows are finer than the pack.
 *
 * Then each period holds what the rows would have given, to the last bit, and the stores come in key order either
 * way. The manifest's SHA-256 is of the summaries in a canonical form ({@link SummaryHash}, ordered by key and
 * period): a change to the table that changes any count, sum, extreme or covered day changes it.
 */
export async function duckdbSummary(
  connection: DuckDBConnection,
  query: string,
  cells: CellReader,
  visitor: LongVisitor,
  wanted: Wanted,
): Promise<InputFile | null> {
  const {source, frequency} = cells;
  if (wanted.ordered !== false || source.dateFormat !== null || source.layout !== 'long') return null;
  const prepared = await connection.prepare(`SELECT * FROM (${query}\n)`);
  const names = Array.from({length: prepared.columnCount}, (_, i) => prepared.columnName(i));
  const types = names.map((_, i) => prepared.columnType(i));
  prepared.destroySync();
  const at = (name: string | null) => (name === null ? -1 : names.indexOf(name));
  const [dateAt, keyAt, valueAt] = [at(source.dateColumn), at(source.keyColumn), at(source.valueColumn)];
  if (dateAt < 0 || keyAt < 0 || valueAt < 0) return null;
  const dateType = types[dateAt].typeId;
  const valueType = types[valueAt];
  const timed = dateType === DuckDBTypeId.TIMESTAMP || (dateType === DuckDBTypeId.TIMESTAMP_TZ && source.timeZone === 'UTC');
  if (!timed && dateType !== DuckDBTypeId.DATE) return null;
  const decimal = valueType instanceof DuckDBDecimalType && valueType.width <= 15;
  if (!decimal && !EXACT_NUMBERS.has(valueType.typeId)) return null;

  const d = ident(names[dateAt]);
  const period = {
    monthly: 'year(d) * 12 + month(d) - 1',
    quarterly: 'year(d) * 4 + quarter(d) - 1',
    weekly: "floor((d - DATE '1970-01-05') / 7)",
  }[frequency];
  const sql = [
    'WITH r AS (SELECT',
    `  CAST(${ident(names[keyAt])} AS VARCHAR) AS k, CAST(${d} AS DATE) AS d,`,
    timed ? `  epoch_ms(${d}) AS t, microsecond(${d}) % 1000 <> 0 AS partms,` : '',
    `  CAST(${ident(names[valueAt])} AS DOUBLE) AS v FROM (${query}\n)),`,
    's AS (SELECT *, round(v * 1000000) AS u FROM r)',
    'SELECT k, count(*)::DOUBLE AS n, count(v)::DOUBLE AS nv, sum(u::BIGINT) AS su, bool_and(u / 1000000 = v) AS exact,',
    "  min(v) AS lo, max(v) AS hi, (min(d) - DATE '1970-01-01')::DOUBLE AS d0, (max(d) - DATE '1970-01-01')::DOUBLE AS d1,",
    timed ? '  min(t)::DOUBLE AS t0, max(t)::DOUBLE AS t1, bool_or(partms) AS partms,' : '',
    '  count(d)::DOUBLE AS dated',
    `FROM s GROUP BY k, ${period} ORDER BY k, d0`,
  ].join('\n');
  const columns: unknown[][] = [];
  try {
    const result = await connection.stream(sql);
    const width = result.columnCount;
    for (let c = 0; c < width; c++) columns.push([]);
    for (;;) {
      const chunk = await result.fetchChunk();
      if (chunk === null || chunk.rowCount === 0) break;
      const rows = chunk.rowCount;
      for (let c = 0; c < width; c++) {
        const vector = chunk.getColumnVector(c);
        const column = columns[c];
        for (let j = 0; j < rows; j++) column.push(vector.getItem(j));
      }
    }
  } catch {
    // An engine error on a value (NaN, an infinite date, a value beyond 64 bits): the rows are read one by one and
    // any problem is reported there.
    return null;
  }
  const [k, n, nv, su, exact, lo, hi, d0, d1] = columns;
  const [t0, t1, partms] = timed ? columns.slice(9, 12) : [d0, d1, []];
  const dated = columns[columns.length - 1];
  const groups = k.length;
  if (groups === 0) return null;
  const trimmed = new Map<string, string>();
  const spans = new Map<string, {first: number; last: number}>();
  let instants = false;
  for (let g = 0; g < groups; g++) {
    const key = k[g] as string | null;
    if (key === null || dated[g] !== n[g] || exact[g] === false || partms[g] === true) return null;
    if (nv[g] !== 0 && !(Math.abs(lo[g] as number) <= LARGEST && Math.abs(hi[g] as number) <= LARGEST)) return null;
    if ((d0[g] as number) < FIRST_DAY || (d1[g] as number) > LAST_DAY) return null;
    const t = key.trim();
    if (t === '' || (trimmed.get(t) ?? key) !== key) return null;
    trimmed.set(t, key);
    const span = spans.get(t);
    if (span === undefined) spans.set(t, {first: d0[g] as number, last: d1[g] as number});
    else span.last = d1[g] as number;
    if ((wanted.all || wanted.names.has(t)) && t0[g] !== t1[g]) instants = true;
  }
  // Rows at the pack's own frequency may be duplicates, named by their lines: only the rows can tell.
  if (!instants) return null;

  visitor.header(names, 0);
  const hash = new SummaryHash();
  let rows = 0;
  let from = Infinity;
  let to = -Infinity;
  let previous = 0;
  let store: PeriodStore | undefined;
  for (let g = 0; g < groups; g++) {
    const first = d0[g] as number;
    const last = d1[g] as number;
    const p = periodOfDay(frequency, first);
    // The engine's grouping must be the pack's periods exactly: each group one period, no period in two groups.
    if (periodOfDay(frequency, last) !== p || (k[g] === k[g - 1] && p <= previous)) {
      throw new Error(`duckdb summary: days ${first} and ${last} of key ${k[g]} grouped apart from period ${p}`);
    }
    previous = p;
    const units = su[g] === null ? 0n : (su[g] as bigint);
    if (k[g] !== k[g - 1]) {
      const key = (k[g] as string).trim();
      const span = spans.get(key)!;
      store = visitor.keep(key);
      store?.reserve(periodOfDay(frequency, span.first), periodOfDay(frequency, span.last));
    }
    store?.put(p, {
      rows: n[g] as number,
      values: nv[g] as number,
      units,
      min: lo[g] === null ? NaN : (lo[g] as number),
      max: hi[g] === null ? NaN : (hi[g] as number),
      instants: t0[g] !== t1[g],
    });
    rows += n[g] as number;
    if (first < from) from = first;
    if (last > to) to = last;
    hash.add(k[g] as string, units, [p, n[g], nv[g], lo[g], hi[g], first, last, t0[g], t1[g]] as (number | null)[]);
  }
  cells.summarised(from, to, periodOfDay(frequency, from), periodOfDay(frequency, to));
  return {
    file: `${source.id} (duckdb query)`,
    sha256: hash.digest(),
    bytes: hash.bytes,
    rows,
    query: {engine: 'duckdb', text: source.query ?? '', summarised: true},
  };
}

/**
 * SHA-256 of the summaries in a canonical form, in order: for each batch of 4,096 groups, their keys (COPY text form,
 * one line each, a sum beyond 2^53 millionths as one more line of its digits), then each group's numbers as
 * little-endian 64-bit floats (period, rows, values, sum in millionths, minimum, maximum, first and last day, first
 * and last instant; NaN for none). Numbers as bytes, not text: writing 3 million numbers as text took 0.5 s.
 */
class SummaryHash {
  private readonly hash = createHash('sha256');
  private readonly numbers = new DataView(new ArrayBuffer(BATCH * FIELDS * 8));
  private keys = '';
  private filled = 0;
  bytes = 0;

  constructor() {
    this.keys = line(['key', 'period', 'rows', 'values', 'millionths', 'min', 'max', 'first day', 'last day', 'first ms', 'last ms']);
  }

  add(key: string, units: bigint, numbers: (number | null)[]): void {
    this.keys += line([key]);
    const big = units > MAX_UNITS || units < -MAX_UNITS;
    if (big) this.keys += `${units}\n`;
    const o = this.filled * FIELDS * 8;
    const values = [numbers[0], numbers[1], numbers[2], big ? NaN : Number(units), ...numbers.slice(3)];
    for (let f = 0; f < FIELDS; f++) this.numbers.setFloat64(o + 8 * f, values[f] ?? NaN, true);
    if (++this.filled === BATCH) this.flush();
  }

  digest(): string {
    this.flush();
    return this.hash.digest('hex');
  }

  private flush(): void {
    const numbers = new Uint8Array(this.numbers.buffer, 0, this.filled * FIELDS * 8);
    this.hash.update(this.keys);
    this.hash.update(numbers);
    this.bytes += Buffer.byteLength(this.keys) + numbers.length;
    this.keys = '';
    this.filled = 0;
  }
}

const BATCH = 4096;
const FIELDS = 10;
const MAX_UNITS = BigInt(Number.MAX_SAFE_INTEGER);
