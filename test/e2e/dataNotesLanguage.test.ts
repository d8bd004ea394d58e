import {mkdtempSync, readFileSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {collectingLogger} from '../../src/log.js';
import {build} from '../../src/run.js';
import {civilFromDays, daysFromCivil} from '../../src/time/period.js';

// A till export as a German or French client sends it: one row a day from 20 January 2023 to 12 March 2026, no
// rows in June 2024, a total row under the data, no review period in the pack. The data notes of the HTML report
// (the data-notes page) must be in the pack's language; a note about one series is led by its label.
const dir = mkdtempSync(join(tmpdir(), 'ebbflow-notes-'));
const html: Record<string, string> = {};

/** The data-notes section of a report, tags removed. */
function notesOf(page: string): string {
  const at = page.lastIndexOf('id="data-notes"');
  return page.slice(at).replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
}

beforeAll(async () => {
  let csv = 'Datum;Umsatz\n';
  for (let d = daysFromCivil(2023, 1, 20); d <= daysFromCivil(2026, 3, 12); d++) {
    const {year, month, day} = civilFromDays(d);
    if (year === 2024 && month === 6) continue;
    const value = 1000 + 300 * Math.sin((2 * Math.PI * month) / 12) + 40 * ((d * 7919) % 13);
    csv += `${String(day).padStart(2, '0')}.${String(month).padStart(2, '0')}.${year};${value.toFixed(2).replace('.', ',')}\n`;
  }
  csv += 'Summe;;\n';
  writeFileSync(join(dir, 'kasse.csv'), csv);
  for (const locale of ['de-DE', 'fr-FR']) {
    const pack = join(dir, `pack-${locale}.yaml`);
    writeFileSync(
      pack,
      `pack: {id: kasse-${locale.toLowerCase()}, title: Kasse, frequency: monthly, locale: ${locale}, formats: [html]}\n` +
        'sources: [{id: kasse, file: kasse.csv, delimiter: ";", decimal: ",", dateFormat: DD.MM.YYYY, ' +
        'dateColumn: Datum}]\n' +
        'series: [{id: umsatz, label: Umsatz, source: kasse, column: Umsatz}]\n',
    );
    const summary = await build({packFile: pack, outDir: join(dir, 'out'), force: true, jobs: 1}, collectingLogger());
    html[locale] = notesOf(readFileSync(join(summary.folder, 'report.html'), 'utf8'));
  }
}, 180_000);

afterAll(() => rmSync(dir, {recursive: true, force: true}));

/** Parts of the English data notes, none of which may appear in a German or French report. */
const ENGLISH = ['has data for', 'left out', 'after the data ignored', 'combined into', 'missing month', 'review period', 'the pack sets none', 'taken as a footer'];

describe('data notes in the pack’s language', () => {
  it('German', () => {
    const de = html['de-DE'];
    expect(ENGLISH.filter((p) => de.includes(p))).toEqual([]);
    for (const sentence of [
      'Januar 2023 enthält Daten für 12 von 31 Tagen (die Daten beginnen innerhalb der Periode) und bleibt unberücksichtigt',
      'März 2026 enthält Daten für 12 von 31 Tagen (die Daten enden innerhalb der Periode) und bleibt unberücksichtigt',
      'Zeilen auf Tagesebene zu Monaten zusammengefasst',
      '1 Zeile nach den Daten nicht berücksichtigt („Summe“): kein Datum, daher als Fußzeile gewertet',
      'Umsatz: 1 Monat fehlt: Juni 2024',
      'Berichtszeitraum Februar 2026: Das Paket legt keinen fest, daher gilt die letzte Periode mit Daten',
    ]) {
      expect(de).toContain(sentence);
    }
  });

  it('French', () => {
    const fr = html['fr-FR'];
    expect(ENGLISH.filter((p) => fr.includes(p))).toEqual([]);
    for (const sentence of [
      'janvier 2023 : données pour 12 jours sur 31 seulement (les données commencent en cours de période) ; la période est écartée',
      'lignes journalières regroupées en mois',
      'Umsatz : 1 mois manquant : juin 2024',
      'période sous revue février 2026 : le dossier n’en fixe pas, la dernière période avec des données est retenue',
    ]) {
      expect(fr).toContain(sentence);
    }
  });
});
