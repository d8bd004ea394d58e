import type {Catalog} from './en.js';

/**
 * German words of the report, in the terms German statistical offices and controllers use (saisonbereinigt,
 * Trend-Konjunktur-Komponente, gegenüber Vorjahr, Prozentpunkte, Geschäftsjahr, Planwert). Sentences avoid verbs
 * that must agree with the series' name; periods follow "für" (für Oktober 2026, für Q3 2026, für KW 41/2026).
 * The reviewer's glossary is in DEVELOPERS.md.
 */
export const de: Catalog = {
  'period.quarter': 'Q{quarter} {year}',
  'period.quarterLong': 'Q{quarter} {year}',
  'period.week': 'KW {week}/{year}',
  'season.quarter': 'Q{quarter}',
  'season.week': 'KW {week}',
  'unit.points': '{value} Pp.',
  'unit.range': '{low} bis {high}',
  'unit.withUnit': '{value} {unit}',
  'p.below': 'p < {value}',
  'p.equal': 'p = {value}',
  'count.periods':
    '{frequency, select, monthly {{n, plural, one {# Monat} other {# Monate}}} quarterly {{n, plural, one {# Quartal} other {# Quartale}}} other {{n, plural, one {# Woche} other {# Wochen}}}}',
  'count.more': '{n} weitere',
  'per.period': '{frequency, select, monthly {je Monat} quarterly {je Quartal} other {je Woche}}',
  'previous.period': '{frequency, select, monthly {dem Vormonat} quarterly {dem Vorquartal} other {der Vorwoche}}',

  'term.original': 'Originalwerte',
  'term.adjusted': 'Saisonbereinigt',
  'term.trendCycle': 'Trend-Konjunktur-Komponente',
  'term.yearOnYear': 'Gegenüber Vorjahr',
  'term.irregular': 'Irreguläre Komponente',
  'phase.rising-above': 'über dem Trend und steigend',
  'phase.falling-above': 'über dem Trend und nachlassend',
  'phase.falling-below': 'unter dem Trend und fallend',
  'phase.rising-below': 'unter dem Trend und sich erholend',
  'phase.onTrend': 'im Trend, ohne erkennbaren Zyklus',
  'direction.rising': 'steigend',
  'direction.falling': 'fallend',
  'direction.flat': 'seitwärts',
  'outlier.additive': 'einmaliger Ausreißer',
  'outlier.level-shift': 'Niveauverschiebung',
  'outlier.temporary': 'vorübergehende Änderung',
  'turn.peak': 'oberen Wendepunkt',
  'turn.trough': 'unteren Wendepunkt',
  'severity.info': 'Hinweis',
  'severity.watch': 'Beobachten',
  'severity.alert': 'Warnung',
  'model.additive': 'additiv',
  'model.multiplicative': 'multiplikativ',
  'method.stl': 'STL',
  'method.classical': 'klassische gleitende Durchschnitte',
  'method.fourier': 'jährliches Fourier-Muster',
  'cycle.hp': 'Hodrick-Prescott',
  'cycle.bandpass': 'Christiano-Fitzgerald',
  'regressor.working-days': 'Arbeitstage',
  'regressor.holidays': 'Feiertage',
  'regressor.easter': 'Ostern',
  'measure.original': 'Originalwert',
  'measure.adjusted': 'Saisonbereinigter Wert',
  'measure.trend-direction': 'Trendrichtung',
  'measure.cycle-phase': 'Zyklusphase',
  'revision.data': 'Daten geändert',
  'revision.estimate': 'Neu geschätzt',

  'section.summary': 'Auf einen Blick',
  'section.headline': 'Was auffällt',
  'section.table': 'Alle Reihen',
  'section.history': 'Seit dem letzten Bericht',
  'section.revisions': 'Revidierte Werte',
  'section.tracking': 'Treffsicherheit früherer Prognosen',
  'section.methods': 'Methoden und Hinweise',
  'section.howMade': 'Wie die Zahlen entstehen',
  'section.perSeries': 'Reihe für Reihe',
  'section.cautions': 'Zum Lesen der Zahlen',
  'section.dataNotes': 'Datenhinweise',
  'label.preparedBy': 'Erstellt von',
  'label.logo': 'Logo',
  'label.logoOf': 'Logo von {organisation}',
  'label.seeChart': 'zur Grafik',
  'label.series': 'Reihe',
  'label.latest': 'Aktuell',
  'label.latestIn': 'Aktuell ({period})',
  'label.adjustedVsPrevious': 'Saisonbereinigt gegenüber Vorperiode',
  'label.adjustedOnPrevious': 'Saisonbereinigt gegenüber Vorperiode',
  'label.trend': 'Trend',
  'label.cycle': 'Zyklus',
  'label.outlook': 'Ausblick',
  'label.flags': 'Hinweise',
  'label.lastYears': 'Letzte 3 Jahre',
  'label.period': 'Periode',
  'label.forecast': 'Prognose',
  'label.levelRange': '{level}-%-Intervall',
  'label.forecastCaption': 'Prognose: {method}',
  'label.comparedWith': 'im Vergleich zu {period}',
  'label.figure': 'Größe',
  'label.why': 'Grund',
  'label.before': 'Vorher',
  'label.now': 'Jetzt',
  'label.change': 'Änderung',
  'label.large': 'groß',
  'label.forecastsChecked': 'Geprüfte Prognosen',
  'label.maseSoFar': 'MASE bisher',
  'label.insideRanges': 'Istwerte innerhalb der veröffentlichten Intervalle',
  'label.published': 'Veröffentlicht',
  'label.stepsAhead': 'Schritte voraus',
  'label.actual': 'Istwert',
  'label.actualMinusForecast': 'Istwert − Prognose',
  'label.ranges': 'Intervalle',
  'label.inside': '{level} %: innerhalb',
  'label.outside': '{level} %: außerhalb',
  'label.insideShare': '{share} innerhalb des {level}-%-Intervalls',
  'label.madeFor': 'Prognosen für {period}, bis zu drei Schritte voraus:',
  'label.noRevision': 'Kein veröffentlichter Wert hat sich geändert.',
  'label.noTracking': 'Noch keine frühere Prognose lässt sich prüfen.',
  'label.inputFile': 'Eingabedatei',
  'label.size': 'Größe',
  'label.rows': 'Zeilen',
  'label.bytes': '{size} Byte',
  'label.dataNotesHeading': 'Hinweise zu den Daten',
  'label.noDataNotes': 'Die Eingabedateien ergaben keine Datenhinweise.',
  'label.lineOf': '{file}, Zeile {line}',
  'label.builtWith': 'Erstellt mit ebbflow {version} für den Berichtszeitraum {period}. Pfade sind relativ zur Paketdatei.',
  'label.page': 'Seite {page} von {pages}',
  'label.fallback':
    'Dieser Bericht ist auf Englisch verfasst: Seine Texte gibt es in der Sprache der Locale {locale} noch nicht; Zahlen und Daten folgen ihr.',
  'label.model': 'Bereinigung',
  'label.seasonalWindow': 'Saisonfenster',
  'label.calendarFound': 'Kalendereffekte',
  'label.outliers': 'Auffällige Werte',
  'label.forecastModel': 'Prognosemodell',
  'label.mase': 'MASE im Backtest',
  'label.cautionsColumn': 'Vorbehalte',
  'label.none': 'keine',
  'label.notAdjusted': 'nicht bereinigt',
  'label.periodic': 'fest',
  'label.modelCell': '{method}, {model}',
  'label.windowCell': '{years, plural, one {# Jahr} other {# Jahre}}',

  'flag.unusual': '{n, plural, one {# auffälliger Wert} other {# auffällige Werte}}',
  'flag.notAdjusted': 'nicht bereinigt',
  'flag.short': 'kurze Reihe',
  'flag.filled': '{n, plural, one {# Lücke geschlossen} other {# Lücken geschlossen}}',
  'flag.notes': '{n, plural, one {# Datenhinweis} other {# Datenhinweise}}',
  'summary.note':
    'Veränderungen in Prozent. „Saisonbereinigt gegenüber Vorperiode“ vergleicht den saisonbereinigten Wert mit {previous}. Der Ausblick zeigt das voraussichtliche Geschäftsjahresergebnis gegenüber dem Planwert, wo einer gesetzt ist, sonst die Prognose für die nächste Periode mit ihrem 80-%-Intervall.',
  'summary.outturn': '{year}: {total} gegenüber Plan {target} ({gap})',
  'summary.forecast': '{period}: {mean} ({low}–{high})',
  'summary.forecastNoRange': '{period}: {mean}',
  'summary.spark': '{label}: letzte {n} Perioden',

  'chart.overview': 'Originalwerte, saisonbereinigt und Trend-Konjunktur-Komponente',
  'chart.overviewOriginal': 'Originalwerte',
  'chart.seasonal': 'Saisonfigur nach Jahren',
  'chart.seasonalPercent': 'Saisonfigur nach Jahren (% gegenüber normal)',
  'chart.yoy': 'Veränderung gegenüber Vorjahr (%)',
  'chart.irregular': 'Irreguläre Komponente',
  'chart.irregularFlagged': 'Irreguläre Komponente mit auffälligen Werten',
  'chart.cycle': 'Abweichung vom langfristigen Trend (%)',
  'chart.forecast': 'Prognose mit {levels}-Intervallen',
  'chart.tracking': 'Fehler früherer Prognosen (% des Istwerts)',
  'chart.trackingTitle': 'Prognoseverfolgung',
  'chart.titleOf': '{name}: {caption}',
  'chart.cycleNote': 'Derzeit {phase}.',
  'chart.provisionalNote': 'Hohle Markierungen sind vorläufige Wendepunkte.',
  'axis.vsNormal': '% gegenüber normal',
  'axis.yoy': '% gegenüber Vorjahr',
  'axis.irregular': '% irregulär',
  'axis.cycle': '% vom langfristigen Trend',
  'axis.tracking': 'Istwert gegenüber Prognose, %',
  'legend.rise': 'Anstieg',
  'legend.fall': 'Rückgang',
  'legend.actual': 'Istwert',
  'legend.forecast': 'Prognose',
  'legend.backtest': 'Backtest (ein Schritt voraus)',
  'legend.peak': 'Oberer Wendepunkt',
  'legend.trough': 'Unterer Wendepunkt',
  'legend.provisionalPeak': 'Vorläufiger oberer Wendepunkt',
  'legend.provisionalTrough': 'Vorläufiger unterer Wendepunkt',
  'legend.additive': 'Einmaliger Ausreißer',
  'legend.level-shift': 'Niveauverschiebung',
  'legend.temporary': 'Vorübergehende Änderung',
  'legend.insideRange': 'Innerhalb des {level}-%-Intervalls',
  'legend.outsideRange': 'Außerhalb des {level}-%-Intervalls',
  'describe.overview':
    'Liniengrafik von {name} von {from} bis {to}{adjusted, select, yes {, mit Originalwerten, saisonbereinigten Werten und Trend-Konjunktur-Komponente} other {}}. Letzter Wert {latest} für {period}.',
  'describe.seasonal':
    'Saisoneffekt von {name} für jede{frequency, select, quarterly {s Quartal} weekly { Woche} other {n Monat}} des Jahres, eine Linie je Jahr; das letzte Jahr ist kräftiger gezeichnet.',
  'describe.yoy': 'Säulengrafik der prozentualen Veränderung von {name} gegenüber der Vorjahresperiode; zuletzt {latest}.',
  'describe.irregular': 'Irreguläre Komponente von {name}; {n, plural, =0 {keine auffälligen Werte} other {auffällig: {list}}}.',
  'describe.cycle':
    'Prozentualer Abstand von {name} zum langfristigen Trend im Zeitverlauf, mit {n, plural, one {# markiertem Wendepunkt} other {# markierten Wendepunkten}}; derzeit {phase}.',
  'describe.forecast':
    'Letzte Werte von {name} und eine Prognose über {n} Perioden ({method}) mit schattierten Intervallen; erste Prognose {first} für {period}.',
  'describe.tracking':
    'Fehler von {n} früher veröffentlichten Prognosen in Prozent des Istwerts, nach Periode; gefüllte Punkte lagen innerhalb des {level}-%-Intervalls.',
  'describe.flagged': '{period} ({kind})',

  'forecast.accuracy':
    'Backtest: von {origins, plural, one {# früheren Zeitpunkt} other {# früheren Zeitpunkten}} der Daten aus wiederholt, bis zu {horizon, plural, one {# Periode} other {# Perioden}} voraus, erreichte die Prognose einen MASE von {mase} und einen sMAPE von {smape}, {better, select, yes {besser} other {nicht besser}} als die Fortschreibung der Vorjahreswerte (MASE 1){benchmarks, select, none {} other {; einfachere Verfahren: {benchmarks}}}.',
  'forecast.benchmark': '{method} {mase}',
  'forecast.outturn':
    '{year}: {actual} Istwerte über {periodsActual} und {forecast} Prognose für die restlichen {periodsRemaining}, zusammen {total} ({level}-%-Intervall {range}){target, select, none {} other {, gegenüber einem Planwert von {target} ({gap})}}.',
  'label.aboutSeries': 'Zu dieser Reihe',
  'history.smallerOne': '1 kleinere Revision (unter {threshold}) ist nicht aufgeführt; sie steht in exports/revisions.csv.',
  'history.smallerMany':
    '{count} kleinere Revisionen (jeweils unter {threshold}) sind nicht aufgeführt; alle stehen in exports/revisions.csv.',
  'history.trackingOne': 'Die eine geprüfte Prognose steht in exports/tracking.csv.',
  'history.trackingMany': 'Alle {count} geprüften Prognosen stehen in exports/tracking.csv.',

  'callout.yearOnYear':
    '{label} für {period}: {value}, {change} gegenüber {yearAgo}.{unusual, select, yes { Für diese Reihe ist das eine ungewöhnlich große Bewegung.} other {}}',
  'callout.adjustedSteady':
    '{label}, saisonbereinigt: für {period} unverändert gegenüber {previous}{annualised}.{unusual, select, yes { Für diese Reihe ist das eine ungewöhnlich große Bewegung.} other {}}',
  'callout.adjustedMove':
    '{label}, saisonbereinigt: für {period} ein {up, select, yes {Anstieg} other {Rückgang}} um {size} gegenüber {previous}{annualised}.{unusual, select, yes { Für diese Reihe ist das eine ungewöhnlich große Bewegung.} other {}}',
  'callout.annualised': ' ({value} auf das Jahr hochgerechnet)',
  'callout.trendSteady': 'Der Trend von {label} ist {direction}, {rate}{annualised}.',
  'callout.trendRate': '{change} {per}',
  'callout.trendTurn':
    'Der Trend von {label} hat für {period} nach {up, select, yes {oben} other {unten}} gedreht, nachdem er {before} lang {up, select, yes {gefallen} other {gestiegen}} war.',
  'callout.trendBlip':
    'Der {up, select, yes {Anstieg} other {Rückgang}} von {label} für {period} ({change}, saisonbereinigt) läuft einem {trendUp, select, yes {steigenden} other {fallenden}} Trend entgegen ({trendChange} {per}): eher ein Ausschlag als eine Wende.',
  'callout.cyclePhase': 'Zyklus von {label}: {phase}; der Abstand zum langfristigen Trend beträgt {gap}.',
  'callout.cyclePhaseChange':
    'Der Zyklus von {label} wechselte für {period} von „{from}“ zu „{to}“; der Abstand zum langfristigen Trend beträgt {gap}.',
  'callout.turningPoint':
    '{provisional, select, yes {Der Zyklus von {label} hat für {period}, vor {ago}, möglicherweise einen {type} durchlaufen (vorläufig: spätere Daten können ihn noch verschieben oder aufheben).} other {Der Zyklus von {label} hat für {period}, vor {ago}, einen {type} durchlaufen.}}',
  'callout.levelShift':
    '{label}: Niveauverschiebung nach {up, select, yes {oben} other {unten}} für {period} ({sigmas} robuste Standardabweichungen).',
  'callout.residual':
    '{label}, {period}: {sigmas} robuste Standardabweichungen {up, select, yes {über} other {unter}} dem, was Trend und Saison erklären, {kind, select, temporary {eine vorübergehende Änderung} other {ein einmaliger Ausreißer}}{size, select, none {} other { von etwa {size}}}.',
  'callout.workingDays':
    'Kalendereffekte (Arbeits- und Feiertage) haben {label} für {period} um etwa {size} {up, select, yes {erhöht} other {gesenkt}}, verglichen mit einer durchschnittlichen Periode.',
  'callout.easter':
    'Ostern {year} fiel auf den {date}, {earlier, select, yes {früher} other {später}} als im Durchschnitt: Gegenüber einem Durchschnittsjahr bewegte das {label} um etwa {firstChange} für {firstPeriod} und {secondChange} für {secondPeriod}.',
  'callout.forecastOutlook': 'Prognose für {label}: {mean} für {period} ({level}-%-Intervall {range}){tail}; Modell: {method}.',
  'callout.forecastTail': ' und {mean} für {period}, {ahead} voraus ({level}-%-Intervall {range})',
  'callout.combination': 'eine Kombination aus {families}',
  'callout.dampedTrend': 'gedämpftem Trend',
  'callout.outturnStock': 'Nach aktueller Prognose: {label} zum Ende von {year} bei {total} ({level}-%-Intervall {range})',
  'callout.outturnFlow':
    'Nach aktueller Prognose: {label} im {year} insgesamt {total} ({level}-%-Intervall {range}), aus {actual} Istwerten und {forecast} Prognose',
  'callout.outturnEnd': '{base}.',
  'callout.outturnInLine': '{base}, im Rahmen des Planwerts von {target}.',
  'callout.outturnGap': '{base}, {gap} {above, select, yes {über} other {unter}} dem Planwert von {target}.',
  'callout.backtestWarning':
    'Die Prognose für {label} mit Vorsicht lesen: Im Backtest von {origins, plural, one {# Prognoseursprung} other {# Prognoseursprüngen}} aus war sie ungenauer als die Fortschreibung der Vorjahresperiode (MASE {mase}; unter 1 wäre sie besser als dieser Maßstab).',
  'callout.gaps':
    '{label}: {count, plural, one {# Wert fehlt} other {# Werte fehlen}} ({periods}){filled, select, none {.} all {; die Analyse hat {count, plural, one {ihn} other {sie}} nur für die Schätzung ergänzt.} other {; die Analyse hat {filled} nur für die Schätzung ergänzt.}}',
  'callout.gapsFilled': '{n, plural, one {# Wert} other {# Werte}}',
  'callout.latestMissing': 'Für {label} gibt es keinen Wert für {period}, den Berichtszeitraum.',
  'callout.notAdjusted': 'Keine Saisonbereinigung für {label}: {reason}',
  'callout.seriesNote': 'Hinweis zu {label}: {note}',
  'callout.revisionNumeric':
    'Der {measure, select, original {gemeldete Wert} other {saisonbereinigte Wert}} von {label} für {period} wurde seit dem Bericht für {since} nach {up, select, yes {oben} other {unten}} revidiert, um {size}, von {from} auf {to}.',
  'callout.revisionWords':
    'Seit dem Bericht für {since} hat sich die {measure, select, trend {Trendrichtung} other {Zyklusphase}} von {label} für {period} von „{from}“ zu „{to}“ geändert.',
  'callout.trackingRecord':
    'Prognosen für {label} aus früheren Berichten: {count, plural, one {# Prognose} other {# Prognosen}} bisher an Istwerten geprüft, {inside} innerhalb ihres {level}-%-Intervalls ({share}){mase, select, none {} other {; laufender MASE {mase}}}.',
  'callout.forecastCheck':
    'Der Bericht für {publishedIn} prognostizierte {forecast} für {label} für {period}; der Istwert lag bei {actual} ({error}), {inside, select, yes {innerhalb} other {außerhalb}} des {level}-%-Intervalls.',

  'para.headline':
    '{label} für {period}: {value}{change, select, none {} other {, {change} gegenüber Vorjahr}}',
  'para.headlineMissing': 'Für {label} liegt noch kein Wert für {period} vor',
  'para.unusualYoy': ', eine für die Reihe ungewöhnlich große Bewegung',
  'para.adjusted':
    'Saisonbereinigt {move, select, up {stieg die Reihe um {size}} down {fiel die Reihe um {size}} other {blieb die Reihe unverändert}} gegenüber {previous}',
  'para.trend':
    'die Trend-Konjunktur-Komponente {direction, select, rising {steigt} falling {fällt} other {verläuft seitwärts}}{rate, select, none {} other { um {rate} {per}}}',
  'para.trendTurned': 'die Trend-Konjunktur-Komponente hat für {period} nach {up, select, yes {oben} other {unten}} gedreht',
  'para.join.and': '{first}, und {second}.',
  'para.join.but': '{first}, doch {second}.',
  'para.join.while': '{first}, während {second}.',
  'para.sentence': '{text}.',
  'para.notAdjustedPlain': 'Die Reihe wurde nicht saisonbereinigt.',
  'para.trendOnly':
    'Ihre Trend-Konjunktur-Komponente {direction, select, rising {steigt} falling {fällt} other {verläuft seitwärts}}.',
  'para.cycle': 'Zyklusphase: {phase}, Abstand zum langfristigen Trend {gap}',
  'para.cycleChanged': 'Zyklusphase: Wechsel von „{from}“ zu „{to}“, Abstand zum langfristigen Trend {gap}',
  'para.turn': 'die Reihe hat für {period} {provisional, select, yes {möglicherweise } other {}}einen {type} durchlaufen',
  'para.outturnTarget':
    'Nach aktueller Prognose schließt das Geschäftsjahr {year} mit {total}, {where, select, inline {im Rahmen des Planwerts von {target}} above {{gap} über dem Planwert von {target}} other {{gap} unter dem Planwert von {target}}}.',
  'para.outturnNoTarget':
    'Nach aktueller Prognose schließt das Geschäftsjahr {year} mit {total}, ohne gesetzten Planwert ({level}-%-Intervall {range}).',
  'para.forecast': 'Die Prognose für {period} lautet {mean} ({level}-%-Intervall {range}).',
  'para.noForecast': 'Für die Reihe wurde keine Prognose erstellt.',
  'para.unusual': '{n, plural, one {Ein Wert fällt auf: {list}.} other {# Werte fallen auf: {list}.}}',
  'para.unusualItem': '{period} ({kind})',
  'para.backtest':
    'Ihre Prognose mit Vorsicht lesen: Im Backtest war sie schlechter als die Fortschreibung der Vorjahreswerte (MASE {mase}).',
  'para.short': 'Die Reihe umfasst nur {observed}; jede Schätzung hier ist vorläufig.',

  'open.yoy':
    'Für {period} {up, plural, =0 {lag keine} one {lag #} other {lagen #}} von {n, plural, one {# Reihe} other {# Reihen}} über dem Vorjahr{best, select, none {} other {; am stärksten wuchs {best} ({bestChange}), am schwächsten {worst} ({worstChange})}}.',
  'open.trend':
    'Die Trend-Konjunktur-Komponente steigt in {rising, plural, =0 {keiner Reihe} one {# Reihe} other {# Reihen}}, fällt in {falling, plural, =0 {keiner} other {#}} und verläuft seitwärts in {flat, plural, =0 {keiner} other {#}}.',
  'open.target': 'Nach aktueller Prognose {list}.',
  'open.targetItem':
    'schließt {label} das Geschäftsjahr {year} {where, select, inline {im Rahmen des Planwerts} above {{gap} über Plan} other {{gap} unter Plan}}',
  'open.surprises':
    '{n, plural, one {Ein Wert verlangt Aufmerksamkeit: {list}.} other {# Werte verlangen Aufmerksamkeit, vor allem {list}.}}',
  'open.surpriseItem': '{label} ({what})',
  'open.calm': 'In dieser Periode gibt kein Wert Anlass zu einer Warnung.',
  'open.outlook':
    'Für {period} zeigen die Prognosen einen Anstieg in {rising, plural, =0 {keiner Reihe} one {# Reihe} other {# Reihen}} und einen Rückgang in {falling, plural, =0 {keiner} other {#}}.',

  'rule.year-on-year': 'Veränderung gegenüber Vorjahr',
  'rule.adjusted-change': 'saisonbereinigte Veränderung',
  'rule.trend': 'Trend-Konjunktur-Komponente',
  'rule.cycle-phase': 'Zyklusphase',
  'rule.turning-point': 'Wendepunkt',
  'rule.large-residual': 'auffälliger Wert',
  'rule.calendar': 'Kalendereffekt',
  'rule.forecast-outlook': 'Prognose',
  'rule.outturn': 'Ergebnis gegenüber Plan',
  'rule.forecast-accuracy': 'Prognosegüte',
  'rule.data': 'Daten',
  'rule.revision': 'Revision',
  'rule.forecast-tracking': 'Prognosebilanz',
  'rule.forecast-check': 'Prognosefehler',
  'methods.adjustment':
    'Die Saisonbereinigung entfernt das Muster, das sich jedes Jahr wiederholt, sodass eine Periode mit der vorherigen verglichen werden kann. Monats- und Quartalsreihen werden mit STL zerlegt, der saisonalen Trendzerlegung mittels LOESS (Cleveland, Cleveland, McRae und Terpenning, 1990, Journal of Official Statistics 6), oder mit klassischen gleitenden Durchschnitten, wo das Paket es verlangt; Wochenreihen verwenden ein jährliches Fourier-Muster im Datum. Ein multiplikatives Modell wird gewählt, wenn die Saisonausschläge mit dem Niveau wachsen, sonst ein additives.',
  'methods.calendar':
    'Arbeitstage, Feiertage und die Lage von Ostern werden per Regression auf die irreguläre Komponente geschätzt und nur entfernt, wo sie auf dem 5-%-Niveau signifikant sind. Auffällige Werte (einmalige Ausreißer, Niveauverschiebungen und vorübergehende Änderungen) werden über robuste Kennzahlen der irregulären Komponente gefunden und aus der Schätzung der Saisonfigur herausgehalten.',
  'methods.cycle':
    'Der Zyklus ist der prozentuale Abstand der saisonbereinigten Reihe zu einem langfristigen Trend aus dem Hodrick-Prescott-Filter (Hodrick und Prescott, 1997, Journal of Money, Credit and Banking 29) oder dem Christiano-Fitzgerald-Bandpassfilter (2003, International Economic Review 44); die Wendepunkte folgen den Regeln von Bry und Boschan (1971, NBER).',
  'methods.forecast':
    'Die Prognosen stammen aus Zustandsraummodellen der exponentiellen Glättung (ETS; Hyndman, Koehler, Ord und Snyder, 2008, Forecasting with Exponential Smoothing), der Theta-Methode (Assimakopoulos und Nikolopoulos, 2000, International Journal of Forecasting 16) und ARIMA-Modellen, einzeln oder kombiniert, mit Prognoseintervallen auf den Niveaus, die das Paket setzt.',
  'methods.backtest':
    'Jede Prognose wird geprüft, indem sie von früheren Zeitpunkten der Daten aus wiederholt wird. Ihre Genauigkeit wird als MASE angegeben, der mittlere absolute skalierte Fehler (Hyndman und Koehler, 2006, International Journal of Forecasting 22): Unter 1 war die Prognose besser als die Fortschreibung der Vorjahresperiode.',
  'methods.parameters':
    'Jede Einstellung jeder Methode ist für jede Reihe in results.json, im Manifest und auf dem Blatt „Methoden“ von tables.xlsx aufgeführt.',
  'caution.estimates':
    'Saisonbereinigte Werte, die Trend-Konjunktur-Komponente und Prognosen sind statistische Schätzungen auf Grundlage der heute verfügbaren Daten. Sie werden revidiert, sobald neue Daten eintreffen, vor allem für die letzten Perioden.',
  'caution.ranges':
    'Prognoseintervalle zeigen, wo das Ergebnis unter den Annahmen des Modells 80 oder 95 von hundert Malen läge. Sie sind keine Garantie: Eine Veränderung des Geschäfts oder seines Marktes, die in der Vergangenheit nicht vorkommt, steckt auch nicht in den Intervallen.',
  'caution.short':
    'Kurze Reihen, Reihen mit Lücken oder Brüchen und Reihen mit jüngsten auffälligen Werten ergeben weniger verlässliche Bereinigungen und Prognosen; die Datenhinweise nennen, wo das zutrifft.',
  'caution.endPoint':
    'Der langfristige Trend hinter den Zykluswerten ist am Ende des Zeitraums am unsichersten (eine bekannte Eigenschaft der Hodrick-Prescott- und Bandpassfilter), sodass sich die aktuelle Phase und die jüngsten Wendepunkte mit weiteren Daten noch ändern können.',
  'caution.advice':
    'Dies sind statistische Projektionen, keine Finanzberatung. Entscheidungen treffen fachkundige Personen, die das Geschäft kennen und abwägen können, was die Zahlen nicht zeigen.',
  'caution.cell.short': 'kurze Reihe',
  'caution.cell.residualSeasonality': 'Restsaisonalität',
  'caution.cell.backtest': 'Prognose schwächer als Vorjahreswerte',
  'caution.cell.filled': '{n, plural, one {# Lücke geschlossen} other {# Lücken geschlossen}}',
  'caution.cell.notAdjusted': 'nicht bereinigt',
  'caution.cell.noForecast': 'keine Prognose',

  'note.infinite':
    '{count, plural, one {1 Wert war keine endliche Zahl und wird als fehlend behandelt.} other {{count} Werte waren keine endlichen Zahlen und werden als fehlend behandelt.}}',
  'note.magnitude':
    'Die Werte erreichen {largest}, mehr als die ±1e15, die die Analyse verlässlich verarbeitet; die Reihe umskalieren (etwa in Tausend oder Millionen), um sie zu analysieren.',
  'note.constant': 'Die Reihe ist konstant bei {value}: Es gibt keine Saisonfigur, keinen Trend und keinen Zyklus zu schätzen.',
  'note.failed':
    '{what, select, adjustment {Die Saisonbereinigung} cycle {Trend und Zyklus} forecast {Die Prognose} other {Das Geschäftsjahresergebnis}} ließ sich für diese Reihe nicht berechnen ({error}).',
  'note.adjustmentFailed': 'Die Saisonbereinigung ist fehlgeschlagen.',
  'note.noValues': 'Die Reihe hat keine Werte zum Bereinigen.',
  'note.tooShortToAdjust':
    'Nicht saisonbereinigt: Dafür sind mindestens zwei volle Jahre an Daten nötig ({minimum} {frequency, select, monthly {Monate} quarterly {Quartale} other {Wochen}}), die Reihe hat {observed} beobachtete {frequency, select, monthly {Monate} quarterly {Quartale} other {Wochen}}.',
  'note.notAdjustable': 'Nicht saisonbereinigt: {error}.',
  'note.cycleTooShort': 'Für den Zyklus sind mindestens drei Werte nötig',
  'note.cycleNotFinite': 'Für den Zyklus sind beobachtete, endliche Werte nötig',
  'note.cycleFilled':
    '{count, plural, one {1 fehlender Wert wurde vor dem Filtern linear interpoliert.} other {{count} fehlende Werte wurden vor dem Filtern linear interpoliert.}}',
  'note.untested': 'Stationarität nicht getestet: {reason}.',
  'note.tooFewToForecast': 'Zu wenige Werte für eine Prognose.',
  'note.forecastFilled':
    '{count, plural, one {1 fehlender Wert wurde vor der Prognose linear interpoliert.} other {{count} fehlende Werte wurden vor der Prognose linear interpoliert.}}',
  'note.forecastAfterEnd': 'Die Prognose beginnt nach der letzten Periode, jenseits des letzten beobachteten Werts.',
  'note.forecastConstant': 'Die Reihe ist konstant; die Prognose schreibt die Konstante fort.',
  'note.forecastFewValues': 'Weniger als vier Werte: Das naive Verfahren (letzter Wert fortgeschrieben) wird verwendet.',
  'note.naiveForSeasonalNaive': 'Weniger als ein volles Jahr: Das naive Verfahren ersetzt das saisonal naive.',
  'note.noSeasonalModels': 'Weniger als zwei volle Jahre an Daten: Saisonmodelle werden nicht verwendet.',
  'note.weeklyEts':
    'Wochendaten: ETS prognostiziert die saisonbereinigte Reihe (klassische Zerlegung über 52 Wochen), und die Saisonfigur wird wieder hinzugefügt.',
  'note.forecastNotFinite': 'Die Prognose mit {method} war nicht endlich; stattdessen wird das naive Verfahren verwendet.',
  'note.noForecast': 'Für diese Reihe wurde keine Prognose erstellt.',
  'note.noCycle': 'Für diese Reihe wird keine Schätzung von Trend und Zyklus gezeigt.',
  'note.endPoint':
    'Der Trend der letzten {count} Perioden ist vorläufig: Ein zweiseitiger Filter sieht keine Daten über das Ende hinaus, daher werden diese Werte und der Abstand mit neuen Daten revidiert.',
  'note.outOfOrder': 'Zeilen nicht in Datumsfolge (erstmals in Zeile {line}); sie wurden sortiert',
  'note.gaps':
    '{frequency, select, monthly {{n, plural, one {# Monat fehlt} other {# Monate fehlen}}} quarterly {{n, plural, one {# Quartal fehlt} other {# Quartale fehlen}}} other {{n, plural, one {# Woche fehlt} other {# Wochen fehlen}}}}: {list}{more, plural, =0 {} other { und # weitere}}',
  'note.truncated':
    '{frequency, select, monthly {{n, plural, one {# Monat} other {# Monate}}} quarterly {{n, plural, one {# Quartal} other {# Quartale}}} other {{n, plural, one {# Woche} other {# Wochen}}}} an Daten nach dem Berichtszeitraum {period} nicht berücksichtigt ({same, select, yes {{from}} other {{from} bis {to}}})',
  'note.padded':
    'Daten enden mit {last}: {frequency, select, monthly {{n, plural, one {# Monat} other {# Monate}}} quarterly {{n, plural, one {# Quartal} other {# Quartale}}} other {{n, plural, one {# Woche} other {# Wochen}}}} bis zum Berichtszeitraum {period} fehlen',
  'note.inferredPeriod': 'Berichtszeitraum {period}: Das Paket legt keinen fest, daher gilt die letzte Periode mit Daten',
  'note.ofSeries': '{series}: {text}',
  'note.noValuesToChart': 'Die Reihe hat keine Werte für eine Grafik.',
};
