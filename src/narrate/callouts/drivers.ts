import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/** Contributions smaller than this many percentage points are not named as drivers (common practice: 0.05). */
export const MIN_DRIVER_POINTS = 0.05;

/**
 * What drove a total: for each group whose total is this series, the part with the largest contribution in the
 * direction of the total's year-on-year change, and the largest contribution against it ("driven by the North,
 * +3.1 points; Web subtracted 0.8"). Info severity; ranked by the size of the total's change.
 */
export const driversRule: Rule = {
  name: 'drivers',
  run({series: s, groups, labels, words: w, analysis: a}) {
    const label = (id: string) => labels.get(id) ?? id;
    return groups
      .filter((g) => g.total === s.id)
      .flatMap((g) => {
        const {total, parts} = g.contributions.yearOnYear;
        if (!Number.isFinite(total)) return [];
        const found = mainDrivers(total, parts);
        if (found === null) return [];
        const {driver, against} = found;
        return [
          {
            key: g.id,
            severity: 'info' as const,
            text: w.t('callout.drivers', {
              label: s.label,
              change: w.share(Math.abs(total)),
              rose: total >= 0 ? 'yes' : 'no',
              period: w.periodLong(a.frequency, a.end),
              driver: label(driver.id),
              points: w.points(driver.points),
              against: against === null ? 'none' : against.points < 0 ? 'subtracted' : 'added',
              againstLabel: against === null ? '' : label(against.id),
              againstPoints: against === null ? '' : w.points(Math.abs(against.points)).replace(/^\+/, ''),
            }),
            figures: {total, [driver.id]: driver.points, ...(against ? {[against.id]: against.points} : {})},
            // The contributions chart sits under the group's total (render/charts/contributions.ts).
            chart: chartAnchor(s.id, 'contributions'),
            magnitude: Math.min(10, Math.abs(total) / 2),
            periodsAgo: 0,
          },
        ];
      });
  },
};

/**
 * The part contributing most in the direction of the total's change, and the one contributing most against it
 * (null when none does by at least {@link MIN_DRIVER_POINTS}); ties go to the earlier part. Null when no part
 * moves the total by that much.
 */
export function mainDrivers(
  total: number,
  parts: Record<string, number>,
): {driver: {id: string; points: number}; against: {id: string; points: number} | null} | null {
  const sign = total >= 0 ? 1 : -1;
  let driver: {id: string; points: number} | null = null;
  let against: {id: string; points: number} | null = null;
  for (const [id, points] of Object.entries(parts)) {
    if (!Number.isFinite(points) || Math.abs(points) < MIN_DRIVER_POINTS) continue;
    if (points * sign > 0 && (driver === null || Math.abs(points) > Math.abs(driver.points))) driver = {id, points};
    if (points * sign < 0 && (against === null || Math.abs(points) > Math.abs(against.points))) against = {id, points};
  }
  return driver === null ? null : {driver, against};
}
