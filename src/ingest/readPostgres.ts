import pg from 'pg';
import type {CellReader} from './cells.js';
import * as msg from './messages.js';
import {QueryRows} from './queryRows.js';
import type {RowVisitor} from './rowVisitor.js';
import type {InputFile} from './types.js';

/** Every column as the server's text: DATE, TIMESTAMP, NUMERIC and the rest are never turned into JS values. */
const asText = {getTypeParser: () => (value: string) => value};

/**
 * Run a source's query on a PostgreSQL server through the `pg` client and hand its rows to a visitor as text,
 * through {@link QueryRows} (canonical text hashed for the manifest).
 *
 * The connection string comes from the environment variable the pack names (`connection: {env: LEDGER_URL}`),
 * never from the pack, and is never written anywhere: problems name the variable, and server errors about the
 * login are replaced by a fixed text (PostgreSQL's own mentions the user). The query runs as one named prepared
 * statement (the extended protocol takes exactly one statement) inside `BEGIN READ ONLY` with
 * `SET LOCAL statement_timeout`, and the transaction is rolled back. Every type parser returns the server's text
 * (DATE `2026-10-31`, TIMESTAMPTZ `2026-10-31 10:00:00+00`, NUMERIC digits), so no local-time `Date` is made.
 * Rows arrive by `row` events and are not kept.
 */
export async function readPostgres(cells: CellReader, visitor: RowVisitor): Promise<InputFile | undefined> {
  const {source} = cells;
  const env = source.connectionEnv ?? '';
  const connectionString = process.env[env];
  if (connectionString === undefined || connectionString.trim() === '') {
    cells.report(null, null, msg.envUnset(env));
    return undefined;
  }
  const timeout = Math.round(source.timeoutSeconds * 1000);
  let client: pg.Client;
  try {
    client = new pg.Client({connectionString, types: asText, connectionTimeoutMillis: timeout});
  } catch {
    cells.report(null, null, msg.badConnection(env));
    return undefined;
  }
  // A connection that fails later (server gone) must not crash the process through an unhandled 'error'.
  client.on('error', () => undefined);
  try {
    await client.connect();
  } catch (e) {
    cells.report(null, null, connectProblem(e, env));
    await client.end().catch(() => undefined);
    return undefined;
  }
  try {
    await client.query('BEGIN READ ONLY');
    await client.query(`SET LOCAL statement_timeout = ${timeout}`);
    const rows = new QueryRows(source, visitor);
    let open = true;
    let headerSeen = false;
    const config = {text: source.query ?? '', name: `ebbflow-${source.id}`, rowMode: 'array'} as pg.QueryConfig;
    const query = new pg.Query(config);
    // A failure inside the handler (a bug) must reach this function, not escape from pg's socket callback.
    let failure: unknown;
    query.on('row', (row: (string | null)[], result?: {fields?: {name: string}[]}) => {
      if (!open || failure !== undefined) return;
      try {
        if (!headerSeen) {
          headerSeen = true;
          open = rows.header((result?.fields ?? []).map((f) => f.name));
          if (!open) return;
        }
        rows.rows([row]);
      } catch (e) {
        failure = e;
      }
    });
    const done = await new Promise<{fields: {name: string}[]}>((resolve, reject) => {
      query.on('end', resolve);
      query.on('error', reject);
      client.query(query);
    });
    if (failure !== undefined) throw failure;
    if (!headerSeen && !rows.header(done.fields.map((f) => f.name))) return undefined;
    if (!open) return undefined;
    if (rows.count === 0) {
      cells.report(null, null, msg.queryNoRows());
      return undefined;
    }
    return rows.input();
  } catch (e) {
    // A bug stays a bug (exit 1); what the server or the network says is a problem with the source.
    if (e instanceof TypeError || e instanceof RangeError || e instanceof ReferenceError) throw e;
    cells.report(null, null, queryProblem(e, source.timeoutSeconds, env));
    return undefined;
  } finally {
    await client.query('ROLLBACK').catch(() => undefined);
    await client.end().catch(() => undefined);
  }
}

/** SQLSTATE and Node error code of an error, if any. */
function codes(e: unknown): {sqlstate: string; code: string} {
  const code = typeof e === 'object' && e !== null ? String((e as {code?: unknown}).code ?? '') : '';
  return {sqlstate: /^[0-9A-Z]{5}$/.test(code) ? code : '', code};
}

/** A failed connection as a problem; never the connection string or the server's text about the login. */
function connectProblem(e: unknown, env: string): string {
  const {sqlstate, code} = codes(e);
  if (sqlstate === '28P01' || sqlstate === '28000') return msg.authFailed(env);
  if (sqlstate === '3D000') return msg.connectFailed(env, 'the database does not exist');
  if (code === 'ECONNREFUSED') return msg.connectFailed(env, 'connection refused');
  if (code === 'ENOTFOUND' || code === 'EAI_AGAIN') return msg.connectFailed(env, 'host not found');
  if (code === 'ETIMEDOUT' || /timeout/i.test(e instanceof Error ? e.message : ''))
    return msg.connectFailed(env, 'no answer in time');
  if (/^E[A-Z]+$/.test(code)) return msg.connectFailed(env, code);
  if (sqlstate !== '') return msg.connectFailed(env, `server error ${sqlstate}`);
  return msg.badConnection(env);
}

/** A failed query as a problem, with PostgreSQL's message (about the query, not the login). */
function queryProblem(e: unknown, seconds: number, env: string): string {
  const {sqlstate} = codes(e);
  if (sqlstate === '57014') return msg.queryTimeout(seconds);
  if (sqlstate.startsWith('28')) return msg.authFailed(env);
  if (sqlstate === '') return msg.connectFailed(env, 'the connection was lost');
  const text = e instanceof Error ? e.message.split('\n')[0] : String(e);
  // The server's hint, when it has one ("Perhaps you meant to reference the column …").
  const hint = typeof e === 'object' && e !== null ? (e as {hint?: unknown}).hint : undefined;
  const more =
    typeof hint === 'string' && hint !== '' ? `; ${hint[0].toLowerCase()}${hint.slice(1).replace(/\.$/, '')}` : '';
  return msg.queryFailed('postgres', `${text} (SQLSTATE ${sqlstate})${more}`);
}
