import type {FromSourcePlan, Plan, SeriesPlan} from '../config/plan.js';
import {slugify} from '../config/slug.js';
import * as msg from './messages.js';
import type {ProblemLog} from './problemLog.js';

/**
 * The pack's series list with each `fromSource` entry replaced by one series per key of its long source
 * (id = slug of the key, label = column = key), keys in the order they first appear in the file, and
 * entries at the place the pack lists them. Id clashes (two keys with one slug, or a key's slug equal to
 * an explicit id) are problems at the entry's pack line.
 *
 * Complexity: O(series + keys).
 */
export function expandSeries(
  plan: Plan,
  keysOf: (sourceId: string) => string[] | undefined,
  problems: ProblemLog,
): SeriesPlan[] {
  const entries: readonly FromSourcePlan[] = plan.fromSource ?? [];
  const owner = new Map<string, string>(plan.series.map((s) => [s.id, `series ${s.id}`]));
  const expanded = entries.map((entry) => {
    const keys = keysOf(entry.source);
    if (keys === undefined) return [];
    if (keys.length === 0) problems.add(plan.packFile, entry.line, null, msg.noKeys(entry.source));
    const made: SeriesPlan[] = [];
    for (const key of keys) {
      const id = slugify(key);
      const other = owner.get(id);
      if (other !== undefined) {
        problems.add(plan.packFile, entry.line, null, msg.slugClash(id, key, other));
        continue;
      }
      owner.set(id, `key "${key}"`);
      made.push({...entry.template, id, label: key, column: key});
    }
    return made;
  });
  const out: SeriesPlan[] = [];
  for (let i = 0; i <= plan.series.length; i++) {
    entries.forEach((entry, j) => {
      if (entry.position === i) out.push(...expanded[j]);
    });
    if (i < plan.series.length) out.push(plan.series[i]);
  }
  return out;
}
