import {describe, expect, it} from 'vitest';
import {mkdir, rm, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {archive} from '../../src/archive/archive.js';
import {loadHistory} from '../../src/history/history.js';
import {InputError} from '../../src/errors.js';
import {digestOfReport, report} from '../archive/fixtures/report.js';
import {tempDir} from '../archive/helpers.js';

async function archiveMonth(out: string, month: number): Promise<void> {
  const rep = report(2026, month, [{id: 'net-sales'}]);
  await archive({
    report: rep,
    digest: digestOfReport(rep),
    html: null,
    pdf: null,
    exports: [],
    outDir: out,
    force: false,
    plan: {},
    warnings: [],
  });
}

const packId = 'harbourline-monthly';

describe('loadHistory', () => {
  it('is null when no earlier period is archived', async () => {
    const out = await tempDir();
    await archiveMonth(out, 11);
    const current = digestOfReport(report(2026, 11, [{id: 'net-sales'}]));
    expect(await loadHistory(out, packId, '2026-11', 'monthly', current, 1)).toBeNull();
  });

  it('compares with the latest earlier period, tracks forecasts of every earlier one (hand-checked)', async () => {
    const out = await tempDir();
    for (const month of [8, 9, 10, 11, 12]) await archiveMonth(out, month);
    await mkdir(join(out, packId, 'notes'));
    const current = digestOfReport(report(2026, 11, [{id: 'net-sales'}]));
    const h = (await loadHistory(out, packId, '2026-11', 'monthly', current, 1))!;
    // The fixture puts y = 100 + 0.5·t + seasonal with t counted from each pack's own start (48 months
    // back), so a pack ending at e forecasts period p as 100 + 0.5·(p − e + 47) + s(p) while the 2026-11
    // pack has 100 + 0.5·(p − 2026-11 + 47) + s(p): error = 0.5·(e − 2026-11).
    //   2026-08 → 2026-09, -10, -11: error −1.5 each; 2026-09 → 2026-10, -11: −1; 2026-10 → 2026-11: −0.5.
    // 2026-12 (later) and the `notes` folder are ignored.
    expect(h.previousPeriod).toBe('2026-10');
    expect(h.tracking.map((r) => [r.publishedIn, r.period, r.horizon])).toEqual([
      ['2026-08', '2026-09', 1],
      ['2026-08', '2026-10', 2],
      ['2026-08', '2026-11', 3],
      ['2026-09', '2026-10', 1],
      ['2026-09', '2026-11', 2],
      ['2026-10', '2026-11', 1],
    ]);
    const errors = h.tracking.map((r) => r.error);
    [-1.5, -1.5, -1.5, -1, -1, -0.5].forEach((e, i) => expect(errors[i]).toBeCloseTo(e, 9));
    // Seasonal naive scale: y[t] − y[t−12] = 0.5·12 = 6 for every t (the sine repeats).
    // mean |error| = (3·1.5 + 2·1 + 0.5) / 6 = 7/6; MASE = (7/6) / 6 = 7/36. Bands ±5 and ±8: all inside.
    expect(h.trackingSummary).toEqual([
      {seriesId: 'net-sales', count: 6, mase: expect.closeTo(7 / 36, 9), coverage: {'80': 1, '95': 1}},
    ]);
    // Each pack's t starts one month later, so every shared value is 0.5 lower: 12 data revisions.
    expect(h.revisions).toHaveLength(12);
    expect(new Set(h.revisions.map((r) => `${r.kind}/${r.measure}`))).toEqual(new Set(['data/original']));
    expect(h.revisions[11]).toMatchObject({period: '2026-10', previous: expect.any(Number)});
    expect((h.revisions[11].current as number) - (h.revisions[11].previous as number)).toBeCloseTo(-0.5, 9);
  });

  it('reads a period archived before digests were kept from its results.json, with the same history', async () => {
    const out = await tempDir();
    for (const month of [8, 9, 10]) await archiveMonth(out, month);
    const current = digestOfReport(report(2026, 11, [{id: 'net-sales'}]));
    const fromDigests = await loadHistory(out, packId, '2026-11', 'monthly', current, 1);
    for (const month of ['08', '09', '10']) await rm(join(out, packId, `2026-${month}`, 'digest.json'));
    expect(await loadHistory(out, packId, '2026-11', 'monthly', current, 1)).toEqual(fromDigests);
  });

  it('names the file when an earlier digest.json is unreadable', async () => {
    const out = await tempDir();
    await archiveMonth(out, 9);
    const file = join(out, packId, '2026-09', 'digest.json');
    await writeFile(file, '{"schema": "ebbflow/digest/v1", "pack": {}}');
    const current = digestOfReport(report(2026, 10, [{id: 'net-sales'}]));
    const error = await loadHistory(out, packId, '2026-10', 'monthly', current, 1).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as Error).message.startsWith(`${file}: unreadable digest file: pack.id: `)).toBe(true);
  });

  it('names the file when an earlier results.json without a digest is unreadable', async () => {
    const out = await tempDir();
    await archiveMonth(out, 9);
    await rm(join(out, packId, '2026-09', 'digest.json'));
    const file = join(out, packId, '2026-09', 'results.json');
    await writeFile(file, '{"schema": "ebbflow/results/v1", "pack": {}}');
    const current = digestOfReport(report(2026, 10, [{id: 'net-sales'}]));
    const error = await loadHistory(out, packId, '2026-10', 'monthly', current, 1).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as Error).message.startsWith(`${file}: unreadable results file: pack.id: `)).toBe(true);
  });

  it('rejects a period label that does not match the pack frequency', async () => {
    const current = digestOfReport(report(2026, 10, [{id: 'net-sales'}]));
    const out = await tempDir();
    await expect(loadHistory(out, packId, '2026-Q3', 'monthly', current, 1)).rejects.toThrow(/invalid period: 2026-Q3/);
  });
});
