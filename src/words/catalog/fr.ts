import type {Catalog} from './en.js';

/**
 * French words of the report, in the terms French statisticians and financial controllers use (corrigé des
 * variations saisonnières / CVS, tendance-cycle, en glissement annuel, points de pourcentage, exercice, objectif).
 * Sentences avoid agreement with the series' name; periods follow "pour" (pour octobre 2026, pour T3 2026).
 * The reviewer's glossary is in DEVELOPERS.md.
 */
export const fr: Catalog = {
  'period.quarter': 'T{quarter} {year}',
  'period.quarterLong': 'T{quarter} {year}',
  'period.week': 'S{week} {year}',
  'season.quarter': 'T{quarter}',
  'season.week': 'S{week}',
  'unit.points': '{value} pt',
  'unit.range': '{low} à {high}',
  'unit.withUnit': '{value} {unit}',
  'p.below': 'p < {value}',
  'p.equal': 'p = {value}',
  'count.periods':
    '{frequency, select, monthly {{n, plural, one {# mois} other {# mois}}} quarterly {{n, plural, one {# trimestre} other {# trimestres}}} other {{n, plural, one {# semaine} other {# semaines}}}}',
  'count.more': '{n} autres',
  'per.period': '{frequency, select, monthly {par mois} quarterly {par trimestre} other {par semaine}}',
  'previous.period': '{frequency, select, monthly {le mois précédent} quarterly {le trimestre précédent} other {la semaine précédente}}',

  'term.original': 'Données brutes',
  'term.adjusted': 'CVS',
  'term.trendCycle': 'Tendance-cycle',
  'term.yearOnYear': 'En glissement annuel',
  'term.irregular': 'Composante irrégulière',
  'phase.rising-above': 'au-dessus de la tendance et en hausse',
  'phase.falling-above': 'au-dessus de la tendance et en repli',
  'phase.falling-below': 'sous la tendance et en baisse',
  'phase.rising-below': 'sous la tendance et en reprise',
  'phase.onTrend': 'sur la tendance, sans cycle marqué',
  'direction.rising': 'en hausse',
  'direction.falling': 'en baisse',
  'direction.flat': 'stable',
  'outlier.additive': 'valeur atypique ponctuelle',
  'outlier.level-shift': 'rupture de niveau',
  'outlier.temporary': 'changement temporaire',
  'turn.peak': 'pic',
  'turn.trough': 'creux',
  'severity.info': 'Note',
  'severity.watch': 'À surveiller',
  'severity.alert': 'Alerte',
  'model.additive': 'additif',
  'model.multiplicative': 'multiplicatif',
  'method.stl': 'STL',
  'method.classical': 'moyennes mobiles classiques',
  'method.fourier': 'profil de Fourier annuel',
  'cycle.hp': 'Hodrick-Prescott',
  'cycle.bandpass': 'Christiano-Fitzgerald',
  'regressor.working-days': 'jours ouvrés',
  'regressor.holidays': 'jours fériés',
  'regressor.easter': 'Pâques',
  'measure.original': 'Valeur brute',
  'measure.adjusted': 'Valeur CVS',
  'measure.trend-direction': 'Sens de la tendance',
  'measure.cycle-phase': 'Phase du cycle',
  'revision.data': 'Données modifiées',
  'revision.estimate': 'Réestimé',

  'section.summary': 'En bref',
  'section.headline': 'Ce qui ressort',
  'section.table': 'Toutes les séries',
  'section.history': 'Depuis le dernier rapport',
  'section.revisions': 'Chiffres révisés',
  'section.tracking': 'Bilan des prévisions antérieures',
  'section.methods': 'Méthodes et précautions',
  'section.howMade': 'Comment les chiffres sont établis',
  'section.perSeries': 'Série par série',
  'section.cautions': 'Pour lire ces chiffres',
  'section.dataNotes': 'Notes sur les données',
  'label.preparedBy': 'Préparé par',
  'label.logo': 'Logo',
  'label.logoOf': 'Logo de {organisation}',
  'label.seeChart': 'voir le graphique',
  'label.series': 'Série',
  'label.latest': 'Dernier',
  'label.latestIn': 'Dernier ({period})',
  'label.adjustedVsPrevious': 'CVS, sur la période précédente',
  'label.adjustedOnPrevious': 'CVS, sur la période précédente',
  'label.trend': 'Tendance',
  'label.cycle': 'Cycle',
  'label.outlook': 'Perspectives',
  'label.flags': 'Signalements',
  'label.lastYears': 'Trois dernières années',
  'label.period': 'Période',
  'label.forecast': 'Prévision',
  'label.levelRange': 'Intervalle à {level} %',
  'label.forecastCaption': 'Prévision : {method}',
  'label.comparedWith': 'par rapport à {period}',
  'label.figure': 'Grandeur',
  'label.why': 'Motif',
  'label.before': 'Avant',
  'label.now': 'Maintenant',
  'label.change': 'Écart',
  'label.large': 'important',
  'label.forecastsChecked': 'Prévisions vérifiées',
  'label.maseSoFar': 'MASE à ce jour',
  'label.insideRanges': 'Réalisations dans les intervalles publiés',
  'label.published': 'Publiée',
  'label.stepsAhead': 'Horizon',
  'label.actual': 'Réalisé',
  'label.actualMinusForecast': 'Réalisé − prévision',
  'label.ranges': 'Intervalles',
  'label.inside': '{level} % : dedans',
  'label.outside': '{level} % : dehors',
  'label.insideShare': '{share} dans l’intervalle à {level} %',
  'label.madeFor': 'Prévisions faites pour {period}, jusqu’à trois pas en avant :',
  'label.noRevision': 'Aucun chiffre publié n’a changé.',
  'label.noTracking': 'Aucune prévision antérieure ne peut encore être vérifiée.',
  'label.inputFile': 'Fichier d’entrée',
  'label.size': 'Taille',
  'label.rows': 'Lignes',
  'label.bytes': '{size} octets',
  'label.dataNotesHeading': 'Remarques sur les données',
  'label.noDataNotes': 'Les fichiers d’entrée n’ont donné lieu à aucune remarque.',
  'label.lineOf': '{file}, ligne {line}',
  'label.builtWith':
    'Établi avec ebbflow {version} pour la période sous revue {period}. Les chemins sont relatifs au fichier du dossier.',
  'label.page': 'Page {page} sur {pages}',
  'label.fallback':
    'Ce rapport est rédigé en anglais : ses textes n’existent pas encore dans la langue de la locale {locale}, dont il utilise les nombres et les dates.',
  'label.model': 'Correction',
  'label.seasonalWindow': 'Fenêtre saisonnière',
  'label.calendarFound': 'Effets de calendrier',
  'label.outliers': 'Valeurs atypiques',
  'label.forecastModel': 'Modèle de prévision',
  'label.mase': 'MASE en rétro-test',
  'label.cautionsColumn': 'Réserves',
  'label.none': 'aucun',
  'label.notAdjusted': 'non corrigé',
  'label.periodic': 'fixe',
  'label.modelCell': '{method}, {model}',
  'label.windowCell': '{years, plural, one {# an} other {# ans}}',

  'flag.unusual': '{n, plural, one {# valeur atypique} other {# valeurs atypiques}}',
  'flag.notAdjusted': 'non corrigé',
  'flag.short': 'série courte',
  'flag.filled': '{n, plural, one {# lacune comblée} other {# lacunes comblées}}',
  'flag.notes': '{n, plural, one {# remarque} other {# remarques}}',
  'summary.note':
    'Évolutions en pourcentage. « CVS, sur la période précédente » compare la valeur corrigée des variations saisonnières avec {previous}. Les perspectives donnent le résultat attendu de l’exercice par rapport à l’objectif lorsqu’un objectif est fixé, sinon la prévision pour la période suivante avec son intervalle à 80 %.',
  'summary.outturn': '{year} : {total} pour un objectif de {target} ({gap})',
  'summary.forecast': '{period} : {mean} ({low}–{high})',
  'summary.forecastNoRange': '{period} : {mean}',
  'summary.spark': '{label} : {n} dernières périodes',

  'chart.overview': 'Données brutes, CVS et tendance-cycle',
  'chart.overviewOriginal': 'Données brutes',
  'chart.seasonal': 'Profil saisonnier par année',
  'chart.seasonalPercent': 'Profil saisonnier par année (% par rapport à la normale)',
  'chart.yoy': 'Évolution en glissement annuel (%)',
  'chart.irregular': 'Composante irrégulière',
  'chart.irregularFlagged': 'Composante irrégulière et valeurs atypiques',
  'chart.cycle': 'Écart à la tendance de long terme (%)',
  'chart.forecast': 'Prévision avec intervalles à {levels}',
  'chart.tracking': 'Erreur des prévisions antérieures (% du réalisé)',
  'chart.trackingTitle': 'Suivi des prévisions',
  'chart.titleOf': '{name} : {caption}',
  'chart.cycleNote': 'Actuellement {phase}.',
  'chart.provisionalNote': 'Les marqueurs creux sont des points de retournement provisoires.',
  'axis.vsNormal': '% par rapport à la normale',
  'axis.yoy': '% en glissement annuel',
  'axis.irregular': '% irrégulier',
  'axis.cycle': '% d’écart à la tendance',
  'axis.tracking': 'Réalisé par rapport à la prévision, %',
  'legend.rise': 'Hausse',
  'legend.fall': 'Baisse',
  'legend.actual': 'Réalisé',
  'legend.forecast': 'Prévision',
  'legend.backtest': 'Rétro-test (un pas en avant)',
  'legend.peak': 'Pic',
  'legend.trough': 'Creux',
  'legend.provisionalPeak': 'Pic provisoire',
  'legend.provisionalTrough': 'Creux provisoire',
  'legend.additive': 'Valeur atypique ponctuelle',
  'legend.level-shift': 'Rupture de niveau',
  'legend.temporary': 'Changement temporaire',
  'legend.insideRange': 'Dans l’intervalle à {level} %',
  'legend.outsideRange': 'Hors de l’intervalle à {level} %',
  'describe.overview':
    'Graphique linéaire de {name} de {from} à {to}{adjusted, select, yes {, avec les données brutes, les données CVS et la tendance-cycle} other {}}. Dernière valeur {latest} pour {period}.',
  'describe.seasonal':
    'Effet saisonnier de {name} pour chaque {frequency, select, quarterly {trimestre} weekly {semaine} other {mois}} de l’année, une ligne par année ; la dernière année est tracée plus épaisse.',
  'describe.yoy': 'Histogramme de l’évolution en pourcentage de {name} en glissement annuel ; dernière {latest}.',
  'describe.irregular': 'Composante irrégulière de {name} ; {n, plural, =0 {aucune valeur signalée} other {signalées : {list}}}.',
  'describe.cycle':
    'Écart en pourcentage entre {name} et sa tendance de long terme au fil du temps, avec {n, plural, one {# point de retournement marqué} other {# points de retournement marqués}} ; actuellement {phase}.',
  'describe.forecast':
    'Dernières valeurs de {name} et prévision sur {n} périodes ({method}) avec intervalles ombrés ; première prévision {first} pour {period}.',
  'describe.tracking':
    'Erreurs de {n} prévisions publiées antérieurement en pourcentage du réalisé, par période ; les points pleins sont tombés dans l’intervalle à {level} %.',
  'describe.flagged': '{period} ({kind})',

  'forecast.accuracy':
    'Rétro-test : refaite depuis {origins, plural, one {# point antérieur} other {# points antérieurs}} des données, jusqu’à {horizon, plural, one {# période} other {# périodes}} en avant, la prévision obtient un MASE de {mase} et un sMAPE de {smape}, {better, select, yes {mieux} other {pas mieux}} que la reconduction des chiffres de l’année précédente (MASE 1){benchmarks, select, none {} other { ; méthodes plus simples : {benchmarks}}}.',
  'forecast.benchmark': '{method} {mase}',
  'forecast.outturn':
    '{year} : {actual} de réalisé sur {periodsActual} et {forecast} de prévision pour les {periodsRemaining} restants, soit {total} au total (intervalle à {level} % : {range}){target, select, none {} other {, pour un objectif de {target} ({gap})}}.',
  'label.aboutSeries': 'À propos de cette série',
  'history.smallerOne': '1 révision plus petite (sous {threshold}) n’est pas listée ; elle figure dans exports/revisions.csv.',
  'history.smallerMany':
    '{count} révisions plus petites (chacune sous {threshold}) ne sont pas listées ; toutes figurent dans exports/revisions.csv.',
  'history.trackingOne': 'La seule prévision vérifiée figure dans exports/tracking.csv.',
  'history.trackingMany': 'Les {count} prévisions vérifiées figurent dans exports/tracking.csv.',

  'callout.yearOnYear':
    '{label} pour {period} : {value}, {change} par rapport à {yearAgo}.{unusual, select, yes { C’est un mouvement inhabituellement fort pour cette série.} other {}}',
  'callout.adjustedSteady':
    '{label}, en données CVS : stable pour {period} par rapport à {previous}{annualised}.{unusual, select, yes { C’est un mouvement inhabituellement fort pour cette série.} other {}}',
  'callout.adjustedMove':
    '{label}, en données CVS : {up, select, yes {hausse} other {baisse}} de {size} pour {period} par rapport à {previous}{annualised}.{unusual, select, yes { C’est un mouvement inhabituellement fort pour cette série.} other {}}',
  'callout.annualised': ' ({value} en rythme annualisé)',
  'callout.trendSteady': 'La tendance de {label} est {direction}, {rate}{annualised}.',
  'callout.trendRate': '{change} {per}',
  'callout.trendTurn':
    'La tendance de {label} s’est retournée à la {up, select, yes {hausse} other {baisse}} pour {period} après {before} de {up, select, yes {baisse} other {hausse}}.',
  'callout.trendBlip':
    'La {up, select, yes {hausse} other {baisse}} de {label} pour {period} ({change}, en données CVS) va contre une tendance {trendUp, select, yes {en hausse} other {en baisse}} ({trendChange} {per}) : plutôt un à-coup qu’un retournement.',
  'callout.cyclePhase': 'Le cycle de {label} est {phase} : l’écart à la tendance de long terme est de {gap}.',
  'callout.cyclePhaseChange':
    'Le cycle de {label} est passé de « {from} » à « {to} » pour {period} ; l’écart à la tendance de long terme est de {gap}.',
  'callout.turningPoint':
    '{provisional, select, yes {Le cycle de {label} a peut-être passé un {type} pour {period}, il y a {ago} (provisoire : des données ultérieures peuvent encore le déplacer ou l’effacer).} other {Le cycle de {label} a passé un {type} pour {period}, il y a {ago}.}}',
  'callout.levelShift':
    '{label} : rupture de niveau à la {up, select, yes {hausse} other {baisse}} pour {period} ({sigmas} écarts-types robustes).',
  'callout.residual':
    '{label}, {period} : {sigmas} écarts-types robustes {up, select, yes {au-dessus} other {au-dessous}} de ce qu’expliquent la tendance et la saison, {kind, select, temporary {un changement temporaire} other {une valeur atypique ponctuelle}}{size, select, none {} other { d’environ {size}}}.',
  'callout.workingDays':
    'Les effets de calendrier (jours ouvrés et fériés) ont {up, select, yes {augmenté} other {diminué}} {label} pour {period} d’environ {size} par rapport à une période moyenne.',
  'callout.easter':
    'Pâques {year} est tombé le {date}, plus {earlier, select, yes {tôt} other {tard}} qu’en moyenne : par rapport à une année moyenne, cela a fait varier {label} d’environ {firstChange} pour {firstPeriod} et {secondChange} pour {secondPeriod}.',
  'callout.forecastOutlook': 'Prévision pour {label} : {mean} pour {period} (intervalle à {level} % : {range}){tail} ; modèle : {method}.',
  'callout.forecastTail': ' et {mean} pour {period}, à {ahead} (intervalle à {level} % : {range})',
  'callout.combination': 'une combinaison de {families}',
  'callout.dampedTrend': 'tendance amortie',
  'callout.outturnStock': 'Selon les prévisions actuelles, {label} à la fin de {year} : {total} (intervalle à {level} % : {range})',
  'callout.outturnFlow':
    'Selon les prévisions actuelles, {label} sur {year} : {total} au total (intervalle à {level} % : {range}), dont {actual} de réalisé et {forecast} de prévision',
  'callout.outturnEnd': '{base}.',
  'callout.outturnInLine': '{base}, conforme à l’objectif de {target}.',
  'callout.outturnGap': '{base}, {gap} {above, select, yes {au-dessus} other {au-dessous}} de l’objectif de {target}.',
  'callout.backtestWarning':
    'Prévision de {label} à prendre avec prudence : en rétro-test depuis {origins, plural, one {# origine} other {# origines}}, elle a été moins précise que la reconduction de la même période de l’année précédente (MASE {mase} ; sous 1, elle ferait mieux que cette référence).',
  'callout.gaps':
    '{label} : {count, plural, one {# valeur manquante} other {# valeurs manquantes}} ({periods}){filled, select, none {.} all { ; l’analyse {count, plural, one {l’a comblée} other {les a comblées}} pour l’estimation seulement.} other { ; l’analyse en a comblé {filled} pour l’estimation seulement.}}',
  'callout.gapsFilled': '{n, plural, one {# valeur} other {# valeurs}}',
  'callout.latestMissing': 'Aucune valeur de {label} pour {period}, la période sous revue.',
  'callout.notAdjusted': 'Pas de correction des variations saisonnières pour {label} : {reason}',
  'callout.seriesNote': 'Remarque sur {label} : {note}',
  'callout.revisionNumeric':
    '{measure, select, original {La valeur publiée} other {La valeur CVS}} de {label} pour {period} a été révisée à la {up, select, yes {hausse} other {baisse}} de {size} depuis le rapport de {since}, de {from} à {to}.',
  'callout.revisionWords':
    'Depuis le rapport de {since}, {measure, select, trend {le sens de la tendance} other {la phase du cycle}} de {label} pour {period} est passé de « {from} » à « {to} ».',
  'callout.trackingRecord':
    'Prévisions de {label} des rapports antérieurs : {count, plural, one {# prévision vérifiée} other {# prévisions vérifiées}} sur les réalisations à ce jour, {inside} dans leur intervalle à {level} % ({share}){mase, select, none {} other { ; MASE cumulé {mase}}}.',
  'callout.forecastCheck':
    'Le rapport de {publishedIn} prévoyait {forecast} pour {label} pour {period} ; le réalisé est de {actual} ({error}), {inside, select, yes {dans} other {hors de}} l’intervalle à {level} %.',

  'para.headline': '{label} pour {period} : {value}{change, select, none {} other {, {change} en glissement annuel}}',
  'para.headlineMissing': 'Pas encore de valeur de {label} pour {period}',
  'para.unusualYoy': ', un mouvement inhabituellement fort pour la série',
  'para.adjusted':
    'En données CVS, la série {move, select, up {a progressé de {size}} down {a reculé de {size}} other {est restée stable}} sur {previous}',
  'para.trend':
    'la tendance-cycle est {direction, select, rising {en hausse} falling {en baisse} other {stable}}{rate, select, none {} other {, de {rate} {per}}}',
  'para.trendTurned': 'la tendance-cycle s’est retournée à la {up, select, yes {hausse} other {baisse}} pour {period}',
  'para.join.and': '{first}, et {second}.',
  'para.join.but': '{first}, mais {second}.',
  'para.join.while': '{first}, tandis que {second}.',
  'para.sentence': '{text}.',
  'para.notAdjustedPlain': 'La série n’a pas été corrigée des variations saisonnières.',
  'para.trendOnly': 'Sa tendance-cycle est {direction, select, rising {en hausse} falling {en baisse} other {stable}}.',
  'para.cycle': 'Son cycle est {phase}, à {gap} de la tendance de long terme',
  'para.cycleChanged': 'Son cycle est passé de « {from} » à « {to} » sur cette période, à {gap} de la tendance de long terme',
  'para.turn': '{provisional, select, yes {il a peut-être passé un {type} pour {period}} other {il a passé un {type} pour {period}}}',
  'para.outturnTarget':
    'Selon les prévisions actuelles, l’exercice {year} se clôturera à {total}, {where, select, inline {conforme à l’objectif de {target}} above {{gap} au-dessus de l’objectif de {target}} other {{gap} au-dessous de l’objectif de {target}}}.',
  'para.outturnNoTarget':
    'Selon les prévisions actuelles, l’exercice {year} se clôturera à {total}, sans objectif fixé (intervalle à {level} % : {range}).',
  'para.forecast': 'La prévision pour {period} est de {mean} (intervalle à {level} % : {range}).',
  'para.noForecast': 'Aucune prévision n’a été établie pour la série.',
  'para.unusual': '{n, plural, one {Une valeur ressort : {list}.} other {# valeurs ressortent : {list}.}}',
  'para.unusualItem': '{period} ({kind})',
  'para.backtest':
    'Sa prévision est à prendre avec prudence : en rétro-test, elle a fait moins bien que la reconduction des chiffres de l’année précédente (MASE {mase}).',
  'para.short': 'Avec {observed}, la série est courte ; toutes les estimations sont donc provisoires.',

  'open.yoy':
    'Pour {period}, {up, plural, =0 {aucune des {n, plural, one {# série} other {# séries}} ne dépassait son} one {# des {n, plural, one {# série} other {# séries}} dépassait son} other {# des {n, plural, one {# série} other {# séries}} dépassaient leur}} niveau d’un an plus tôt{best, select, none {} other { ; {best} a le plus progressé ({bestChange}) et {worst} le moins ({worstChange})}}.',
  'open.trend':
    'La tendance-cycle est en hausse pour {rising, plural, =0 {aucune série} one {# série} other {# séries}}, en baisse pour {falling, plural, =0 {aucune} other {#}} et stable pour {flat, plural, =0 {aucune} other {#}}.',
  'open.target': 'Selon les prévisions actuelles, {list}.',
  'open.targetItem':
    '{label} clôturera {year} {where, select, inline {conforme à son objectif} above {{gap} au-dessus de l’objectif} other {{gap} au-dessous de l’objectif}}',
  'open.surprises':
    '{n, plural, one {Un chiffre appelle l’attention : {list}.} other {# chiffres appellent l’attention, en premier lieu {list}.}}',
  'open.surpriseItem': '{label} ({what})',
  'open.calm': 'Aucun chiffre n’appelle d’alerte sur cette période.',
  'open.outlook':
    'Pour {period}, les prévisions annoncent une hausse pour {rising, plural, =0 {aucune série} one {# série} other {# séries}} et une baisse pour {falling, plural, =0 {aucune} other {#}}.',

  'rule.year-on-year': 'évolution en glissement annuel',
  'rule.adjusted-change': 'évolution CVS',
  'rule.trend': 'tendance-cycle',
  'rule.cycle-phase': 'phase du cycle',
  'rule.turning-point': 'point de retournement',
  'rule.large-residual': 'valeur atypique',
  'rule.calendar': 'effet de calendrier',
  'rule.forecast-outlook': 'prévision',
  'rule.outturn': 'résultat par rapport à l’objectif',
  'rule.forecast-accuracy': 'précision de la prévision',
  'rule.data': 'données',
  'rule.revision': 'révision',
  'rule.forecast-tracking': 'bilan des prévisions',
  'rule.forecast-check': 'prévision manquée',
  'methods.adjustment':
    'La correction des variations saisonnières retire le profil qui se répète chaque année, afin de comparer une période à la précédente. Les séries mensuelles et trimestrielles sont décomposées par STL, décomposition saisonnière et tendancielle par LOESS (Cleveland, Cleveland, McRae et Terpenning, 1990, Journal of Official Statistics 6), ou par moyennes mobiles classiques lorsque le dossier le demande ; les séries hebdomadaires utilisent un profil de Fourier annuel dans la date. Un modèle multiplicatif est retenu lorsque l’amplitude saisonnière croît avec le niveau, un modèle additif sinon.',
  'methods.calendar':
    'Les jours ouvrés, les jours fériés et la date de Pâques sont estimés par régression sur la composante irrégulière et retirés seulement lorsqu’ils sont significatifs au seuil de 5 %. Les valeurs atypiques (ponctuelles, ruptures de niveau et changements temporaires) sont repérées par des scores robustes de la composante irrégulière et écartées de l’estimation saisonnière.',
  'methods.cycle':
    'Le cycle est l’écart en pourcentage entre la série CVS et une tendance de long terme issue du filtre de Hodrick-Prescott (Hodrick et Prescott, 1997, Journal of Money, Credit and Banking 29) ou du filtre passe-bande de Christiano-Fitzgerald (2003, International Economic Review 44) ; les points de retournement suivent les règles de Bry et Boschan (1971, NBER).',
  'methods.forecast':
    'Les prévisions proviennent de modèles espace-état de lissage exponentiel (ETS ; Hyndman, Koehler, Ord et Snyder, 2008, Forecasting with Exponential Smoothing), de la méthode Theta (Assimakopoulos et Nikolopoulos, 2000, International Journal of Forecasting 16) et de modèles ARIMA, seuls ou combinés, avec des intervalles de prévision aux niveaux fixés par le dossier.',
  'methods.backtest':
    'Chaque prévision est testée en la refaisant depuis des points antérieurs des données. Sa précision est donnée par le MASE, l’erreur absolue moyenne mise à l’échelle (Hyndman et Koehler, 2006, International Journal of Forecasting 22) : sous 1, la prévision a fait mieux que la reconduction de la même période de l’année précédente.',
  'methods.parameters':
    'Tous les réglages de chaque méthode, pour chaque série, figurent dans results.json, dans le manifeste et sur la feuille « méthodes » de tables.xlsx.',
  'caution.estimates':
    'Les données CVS, les estimations de tendance-cycle et les prévisions sont des estimations statistiques établies avec les données disponibles aujourd’hui. Elles sont révisées à l’arrivée de nouvelles données, surtout pour les dernières périodes.',
  'caution.ranges':
    'Les intervalles de prévision indiquent où, selon les hypothèses du modèle, le résultat tomberait 80 ou 95 fois sur cent. Ce ne sont pas des garanties : un changement de l’activité ou de son marché absent de l’historique ne figure pas non plus dans les intervalles.',
  'caution.short':
    'Les séries courtes, les séries avec des lacunes ou des ruptures et celles avec des valeurs atypiques récentes donnent des corrections et des prévisions moins fiables ; les notes sur les données indiquent où c’est le cas.',
  'caution.endPoint':
    'La tendance de long terme qui sous-tend le cycle est la plus incertaine en fin d’échantillon (propriété connue des filtres de Hodrick-Prescott et passe-bande) ; la phase actuelle et les derniers points de retournement peuvent donc changer avec de nouvelles données.',
  'caution.advice':
    'Il s’agit de projections statistiques, non de conseils financiers. Les décisions reviennent à des personnes qualifiées qui connaissent l’activité et savent peser ce que les chiffres ne montrent pas.',
  'caution.cell.short': 'série courte',
  'caution.cell.residualSeasonality': 'saisonnalité résiduelle',
  'caution.cell.backtest': 'prévision moins bonne que l’année précédente',
  'caution.cell.filled': '{n, plural, one {# lacune comblée} other {# lacunes comblées}}',
  'caution.cell.notAdjusted': 'non corrigé',
  'caution.cell.noForecast': 'pas de prévision',

  'note.infinite':
    '{count, plural, one {1 valeur n’était pas un nombre fini et est traitée comme manquante.} other {{count} valeurs n’étaient pas des nombres finis et sont traitées comme manquantes.}}',
  'note.magnitude':
    'Les valeurs atteignent {largest}, au-delà des ±1e15 que l’analyse traite de façon fiable ; changer l’échelle de la série (en milliers ou en millions par exemple) pour l’analyser.',
  'note.constant': 'La série est constante à {value} : il n’y a ni profil saisonnier, ni tendance, ni cycle à estimer.',
  'note.failed':
    '{what, select, adjustment {La correction des variations saisonnières} cycle {La tendance et le cycle} forecast {La prévision} other {Le résultat de l’exercice}} n’a pas pu être calculé pour cette série ({error}).',
  'note.adjustmentFailed': 'La correction des variations saisonnières a échoué.',
  'note.noValues': 'La série n’a aucune valeur à corriger.',
  'note.tooShortToAdjust':
    'Non corrigée des variations saisonnières : il faut au moins deux années complètes de données ({minimum} {frequency, select, monthly {mois} quarterly {trimestres} other {semaines}}), et la série compte {observed} {frequency, select, monthly {mois} quarterly {trimestres} other {semaines}} observés.',
  'note.notAdjustable': 'Non corrigée des variations saisonnières : {error}.',
  'note.cycleTooShort': 'le cycle demande au moins trois valeurs',
  'note.cycleNotFinite': 'le cycle demande des valeurs observées et finies',
  'note.cycleFilled':
    '{count, plural, one {1 valeur manquante a été interpolée linéairement avant le filtrage.} other {{count} valeurs manquantes ont été interpolées linéairement avant le filtrage.}}',
  'note.untested': 'Stationnarité non testée : {reason}.',
  'note.tooFewToForecast': 'Trop peu de valeurs pour une prévision.',
  'note.forecastFilled':
    '{count, plural, one {1 valeur manquante a été interpolée linéairement avant la prévision.} other {{count} valeurs manquantes ont été interpolées linéairement avant la prévision.}}',
  'note.forecastAfterEnd': 'La prévision commence après la dernière période, au-delà de la dernière valeur observée.',
  'note.forecastConstant': 'La série est constante ; la prévision reconduit la constante.',
  'note.forecastFewValues': 'Moins de quatre valeurs : la méthode naïve (dernière valeur reconduite) est utilisée.',
  'note.naiveForSeasonalNaive': 'Moins d’une année complète : la méthode naïve remplace la méthode naïve saisonnière.',
  'note.noSeasonalModels': 'Moins de deux années complètes de données : les modèles saisonniers ne sont pas utilisés.',
  'note.weeklyEts':
    'Données hebdomadaires : ETS prévoit la série CVS (décomposition classique sur 52 semaines) et le profil saisonnier est ajouté ensuite.',
  'note.forecastNotFinite': 'La prévision {method} n’était pas finie ; la méthode naïve est utilisée à la place.',
  'note.noForecast': 'Aucune prévision n’a été établie pour cette série.',
  'note.noCycle': 'Aucune estimation de tendance et de cycle n’est présentée pour cette série.',
  'note.endPoint':
    'La tendance des {count} dernières périodes est provisoire : un filtre bilatéral ne voit aucune donnée au-delà de la fin ; ces valeurs et l’écart seront révisés avec de nouvelles données.',
  'note.outOfOrder': 'lignes hors de l’ordre chronologique (dès la ligne {line}) ; elles ont été triées',
  'note.gaps':
    '{frequency, select, monthly {{n, plural, one {# mois manquant} other {# mois manquants}}} quarterly {{n, plural, one {# trimestre manquant} other {# trimestres manquants}}} other {{n, plural, one {# semaine manquante} other {# semaines manquantes}}}} : {list}{more, plural, =0 {} other { et # autres}}',
  'note.truncated':
    '{frequency, select, monthly {{n, plural, one {# mois} other {# mois}}} quarterly {{n, plural, one {# trimestre} other {# trimestres}}} other {{n, plural, one {# semaine} other {# semaines}}}} de données après la période sous revue {period} ignorés ({same, select, yes {{from}} other {{from} à {to}}})',
  'note.padded':
    'les données s’arrêtent à {last} : {frequency, select, monthly {{n, plural, one {# mois manque} other {# mois manquent}}} quarterly {{n, plural, one {# trimestre manque} other {# trimestres manquent}}} other {{n, plural, one {# semaine manque} other {# semaines manquent}}}} jusqu’à la période sous revue {period}',
  'note.inferredPeriod': 'période sous revue {period} : le dossier n’en fixe pas, la dernière période avec des données est retenue',
  'note.ofSeries': '{series} : {text}',
  'note.noValuesToChart': 'La série n’a aucune valeur à représenter.',
};
