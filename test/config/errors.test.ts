import {mkdir, mkdtemp, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, test} from 'vitest';
import {loadPlan, type PlanOverrides} from '../../src/config/index.js';
import {InputError} from '../../src/errors.js';

/** The head of a valid pack: lines 1–9. Tests append `series:` and more from line 10 on. */
const head = `pack:
  title: Test pack
  frequency: monthly
sources:
  - id: trading
    file: data/trading.csv
  - id: web
    file: data/web.csv
    layout: long`;
const longKeys = `
    keyColumn: series
    valueColumn: value`;

/** Write a pack and its two CSV files into a fresh folder; return the problems as `line:col: message`. */
async function problems(yaml: string, overrides?: PlanOverrides, files = ['data/trading.csv', 'data/web.csv']) {
  const dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-config-'));
  await mkdir(path.join(dir, 'data'));
  for (const f of files) await writeFile(path.join(dir, f), 'date,x\n2025-01,1\n');
  const packFile = path.join(dir, 'pack.yaml');
  await writeFile(packFile, yaml);
  try {
    await loadPlan(packFile, overrides);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    const err = e as InputError;
    for (const p of err.problems) expect(p.file === packFile || p.file === 'command line').toBe(true);
    return err.problems.map((p) =>
      p.line === null ? `${p.file}: ${p.message}` : `${p.line}:${p.column}: ${p.message}`,
    );
  }
  throw new Error('loadPlan accepted the pack');
}

const okSeries = `
series:
  - id: net-sales
    source: trading`;

