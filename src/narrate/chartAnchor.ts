/**
 * The HTML anchor of a series' chart: `chart-<series>-<name>`, where `name` is the chart's entry in the chart
 * registry (`src/render/charts/registry.ts`). Callouts point at charts through it and the registry names its
 * charts' anchors through it, so the two cannot drift apart; test/render/chartRegistry.test.ts checks that every
 * chart a callout names is registered.
 */
export function chartAnchor(seriesId: string, name: string): string {
  return `chart-${seriesId}-${name}`;
}

