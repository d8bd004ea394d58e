import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {dirname, join} from 'node:path';
import {afterAll, expect} from 'vitest';
import {fileURLToPath} from 'node:url';
import type {AnalysisOptions, FromSourcePlan, Plan, SeriesPlan, SourcePlan} from '../../src/config/plan.js';
import type {Frequency} from '../../src/time/period.js';
import {derive} from '../../src/derive/index.js';
import {ingest, type Dataset} from '../../src/ingest/index.js';
import {InputError, type Problem} from '../../src/errors.js';
import {analysisOptions, planFixture, seriesPlanFixture} from '../fixtures/plans.js';

export const FIXTURES = join(dirname(fileURLToPath(import.meta.url)), '..', 'fixtures', 'ingest');

const analysis: AnalysisOptions = analysisOptions();

/** A source plan for a fixture (or any absolute path), wide and comma-separated unless told otherwise. */
export function source(id: string, file: string, more: Partial<SourcePlan> = {}): SourcePlan {
  return {
    id,
    file: file.startsWith('/') ? file : join(FIXTURES, file),
    layout: 'wide',
    dateColumn: 'month',
    keyColumn: null,
    valueColumn: null,
    delimiter: 'auto',
    decimal: '.',
    encoding: 'utf-8',
    line: 1,
    reader: /\.xlsx$/i.test(file) ? 'xlsx' : 'csv',
    headerRow: 1,
    dateFormat: null,
    timeZone: 'UTC',
    emptyMeans: 'missing',
    sheet: null,
    query: null,
    connectionEnv: null,
    timeoutSeconds: 60,
    readFolders: [],
    ...more,
  };
}

export function series(id: string, sourceId: string, more: Partial<SeriesPlan> = {}): SeriesPlan {
  return seriesPlanFixture({id, source: sourceId, analysis, ...more});
}

export function fromSource(sourceId: string, position: number): FromSourcePlan {
  const {id: _id, label: _label, column: _column, ...template} = series('x', sourceId, {line: 20});
  return {source: sourceId, template, position, line: 20};
}

export function plan(frequency: Frequency, sources: SourcePlan[], list: SeriesPlan[], more: Partial<Plan> = {}): Plan {
  return planFixture({packFile: join(FIXTURES, 'pack.yaml'), id: 'test', title: 'Test', frequency, sources, series: list, ...more});
}

/** Ingest and derive, as a build runs them: the plan's sources read into series. */
export async function readPack(p: Plan): Promise<Dataset> {
  return derive(p, await ingest(p));
}

/** The problems of a plan that must fail with bad input. */
export async function problemsOf(p: Plan): Promise<Problem[]> {
  const error = await readPack(p).then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(InputError);
  return (error as InputError).problems;
}

/** A fresh temporary folder for the calling test file, removed after its tests, and a writer of files into it. */
export function scratch(prefix: string): {dir: string; write: (name: string, text: string | Buffer) => string} {
  const dir = mkdtempSync(join(tmpdir(), `ebbflow-${prefix}-`));
  afterAll(() => rmSync(dir, {recursive: true, force: true}));
  return {
    dir,
    write: (name, text) => {
      const file = join(dir, name);
      writeFileSync(file, text);
      return file;
    },
  };
}
