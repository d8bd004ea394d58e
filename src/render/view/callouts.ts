import type {Callout} from '../../narrate/types.js';
import type {Words} from '../../words/index.js';
import type {CalloutView} from './types.js';

/** Links a callout to its chart when that chart is drawn, else to its series' section, else nowhere. */
export type CalloutLink = (c: Callout) => string | null;

export function calloutLink(chartIds: Set<string>, seriesIds: Set<string>): CalloutLink {
  return (c) => (c.chart && chartIds.has(c.chart) ? `#${c.chart}` : c.seriesId && seriesIds.has(c.seriesId) ? `#series-${c.seriesId}` : null);
}

export function calloutView(c: Callout, w: Words, labels: Map<string, string>, link: CalloutLink): CalloutView {
  return {
    id: `callout-${c.id.replace(/[^A-Za-z0-9_-]/g, '-')}`,
    severity: c.severity,
    severityLabel: w.t(`severity.${c.severity}`),
    text: c.text,
    href: link(c),
    series: c.seriesId ? (labels.get(c.seriesId) ?? null) : null,
  };
}

/** The callouts a series section shows: its exceptions (alerts and watches); the paragraph says the rest. */
export function exceptions(callouts: Callout[]): Callout[] {
  return callouts.filter((c) => c.severity !== 'info');
}
