import {InputError} from '../errors.js';
import {RESULTS_SCHEMA, resultsSchema, type ResultsV1} from './schema.js';

/**
 * Read and check a results.json written by this or an earlier version of ebbflow. Throws an
 * {@link InputError} naming `file` and the first offending field when the text is not JSON, has
 * another schema tag, or does not have the v1 shape.
 */
export function parseResults(text: string, file = 'results.json'): ResultsV1 {
  const problem = (message: string) => new InputError([{file, line: null, column: null, message}]);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw problem(`unreadable results file: ${(e as Error).message}`);
  }
  const tag = (data as {schema?: unknown} | null)?.schema;
  if (tag !== RESULTS_SCHEMA) {
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
