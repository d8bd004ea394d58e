import {InputError} from '../errors.js';
import {RESULTS_SCHEMA, resultsSchema, type Results} from './schema.js';

/** The schema tag of results files written before v2 (no groups, targets or reconciled forecasts). */
const RESULTS_V1 = 'ebbflow/results/v1';

/**
 * Read and check a results.json written by this or an earlier version of ebbflow. A v1 file is read as v2 with
 * what v1 did not record left empty: no groups, `better: higher`, no `versusTarget`, forecasts not reconciled.
 * Throws an {@link InputError} naming `file` and the first offending field when the text is not JSON, has
 * another schema tag, or does not have the shape of its tag.
 */
export function parseResults(text: string, file = 'results.json'): Results {
  const problem = (message: string) => new InputError([{file, line: null, column: null, message}]);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw problem(`unreadable results file: ${(e as Error).message}`);
  }
  const tag = (data as {schema?: unknown} | null)?.schema;
  if (tag === RESULTS_V1) data = fromV1(data as Record<string, unknown>);
  else if (tag !== RESULTS_SCHEMA) {
    throw problem(`unreadable results file: schema is ${JSON.stringify(tag ?? null)}, expected "${RESULTS_SCHEMA}"`);
  }
  const parsed = resultsSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const at = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('');
    throw problem(`unreadable results file: ${at.replace(/^\./, '') || '(top level)'}: ${issue.message}`);
  }
  return parsed.data;
}

/** A v1 results object in the v2 shape (see {@link parseResults}); anything malformed is left for the schema. */
function fromV1(data: Record<string, unknown>): Record<string, unknown> {
  const series = Array.isArray(data.series) ? data.series : [];
  return {
    ...data,
    schema: RESULTS_SCHEMA,
    groups: [],
    series: series.map((s: Record<string, unknown>) => ({
      ...s,
      better: 'higher',
      versusTarget: null,
      forecast:
        s.forecast && typeof s.forecast === 'object' ? {...s.forecast, baseMean: null, reconciliation: null} : s.forecast,
    })),
  };
}
