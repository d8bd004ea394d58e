import duckdb from '@duckdb/node-bindings';
import type {DuckDBDataChunk} from '@duckdb/node-api';

const ALL_VALID = 0xffff_ffff_ffff_ffffn;

/**
 * A DOUBLE column of a result chunk as a copy of the engine's own array, NaN where the value is NULL.
 *
 * Why not the vector's `getItem`: it tests every row's validity bit with BigInt arithmetic, so reading the
 * 330,000 summaries of the ingest benchmark (8 columns) that way took about 0.4 s with its garbage; copying the
 * engine's memory takes a few milliseconds. Validity is read through the C API's 64-bit words (`BigUint64Array`,
 * in the machine's byte order, as the engine writes them); a word of all ones has no NULL, so bits are looked at only
 * in words that hold one.
 */
export function doubles(chunk: DuckDBDataChunk, column: number): Float64Array {
  const rows = chunk.rowCount;
  const vector = duckdb.data_chunk_get_vector(chunk.chunk, column);
  const data = duckdb.vector_get_data(vector, rows * 8);
  const out = new Float64Array(rows);
  out.set(new Float64Array(data.buffer, data.byteOffset, rows));
  const words = Math.ceil(rows / 64);
  const validity = duckdb.vector_get_validity(vector, words * 8);
  if (validity === null) return out;
  const mask = new BigUint64Array(validity.buffer, validity.byteOffset, words);
  for (let w = 0; w < words; w++) {
    if (mask[w] === ALL_VALID) continue;
    for (let j = w * 64; j < Math.min(rows, w * 64 + 64); j++) {
      if (((mask[w] >> BigInt(j - w * 64)) & 1n) === 0n) out[j] = NaN;
    }
  }
  return out;
}

/** Arrays of one column, chunk after chunk, as one array. */
export function joined(parts: Float64Array[]): Float64Array {
  const out = new Float64Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
