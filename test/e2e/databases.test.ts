/**
 * SQL sources end to end with real engines, no mocks: the same daily till rows (3 regions, 1 January 2022 to
 * 14 June 2025) as a CSV, as a Parquet file read through the embedded DuckDB, and as a table on a throwaway
 * PostgreSQL server started here (Debian's postgresql 15: initdb on a temporary folder, a free port, stopped at the
 * end). Each pack aggregates the days to months (June 2025 is cut and left out) and the three results.json files
 * must hold the same figures. The PostgreSQL pack is built to HTML, PDF and JSON, and its password must appear in
 * no output.
 */
import {execFileSync} from 'node:child_process';
import {mkdtemp, readdir, readFile, rm, writeFile, mkdir} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {DuckDBInstance} from '@duckdb/node-api';
import pg from 'pg';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {main, type Io} from '../../src/cli/main.js';
import {startCluster, type Cluster} from '../helpers/postgresCluster.js';

let root = '';
let cluster: Cluster;
const REGIONS = ['North', 'South', 'Coast'];

/** Run the CLI in-process; returns the exit code and what it printed. */
async function cli(...args: string[]): Promise<{code: number; stdout: string; stderr: string}> {
  let stdout = '';
  let stderr = '';
  const io: Io = {stdout: {write: (t: string) => (stdout += t)}, stderr: {write: (t: string) => (stderr += t)}};
  const code = await main(args, io);
  return {code, stdout, stderr};
}

/** Daily rows: a yearly swing, a weekday pattern and a fixed integer hash as noise; cents, so every path reads the same text. */
function tillRows(): [string, string, string][] {
  const rows: [string, string, string][] = [];
  const start = Date.UTC(2022, 0, 1);
  const end = Date.UTC(2025, 5, 14);
  for (let t = start, i = 0; t <= end; t += 86_400_000, i++) {
    const day = new Date(t).toISOString().slice(0, 10);
    REGIONS.forEach((region, r) => {
      const season = 1 + 0.25 * Math.sin((2 * Math.PI * i) / 365.25 + r);
      const weekday = [1, 1, 1, 1.1, 1.3, 1.6, 0.7][new Date(t).getUTCDay()];
      const noise = (((i * 2654435761 + r * 40503) >>> 0) % 1000) / 1000 - 0.5;
      rows.push([day, region, (1000 * (r + 1) * season * weekday * (1 + 0.05 * noise) + i).toFixed(2)]);
    });
  }
  return rows;
}

function pack(id: string, source: string, formats = '[json]'): string {
  return [
    'pack:',
    `  id: ${id}`,
    '  title: Tills by region',
    '  organisation: Tarnwick Outdoor Co.',
    '  frequency: monthly',
    `  formats: ${formats}`,
    'sources:',
    '  - id: tills',
    ...source.split('\n').map((l) => `    ${l}`),
    '    layout: long',
    '    dateColumn: day',
    '    keyColumn: region',
    '    valueColumn: amount',
    'series:',
    '  - fromSource: tills',
    '    unit: EUR',
    'defaults:',
    '  forecast: {method: theta}',
    '',
  ].join('\n');
}

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'ebbflow-databases-'));
  await mkdir(join(root, 'data'));
  const rows = tillRows();
  await writeFile(join(root, 'data', 'tills.csv'), ['day,region,amount', ...rows.map((r) => r.join(','))].join('\n') + '\n');
  const db = await (await DuckDBInstance.create(':memory:')).connect();
  await db.run(
    `COPY (SELECT day::DATE AS day, region, amount::DECIMAL(12,2) AS amount FROM read_csv('${join(root, 'data', 'tills.csv')}', ` +
      `columns = {'day': 'VARCHAR', 'region': 'VARCHAR', 'amount': 'VARCHAR'}, header = true)) TO '${join(root, 'data', 'tills.parquet')}' (FORMAT parquet)`,
  );
  db.closeSync();
  cluster = await startCluster();
  await cluster.sql('CREATE TABLE tills (day date NOT NULL, region text NOT NULL, amount numeric(12,2) NOT NULL)');
  for (let i = 0; i < rows.length; i += 1000) {
    const values = rows.slice(i, i + 1000).map(([d, r, a]) => `('${d}', '${r}', ${a})`);
    await cluster.sql(`INSERT INTO tills VALUES ${values.join(', ')}`);
  }
  await writeFile(join(root, 'csv.yaml'), pack('tills-csv', 'file: data/tills.csv'));
  await writeFile(
    join(root, 'duckdb.yaml'),
    pack('tills-duckdb', "engine: duckdb\nquery: SELECT day, region, amount FROM read_parquet('data/tills.parquet') ORDER BY day, region"),
  );
  await writeFile(
    join(root, 'postgres.yaml'),
    pack(
      'tills-postgres',
      'engine: postgres\nconnection: {env: EBBFLOW_TEST_LEDGER}\nquery: SELECT day, region, amount FROM tills ORDER BY day, region',
      '[html, pdf, json]',
    ),
  );
}, 120_000);

afterAll(async () => {
  cluster?.stop();
  await rm(root, {recursive: true, force: true});
});

async function results(id: string): Promise<{series: unknown[]; pack: {period: string}}> {
  return JSON.parse(await readFile(join(root, 'out', id, '2025-05', 'results.json'), 'utf8'));
}

