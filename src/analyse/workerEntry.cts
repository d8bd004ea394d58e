/**
 * Worker-thread entry of the analysis pool, in CommonJS on purpose. Piscina loads its task file with `require()`
 * first; on Node 20, `require()` of an ES module in a thread that is terminated while it loads aborts the whole
 * process (a V8 fatal error, "IsGraphAsync must be used on an instantiated module"), which happened now and then
 * when the pool shut down while a thread was still starting. From this CommonJS file the analysis is loaded with
 * `import()`, which a termination stops cleanly.
 */
export = async function analyseInWorker(input: unknown): Promise<unknown> {
  const {default: analyse} = await import('./worker.js');
  return analyse(input as Parameters<typeof analyse>[0]);
};
