/** Comparison of this period's pack with earlier archived packs of the same pack id. */
export interface History {
  /** Label of the previous archived period compared against, e.g. `2026-09`. */
  previousPeriod: string;
  revisions: RevisionRow[];
  tracking: TrackingRow[];
  /** Per-series accuracy of published forecasts so far. */
  trackingSummary: TrackingSummary[];
}

/** How one figure published last time changed in this pack. */
export interface RevisionRow {
  seriesId: string;
  /** Canonical period label of the revised figure. */
  period: string;
  /** `data`: the input value itself changed; `estimate`: new data moved the adjusted figure. */
  kind: 'data' | 'estimate';
  /** What was revised: `original`, `adjusted`, `trend-direction`, `cycle-phase`. */
  measure: 'original' | 'adjusted' | 'trend-direction' | 'cycle-phase';
  previous: number | string;
  current: number | string;
  /** Percent change for numeric measures, else null. */
  revisionPct: number | null;
  /** Above the pack's revision threshold. */
  large: boolean;
}

/** A forecast published in an earlier pack, set against the actual that has since arrived. */
export interface TrackingRow {
  seriesId: string;
  /** Period the forecast was published in (the earlier pack's review period). */
  publishedIn: string;
  /** Period forecast. */
  period: string;
  horizon: number;
  forecast: number;
  actual: number;
  /** actual − forecast. */
  error: number;
  /** Keyed by level, e.g. `{"80": true, "95": true}`. */
  inside: Readonly<Record<string, boolean>>;
}

export interface TrackingSummary {
  seriesId: string;
  count: number;
  /** Mean absolute error scaled by the in-sample seasonal-naive MAE of the latest data (running MASE). */
  mase: number | null;
  /** Share of actuals inside each published band, 0–1, keyed by level. */
  coverage: Record<string, number>;
}
