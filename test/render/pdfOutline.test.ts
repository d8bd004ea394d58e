import {describe, expect, test} from 'vitest';
import {execFileSync, spawnSync} from 'node:child_process';
import {mkdtempSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {addOutline, type OutlineEntry} from '../../src/render/pdfOutline.js';

/**
 * A two-page PDF laid out as Chromium writes one: plain objects, one cross-reference table, named destinations
 * in a `/Dests` dictionary of the catalog. Built by hand after PDF 32000-1:2008 §7.5.
 */
function twoPages(catalogExtra = '/Dests 5 0 R'): Uint8Array {
  const objects = [
    `<</Type /Catalog\n/Pages 2 0 R\n${catalogExtra}>>`,
    '<</Type /Pages\n/Kids [3 0 R 4 0 R]\n/Count 2>>',
    '<</Type /Page\n/Parent 2 0 R\n/MediaBox [0 0 200 200]>>',
    '<</Type /Page\n/Parent 2 0 R\n/MediaBox [0 0 200 200]>>',
    '<</summary [3 0 R /XYZ 0 200 0]\n/series#2Dnet [4 0 R /XYZ 0 200 0]\n/methods [4 0 R /XYZ 0 100 0]>>',
  ];
  let text = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((body, i) => {
    offsets.push(text.length);
    text += `${i + 1} 0 obj\n${body}\nendobj\n`;
  });
  const xref = text.length;
  text += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const offset of offsets) text += `${String(offset).padStart(10, '0')} 00000 n \n`;
  text += `trailer\n<</Size ${objects.length + 1}\n/Root 1 0 R>>\nstartxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(text, 'latin1'));
}

const entries: OutlineEntry[] = [
  {title: 'At a glance', dest: 'summary', children: []},
  {title: 'Sales (net)', dest: 'series-net', children: []},
  {title: 'Gone', dest: 'no-such-section', children: [{title: 'Umsätze – netto', dest: 'methods', children: []}]},
];

const latin1 = (bytes: Uint8Array) => Buffer.from(bytes).toString('latin1');

describe('addOutline', () => {
  test('appends an update: the old bytes stay, every new object is where the new table says', () => {
    const before = twoPages();
    const after = addOutline(before, entries);
    expect(Buffer.from(after.subarray(0, before.length)).equals(Buffer.from(before))).toBe(true);
    const text = latin1(after);
    const xrefAt = Number(/startxref\s+(\d+)\s+%%EOF\s*$/.exec(text)![1]);
    const table = text.slice(xrefAt);
    expect(table.startsWith('xref\n1 1\n')).toBe(true);
    for (const m of table.matchAll(/^(\d+) (\d+)\n((?:\d{10} \d{5} n \n)+)/gm)) {
      const first = Number(m[1]);
      m[3].match(/\d{10} \d{5} n \n/g)!.forEach((entry, k) => {
        const offset = Number(entry.slice(0, 10));
        expect(text.startsWith(`${first + k} 0 obj\n<<`, offset)).toBe(true);
      });
    }
    expect(/\/Prev (\d+)>>\nstartxref/.exec(text)![1]).toBe(/startxref\s+(\d+)/.exec(latin1(before))![1]);
    // Three items (the missing destination left out) and the outline root: objects 6 to 9, so /Size 10.
    expect(text).toMatch(/trailer\n<<\/Size 10\n\/Root 1 0 R\n\/Prev \d+>>/);
    expect(text).toContain('/Outlines 6 0 R\n/PageMode /UseOutlines\n/Type /Catalog');
  });

  test('titles: ASCII as literal strings with parentheses escaped, anything else as UTF-16BE', () => {
    const text = latin1(addOutline(twoPages(), entries));
    expect(text).toContain('/Title (Sales \\(net\\))');
    // "Umsätze – netto": ä is U+00E4, the dash U+2013.
    expect(text).toContain('/Title <FEFF0055006D007300E40074007A0065002020130020006E006500740074006F>');
    expect(text).toContain('/Dest /series#2Dnet');
  });

  test('poppler reads the bookmarks and their pages', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ebbflow-outline-'));
    const file = join(dir, 'two.pdf');
    writeFileSync(file, addOutline(twoPages(), entries));
    expect(spawnSync('pdfinfo', [file], {encoding: 'utf8'}).stderr).toBe('');
    const xml = execFileSync('pdftohtml', ['-xml', '-i', '-q', '-stdout', file], {encoding: 'utf8'});
    const items = Array.from(xml.matchAll(/<item page="(\d+)">([^<]*)<\/item>/g), (m) => `${m[1]} ${m[2]}`);
    expect(items).toEqual(['1 At a glance', '2 Sales (net)', '2 Umsätze – netto']);
  });

  test('children of a missing section take its place; nothing to point at leaves the file alone', () => {
    const child: OutlineEntry = {title: 'Child', dest: 'methods', children: []};
    const text = latin1(addOutline(twoPages(), [{title: 'Parent', dest: 'summary', children: [child]}]));
    expect(text).toContain('/Title (Parent)\n/Parent 6 0 R\n/First 8 0 R\n/Last 8 0 R\n/Count -1\n/Dest /summary');
    const none = twoPages();
    expect(addOutline(none, [{title: 'x', dest: 'absent', children: []}])).toBe(none);
    const noDests = twoPages('');
    expect(addOutline(noDests, entries)).toBe(noDests);
    const outlined = twoPages('/Dests 5 0 R\n/Outlines 5 0 R');
    expect(addOutline(outlined, entries)).toBe(outlined);
  });
});
