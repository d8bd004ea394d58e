import type {Plan} from '../config/plan.js';
import type {SeriesAnalysis} from '../analyse/types.js';

/**
 * Charts drawn ahead of the report: `add` queues the charts of one series as soon as its analysis arrives (the
 * analysis of the others goes on in the worker threads meanwhile), `drawn` waits for the queue and gives the SVGs
 * keyed as `renderHtml` looks them up. A chart that fails here is left out, and `renderHtml` draws it again and
 * reports its failure in the usual place. The chart libraries load with the first series.
 */
export interface ChartPrefetch {
  add(index: number, analysis: SeriesAnalysis): void;
  drawn(): Promise<ReadonlyMap<string, string>>;
}

export function chartPrefetch(plan: Plan): ChartPrefetch {
  const drawn = new Map<string, string>();
  let queue: Promise<void> = Promise.resolve();
  return {
    add(index, analysis) {
      queue = queue
        .then(async () => (await import('./html.js')).drawSeriesCharts(plan, plan.series[index], analysis, drawn))
        .catch(() => undefined);
    },
    async drawn() {
      await queue;
      return drawn;
    },
  };
}
