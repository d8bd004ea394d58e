import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {describe, expect, test} from 'vitest';
import {defaultConfig, loadPlan} from '../../src/config/index.js';
import type {AnalysisOptions} from '../../src/config/plan.js';
import {monthIndex, quarterIndex} from '../../src/time/period.js';
import {analysisOptions} from '../fixtures/plans.js';

const fixtures = fileURLToPath(new URL('../fixtures/config/', import.meta.url));
const validPack = path.join(fixtures, 'valid', 'pack.yaml');
const minimalPack = path.join(fixtures, 'minimal', 'quarterly-minimal.yaml');

/** Every analysis option when nothing is set (quarterly data). */
const untouched: AnalysisOptions = analysisOptions({forecast: {horizon: 4}});

describe('a valid pack', async () => {
  const plan = await loadPlan(validPack);
  const dir = path.dirname(validPack);

  test('keeps what the pack says', () => {
    expect(plan).toMatchObject({
      packFile: validPack,
      id: 'harbour-monthly',
      title: 'Harbour café monthly review',
      subtitle: null,
      frequency: 'monthly',
      period: monthIndex(2025, 6),
      formats: ['html', 'json'],
      locale: 'de-DE',
      fiscalYearStart: 4,
      browser: null,
    });
    expect(plan.groups).toEqual([
      {
        id: 'money',
        title: 'Money',
        series: ['takings', 'staff'],
        total: null,
        adjustTotal: 'direct',
        reconcile: 'mint',
        line: 45,
      },
    ]);
  });

  test('resolves paths against the pack file', () => {
    expect(plan.outDir).toBe(path.join(dir, 'reports'));
    expect(plan.branding.logo).toBe(path.join(dir, 'brand', 'logo.svg'));
    expect(plan.sources.map((s) => s.file)).toEqual([
      path.join(dir, 'data/till.csv'),
      path.join(dir, 'data/visits.csv'),
    ]);
  });

  test('fills source and series defaults, with the line of each entry', () => {
    expect(plan.sources[0]).toEqual({
      id: 'till',
      file: path.join(dir, 'data/till.csv'),
      layout: 'wide',
      dateColumn: 'month',
      keyColumn: null,
      valueColumn: null,
      delimiter: ';',
      decimal: ',',
      encoding: 'utf-8',
      line: 16,
      reader: 'csv',
      headerRow: 1,
      dateFormat: null,
      timeZone: 'UTC',
      emptyMeans: 'missing',
      sheet: null,
      query: null,
      connectionEnv: null,
      timeoutSeconds: 60,
      readFolders: [],
    });
    expect(plan.sources[1]).toMatchObject({
      layout: 'long',
      dateColumn: 'date',
      keyColumn: 'series',
      valueColumn: 'value',
      line: 21,
    });
    expect(plan.series.map((s) => [s.id, s.label, s.column, s.kind, s.target, s.hidden, s.line])).toEqual([
      ['takings', 'Takings', 'takings', 'flow', 'takings-plan', false, 27],
      ['takings-plan', 'takings-plan', 'plan', 'flow', null, true, 34],
      ['staff', 'staff', 'staff', 'stock', null, false, 38],
    ]);
  });

  test('branding keeps defaults for keys not given', () => {
    expect(plan.branding).toEqual({
      ...defaultConfig.branding,
      logo: path.join(dir, 'brand', 'logo.svg'),
      accent: '#335577',
      paper: 'Letter',
    });
  });

  test('merges defaultConfig, then the defaults block, then the series (series wins)', () => {
    const [takings, plan2, staff] = plan.series;
    // Series block wins over the defaults block and defaultConfig.
    expect(takings.analysis.decomposition).toMatchObject({model: 'multiplicative', seasonalWindow: 15});
    expect(takings.analysis.forecast.levels).toEqual([90]);
    // Defaults block wins over defaultConfig where the series says nothing.
    expect(takings.analysis.decomposition).toMatchObject({robust: false, trendWindow: 23, method: 'stl'});
    expect(takings.analysis.forecast.horizon).toBe(6);
    expect(plan2.analysis.forecast.levels).toEqual([80, 95, 99]);
    expect(plan2.analysis.calendar).toEqual({workingDays: 'auto', easter: 'auto', holidays: ['2025-12-25']});
    // Classical decomposition with no window set uses a periodic seasonal.
    expect(staff.analysis.decomposition).toMatchObject({method: 'classical', seasonalWindow: 'periodic'});
    expect(plan2.analysis.decomposition.seasonalWindow).toBe(13);
  });

  test('keeps fromSource entries for ingest, with resolved settings', () => {
    expect(plan.fromSource).toHaveLength(1);
    const [entry] = plan.fromSource ?? [];
    expect(entry).toMatchObject({source: 'visits', position: 3, line: 42});
    expect(entry.template).toMatchObject({source: 'visits', unit: 'visits', kind: 'flow', hidden: false, target: null});
    expect(entry.template.analysis.forecast).toEqual({
      method: 'auto',
      horizon: 6,
      levels: [80, 95, 99],
      backtestOrigins: 6,
    });
  });

  test('series analysis objects are independent copies', () => {
    plan.series[1].analysis.forecast.levels.push(50);
    expect(plan.series[2].analysis.forecast.levels).toEqual([80, 95, 99]);
    expect(defaultConfig.analysis.forecast.levels).toEqual([80, 95]);
  });
});

describe('a minimal pack', async () => {
  const plan = await loadPlan(minimalPack);

  test('gets every default', () => {
    expect(plan).toMatchObject({
      id: 'quarterly-minimal',
      subtitle: null,
      organisation: null,
      preparedBy: null,
      confidentiality: null,
      period: null,
      formats: ['html', 'pdf', 'json', 'csv', 'xlsx'],
      locale: 'en-GB',
      fiscalYearStart: 1,
      thresholds: {residualSigma: 3, revisionPct: 1},
      outDir: path.resolve('out'),
      groups: [],
      fromSource: [],
    });
    expect(plan.branding).toEqual(defaultConfig.branding);
    expect(plan.series[0]).toMatchObject({id: 'sales', label: 'sales', unit: null, column: 'sales', kind: 'flow'});
    expect(plan.series[0].analysis).toEqual(untouched);
  });

  test('a tagged PDF is asked for by branding.taggedPdf', async () => {
    const tagged = await loadPlan(path.join(fixtures, 'minimal', 'quarterly-tagged.yaml'));
    expect(plan.branding.taggedPdf).toBe(false);
    expect(tagged.branding).toEqual({...defaultConfig.branding, taggedPdf: true});
  });

  test('command-line values win over the pack', async () => {
    const p = await loadPlan(minimalPack, {period: '2024-Q3', outDir: 'elsewhere', formats: ['json']});
    expect(p.period).toBe(quarterIndex(2024, 3));
    expect(p.outDir).toBe(path.resolve('elsewhere'));
    expect(p.formats).toEqual(['json']);
    const q = await loadPlan(validPack, {outDir: '/tmp/x', period: '2025-01'});
    expect(q.outDir).toBe('/tmp/x');
    expect(q.period).toBe(monthIndex(2025, 1));
  });
});
