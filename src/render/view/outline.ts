import {wordsFor} from '../../words/index.js';
import type {OutlineEntry} from '../pdfOutline.js';
import type {Report} from '../types.js';
import {orderSeries} from './order.js';

/**
 * The PDF's bookmarks: the summary; each series section, under its group's title when the pack groups them;
 * the history section when there is one; the methods appendix; the data notes. The page carries a hidden list
 * of links to these ids, which is what makes the browser record them.
 */
export function reportOutline(report: Report): OutlineEntry[] {
  const w = wordsFor(report.plan.locale);
  const series: OutlineEntry[] = [];
  let lastGroup: number | null = null;
  for (const {entry, kicker, group} of orderSeries(report)) {
    const item: OutlineEntry = {title: entry.plan.label, dest: `series-${entry.plan.id}`, children: []};
    if (group === null || kicker === null) series.push(item);
    else if (group === lastGroup) series[series.length - 1].children.push(item);
    else series.push({title: kicker, dest: item.dest, children: [item]});
    lastGroup = group;
  }
  return [
    {title: w.t('section.summary'), dest: 'summary', children: []},
    ...series,
    ...(report.history ? [{title: w.t('section.history'), dest: 'history', children: []}] : []),
    {title: w.t('section.methods'), dest: 'methods', children: []},
    {title: w.t('section.dataNotes'), dest: 'data-notes', children: []},
  ];
}

/** Every entry of an outline, parents before their children. */
export function flatten(entries: OutlineEntry[]): OutlineEntry[] {
  return entries.flatMap((e) => [e, ...flatten(e.children)]);
}
