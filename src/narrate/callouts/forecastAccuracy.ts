import {chartId, type Rule} from '../context.js';
import * as say from '../wording.js';

/** MASE at or above which the warning is an alert: half as bad again as the benchmark (our threshold). */
export const ALERT_MASE = 1.5;

/**
 * Back-test warning when the forecast did worse than the seasonal naive benchmark: MASE > 1 (Hyndman &
 * Koehler 2006, "Another look at measures of forecast accuracy": a MASE above 1 means larger errors than the
 * in-sample one-season-back naive forecast). Watch above 1, alert from {@link ALERT_MASE}.
 */
export const forecastAccuracyRule: Rule = {
  name: 'forecast-accuracy',
  run({analysis: a, series: s, fmt}) {
    const b = a.forecast?.backtest;
    if (!b || !Number.isFinite(b.mase) || b.mase <= 1) return [];
    return [
      {
        key: null,
        severity: b.mase >= ALERT_MASE ? 'alert' : 'watch',
        text: say.backtestWarning({
          label: s.label,
          origins: say.count(b.origins, 'forecast origin'),
          mase: fmt.number(b.mase, 2),
        }),
        figures: {mase: b.mase, smape: b.smape, origins: b.origins},
        chart: chartId(s.id, 'forecast'),
        magnitude: 2 * b.mase,
        periodsAgo: 0,
      },
    ];
  },
};
