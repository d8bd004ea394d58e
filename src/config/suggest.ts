/**
 * Edit distance between two strings: the optimal string alignment variant of the Damerau–Levenshtein
 * distance (insert, delete, substitute, or swap two adjacent characters; each substring edited once).
 *
 * Why: unknown keys and unknown ids get a "did you mean …?" hint, and the commonest typos are one
 * dropped, doubled, wrong or swapped letter.
 *
 * Reference: F. J. Damerau (1964), "A technique for computer detection and correction of spelling
 * errors", Comm. ACM 7(3); V. I. Levenshtein (1966), "Binary codes capable of correcting deletions,
 * insertions, and reversals", Soviet Physics Doklady 10(8).
 *
 * Complexity: O(|a|·|b|) time, O(|b|) memory (three rolling rows).
 *
 * @example editDistance('kidn', 'kind') // => 1
 */
export function editDistance(a: string, b: string): number {
  let before = new Array<number>(b.length + 1).fill(0);
  let previous = Array.from({length: b.length + 1}, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = new Array<number>(b.length + 1);
    current[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, before[j - 2] + 1);
      current[j] = d;
    }
    before = previous;
    previous = current;
  }
  return previous[b.length];
}

/**
 * The candidate a mistyped `word` most likely meant: the closest one within edit distance 2
 * (ignoring case), else one that starts with the word or that the word starts with (at least
 * three letters shared). Ties go to the earlier candidate. Undefined when nothing is close.
 *
 * Complexity: O(n·|word|·|candidate|) for n candidates.
 */
export function didYouMean(word: string, candidates: readonly string[]): string | undefined {
  const w = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = 3;
  for (const c of candidates) {
    const d = editDistance(w, c.toLowerCase());
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  if (best !== undefined) return best;
  if (w.length < 3) return undefined;
  return candidates.find((c) => {
    const l = c.toLowerCase();
    return l.length >= 3 && (l.startsWith(w) || w.startsWith(l));
  });
}

/** `; did you mean x?` or the empty string, for appending to a message. */
export function hint(word: string, candidates: readonly string[]): string {
  const s = didYouMean(word, candidates);
  return s === undefined ? '' : `; did you mean ${s}?`;
}