describe('schema problems point at the key', () => {
  test('a mistyped key, with a suggestion', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}\n    kidn: stock\n    forcast: {horizon: 6}`)).toEqual([
      '15:5: series[0] has an unknown key kidn; did you mean kind?',
      '16:5: series[0] has an unknown key forcast; did you mean forecast?',
    ]);
  });

  test('unknown keys at the top level and inside nested blocks', async () => {
    expect(
      await problems(
        `${head}${longKeys}${okSeries}\n    decomposition: {method: stl, seasonalWindo: 7}\nsorces: []\ncolour: red`,
      ),
    ).toEqual([
      '15:34: series[0].decomposition has an unknown key seasonalWindo; did you mean seasonalWindow?',
      '16:1: the pack file has an unknown key sorces; did you mean sources?',
      '17:1: the pack file has an unknown key colour',
    ]);
  });

  test('a value outside an enum', async () => {
    const yaml = `${head}${longKeys}${okSeries}\n  - id: orders\n    source: trading\n    kind: stok`;
    expect(await problems(yaml)).toEqual([
      '17:5: series[1].kind must be one of flow, stock, ratio',
    ]);
  });

  test('a missing required key points at the entry that lacks it', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}\n  - id: orders\n    label: Orders`)).toEqual([
      '15:5: series[1].source is required',
    ]);
    expect(await problems(`pack:\n  frequency: monthly\nsources: []\nseries: []`)).toEqual([
      '1:1: pack.title is required',
      '3:1: sources must list at least 1 item',
      '4:1: series must list at least 1 item',
    ]);
  });

  test('numbers out of range and wrong types', async () => {
    const yaml = `${head}${longKeys}${okSeries}
    decomposition: {seasonalWindow: 12, trendWindow: 1, seasonalDegree: 2}
    forecast: {levels: [80, 100], horizon: 0, backtestOrigins: 1.5}
    hidden: "yes"
thresholds: {residualSigma: 0}`;
    expect(await problems(yaml)).toEqual([
      '15:21: series[0].decomposition.seasonalWindow must be periodic or an odd whole number ≥ 7',
      '15:41: series[0].decomposition.trendWindow must be ≥ 3',
      '15:57: series[0].decomposition.seasonalDegree must be 0 or 1',
      '16:29: series[0].forecast.levels[1] must be between 50 and 99.9',
      '16:35: series[0].forecast.horizon must be ≥ 1',
      '16:47: series[0].forecast.backtestOrigins must be a whole number',
      '17:5: series[0].hidden must be true or false',
      '18:14: thresholds.residualSigma must be > 0',
    ]);
  });

  test('pack-level values', async () => {
    const yaml = `pack:
  id: Harbour Pack
  title: ""
  frequency: monthly
  formats: [html, pfd]
  locale: "en_GB!"
  fiscalYearStart: 13
branding: {accent: teal, paper: A5}
sources:
  - id: trading
    file: data/trading.csv${okSeries}`;
    expect(await problems(yaml, undefined, ['data/trading.csv'])).toEqual([
      '2:3: pack.id must be lowercase letters, digits and hyphens, e.g. net-sales',
      '3:3: pack.title must not be empty',
      '5:19: pack.formats[1] must be one of html, pdf, json, csv, xlsx',
      '6:3: pack.locale must be a language tag such as en-GB or de-DE',
      '7:3: pack.fiscalYearStart must be ≤ 12',
      '8:12: branding.accent must be a colour written #rrggbb, e.g. "#1d6f64"',
      '8:26: branding.paper must be one of A4, Letter',
    ]);
  });

  test('a holiday that is not a real date', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}\ndefaults:\n  calendar: {holidays: ["2026-02-30"]}`)).toEqual([
      '16:25: defaults.calendar.holidays[0] must be a date written YYYY-MM-DD',
    ]);
  });

  test('a fromSource entry is checked against its own keys', async () => {
    expect(await problems(`${head}${longKeys}\nseries:\n  - fromSource: web\n    label: Web\n    knd: flow`)).toEqual([
      '14:5: series[0] has an unknown key label',
      '15:5: series[0] has an unknown key knd; did you mean kind?',
    ]);
  });
});

describe('cross-checks', () => {
  test('a series naming an unknown source, with a suggestion', async () => {
    expect(await problems(`${head}${longKeys}\nseries:\n  - id: net-sales\n    source: tradng`)).toEqual([
      '14:5: series[0].source names no source: tradng; did you mean trading?',
    ]);
  });

  test('a missing CSV file points at the file: key', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}`, undefined, ['data/trading.csv'])).toEqual([
      expect.stringMatching(/^8:5: sources\[1\]\.file not found: data\/web\.csv \(looked for \/.*\/data\/web\.csv\)$/),
    ]);
  });

  test('a period label that does not fit the frequency', async () => {
    const yaml = `${head}${longKeys}${okSeries}`.replace('frequency: monthly', 'frequency: monthly\n  period: 2026-Q3');
    expect(await problems(yaml)).toEqual(['4:3: pack.period 2026-Q3 is not a monthly period; write it like 2026-10']);
    const quarterly = yaml.replace('monthly', 'quarterly').replace('2026-Q3', '2026-13');
    expect(await problems(quarterly)).toEqual([
      '4:3: pack.period 2026-13 is not a quarterly period; write it like 2026-Q3',
    ]);
  });

  test('a bad --period is reported against the command line', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}`, {period: '2026-W41'})).toEqual([
      'command line: --period 2026-W41 is not a monthly period; write it like 2026-10',
    ]);
  });

  test('a long source without key and value columns', async () => {
    expect(await problems(`${head}${okSeries}`)).toEqual([
      '9:5: sources[1] has layout long, which needs keyColumn',
      '9:5: sources[1] has layout long, which needs valueColumn',
    ]);
  });

  test('an across source needs its key column, and takes neither a value nor a date column', async () => {
    const across = head.replace('layout: long', 'layout: across');
    expect(await problems(`${across}${okSeries}`)).toEqual(['9:5: sources[1] has layout across, which needs keyColumn']);
    expect(await problems(`${across}${longKeys}\n    dateColumn: month${okSeries}`)).toEqual([
      '11:5: sources[1].valueColumn only applies to layout long',
      '12:5: sources[1].dateColumn does not apply to layout across: its periods are the header\'s cells',
    ]);
  });

  test('key and value columns on a wide source', async () => {
    const yaml = `${head}${longKeys}${okSeries}`.replace('data/trading.csv', 'data/trading.csv\n    keyColumn: k');
    expect(await problems(yaml)).toEqual([
      '7:5: sources[0].keyColumn only applies to layout long or across',
    ]);
  });

  test('duplicate ids, unknown targets and unknown group members', async () => {
    const yaml = `${head}${longKeys}
  - id: trading
    file: data/trading.csv
