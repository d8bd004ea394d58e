/**
 * Bookmarks (the document outline) for a PDF printed by Chromium, written by us rather than by the browser.
 *
 * Why: Chromium builds its own outline only for a tagged PDF, and tagging costs about a third of the printing
 * time and doubles the file. It does write, untagged, a named destination for every element id that some link in
 * the page points to (the report carries a hidden list of links to its sections for this). This module appends an
 * incremental update (PDF 32000-1:2008, §7.5.6): outline items that point at those destinations by name (§12.3.3),
 * and a new catalog that names the outline and opens the bookmarks panel. The bytes printed before stay unchanged.
 *
 * Entries whose destination is missing (say, a restyled template without the section) are left out, with their
 * children lifted to their place. A file not laid out as expected (no cross-reference table, or an outline
 * already there) is returned unchanged.
 *
 * Complexity: O(file size) for one scan of the trailer and two objects.
 */

export interface OutlineEntry {
  title: string;
  /** Element id of the section in the page, without '#'. */
  dest: string;
  children: OutlineEntry[];
}

interface Trailer {
  /** The trailer dictionary's entries, without the enclosing brackets. */
  entries: string;
  size: number;
  root: number;
  xrefAt: number;
}

export function addOutline(pdf: Uint8Array, entries: readonly OutlineEntry[]): Uint8Array {
  const text = Buffer.from(pdf.buffer, pdf.byteOffset, pdf.byteLength).toString('latin1');
  const trailer = lastTrailer(text);
  if (trailer === null) return pdf;
  const catalog = objectBody(text, trailer, trailer.root);
  if (catalog === null || !catalog.startsWith('<<') || /\/Outlines\b/.test(catalog)) return pdf;
  const destsRef = /\/Dests\s+(\d+)\s+0\s+R/.exec(catalog);
  const dests = destsRef ? objectBody(text, trailer, Number(destsRef[1])) : null;
  const names = dests === null ? new Map<string, string>() : destinationNames(dests);
  const kept = keep(entries, names);
  if (kept.length === 0) return pdf;

  const objects: {num: number; body: string}[] = [];
  const outlineRoot = trailer.size;
  let next = outlineRoot + 1;
  const number = (list: Kept[]): number[] => list.map(() => next++);
  const write = (list: Kept[], nums: number[], parent: number): void => {
    list.forEach((entry, k) => {
      const kids = number(entry.children);
      const links = [
        `/Title ${pdfText(entry.title)}`,
        `/Parent ${parent} 0 R`,
        k > 0 ? `/Prev ${nums[k - 1]} 0 R` : '',
        k < list.length - 1 ? `/Next ${nums[k + 1]} 0 R` : '',
        // Children start closed: a negative count is the number of items shown when opened (§12.3.3).
        kids.length > 0 ? `/First ${kids[0]} 0 R\n/Last ${kids[kids.length - 1]} 0 R\n/Count -${kids.length}` : '',
        `/Dest /${entry.name}`,
      ];
      objects.push({num: nums[k], body: `<<${links.filter(Boolean).join('\n')}>>`});
      write(entry.children, kids, nums[k]);
    });
  };
  const top = number(kept);
  write(kept, top, outlineRoot);
  objects.push({
    num: outlineRoot,
    body: `<</Type /Outlines\n/First ${top[0]} 0 R\n/Last ${top[top.length - 1]} 0 R\n/Count ${top.length}>>`,
  });
  const newCatalog = `<</Outlines ${outlineRoot} 0 R\n/PageMode /UseOutlines\n${catalog.slice(2)}`;
  objects.push({num: trailer.root, body: newCatalog});
  objects.sort((a, b) => a.num - b.num);

  let update = '\n';
  const offsets = new Map<number, number>();
  for (const {num, body} of objects) {
    offsets.set(num, text.length + update.length);
    update += `${num} 0 obj\n${body}\nendobj\n`;
  }
  const xrefAt = text.length + update.length;
  update += `xref\n${trailer.root} 1\n${xrefEntry(offsets.get(trailer.root)!)}${outlineRoot} ${next - outlineRoot}\n`;
  for (let num = outlineRoot; num < next; num++) update += xrefEntry(offsets.get(num)!);
  const carried = trailer.entries.replace(/\/Size\s+\d+/, '').replace(/\/Prev\s+\d+/, '').trim();
  update += `trailer\n<</Size ${next}\n${carried}\n/Prev ${trailer.xrefAt}>>\nstartxref\n${xrefAt}\n%%EOF\n`;
  return new Uint8Array(Buffer.concat([Buffer.from(pdf), Buffer.from(update, 'latin1')]));
}

