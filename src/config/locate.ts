import {isAlias, isMap, isScalar, isSeq, type Document, type LineCounter} from 'yaml';

/** 1-based line and column in the pack file. */
export interface Position {
  line: number;
  column: number;
}

/**
 * Where a data path sits in the YAML source: the key of the last mapping entry on the path, or the
 * start of the last list item. When the path runs past what the file contains (a missing key), the
 * deepest part that exists is given, so "series[1].source is required" points at series[1].
 *
 * Complexity: O(total entries of the mappings along the path).
 */
export function locate(doc: Document, lineCounter: LineCounter, path: readonly PropertyKey[]): Position {
  let node: unknown = doc.contents;
  let offset = isMap(node) || isSeq(node) || isScalar(node) ? (node.range?.[0] ?? 0) : 0;
  for (const seg of path) {
    if (isAlias(node)) node = node.resolve(doc);
    if (isMap(node)) {
      const pair = node.items.find((p) => isScalar(p.key) && String(p.key.value) === String(seg));
      if (!pair || !isScalar(pair.key) || !pair.key.range) break;
      offset = pair.key.range[0];
      node = pair.value;
    } else if (isSeq(node) && typeof seg === 'number') {
      const item: unknown = node.items[seg];
      if (!(isMap(item) || isSeq(item) || isScalar(item) || isAlias(item)) || !item.range) break;
      offset = item.range[0];
      node = item;
    } else break;
  }
  const {line, col} = lineCounter.linePos(offset);
  return {line, column: col};
}