series:
  - id: net-sales
    source: trading
    target: net-sales
  - id: net-sales
    source: trading
    target: net-sale
groups:
  - id: g
    title: G
    series: [net-sales, ordrs]`;
    expect(await problems(yaml)).toEqual([
      '12:5: sources[2].id trading is already used by sources[0]',
      '17:5: series[0].target cannot be the series itself',
      '18:5: series[1].id net-sales is already used by series[0]',
      '20:5: series[1].target names no series: net-sale; did you mean net-sales?',
      '24:25: groups[0].series[1] names no series: ordrs',
    ]);
  });

  test('fromSource must name a long source; its keys are not known yet, so members are not checked', async () => {
    const yaml = `${head}${longKeys}
series:
  - fromSource: trading
  - fromSource: webb
groups:
  - id: g
    title: G
    series: [web-visits]`;
    expect(await problems(yaml)).toEqual([
      '13:5: series[0].fromSource needs a source with layout long or across; trading is wide',
      '14:5: series[1].fromSource names no source: webb; did you mean web?',
    ]);
  });

  test('a missing logo and templates folder', async () => {
    expect(await problems(`${head}${longKeys}${okSeries}\nbranding:\n  logo: logo.png\n  templates: tpl`)).toEqual([
      expect.stringMatching(/^16:3: branding\.logo not found: logo\.png \(looked for .*logo\.png\)$/),
      expect.stringMatching(/^17:3: branding\.templates folder not found: tpl/),
    ]);
  });
});

describe('file-level problems', () => {
  test('YAML syntax errors carry their line and column', async () => {
    expect(await problems(`pack:\n  title: "unclosed\n  frequency: monthly\n`)).toEqual([
      // The parser notices the open quote at the end of the file.
      '4:1: YAML syntax: Missing closing "quote',
    ]);
    expect(await problems(`pack:\n  title: A\n  title: B\n`)).toEqual(['3:3: YAML syntax: Map keys must be unique']);
    expect(await problems(`pack:\n  title: A\n frequency: monthly\n`)).toEqual([
      '3:1: YAML syntax: All mapping items must start at the same column',
    ]);
  });

  test('an empty pack file and one that is not a mapping', async () => {
    expect(await problems('# nothing here\n')).toEqual(['1:1: the pack file is empty']);
    expect(await problems('- a\n- b\n')).toEqual(['1:1: the pack file must be a mapping of keys']);
  });

  test('a pack file that does not exist', async () => {
    await expect(loadPlan('no/such/pack.yaml')).rejects.toThrow(/^no\/such\/pack\.yaml: pack file not found \(/);
  });

  test('every problem is reported at once, in file order', async () => {
    const yaml = `pack:
  title: T
  frequency: montly
  period: "2026-10"
sources:
  - id: trading
    file: data/missing.csv
    layot: wide
series:
  - id: a
    source: nowhere
    kind: both`;
    expect(await problems(yaml)).toEqual([
      '3:3: pack.frequency must be one of monthly, quarterly, weekly',
      expect.stringMatching(/^7:5: sources\[0\]\.file not found: data\/missing\.csv/),
      '8:5: sources[0] has an unknown key layot; did you mean layout?',
      '11:5: series[0].source names no source: nowhere',
      '12:5: series[0].kind must be one of flow, stock, ratio',
    ]);
  });
});
