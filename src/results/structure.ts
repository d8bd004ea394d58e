import {z} from 'zod';
import type {GroupResult, ReconciledBacktest, SeriesCombination, Variance} from '../combine/index.js';

/**
 * The parts of results.json that the pack's structure adds (`ebbflow/results/v2`): top-level `groups[]`, and per
 * series `better`, `versusTarget`, `forecast.baseMean` and `forecast.reconciliation`. NaN is written as null.
 */

const figure = z.number().nullable();
const points = z.record(z.string(), figure);
const contributionsAt = z.object({period: z.string(), total: figure, parts: points});

export const groupSchema = z.object({
  id: z.string(),
  title: z.string(),
  total: z.string(),
  parts: z.array(z.string()),
  adjustTotal: z.enum(['direct', 'indirect']),
  reconcile: z.enum(['mint', 'ols', 'bottom-up', 'none']),
  partsGap: z.object({period: z.string(), gap: figure, percent: figure, periods: z.number()}).nullable(),
  contributions: z.object({
    yearOnYear: contributionsAt,
    periodOnPeriodAdjusted: contributionsAt,
    history: z.array(
      z.object({
        period: z.string(),
        yearOnYear: z.object({total: figure, parts: points}),
        periodOnPeriodAdjusted: z.object({total: figure, parts: points}),
      }),
    ),
  }),
  indirect: z
    .object({
      residualSeasonality: z.object({test: z.string(), statistic: figure, pValue: figure, detected: z.boolean()}),
      largestDifference: z.object({period: z.string().nullable(), percent: figure}),
    })
    .nullable(),
  backtest: z
    .object({
      method: z.enum(['mint', 'ols', 'bottom-up']),
      origins: z.number(),
      horizon: z.number(),
      series: z.record(z.string(), z.object({base: figure, reconciled: figure})),
      base: figure,
      reconciled: figure,
    })
    .nullable(),
});

const varianceSchema = z.object({
  actual: figure,
  target: figure,
  difference: figure,
  percent: figure,
  favourable: z.boolean(),
  calendarPart: figure,
});

export const versusTargetSchema = z.object({period: varianceSchema, yearToDate: varianceSchema}).nullable();
export const reconciliationSchema = z.object({method: z.enum(['mint', 'ols', 'bottom-up']), group: z.string()});

export type GroupResults = z.infer<typeof groupSchema>;

function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function pointsOf(parts: Record<string, number>): Record<string, number | null> {
  return Object.fromEntries(Object.entries(parts).map(([k, v]) => [k, num(v)]));
}

/** A group with a total as written in results.json, keys in a fixed order. */
export function groupResults(g: GroupResult & {backtest: ReconciledBacktest | null}): GroupResults {
  const at = (c: {total: number; parts: Record<string, number>}) => ({total: num(c.total), parts: pointsOf(c.parts)});
  const {yearOnYear: yoy, periodOnPeriodAdjusted: pop} = g.contributions;
  return {
    id: g.id,
    title: g.title,
    total: g.total,
    parts: [...g.parts],
    adjustTotal: g.adjustTotal,
    reconcile: g.reconcile,
    partsGap: g.partsGap && {
      period: g.partsGap.period,
      gap: num(g.partsGap.gap),
      percent: num(g.partsGap.percent),
      periods: g.partsGap.periods,
    },
    contributions: {
      yearOnYear: {period: yoy.period, ...at(yoy)},
      periodOnPeriodAdjusted: {period: pop.period, ...at(pop)},
      history: g.contributions.history.map((h) => ({
        period: h.period,
        yearOnYear: at(h.yearOnYear),
        periodOnPeriodAdjusted: at(h.periodOnPeriodAdjusted),
      })),
    },
    indirect: g.indirect && {
      residualSeasonality: {
        test: g.indirect.residualSeasonality.test,
        statistic: num(g.indirect.residualSeasonality.statistic),
        pValue: num(g.indirect.residualSeasonality.pValue),
        detected: g.indirect.residualSeasonality.detected,
      },
      largestDifference: {
        period: g.indirect.largestDifference.period,
        percent: num(g.indirect.largestDifference.percent),
      },
    },
    backtest: g.backtest && {
      method: g.backtest.method,
      origins: g.backtest.origins,
      horizon: g.backtest.horizon,
      series: Object.fromEntries(
        Object.entries(g.backtest.series).map(([id, s]) => [id, {base: num(s.base), reconciled: num(s.reconciled)}]),
      ),
      base: num(g.backtest.base),
      reconciled: num(g.backtest.reconciled),
    },
  };
}

function varianceResults(v: Variance): z.infer<typeof varianceSchema> {
  return {
    actual: num(v.actual),
    target: num(v.target),
    difference: num(v.difference),
    percent: num(v.percent),
    favourable: v.favourable,
    calendarPart: num(v.calendarPart),
  };
}

/** Per series: `versusTarget` as written in results.json (null without a target). */
export function versusTargetResults(c: SeriesCombination | undefined): z.infer<typeof versusTargetSchema> {
  const v = c?.versusTarget;
  return v ? {period: varianceResults(v.period), yearToDate: varianceResults(v.yearToDate)} : null;
}
