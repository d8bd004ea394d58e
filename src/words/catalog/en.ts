/**
 * English words of the report: every term, label and sentence, as ICU MessageFormat strings (plural and select
 * by the Unicode CLDR rules, through `intl-messageformat`). The keys of this catalogue are the keys of every
 * language: `de.ts` and `fr.ts` are typed against it, so a missing translation does not compile, and
 * test/words/catalog.test.ts checks that each translation parses and uses the same arguments.
 *
 * Arguments are plain strings already formatted for the locale (numbers, periods, ranges), except those used by
 * `plural` or `select`. Sentences are our own.
 */
export const en = {
  // Periods and units
  'period.quarter': 'Q{quarter} {year}',
  'period.quarterLong': 'Q{quarter} {year}',
  'period.week': 'W{week} {year}',
  'season.quarter': 'Q{quarter}',
  'season.week': 'W{week}',
  'unit.points': '{value} pp',
  'unit.range': '{low} to {high}',
  'unit.withUnit': '{value} {unit}',
  'p.below': 'p < {value}',
  'p.equal': 'p = {value}',
  'count.periods':
    '{frequency, select, monthly {{n, plural, one {# month} other {# months}}} quarterly {{n, plural, one {# quarter} other {# quarters}}} other {{n, plural, one {# week} other {# weeks}}}}',
  'count.more': '{n} more',
  'per.period': '{frequency, select, monthly {a month} quarterly {a quarter} other {a week}}',
  'previous.period': '{frequency, select, monthly {the previous month} quarterly {the previous quarter} other {the previous week}}',

  // Terms of the trade
  'term.original': 'Original',
  'term.adjusted': 'Seasonally adjusted',
  'term.trendCycle': 'Trend-cycle',
  'term.yearOnYear': 'On a year earlier',
  'term.irregular': 'Irregular',
  'phase.rising-above': 'above trend and rising',
  'phase.falling-above': 'above trend and easing',
  'phase.falling-below': 'below trend and falling',
  'phase.rising-below': 'below trend and recovering',
  'phase.onTrend': 'on trend, no cycle to speak of',
  'direction.rising': 'rising',
  'direction.falling': 'falling',
  'direction.flat': 'flat',
  'outlier.additive': 'one-off',
  'outlier.level-shift': 'level shift',
  'outlier.temporary': 'temporary change',
  'turn.peak': 'peak',
  'turn.trough': 'trough',
  'severity.info': 'Note',
  'severity.watch': 'Watch',
  'severity.alert': 'Alert',
  'model.additive': 'additive',
  'model.multiplicative': 'multiplicative',
  'method.stl': 'STL',
  'method.classical': 'classical moving averages',
  'method.fourier': 'yearly Fourier pattern',
  'cycle.hp': 'Hodrick-Prescott',
  'cycle.bandpass': 'Christiano-Fitzgerald',
  'regressor.working-days': 'working days',
  'regressor.holidays': 'holidays',
  'regressor.easter': 'Easter',
  'measure.original': 'Original value',
  'measure.adjusted': 'Seasonally adjusted value',
  'measure.trend-direction': 'Trend direction',
  'measure.cycle-phase': 'Cycle phase',
  'revision.data': 'Data changed',
  'revision.estimate': 'Re-estimated',

  // Sections and fixed labels
  'section.summary': 'At a glance',
  'section.headline': 'What stands out',
  'section.table': 'Every series',
  'section.history': 'Since the last pack',
  'section.revisions': 'Revised figures',
  'section.tracking': 'How earlier forecasts fared',
  'section.methods': 'Methods and cautions',
  'section.howMade': 'How the figures were made',
  'section.perSeries': 'Series by series',
  'section.cautions': 'Reading these figures',
  'section.dataNotes': 'Data notes',
  'label.preparedBy': 'Prepared by',
  'label.logo': 'Logo',
  'label.logoOf': '{organisation} logo',
  'label.seeChart': 'see chart',
  'label.series': 'Series',
  'label.latest': 'Latest',
  'label.latestIn': 'Latest ({period})',
  'label.adjustedVsPrevious': 'Adjusted vs previous',
  'label.adjustedOnPrevious': 'Adjusted, on previous period',
  'label.trend': 'Trend',
  'label.cycle': 'Cycle',
  'label.outlook': 'Outlook',
  'label.flags': 'Flags',
  'label.lastYears': 'Last 3 years',
  'label.period': 'Period',
  'label.forecast': 'Forecast',
  'label.levelRange': '{level}% range',
  'label.forecastCaption': 'Forecast: {method}',
  'label.comparedWith': 'compared with {period}',
  'label.figure': 'Figure',
  'label.why': 'Why',
  'label.before': 'Before',
  'label.now': 'Now',
  'label.change': 'Change',
  'label.large': 'large',
  'label.forecastsChecked': 'Forecasts checked',
  'label.maseSoFar': 'MASE so far',
  'label.insideRanges': 'Actuals inside the published ranges',
  'label.published': 'Published',
  'label.stepsAhead': 'Steps ahead',
  'label.actual': 'Actual',
  'label.actualMinusForecast': 'Actual − forecast',
  'label.ranges': 'Ranges',
  'label.inside': '{level}%: inside',
  'label.outside': '{level}%: outside',
  'label.insideShare': '{share} inside the {level}% range',
  'label.madeFor': 'Forecasts made for {period}, up to three steps ahead:',
  'label.noRevision': 'No published figure changed.',
  'label.noTracking': 'No earlier forecast can be checked yet.',
  'label.inputFile': 'Input file',
  'label.size': 'Size',
  'label.rows': 'Rows',
  'label.bytes': '{size} bytes',
  'label.dataNotesHeading': 'Notes on the data',
  'label.noDataNotes': 'The input files raised no data notes.',
  'label.lineOf': '{file}, line {line}',
  'label.builtWith': 'Built with ebbflow {version} for the review period {period}. Paths are relative to the pack file.',
  'label.page': 'Page {page} of {pages}',
  'label.fallback':
    'This report is written in English: its words are not yet available in the language of the locale {locale}, whose numbers and dates it uses.',
  'label.model': 'Adjustment',
  'label.seasonalWindow': 'Seasonal window',
  'label.calendarFound': 'Calendar effects',
  'label.outliers': 'Unusual values',
  'label.forecastModel': 'Forecast model',
  'label.mase': 'Back-test MASE',
  'label.cautionsColumn': 'Cautions',
  'label.none': 'none',
  'label.notAdjusted': 'not adjusted',
  'label.periodic': 'fixed',
  'label.modelCell': '{method}, {model}',
  'label.windowCell': '{years, plural, one {# year} other {# years}}',

  // Summary table
  'flag.unusual': '{n, plural, one {# unusual value} other {# unusual values}}',
  'flag.notAdjusted': 'not adjusted',
  'flag.short': 'short series',
  'flag.filled': '{n, plural, one {# gap filled} other {# gaps filled}}',
  'flag.notes': '{n, plural, one {# data note} other {# data notes}}',
  'summary.note':
    'Changes are in percent. “Adjusted” compares the seasonally adjusted figure with {previous}. The outlook shows the fiscal-year outturn against target where a target is set, otherwise the forecast for the next period with its 80% range.',
  'summary.outturn': '{year}: {total} vs target {target} ({gap})',
  'summary.forecast': '{period}: {mean} ({low}–{high})',
  'summary.forecastNoRange': '{period}: {mean}',
  'summary.spark': '{label}: last {n} periods',

  // Chart captions, legends and descriptions
  'chart.overview': 'Original, seasonally adjusted and trend-cycle',
  'chart.overviewOriginal': 'Original values',
  'chart.seasonal': 'Seasonal pattern by year',
  'chart.seasonalPercent': 'Seasonal pattern by year (% vs normal)',
  'chart.yoy': 'Change on a year earlier (%)',
  'chart.irregular': 'Irregular',
  'chart.irregularFlagged': 'Irregular, with flagged values',
  'chart.cycle': 'Deviation from long-run trend (%)',
  'chart.forecast': 'Forecast with {levels} ranges',
  'chart.tracking': 'Error of earlier forecasts (% of the actual)',
  'chart.trackingTitle': 'Forecast tracking',
  'chart.titleOf': '{name}: {caption}',
  'chart.cycleNote': 'Now {phase}.',
  'chart.provisionalNote': 'Hollow markers are provisional turning points.',
  'axis.vsNormal': '% vs normal',
  'axis.yoy': '% on a year earlier',
  'axis.irregular': '% irregular',
  'axis.cycle': '% from long-run trend',
  'axis.tracking': 'Actual vs forecast, %',
  'legend.rise': 'Rise',
  'legend.fall': 'Fall',
  'legend.actual': 'Actual',
  'legend.forecast': 'Forecast',
  'legend.backtest': 'Back-test (one step ahead)',
  'legend.peak': 'Peak',
  'legend.trough': 'Trough',
  'legend.provisionalPeak': 'Provisional peak',
  'legend.provisionalTrough': 'Provisional trough',
  'legend.additive': 'One-off',
  'legend.level-shift': 'Level shift',
  'legend.temporary': 'Temporary change',
  'legend.insideRange': 'Inside {level}% range',
  'legend.outsideRange': 'Outside {level}% range',
  'describe.overview': 'Line chart of {name} from {from} to {to}{adjusted, select, yes {, showing original, seasonally adjusted and trend-cycle values} other {}}. Latest value {latest} in {period}.',
  'describe.seasonal': 'Seasonal effect of {name} for each {frequency, select, quarterly {quarter} weekly {week} other {month}} of the year, one line per year; the latest year is drawn thicker.',
  'describe.yoy': 'Bar chart of the percent change of {name} on the same period a year earlier; latest {latest}.',
  'describe.irregular': 'Irregular component of {name}; {n, plural, =0 {no values flagged} other {flagged: {list}}}.',
  'describe.cycle': 'Percent gap between {name} and its long-run trend over time, with {n, plural, one {# turning point} other {# turning points}} marked; currently {phase}.',
  'describe.forecast': 'Recent values of {name} and a {n}-period forecast ({method}) with shaded ranges; first forecast {first} for {period}.',
  'describe.tracking': 'Errors of {n} earlier published forecasts in percent of the actual, by period; filled points fell inside the {level}% range.',
  'describe.flagged': '{period} ({kind})',

  // History section
  'forecast.accuracy':
    'Back-test: re-run from {origins, plural, one {# earlier point} other {# earlier points}} in the data, up to {horizon, plural, one {# period} other {# periods}} ahead, the forecast scored MASE {mase} and sMAPE {smape}, {better, select, yes {better} other {no better}} than repeating last year’s figures (MASE 1){benchmarks, select, none {} other {; simpler methods: {benchmarks}}}.',
  'forecast.benchmark': '{method} {mase}',
  'forecast.outturn':
    '{year}: {actual} actual over {periodsActual} plus {forecast} forecast for the remaining {periodsRemaining}, a total of {total} ({level}% range {range}){target, select, none {} other {, against a target of {target} ({gap})}}.',
  'label.aboutSeries': 'About this series',
  'history.smallerOne': '1 smaller revision (under {threshold}) is not listed; it is in exports/revisions.csv.',
  'history.smallerMany': '{count} smaller revisions (each under {threshold}) are not listed; all of them are in exports/revisions.csv.',
  'history.trackingOne': 'The one checked forecast is in exports/tracking.csv.',
  'history.trackingMany': 'All {count} checked forecasts are in exports/tracking.csv.',

  // Callouts (ranked statements; each names its series, since the summary lists them apart from their section)
  'callout.yearOnYear':
    '{label} {stock, select, yes {stood at} other {came to}} {value} in {period}, {change} on {yearAgo}.{unusual, select, yes { That is an unusually large move for this series.} other {}}',
  'callout.adjustedSteady':
    'Seasonally adjusted, {label} held steady in {period} from {previous}{annualised}.{unusual, select, yes { That is an unusually large move for this series.} other {}}',
  'callout.adjustedMove':
    'Seasonally adjusted, {label} {up, select, yes {rose} other {fell}} {size} in {period} from {previous}{annualised}.{unusual, select, yes { That is an unusually large move for this series.} other {}}',
  'callout.annualised': ' ({value} annualised)',
  'callout.trendSteady': 'The trend of {label} is {direction}, {rate}{annualised}.',
  'callout.trendRate': '{change} {per}',
  'callout.trendTurn': 'The trend of {label} turned {up, select, yes {up} other {down}} in {period} after {up, select, yes {falling} other {rising}} for {before}.',
  'callout.trendBlip':
    'The {up, select, yes {rise} other {fall}} in {label} in {period} ({change}, seasonally adjusted) goes against a {trendUp, select, yes {rising} other {falling}} trend ({trendChange} {per}): more likely a blip than a turn.',
  'callout.cyclePhase': 'For {label}, the cycle is {phase}: the gap to the long-run trend is {gap}.',
  'callout.cyclePhaseChange':
    'For {label}, the cycle moved from {from} to {to} in {period}; the gap to the long-run trend is {gap}.',
  'callout.turningPoint':
    '{provisional, select, yes {The cycle of {label} may have passed a {type} in {period}, {ago} ago (provisional: later data can still move or remove it).} other {The cycle of {label} passed a {type} in {period}, {ago} ago.}}',
  'callout.levelShift': '{label} shifted {up, select, yes {up} other {down}} to a new level in {period} ({sigmas} robust sigmas).',
  'callout.residual':
    '{period} stands out for {label}: {sigmas} robust sigmas {up, select, yes {above} other {below}} what trend and season explain, {kind, select, temporary {a temporary change} other {a one-off}}{size, select, none {} other { of about {size}}}.',
  'callout.workingDays':
    'Calendar effects (trading days and holidays) {up, select, yes {raised} other {lowered}} {label} in {period} by about {size} compared with an average period.',
  'callout.easter':
    'Easter {year} fell on {date}, {earlier, select, yes {earlier} other {later}} than on average: against an average year that moved {label} by about {firstChange} in {firstPeriod} and {secondChange} in {secondPeriod}.',
  'callout.forecastOutlook': 'The forecast for {label} is {mean} for {period} ({level}% range {range}){tail}; model: {method}.',
  'callout.forecastTail': ' and {mean} for {period}, {ahead} ahead ({level}% range {range})',
  'callout.combination': 'a combination of {families}',
  'callout.dampedTrend': 'damped trend',
  'callout.outturnStock': 'On current forecasts, {label} will end {year} at {total} ({level}% range {range})',
  'callout.outturnFlow':
    'On current forecasts, {label} will total {total} in {year} ({level}% range {range}), from {actual} of actuals and {forecast} of forecast',
  'callout.outturnEnd': '{base}.',
  'callout.outturnInLine': '{base}: in line with the target of {target}.',
  'callout.outturnGap': '{base}: {gap} {above, select, yes {above} other {below}} the target of {target}.',
  'callout.backtestWarning':
    'Treat the forecast for {label} with care: in back-tests from {origins, plural, one {# forecast origin} other {# forecast origins}} it was less accurate than repeating the same period of the previous year (MASE {mase}; below 1 would beat that benchmark).',
  'callout.gaps':
    '{count, plural, one {# value of {label} is missing} other {# values of {label} are missing}} ({periods}){filled, select, none {.} all {; the analysis filled {count, plural, one {it} other {them}} in for estimation only.} other {; the analysis filled {filled} in for estimation only.}}',
  'callout.gapsFilled': '{n, plural, one {# value} other {# values}}',
  'callout.latestMissing': 'There is no value of {label} for {period}, the review period.',
  'callout.notAdjusted': 'No seasonal adjustment for {label}: {reason}',
  'callout.seriesNote': 'Note on {label}: {note}',
  'callout.revisionNumeric':
    'The {measure, select, original {reported value} other {seasonally adjusted figure}} of {label} for {period} was revised {up, select, yes {up} other {down}} by {size} since the {since} pack, from {from} to {to}.',
  'callout.revisionWords':
    'Since the {since} pack, the {measure, select, trend {trend direction} other {cycle phase}} of {label} for {period} changed from {from} to {to}.',
  'callout.trackingRecord':
    'Forecasts of {label} from earlier packs: {count, plural, one {# forecast} other {# forecasts}} checked against actuals so far, {inside} inside their {level}% range ({share}){mase, select, none {} other {; running MASE {mase}}}.',
  'callout.forecastCheck':
    'The {publishedIn} pack forecast {forecast} of {label} for {period}; the actual came in at {actual} ({error}), {inside, select, yes {inside} other {outside}} the {level}% range.',

  // Commentary: one paragraph per series (name once, then "the series")
  'para.headline':
    '{label} {stock, select, yes {stood at} other {came to}} {value} in {period}{change, select, none {} other {, {change} on a year earlier}}',
  'para.headlineMissing': 'There is no figure for {label} in {period} yet',
  'para.unusualYoy': ', an unusually large move for the series',
  'para.adjusted':
    'Seasonally adjusted, the series {move, select, up {rose {size}} down {fell {size}} other {held steady}} on {previous}',
  'para.trend': 'the trend-cycle is {direction, select, rising {rising} falling {falling} other {flat}}{rate, select, none {} other { at {rate} {per}}}',
  'para.trendTurned': 'the trend-cycle turned {up, select, yes {up} other {down}} in {period}',
  'para.join.and': '{first}, and {second}.',
  'para.join.but': '{first}, but {second}.',
  'para.join.while': '{first}, while {second}.',
  'para.sentence': '{text}.',
  'para.notAdjustedPlain': 'The series was not seasonally adjusted.',
  'para.trendOnly': 'Its trend-cycle is {direction, select, rising {rising} falling {falling} other {flat}}.',
  'para.cycle': 'Its cycle is {phase}, {gap} from the long-run trend',
  'para.cycleChanged': 'Its cycle moved from {from} to {to} this period, {gap} from the long-run trend',
  'para.turn': '{provisional, select, yes {it may have passed a {type} in {period}} other {it passed a {type} in {period}}}',
  'para.outturnTarget':
    'On current forecasts the fiscal year {year} will close at {total}, {where, select, inline {in line with the target of {target}} above {{gap} above the target of {target}} other {{gap} below the target of {target}}}.',
  'para.outturnNoTarget': 'On current forecasts the fiscal year {year} will close at {total}, with no target set ({level}% range {range}).',
  'para.forecast': 'The forecast for {period} is {mean} ({level}% range {range}).',
  'para.noForecast': 'No forecast was made for the series.',
  'para.unusual':
    '{n, plural, one {One value stands out: {list}.} other {# values stand out: {list}.}}',
  'para.unusualItem': '{period} ({kind})',
  'para.backtest': 'Treat its forecast with care: in back-tests it did worse than repeating last year’s figures (MASE {mase}).',
  'para.short': 'With {observed}, the series is short, so every estimate here is provisional.',

  // Commentary: the opening paragraph of the pack
  'open.yoy':
    'In {period}, {up, plural, =0 {none} other {#}} of {n, plural, one {the # series} other {the # series}} stood above their level a year earlier{best, select, none {} other {; {best} grew most ({bestChange}) and {worst} least ({worstChange})}}.',
  'open.trend':
    'The trend-cycle is rising in {rising, plural, one {# series} other {# series}}, falling in {falling, plural, =0 {none} one {#} other {#}} and flat in {flat, plural, =0 {none} one {#} other {#}}.',
  'open.target': 'On current forecasts, {list}.',
  'open.targetItem':
    '{label} will close {year} {where, select, inline {in line with its target} above {{gap} above target} other {{gap} below target}}',
  'open.surprises': '{n, plural, one {One figure calls for attention: {list}.} other {# figures call for attention, above all {list}.}}',
  'open.surpriseItem': '{label} ({what})',
  'open.calm': 'No figure calls for an alert this period.',
  'open.outlook':
    'For {period}, the forecasts point to a rise in {rising, plural, one {# series} other {# series}} and a fall in {falling, plural, =0 {none} other {#}}.',

  'rule.year-on-year': 'year-on-year change',
  'rule.adjusted-change': 'adjusted change',
  'rule.trend': 'trend-cycle',
  'rule.cycle-phase': 'cycle phase',
  'rule.turning-point': 'turning point',
  'rule.large-residual': 'unusual value',
  'rule.calendar': 'calendar effect',
  'rule.forecast-outlook': 'forecast',
  'rule.outturn': 'outturn against target',
  'rule.forecast-accuracy': 'forecast accuracy',
  'rule.data': 'data',
  'rule.revision': 'revision',
  'rule.forecast-tracking': 'forecast record',
  'rule.forecast-check': 'forecast miss',
  // Methods section (plain sentences) and cautions
  'methods.adjustment':
    'Seasonal adjustment removes the pattern that repeats every year, so that one period can be compared with the one before. Monthly and quarterly series are decomposed by STL, seasonal-trend decomposition by LOESS (Cleveland, Cleveland, McRae and Terpenning, 1990, Journal of Official Statistics 6), or by classical moving averages where the pack asks for it; weekly series use a yearly Fourier pattern in the date. A multiplicative model is used when the seasonal swing grows with the level, an additive one otherwise.',
  'methods.calendar':
    'Working days, public holidays and the date of Easter are estimated by regression on the irregular and removed only where they are significant at the 5% level. Unusual values (one-offs, level shifts and temporary changes) are found from robust scores of the irregular and kept out of the seasonal estimate.',
  'methods.cycle':
    'The cycle is the percentage gap between the seasonally adjusted series and a long-run trend from the Hodrick-Prescott filter (Hodrick and Prescott, 1997, Journal of Money, Credit and Banking 29) or the Christiano-Fitzgerald band-pass filter (2003, International Economic Review 44); turning points follow the rules of Bry and Boschan (1971, NBER).',
  'methods.forecast':
    'Forecasts come from exponential smoothing state-space models (ETS; Hyndman, Koehler, Ord and Snyder, 2008, Forecasting with Exponential Smoothing), the Theta method (Assimakopoulos and Nikolopoulos, 2000, International Journal of Forecasting 16) and ARIMA models, alone or combined, with prediction ranges at the levels the pack sets.',
  'methods.backtest':
    'Each forecast is tested by re-running it from earlier points in the data. Its accuracy is given as MASE, the mean absolute scaled error (Hyndman and Koehler, 2006, International Journal of Forecasting 22): below 1, the forecast beat repeating the same period of the previous year.',
  'methods.parameters': 'Every setting of every method, for each series, is listed in results.json, in the manifest and on the “methods” sheet of tables.xlsx.',
  'caution.estimates':
    'Seasonally adjusted figures, trend-cycle estimates and forecasts are statistical estimates made from the data available today. They are revised as new data arrive, most of all for the latest few periods.',
  'caution.ranges':
    'Forecast ranges show where, on the model’s own assumptions, the outcome would fall 80 or 95 times in a hundred. They are not guarantees: a change in the business or its market that the history does not contain will not be in the ranges either.',
  'caution.short':
    'Short series, series with gaps or breaks, and series with recent unusual values give less reliable adjustments and forecasts; the data notes list where this applies.',
  'caution.endPoint':
    'The long-run trend behind the cycle figures is least certain at the end of the sample (a known property of the Hodrick-Prescott and band-pass filters), so the current phase and the most recent turning points may change once more data arrive.',
  'caution.advice':
    'These are statistical projections, not financial advice. Decisions rest with qualified people who know the business and can weigh what the figures cannot show.',
  'caution.cell.short': 'short series',
  'caution.cell.residualSeasonality': 'some seasonality left',
  'caution.cell.backtest': 'forecast weaker than last year’s figures',
  'caution.cell.filled': '{n, plural, one {# gap filled} other {# gaps filled}}',
  'caution.cell.notAdjusted': 'not adjusted',
  'caution.cell.noForecast': 'no forecast',

  // Notes from the analysis and from reading the data, by code
  'note.infinite':
    '{count, plural, one {1 value was not a finite number and is treated as missing.} other {{count} values were not finite numbers and are treated as missing.}}',
  'note.magnitude':
    'Values reach {largest}, beyond the ±1e15 the analysis handles reliably; rescale the series (for example to thousands or millions) to analyse it.',
  'note.constant': 'The series is constant at {value}: there is no seasonal pattern, trend or cycle to estimate.',
  'note.failed':
    'The {what, select, adjustment {seasonal adjustment} cycle {trend and cycle} forecast {forecast} other {fiscal-year outturn}} could not be computed for this series ({error}).',
  'note.adjustmentFailed': 'The seasonal adjustment failed.',
  'note.noValues': 'The series has no values to adjust.',
  'note.tooShortToAdjust':
    'Not seasonally adjusted: this needs at least two full years of data ({minimum} {frequency, select, monthly {months} quarterly {quarters} other {weeks}}), and the series has {observed} observed {frequency, select, monthly {months} quarterly {quarters} other {weeks}}.',
  'note.notAdjustable': 'Not seasonally adjusted: {error}.',
  'note.cycleTooShort': 'cycle needs at least three values',
  'note.cycleNotFinite': 'cycle needs observed, finite values',
  'note.cycleFilled':
    '{count, plural, one {1 missing value was filled by straight-line interpolation before filtering.} other {{count} missing values were filled by straight-line interpolation before filtering.}}',
  'note.untested': 'Stationarity not tested: {reason}.',
  'note.tooFewToForecast': 'Too few values to forecast.',
  'note.forecastFilled':
    '{count, plural, one {Filled 1 missing value by linear interpolation before forecasting.} other {Filled {count} missing values by linear interpolation before forecasting.}}',
  'note.forecastAfterEnd': 'Forecast starts after the last period, beyond the last observed value.',
  'note.forecastConstant': 'The series is constant; the forecast repeats the constant.',
  'note.forecastFewValues': 'Fewer than four values: the naive method (last value repeated) is used.',
  'note.naiveForSeasonalNaive': 'Less than one full year: the naive method replaces the seasonal naive method.',
  'note.noSeasonalModels': 'Fewer than two full years of data: seasonal models are not used.',
  'note.weeklyEts':
    'Weekly data: ETS forecasts the seasonally adjusted series (classical decomposition over 52 weeks) and the seasonal pattern is added back.',
  'note.forecastNotFinite': 'The {method} forecast was not finite; the naive method is used instead.',
  'note.noForecast': 'No forecast was made for this series.',
  'note.noCycle': 'No trend and cycle estimate is shown for this series.',
  'note.endPoint':
    'The trend over the latest {count} periods is provisional: a two-sided filter sees no data beyond the end, so these values and the gap will be revised as new data arrive.',
  'note.outOfOrder': 'rows are not in date order (first at line {line}); they were sorted',
  'note.gaps':
    '{n} missing {frequency, select, monthly {{n, plural, one {month} other {months}}} quarterly {{n, plural, one {quarter} other {quarters}}} other {{n, plural, one {week} other {weeks}}}}: {list}{more, plural, =0 {} other { and # more}}',
  'note.truncated':
    '{frequency, select, monthly {{n, plural, one {# month} other {# months}}} quarterly {{n, plural, one {# quarter} other {# quarters}}} other {{n, plural, one {# week} other {# weeks}}}} of data after the review period {period} ignored ({same, select, yes {{from}} other {{from} to {to}}})',
  'note.padded':
    'data end at {last}: the {frequency, select, monthly {{n, plural, one {# month} other {# months}}} quarterly {{n, plural, one {# quarter} other {# quarters}}} other {{n, plural, one {# week} other {# weeks}}}} up to the review period {period} are missing',
  'note.inferredPeriod': 'review period {period}: the pack sets none, so the last period with data is used',
  'note.ofSeries': '{series}: {text}',
  'note.noValuesToChart': 'The series has no values to chart.',
} as const;

/** A key of the catalogue. */
export type MessageKey = keyof typeof en;

/** A catalogue of one language: a message for every key. */
export type Catalog = Record<MessageKey, string>;