describe('the same rows through CSV, DuckDB and PostgreSQL', () => {
  it('build to the same results.json figures; the manifest records engine, query and the rows hash', async () => {
    process.env.EBBFLOW_TEST_LEDGER = cluster.url;
    try {
      for (const name of ['csv', 'duckdb', 'postgres']) {
        const run = await cli('build', join(root, `${name}.yaml`), '--out', join(root, 'out'), '--jobs', '1');
        expect(run.stderr, name).not.toMatch(/problem/);
        expect(run.code, `${name}: ${run.stderr}`).toBe(0);
      }
    } finally {
      delete process.env.EBBFLOW_TEST_LEDGER;
    }
    const [csv, duckdb, postgres] = await Promise.all(['tills-csv', 'tills-duckdb', 'tills-postgres'].map(results));
    expect(csv.pack.period).toBe('2025-05');
    expect(csv.series).toHaveLength(3);
    // The queries sort regions by name, the CSV keeps North, South, Coast: series come in first-seen order.
    const byId = (list: unknown[]) => [...list].sort((a, b) => ((a as {id: string}).id < (b as {id: string}).id ? -1 : 1));
    expect(byId(duckdb.series)).toEqual(byId(csv.series));
    expect(byId(postgres.series)).toEqual(byId(csv.series));
    const manifest = JSON.parse(await readFile(join(root, 'out', 'tills-postgres', '2025-05', 'manifest.json'), 'utf8'));
    expect(manifest.inputs).toEqual([
      {
        file: 'tills (postgres query)',
        bytes: expect.any(Number),
        sha256: expect.stringMatching(/^[0-9a-f]{64}$/),
        rows: 3 * 1261,
        engine: 'postgres',
        query: 'SELECT day, region, amount FROM tills ORDER BY day, region',
      },
    ]);
    const duckManifest = JSON.parse(await readFile(join(root, 'out', 'tills-duckdb', '2025-05', 'manifest.json'), 'utf8'));
    // DuckDB summed the rows up by region and month itself: its hash is of those summaries, PostgreSQL's of the rows.
    expect(duckManifest.inputs[0]).toMatchObject({rows: 3 * 1261, engine: 'duckdb', hashed: 'period summaries'});
    expect(duckManifest.inputs[0].sha256).not.toBe(manifest.inputs[0].sha256);
    expect(manifest.plan.sources[0]).toMatchObject({connectionEnv: 'EBBFLOW_TEST_LEDGER', reader: 'postgres'});
  }, 900_000);

  it('the PostgreSQL pack wrote HTML, PDF and JSON, and no output holds the password or the connection string', async () => {
    const folder = join(root, 'out', 'tills-postgres', '2025-05');
    const files = await readdir(folder);
    expect(files).toEqual(expect.arrayContaining(['report.html', 'report.pdf', 'results.json', 'manifest.json']));
    for (const f of files) {
      const text = await readFile(join(folder, f), 'latin1');
      expect(text, f).not.toContain('ledger-pw');
      expect(text, f).not.toContain(`:${cluster.port}`);
    }
    const pdf = execFileSync('pdftotext', [join(folder, 'report.pdf'), '-']).toString();
    expect(pdf).toContain('Tills by region');
    const html = await readFile(join(folder, 'report.html'), 'utf8');
    expect(html).toContain('June 2025 has data for 14 of 30 days (the data stop inside it) and is left out');
    // The data notes name the query source as it is, not as a path relative to the pack's folder.
    expect(html).toContain('>tills (postgres query)<');
    expect(html).not.toContain('/tills (postgres query)');
  }, 60_000);

  it('the query runs read-only and under the statement timeout', async () => {
    const write = "WITH x AS (INSERT INTO tills VALUES ('2030-01-01', 'North', 1) RETURNING *) SELECT day, region, amount FROM x";
    await writeFile(join(root, 'write.yaml'), pack('tills-write', `engine: postgres\nconnection: {env: EBBFLOW_TEST_LEDGER}\nquery: ${write}`));
    const slow = 'SELECT day, region, amount FROM tills, pg_sleep(3) LIMIT 5';
    await writeFile(
      join(root, 'slow.yaml'),
      pack('tills-slow', `engine: postgres\nconnection: {env: EBBFLOW_TEST_LEDGER}\ntimeoutSeconds: 1\nquery: ${slow}`),
    );
    process.env.EBBFLOW_TEST_LEDGER = cluster.url;
    try {
      const w = await cli('check', join(root, 'write.yaml'));
      expect(w.code).toBe(2);
      expect(w.stderr).toMatch(/write\.yaml:8: source tills: the PostgreSQL query failed: cannot execute \w+ in a read-only transaction \(SQLSTATE 25006\)/);
      const t = await cli('check', join(root, 'slow.yaml'));
      expect(t.code).toBe(2);
      expect(t.stderr).toMatch(/slow\.yaml:8: source tills: the query ran longer than 1 s and was stopped/);
    } finally {
      delete process.env.EBBFLOW_TEST_LEDGER;
    }
    // Nothing was written.
    const client = new pg.Client({connectionString: cluster.url});
    await client.connect();
    const written = await client.query("SELECT count(*)::int AS n FROM tills WHERE day = '2030-01-01'");
    await client.end();
    expect(written.rows[0].n).toBe(0);
  }, 120_000);

  it('a DuckDB query may read another folder only when --allow-dir allows it', async () => {
    await mkdir(join(root, 'packs'), {recursive: true});
    const query = `engine: duckdb\nquery: SELECT day, region, amount FROM read_parquet('${join(root, 'data', 'tills.parquet')}')`;
    await writeFile(join(root, 'packs', 'elsewhere.yaml'), pack('tills-elsewhere', query));
    const refused = await cli('check', join(root, 'packs', 'elsewhere.yaml'));
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/elsewhere\.yaml:8: source tills: the query reads a file outside the pack's folder/);
    const allowed = await cli('check', join(root, 'packs', 'elsewhere.yaml'), '--allow-dir', join(root, 'data'));
    expect(allowed.stderr).toMatch(/3 series, review period 2025-05, no problems/);
    expect(allowed.code).toBe(0);
  }, 120_000);
});
