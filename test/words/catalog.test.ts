import {describe, expect, it} from 'vitest';
import {IntlMessageFormat} from 'intl-messageformat';
import {catalogs} from '../../src/words/catalog/index.js';
import {en} from '../../src/words/catalog/en.js';
import {LANGUAGES} from '../../src/words/index.js';

/**
 * The arguments a message prints (placeholders) and those it only chooses by (plural and select), in any nesting.
 * AST node types of @formatjs/icu-messageformat-parser: 0 literal, 1 argument, 5 select, 6 plural, 7 `#`.
 */
function argumentsOf(source: string, locale: string): {printed: string[]; chosen: string[]} {
  const printed = new Set<string>();
  const chosen = new Set<string>();
  const walk = (nodes: unknown[]): void => {
    for (const node of nodes as {type: number; value?: string; options?: Record<string, {value: unknown[]}>}[]) {
      if (node.type === 5 || node.type === 6) chosen.add(node.value!);
      else if (node.value !== undefined && node.type !== 0 && node.type !== 7) printed.add(node.value);
      for (const option of Object.values(node.options ?? {})) walk(option.value);
    }
  };
  walk(new IntlMessageFormat(source, locale).getAst());
  return {printed: [...printed].sort(), chosen: [...chosen].sort()};
}

describe('message catalogues', () => {
  const keys = Object.keys(en).sort();

  it.each(LANGUAGES.filter((l) => l !== 'en'))('%s has a message for every key and no other', (language) => {
    expect(Object.keys(catalogs[language]).sort()).toEqual(keys);
    const empty = keys.filter((k) => (catalogs[language] as Record<string, string>)[k].trim() === '');
    expect(empty).toEqual([]);
  });

  // A translation prints everything the English prints (a count may print through `#`); it may choose by fewer
  // arguments (German needs no verb for "stood at" / "came to"), and never uses one the English does not pass.
  it.each(LANGUAGES)('every %s message parses as ICU MessageFormat and uses the English arguments', (language) => {
    const catalog = catalogs[language] as Record<string, string>;
    const wrong = keys.filter((k) => {
      const mine = argumentsOf(catalog[k], language);
      const english = argumentsOf(en[k as keyof typeof en], 'en');
      const known = new Set([...english.printed, ...english.chosen]);
      const used = new Set([...mine.printed, ...mine.chosen]);
      return english.printed.some((a) => !used.has(a)) || [...used].some((a) => !known.has(a));
    });
    expect(wrong).toEqual([]);
  });

  it.each(LANGUAGES.filter((l) => l !== 'en'))('%s translates what the report shows (only names and codes stay as in English)', (language) => {
    const catalog = catalogs[language] as Record<string, string>;
    // Messages that are the same in every language: formats of our own, published method names, units.
    const same = new Set([
      'period.quarter', 'period.quarterLong', 'season.quarter', 'unit.withUnit', 'p.below', 'p.equal', 'method.stl',
      'cycle.hp', 'cycle.bandpass', 'label.logo', 'label.trend', 'label.cycle', 'label.modelCell', 'chart.titleOf',
      'summary.forecast', 'summary.forecastNoRange', 'describe.flagged', 'para.sentence', 'para.unusualItem',
      'open.surpriseItem', 'forecast.benchmark', 'callout.outturnEnd', 'callout.trendRate', 'note.ofSeries',
      'severity.info', 'label.page', 'label.series', 'label.period', 'label.forecastCaption', 'variance.keyFigure',
    ]);
    const untranslated = keys.filter((k) => !same.has(k) && catalog[k] === en[k as keyof typeof en]);
    expect(untranslated).toEqual([]);
  });
});
