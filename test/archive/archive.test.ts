import {describe, expect, it} from 'vitest';
import {execFileSync} from 'node:child_process';
import {mkdir, readdir, readFile, stat, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {archive, type ArchiveArgs} from '../../src/archive/archive.js';
import {InputError} from '../../src/errors.js';
import {digestOfReport, report} from './fixtures/report.js';
import {listFiles, snapshot, tempDir, deadPid} from './helpers.js';
import type {Report} from '../../src/render/types.js';

function args(outDir: string, rep: Report, extra: Partial<ArchiveArgs> = {}): ArchiveArgs {
  return {
    report: rep,
    digest: digestOfReport(rep),
    html: '<!DOCTYPE html><p>report</p>',
    pdf: Uint8Array.of(37, 80, 68, 70),
    exports: [
      {name: 'series.csv', content: 'period,value\n2026-10,1\n'},
      {name: 'tables.xlsx', content: Uint8Array.of(80, 75, 3, 4)},
    ],
    outDir,
    force: false,
    plan: {id: rep.plan.id, title: rep.plan.title, frequency: 'monthly'},
    warnings: ['net-sales: 1 value missing'],
    ...extra,
  };
}

const oct = () => report(2026, 10, [{id: 'net-sales', label: 'Net sales'}]);

describe('archive', () => {
  it('writes the period folder with every output and a manifest of hashes, no clock values', async () => {
    const out = await tempDir();
    const {folder, outputs} = await archive(args(out, oct()));
    expect(folder).toBe(join(out, 'harbourline-monthly', '2026-10'));
    expect(await listFiles(folder)).toEqual([
      'digest.json',
      'exports/series.csv',
      'exports/tables.xlsx',
      'headlines.json',
      'manifest.json',
      'report.html',
      'report.pdf',
      'results.json',
    ]);
    expect(outputs.map((o) => o.slice(folder.length + 1)).sort()).toEqual(await listFiles(folder));
    const manifest = JSON.parse(await readFile(join(folder, 'manifest.json'), 'utf8'));
    const keys = ['schema', 'tool', 'resultsSchema', 'pack', 'plan', 'inputs', 'outputs', 'warnings'];
    expect(Object.keys(manifest)).toEqual(keys);
    expect(manifest.tool).toEqual({name: 'ebbflow', version: '0.1.0'});
    expect(manifest.resultsSchema).toBe('ebbflow/results/v2');
    expect(manifest.pack.period).toBe('2026-10');
    expect(manifest.plan).toEqual({
      id: 'harbourline-monthly',
      title: 'Harbourline Goods: monthly review',
      frequency: 'monthly',
    });
    expect(manifest.inputs).toEqual([{file: 'data/trading.csv', bytes: 1234, sha256: 'ab'.repeat(32), rows: 48}]);
    expect(manifest.warnings).toEqual(['net-sales: 1 value missing']);
    // The 4-byte PDF stand-in "%PDF": bytes 4; hash checked against coreutils `printf %%PDF | sha256sum`.
    expect(manifest.outputs.find((o: {path: string}) => o.path === 'report.pdf')).toEqual({
      path: 'report.pdf',
      bytes: 4,
      sha256: '315d429b7714cedb6ad04ac31240145257692630457f3c88253c5beceac76027',
    });
    const text = await readFile(join(folder, 'manifest.json'), 'utf8');
    expect(text).not.toMatch(/20\d\d-\d\d-\d\dT|"(date|time|created)"/i);
    expect(await readdir(join(out, 'harbourline-monthly'))).toEqual(['2026-10', 'index.html']);
  });

  it('records the size and SHA-256 of results.json written in blocks, with multi-byte text (sha256sum)', async () => {
    // 300 series whose labels hold 2- and 3-byte UTF-8 characters: a results.json of several write blocks.
    const labels = Array.from({length: 300}, (_, i) => ({id: `s${i}`, label: `Umsätze – Linie ${i} €`}));
    const out = await tempDir();
    const {folder} = await archive(args(out, report(2026, 10, labels)));
    const file = join(folder, 'results.json');
    const manifest = JSON.parse(await readFile(join(folder, 'manifest.json'), 'utf8'));
    const entry = manifest.outputs.find((o: {path: string}) => o.path === 'results.json');
    expect(entry.bytes).toBe((await stat(file)).size);
    expect(entry.bytes).toBeGreaterThan(1 << 20);
    expect(entry.sha256).toBe(execFileSync('sha256sum', [file], {encoding: 'utf8'}).split(' ')[0]);
    expect(JSON.parse(await readFile(file, 'utf8')).series[299].label).toBe('Umsätze – Linie 299 €');
  });

  it('gives byte-identical folders and index for the same inputs', async () => {
    const a = await tempDir();
    const b = await tempDir();
    await archive(args(a, oct()));
    await archive(args(b, oct()));
    expect(await snapshot(a)).toEqual(await snapshot(b));
    await archive(args(a, oct(), {force: true}));
    expect(await snapshot(a)).toEqual(await snapshot(b));
  });

  it('refuses to replace an existing period without force, and writes nothing', async () => {
    const out = await tempDir();
    await archive(args(out, oct()));
    const before = await snapshot(out);
    const changed = args(out, oct(), {html: '<p>changed</p>'});
    const error = await archive(changed).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).message).toBe(
      `${join(out, 'harbourline-monthly', '2026-10')}: period folder already exists; use --force to replace it`,
    );
    expect(await snapshot(out)).toEqual(before);
  });

  it('replaces an existing period with force, leaving no temporary or old folder', async () => {
    const out = await tempDir();
    await archive(args(out, oct()));
    await archive(args(out, oct(), {force: true, html: '<p>second</p>', pdf: null, exports: []}));
    const folder = join(out, 'harbourline-monthly', '2026-10');
    expect(await readFile(join(folder, 'report.html'), 'utf8')).toBe('<p>second</p>');
    expect(await listFiles(folder)).toEqual(['digest.json', 'headlines.json', 'manifest.json', 'report.html', 'results.json']);
    expect(await readdir(join(out, 'harbourline-monthly'))).toEqual(['2026-10', 'index.html']);
  });

  it('cleans up leftovers of a dead run first: restores a moved-aside folder, deletes temporary ones', async () => {
    const out = await tempDir();
    const packDir = join(out, 'harbourline-monthly');
    const pid = deadPid();
    await mkdir(join(packDir, `.2026-09.old-${pid}`), {recursive: true});
    await writeFile(join(packDir, `.2026-09.old-${pid}`, 'results.json'), 'kept');
    await mkdir(join(packDir, `.2026-10.tmp-${pid}`), {recursive: true});
    await writeFile(join(packDir, `.index.html.tmp-${pid}-3`), 'half');
    await archive(args(out, oct()));
    expect(await readdir(packDir)).toEqual(['2026-09', '2026-10', 'index.html']);
    expect(await readFile(join(packDir, '2026-09', 'results.json'), 'utf8')).toBe('kept');
  });

  it('two archives of one pack at once take turns under the pack lock; the index lists both', async () => {
    const out = await tempDir();
    const sep = report(2026, 9, [{id: 'net-sales', label: 'Net sales'}]);
    await Promise.all([archive(args(out, oct())), archive(args(out, sep))]);
    const packDir = join(out, 'harbourline-monthly');
    expect(await readdir(packDir)).toEqual(['2026-09', '2026-10', 'index.html']);
    const index = await readFile(join(packDir, 'index.html'), 'utf8');
    expect(index).toContain('2026-09/report.html');
    expect(index).toContain('2026-10/report.html');
  });

  it('rejects export names that would leave the exports folder', async () => {
    const out = await tempDir();
    await expect(archive(args(out, oct(), {exports: [{name: '../x.csv', content: ''}]}))).rejects.toThrow(
      /invalid export file name: \.\.\/x\.csv/,
    );
    expect(await readdir(out)).toEqual([]);
  });
});
