/**
 * The pipeline's shape, read from the source: every import runs down the stage order (a stage may use the stages
 * before it, never one after it) and no files import each other in a circle. `stageOf` is the order itself; a new
 * stage folder gets its place there.
 */
import {readdirSync, readFileSync} from 'node:fs';
import {dirname, join, relative, resolve} from 'node:path';
import {fileURLToPath} from 'node:url';
import {describe, expect, test} from 'vitest';

const src = fileURLToPath(new URL('../../src/', import.meta.url));

/** The stages in pipeline order; files outside a stage folder are shared utilities (rank 0) or the top (last). */
const ORDER = ['config', 'ingest', 'derive', 'analyse', 'combine', 'results', 'history', 'narrate', 'render', 'archive'];
const SHARED = ['time', 'errors.ts', 'log.ts', 'version.ts'];
const TOP = ['run.ts', 'cli', 'index.ts'];

function stageOf(file: string): {name: string; rank: number} {
  const first = relative(src, file).split('/')[0];
  if (SHARED.includes(first)) return {name: first, rank: 0};
  if (ORDER.includes(first)) return {name: first, rank: ORDER.indexOf(first) + 1};
  if (first === 'run.ts') return {name: first, rank: ORDER.length + 1};
  if (TOP.includes(first)) return {name: first, rank: ORDER.length + 2};
  throw new Error(`${first} has no place in the stage order: add it to imports.test.ts`);
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, {withFileTypes: true}).flatMap((e) => {
    const path = join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(path);
    return /\.c?ts$/.test(e.name) && !e.name.endsWith('.d.ts') ? [path] : [];
  });
}

/** Relative imports of a file (static, type-only and dynamic), resolved to source paths. */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const specs = [
    ...text.matchAll(/^\s*(?:import|export)\b[^'"]*?from\s+'(\.[^']+)'/gm),
    ...text.matchAll(/import\(\s*'(\.[^']+)'\s*\)/g),
  ].map((m) => m[1]);
  return specs.map((s) => resolve(dirname(file), s).replace(/\.c?js$/, (ext) => (ext === '.cjs' ? '.cts' : '.ts')));
}

const files = sourceFiles(src);
const graph = new Map(files.map((f) => [f, importsOf(f)]));

describe('the pipeline order', () => {
  test('every relative import names a source file', () => {
    const missing = [...graph].flatMap(([f, deps]) => deps.filter((d) => !graph.has(d)).map((d) => `${rel(f)} → ${rel(d)}`));
    expect(missing).toEqual([]);
  });

  test('no stage imports a later stage', () => {
    const upward = [...graph].flatMap(([f, deps]) =>
      deps.filter((d) => stageOf(d).rank > stageOf(f).rank).map((d) => `${rel(f)} → ${rel(d)}`),
    );
    expect(upward).toEqual([]);
  });

  test('no files import each other in a circle', () => {
    expect(cycles()).toEqual([]);
  });
});

function rel(file: string): string {
  return relative(src, file);
}

/** Each circle of imports, once, as the files along it (Tarjan's strongly connected components). */
function cycles(): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string) => {
    index.set(v, next);
    low.set(v, next++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!graph.has(w)) continue;
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(rel(w));
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) found.push(component.sort());
    }
  };
  for (const f of files) if (!index.has(f)) visit(f);
  return found;
}
