// Child process for numeric.test.ts: analyse one series and narrate it, in a process of its own so that an
// analysis that never returns can be stopped by a timeout. Reads {values, options} from argv[2] (JSON, numbers
// written as strings so NaN and Infinity survive) and prints {notes, notAdjustedReason, texts} or {error}.
import {analyseSeries} from '../../src/analyse/index.js';
import {loadPlan} from '../../src/config/index.js';
import {narrate} from '../../src/narrate/index.js';

const {pack, end, values, options} = JSON.parse(process.argv[2]);
const plan = await loadPlan(pack);
const series = {...plan.series[0], target: null};
const numbers = Float64Array.from(values.map(Number));
try {
  const analysis = analyseSeries({
    id: series.id,
    frequency: plan.frequency,
    start: end - numbers.length + 1,
    values: numbers,
    kind: series.kind,
    fiscalYearStart: plan.fiscalYearStart,
    target: null,
    options,
    residualSigma: plan.thresholds.residualSigma,
  });
  const told = narrate({
    plan: {...plan, series: [series]},
    period: end,
    series: [{plan: series, analysis}],
    history: null,
  });
  const texts = [...told.pack, ...(told.bySeries.get(series.id) ?? [])].map((c) => c.text);
  const {original, notAdjustedReason} = analysis;
  // The analysis' own notes and its forecast's (gaps filled, fallbacks) both explain poor data.
  const notes = [...analysis.notes, ...(analysis.forecast?.notes ?? [])];
  process.stdout.write(JSON.stringify({length: original.length, notes, notAdjustedReason, texts}));
} catch (e) {
  const at = String(e?.stack).split('\n')[1]?.trim();
  process.stdout.write(JSON.stringify({error: `${e?.constructor?.name}: ${e?.message}`, at}));
}
