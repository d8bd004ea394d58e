import type {Rule} from '../context.js';
import {chartAnchor} from '../chartAnchor.js';

/** MASE at or above which the warning is an alert: half as bad again as the benchmark (our threshold). */
export const ALERT_MASE = 1.5;

/**
 * Back-test warning when the forecast did worse than the seasonal naive benchmark: MASE > 1 (Hyndman &
 * Koehler 2006, "Another look at measures of forecast accuracy": a MASE above 1 means larger errors than the
 * in-sample one-season-back naive forecast). Watch above 1, alert from {@link ALERT_MASE}.
 */
export const forecastAccuracyRule: Rule = {
  name: 'forecast-accuracy',
  run({analysis: a, series: s, words: w}) {
    const b = a.forecast?.backtest;
    if (!b || !Number.isFinite(b.mase) || b.mase <= 1) return [];
    return [
      {
        key: null,
        severity: b.mase >= ALERT_MASE ? 'alert' : 'watch',
        text: w.t('callout.backtestWarning', {label: s.label, origins: b.origins, mase: w.number(b.mase, 2)}),
        figures: {mase: b.mase, smape: b.smape, origins: b.origins},
        chart: chartAnchor(s.id, 'forecast'),
        magnitude: 2 * b.mase,
        periodsAgo: 0,
      },
    ];
  },
};
