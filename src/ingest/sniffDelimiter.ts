/**
 * Guess the field delimiter from a CSV header line: whichever of comma, semicolon and tab occurs most
 * often outside double quotes. Ties and a line with none of them give a comma (a one-column file).
 *
 * Why: files saved where the decimal mark is a comma usually separate fields with semicolons.
 *
 * Complexity: O(length of line).
 */
export function sniffDelimiter(headerLine: string): ',' | ';' | '\t' {
  const counts = {',': 0, ';': 0, '\t': 0};
  let quoted = false;
  for (const ch of headerLine) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === ',' || ch === ';' || ch === '\t')) counts[ch]++;
  }
  if (counts[';'] > counts[','] && counts[';'] >= counts['\t']) return ';';
  if (counts['\t'] > counts[','] && counts['\t'] > counts[';']) return '\t';
  return ',';
}
