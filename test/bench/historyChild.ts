/**
 * Child of the history benchmark: loads the history of period 2026-12 from the archive in argv[2] and prints as
 * JSON its time, the resident memory just before (this period's own figures already held) and the peak.
 *
 *   node --expose-gc historyChild.js <outDir> <series>
 */
import {loadHistory} from '../../src/history/index.js';
import {digestOfReport, report} from '../archive/fixtures/report.js';

const [out, count] = process.argv.slice(2);
const specs = Array.from({length: Number(count)}, (_, i) => ({id: `line-${i + 1}`, length: 120}));
const current = digestOfReport(report(2026, 12, specs));
(globalThis as {gc?: () => void}).gc?.();
const before = process.memoryUsage().rss;
const cpu = process.cpuUsage();
const started = performance.now();
const history = await loadHistory(out, 'harbourline-monthly', '2026-12', 'monthly', current, 1);
const ms = performance.now() - started;
const used = process.cpuUsage(cpu);
process.stdout.write(
  JSON.stringify({
    ms,
    cpuMs: (used.user + used.system) / 1000,
    beforeMiB: Math.round(before / 2 ** 20),
    peakMiB: Math.round(process.resourceUsage().maxRSS / 1024),
    tracking: history?.tracking.length ?? 0,
    revisions: history?.revisions.length ?? 0,
  }),
);
