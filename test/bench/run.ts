/**
 * `npm run bench`: every benchmark in turn (compiled by `npm run build`, run with node). Each module exports
 * `run()` and prints its own figures; none of them is part of `npm test`. Pass names to run a subset:
 * `node dist/test/bench/run.js stl cycle`.
 */
const all = ['ingest', 'aggregate', 'stl', 'ets', 'cycle', 'scale', 'render', 'archive', 'history', 'backfill', 'reconcile'];
const wanted = process.argv.slice(2);
for (const name of wanted.length ? wanted : all) {
  const mod = (await import(`./${name}.js`)) as {run: () => Promise<void>};
  console.log(`\n## ${name}`);
  await mod.run();
}