interface Kept {
  title: string;
  /** The destination's name as written in the file (after '/'). */
  name: string;
  children: Kept[];
}

function keep(entries: readonly OutlineEntry[], names: Map<string, string>): Kept[] {
  return entries.flatMap((e) => {
    const children = keep(e.children, names);
    const name = names.get(e.dest);
    return name === undefined ? children : [{title: e.title, name, children}];
  });
}

/** Cross-reference entry of an object at byte `offset`: exactly 20 bytes (§7.5.4). */
function xrefEntry(offset: number): string {
  return `${String(offset).padStart(10, '0')} 00000 n \n`;
}

function lastTrailer(text: string): Trailer | null {
  const tail = text.slice(-4096);
  const m = /trailer\s*<<([\s\S]*?)>>\s*startxref\s+(\d+)\s+%%EOF\s*$/.exec(tail);
  if (!m) return null;
  const size = /\/Size\s+(\d+)/.exec(m[1]);
  const root = /\/Root\s+(\d+)\s+0\s+R/.exec(m[1]);
  if (!size || !root) return null;
  return {entries: m[1], size: Number(size[1]), root: Number(root[1]), xrefAt: Number(m[2])};
}

/** The dictionary of object `num` (generation 0), found through the cross-reference table; null when absent. */
function objectBody(text: string, trailer: Trailer, num: number): string | null {
  const offset = xrefOffset(text, trailer.xrefAt, num);
  if (offset === null) return null;
  const head = `${num} 0 obj`;
  if (text.slice(offset, offset + head.length) !== head) return null;
  const end = text.indexOf('endobj', offset);
  return end < 0 ? null : text.slice(offset + head.length, end).trim();
}

function xrefOffset(text: string, at: number, num: number): number | null {
  if (text.slice(at, at + 4) !== 'xref') return null;
  const line = /\s*(\d+) (\d+)\s*?\r?\n/y;
  let pos = at + 4;
  for (;;) {
    line.lastIndex = pos;
    const m = line.exec(text);
    if (!m) return null;
    const first = Number(m[1]);
    const count = Number(m[2]);
    pos = line.lastIndex;
    if (num >= first && num < first + count) {
      const entry = text.slice(pos + 20 * (num - first), pos + 20 * (num - first) + 18);
      return entry.endsWith(' n') ? Number(entry.slice(0, 10)) : null;
    }
    pos += 20 * count;
  }
}

/** Destination names of a `/Dests` dictionary, decoded (`#2D` → `-`) and mapped to their written form. */
function destinationNames(dict: string): Map<string, string> {
  const names = new Map<string, string>();
  for (const m of dict.matchAll(/\/([^\s/[\]<>(){}%]+)\s*\[/g)) {
    names.set(m[1].replace(/#([0-9A-Fa-f]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16))), m[1]);
  }
  return names;
}

/** A PDF text string (§7.9.2.2): printable ASCII as a literal string, anything else as UTF-16BE in hex. */
function pdfText(s: string): string {
  if (/^[\x20-\x7e]*$/.test(s)) return `(${s.replace(/[\\()]/g, '\\$&')})`;
  let hex = 'FEFF';
  for (let i = 0; i < s.length; i++) hex += s.charCodeAt(i).toString(16).toUpperCase().padStart(4, '0');
  return `<${hex}>`;
}
