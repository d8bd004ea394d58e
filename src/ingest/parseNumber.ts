/**
 * Numbers in CSV cells, per the source's decimal mark.
 *
 * Accepted: an optional sign (`-`, `+` or the minus sign U+2212), digits with the source's decimal mark,
 * thousands grouped in threes by one consistent separator (`,` space, no-break space, narrow no-break
 * space or `'` when the decimal mark is `.`; `.` space, no-break spaces or `'` when it is `,`), an
 * exponent (`1.5e3`, only without grouping), accounting negatives in parentheses (`(1,234.5)`) and the trailing
 * minus some ledgers export (`1.234,50-`).
 *
 * Missing (NaN, never 0): blank, `NA`, `N/A`, `#N/A`, `-`, `–`, `—`, `null`, `NaN` (any case).
 *
 * Rejected (undefined; {@link numberAdvice} says why): currency symbols and codes, a trailing `%`, and numbers
 * beyond the double range (`1e400`), which would otherwise enter the analysis as Infinity.
 * They are not stripped because dropping them silently would change meaning: `12%` could be 12 or 0.12,
 * and a symbol on some cells suggests a column that mixes currencies. Units belong in the series `unit`.
 *
 * Complexity: O(length of text).
 */
export function parseNumberCell(text: string, decimal: '.' | ','): number | undefined {
  const value = readNumber(text, decimal);
  // 1e400 reads as Infinity: rejected, since no later stage can compute with it.
  return value === Infinity || value === -Infinity ? undefined : value;
}

/** {@link parseNumberCell} before the overflow check. */
function readNumber(text: string, decimal: '.' | ','): number | undefined {
  if (decimal === '.') {
    const fast = plainDecimal(text);
    if (fast !== undefined) return fast;
    if (PLAIN.test(text)) return Number(text);
  }
  let s = text.trim();
  if (MISSING.has(s.toLowerCase())) return NaN;
  let sign = 1;
  const bracketed = s.match(/^\((.*)\)$/);
  if (bracketed) {
    sign = -1;
    s = bracketed[1].trim();
  }
  if (/^[-+\u2212]/.test(s)) {
    if (s[0] !== '+') sign = -sign;
    s = s.slice(1);
  } else if (/\d[-\u2212]$/.test(s)) {
    sign = -sign;
    s = s.slice(0, -1);
  }
  if (bracketed && sign > 0) return undefined;
  const grouped = (decimal === '.' ? DOT_GROUPED : COMMA_GROUPED).exec(s);
  if (grouped) {
    const digits = grouped[1].replace(/[^0-9]/g, '');
    return sign * Number(grouped[3] === undefined ? digits : `${digits}.${grouped[3]}`);
  }
  const plain = (decimal === '.' ? DOT_PLAIN : COMMA_PLAIN).exec(s);
  if (plain) return sign * Number(decimal === '.' ? s : s.replace(',', '.'));
  return undefined;
}

const POWERS = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * Plain decimal text of at most 15 digits (`-12.34`, `100`, `.5`, `7.`) read from its characters (`text` from
 * `start` to `end`, so a CSV line need not be cut), or undefined for anything else. Equal to `Number(text)`: the digits form an integer below 2^53 and 10^k is exact, so their quotient
 * is the correctly rounded value (Clinger's fast path). Several times faster than a regular expression and Number.
 */
export function plainDecimal(text: string, start = 0, end = text.length): number | undefined {
  const n = end;
  if (n === start || n - start > 17) return undefined;
  const negative = text.charCodeAt(start) === 45;
  let i = negative ? start + 1 : start;
  let m = 0;
  let digits = 0;
  let places = -1;
  for (; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      m = m * 10 + (c - 48);
      digits++;
      if (places >= 0) places++;
    } else if (c === 46 && places < 0) places = 0;
    else return undefined;
  }
  if (digits === 0 || digits > 15) return undefined;
  const v = places > 0 ? m / POWERS[places] : m;
  return negative ? -v : v;
}

/** Why a cell that {@link parseNumberCell} rejected is not a number, and how to fix it. */
export function numberAdvice(text: string, decimal: '.' | ','): string {
  const s = text.trim();
  if (/[€$£¥₹₣₤]|\b(EUR|USD|GBP|CHF|JPY|SEK|NOK|DKK)\b/i.test(s)) {
    return 'remove the currency symbol or code and put the unit in the series `unit`';
  }
  if (/%$/.test(s)) return 'write percentages as plain numbers (12.5, not 12.5%) and put % in the series `unit`';
  if (/^#(DIV\/0!|VALUE!|REF!|NAME\?|NUM!|NULL!|SPILL!|CALC!)$/i.test(s)) {
    return (
      'it is a spreadsheet error value: correct the formula in the workbook the file came from and export it ' +
      'again, or leave the cell blank'
    );
  }
  if (Math.abs(readNumber(s, decimal) ?? 0) === Infinity) {
    return 'it is too large to compute with (the limit is about 1.8e308); check the exponent';
  }
  const other = decimal === '.' ? ',' : '.';
  if (parseNumberCell(s, other as '.' | ',') !== undefined) {
    return `it reads as a number with decimal mark "${other}": set \`decimal: "${other}"\` on the source`;
  }
  return 'write a number such as 1234.5, or leave the cell blank or NA when the value is missing';
}

const PLAIN = /^-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;
const DOT_PLAIN = /^(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;
const COMMA_PLAIN = /^(?:\d+,?\d*|,\d+)(?:[eE][-+]?\d+)?$/;
const DOT_GROUPED = /^(\d{1,3}([, \u00a0\u202f'])\d{3}(?:\2\d{3})*)(?:\.(\d*))?$/;
const COMMA_GROUPED = /^(\d{1,3}([. \u00a0\u202f'])\d{3}(?:\2\d{3})*)(?:,(\d*))?$/;
const MISSING = new Set(['', 'na', 'n/a', '#n/a', '-', '\u2013', '\u2014', 'null', 'nan']);
