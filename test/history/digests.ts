/** Tiny hand-made period digests for the history tests. */
import {DIGEST_SCHEMA, type DigestSeries, type PeriodDigest} from '../../src/results/index.js';

export interface Hand {
  id?: string;
  periods: string[];
  original: (number | null)[];
  adjusted?: (number | null)[];
  trendDirection?: DigestSeries['trendDirection'];
  phase?: NonNullable<DigestSeries['phase']>;
  forecast?: {
    periods: string[];
    mean: (number | null)[];
    lower: Record<string, number[]>;
    upper: Record<string, number[]>;
  };
}

export function hand(period: string, frequency: 12 | 4 | 52, series: Hand[]): PeriodDigest {
  return {
    schema: DIGEST_SCHEMA,
    pack: {id: 'harbourline-quarterly', period, frequency},
    series: series.map((h) => ({
      id: h.id ?? 'orders',
      periods: h.periods,
      original: h.original,
      adjusted: h.adjusted ?? new Array<number | null>(h.periods.length).fill(null),
      trendDirection: h.trendDirection ?? 'flat',
      phase: h.phase ?? null,
      forecast: h.forecast ?? null,
    })),
  };
}

/** Quarter labels from `2024-Q1`, `count` of them. */
export function quarters(count: number, fromYear = 2024): string[] {
  return Array.from({length: count}, (_, i) => `${fromYear + Math.floor(i / 4)}-Q${(i % 4) + 1}`);
}
