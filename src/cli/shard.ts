import {resolve} from 'node:path';
import {InvalidArgumentError} from 'commander';

/** One of `count` equal parts of a batch of packs; `index` counts from 1. */
export interface Shard {
  index: number;
  count: number;
}

/** Most shards accepted; more is surely a typo. */
const MAX_SHARDS = 10_000;

/** `--shard 3/8` → `{index: 3, count: 8}`; a usage error (exit 2) unless i and n are whole numbers, 1 ≤ i ≤ n. */
export function parseShard(value: string): Shard {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(value);
  if (!match) throw new InvalidArgumentError('write it as i/n, e.g. 3/8 for the third of eight parts');
  const index = Number(match[1]);
  const count = Number(match[2]);
  if (count < 1 || count > MAX_SHARDS) {
    throw new InvalidArgumentError(`the number of parts n must be from 1 to ${MAX_SHARDS}`);
  }
  if (index < 1 || index > count) {
    throw new InvalidArgumentError(`the part i must be from 1 to ${count} (parts count from 1)`);
  }
  return {index, count};
}

/**
 * The packs of one shard. Every copy of the command must be given the same pack list from the same folder: the
 * paths are resolved to absolute paths, duplicates dropped, sorted in plain code-unit order (no locale), and the
 * pack at 0-based position k belongs to part (k mod n) + 1. So the parts never overlap, together they cover the
 * batch, and their sizes differ by at most one. Returns the given paths of the shard's packs, in that order.
 *
 * Complexity: O(p log p) for p packs.
 */
export function selectShard(packs: string[], shard: Shard): string[] {
  const byPath = new Map<string, string>();
  for (const pack of packs) {
    const full = resolve(pack);
    if (!byPath.has(full)) byPath.set(full, pack);
  }
  const sorted = [...byPath.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  return sorted.filter((_, k) => k % shard.count === shard.index - 1).map((full) => byPath.get(full)!);
}
