/** A ranked plain-language statement with the numbers behind it. */
export interface Callout {
  /** Stable id, e.g. `net-sales/yoy`; also the HTML anchor suffix. */
  id: string;
  /** Series the callout is about, or null for pack-level callouts. */
  seriesId: string | null;
  /** Rule that produced it, e.g. `latest-change`, `large-residual`. */
  rule: string;
  severity: 'info' | 'watch' | 'alert';
  /** Higher ranks come first in the summary. Deterministic. */
  rank: number;
  text: string;
  /** The raw figures quoted in the text, full precision, for checks and exports. */
  figures: Record<string, number>;
  /** Id of the chart the callout refers to (HTML anchor), e.g. `chart-net-sales-overview`. */
  chart: string | null;
}
