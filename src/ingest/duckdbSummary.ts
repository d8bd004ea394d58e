import {createHash} from 'node:crypto';
import {DuckDBDecimalType, DuckDBTypeId, type DuckDBConnection} from '@duckdb/node-api';
import {daysFromCivil} from '../time/period.js';
import {periodOfDay} from '../time/stamp.js';
import type {CellReader} from './cells.js';
import {doubles, joined} from './duckdbDoubles.js';
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
 * first and last day and instant, in no order (the engine's sort cost more than {@link keyOrder}). The numeric columns
 * are copied from the engine's chunks as whole arrays (duckdbDoubles.ts), the keys item by item. It is used only when
 *
 * - the pack reads no series of the source by `first` or `last` (those follow the rows' order, which a query
 *   without ORDER BY does not have) and the source has no `dateFormat`;
 * - the date column is DATE, TIMESTAMP, or TIMESTAMPTZ with `timeZone: UTC` (whole milliseconds, years 1000–9999),
 *   and the value column DOUBLE, a DECIMAL of at most 15 digits, or an integer up to BIGINT (their DOUBLE is the
 *   number ingest reads from their text);
 * - every value is NULL or a whole number of millionths (decimalUnits.ts: no NaN, no 1/3, below about 9·10^9), every
 *   date within the years 1000–9999; keys are neither NULL nor blank, no two differ only by surrounding blanks, and
 *   rows are finer than the pack.
 *
 * Then each period holds what the rows would have given, to the last bit, and the stores come in key order either
 * way. The manifest's SHA-256 is of the summaries in a canonical form ({@link SummaryHash}, ordered by key in code
 * units and by period): a change to the table that changes any count, sum, extreme or covered day changes it.
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
    's AS (SELECT *, round(v * 1000000) AS u FROM r),',
    // ok: 1 when every value is a whole number of millionths (or NULL) and every instant whole milliseconds. (Undated
    // rows share one group of NULL period, whose min(d) is NULL, so ok 0.)
    `g AS (SELECT k, (coalesce(bool_and(u / 1000000 = v), true)${timed ? ' AND NOT bool_or(partms)' : ''}`,
    "  AND min(d) IS NOT NULL)::DOUBLE AS ok,",
    '  count(*)::DOUBLE AS n, count(v)::DOUBLE AS nv, sum(u::BIGINT) AS su, min(v) AS lo, max(v) AS hi,',
    "  (min(d) - DATE '1970-01-01')::DOUBLE AS d0, (max(d) - DATE '1970-01-01')::DOUBLE AS d1",
    timed ? '  , min(t)::DOUBLE AS t0, max(t)::DOUBLE AS t1' : '',
    `  FROM s GROUP BY k, ${period})`,
    // The exact sum as a DOUBLE while below 2^53 millionths, as text beyond.
    `SELECT k, CASE WHEN abs(su) > ${Number.MAX_SAFE_INTEGER} THEN su::VARCHAR END AS big, ok, n, nv,`,
    `  CASE WHEN abs(su) <= ${Number.MAX_SAFE_INTEGER} THEN su::DOUBLE END AS su, lo, hi, d0, d1${timed ? ', t0, t1' : ''}`,
    'FROM g',
  ].join('\n');
  const k: (string | null)[] = [];
  const big = new Map<number, bigint>();
  const parts: Float64Array[][] = [];
  try {
    const result = await connection.stream(sql);
    const width = result.columnCount;
    for (let c = 2; c < width; c++) parts.push([]);
    for (;;) {
      const chunk = await result.fetchChunk();
      if (chunk === null || chunk.rowCount === 0) break;
      const keys = chunk.getColumnVector(0);
      const bigs = chunk.getColumnVector(1);
      for (let c = 2; c < width; c++) parts[c - 2].push(doubles(chunk, c));
      const su = parts[3].at(-1)!;
      // (rowCount is a call into the engine.)
      const rows = chunk.rowCount;
      for (let j = 0; j < rows; j++) {
        if (Number.isNaN(su[j]) && bigs.getItem(j) !== null) big.set(k.length + j, BigInt(bigs.getItem(j) as string));
      }
      for (let j = 0; j < rows; j++) k.push(keys.getItem(j) as string | null);
    }
  } catch {
    // An engine error on a value (NaN, an infinite date, a value beyond 64 bits): the rows are read one by one and
    // any problem is reported there.
    return null;
  }
  const [ok, n, nv, su, lo, hi, d0, d1, t0 = d0, t1 = d1] = parts.map(joined);
  const groups = k.length;
  if (groups === 0) return null;
  for (let g = 0; g < groups; g++) {
    if (k[g] === null || ok[g] !== 1 || d0[g] < FIRST_DAY || d1[g] > LAST_DAY) return null;
    if (nv[g] !== 0 && !(Math.abs(lo[g]) <= LARGEST && Math.abs(hi[g]) <= LARGEST)) return null;
  }
  // The groups in key order, each key's by day: a key's first group starts it, end[i] is its last (positions in order).
  const order = keyOrder(k as string[], d0);
  const keyOf = (i: number) => (i >= 0 && i < groups ? k[order[i]] : null);
  const end = new Int32Array(groups);
  const trimmed = new Map<string, string>();
  let instants = false;
  let wantedKey = false;
  for (let i = groups - 1, last = groups - 1; i >= 0; i--) {
    const g = order[i];
    const key = k[g] as string;
    if (key !== keyOf(i + 1)) last = i;
    end[i] = last;
    if (key !== keyOf(i - 1)) {
      const t = key.trim();
      if (t === '' || (trimmed.get(t) ?? key) !== key) return null;
      trimmed.set(t, key);
      wantedKey = wanted.all || wanted.names.has(t);
    }
    if (wantedKey && t0[g] !== t1[g]) instants = true;
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
  let keyLine = '';
  for (let i = 0; i < groups; i++) {
    const g = order[i];
    const first = d0[g];
    const last = d1[g];
    const p = periodOfDay(frequency, first);
    const key = k[g] as string;
    const sameKey = key === keyOf(i - 1);
    // The engine's grouping must be the pack's periods exactly: each group one period, no period in two groups.
    if (periodOfDay(frequency, last) !== p || (sameKey && p <= previous)) {
      throw new Error(`duckdb summary: days ${first} and ${last} of key ${key} grouped apart from period ${p}`);
    }
    previous = p;
    const units = big.get(g) ?? (Number.isNaN(su[g]) ? 0 : su[g]);
    if (!sameKey) {
      store = visitor.keep(key.trim());
      store?.reserve(p, periodOfDay(frequency, d1[order[end[i]]]));
      keyLine = line([key]);
    }
    store?.put(p, {
      rows: n[g],
      values: nv[g],
      units,
      min: lo[g],
      max: hi[g],
      instants: t0[g] !== t1[g],
    });
    rows += n[g];
    if (first < from) from = first;
    if (last > to) to = last;
    hash.add(keyLine, units, p, n[g], nv[g], lo[g], hi[g], first, last, t0[g], t1[g]);
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
 * Indices of groups in order of key (code units, as ingest orders a query's keys) and, within a key, of first day:
 * the keys are sorted once each and the groups counted into place, cheaper than having the engine sort its result
 * (measured: 0.1–0.2 s of 0.9 s for the benchmark's 330,000 groups).
 */
function keyOrder(k: readonly string[], d0: Float64Array): Int32Array {
  const rank = new Map<string, number>();
  for (const key of k) rank.set(key, 0);
  const keys = [...rank.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  keys.forEach((key, r) => rank.set(key, r));
  const ranks = new Int32Array(k.length);
  const start = new Int32Array(keys.length + 1);
  for (let g = 0; g < k.length; g++) start[(ranks[g] = rank.get(k[g])!) + 1]++;
  for (let r = 0; r < keys.length; r++) start[r + 1] += start[r];
  const order = new Int32Array(k.length);
  const next = start.slice(0, keys.length);
  for (let g = 0; g < k.length; g++) order[next[ranks[g]]++] = g;
  // Each key's few groups by first day (insertion sort).
  for (let r = 0; r < keys.length; r++) {
    for (let i = start[r] + 1; i < start[r + 1]; i++) {
      const g = order[i];
      let j = i - 1;
      for (; j >= start[r] && d0[order[j]] > d0[g]; j--) order[j + 1] = order[j];
      order[j + 1] = g;
    }
  }
  return order;
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

  /** One group: its key as a line of COPY text (`line([key])`), its exact sum and its numbers (NaN for none). */
  add(keyLine: string, units: number | bigint, period: number, rows: number, values: number, ...rest: number[]): void {
    this.keys += keyLine;
    const big = typeof units === 'bigint';
    if (big) this.keys += `${units}\n`;
    const view = this.numbers;
    let o = this.filled * FIELDS * 8;
    view.setFloat64(o, period, true);
    view.setFloat64((o += 8), rows, true);
    view.setFloat64((o += 8), values, true);
    view.setFloat64((o += 8), big ? NaN : Number(units), true);
    for (let f = 0; f < rest.length; f++) view.setFloat64((o += 8), rest[f], true);
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
