import type {Rule} from './context.js';
import {yearOnYearRule} from './callouts/yearOnYear.js';
import {adjustedChangeRule} from './callouts/adjustedChange.js';
import {trendRule} from './callouts/trend.js';
import {cyclePhaseRule} from './callouts/cyclePhase.js';
import {turningPointsRule} from './callouts/turningPoints.js';
import {largeResidualRule} from './callouts/largeResidual.js';
import {calendarRule} from './callouts/calendar.js';
import {forecastOutlookRule} from './callouts/forecastOutlook.js';
import {outturnRule} from './callouts/outturn.js';
import {forecastAccuracyRule} from './callouts/forecastAccuracy.js';
import {dataQualityRule} from './callouts/dataQuality.js';
import {revisionsRule} from './callouts/revisions.js';
import {forecastTrackingRule} from './callouts/forecastTracking.js';
import {forecastCheckRule} from './callouts/forecastCheck.js';
import {driversRule} from './callouts/drivers.js';
import {versusTargetRule} from './callouts/versusTarget.js';

/** Every callout rule, in the fixed order that breaks ranking ties. Adding a callout: one file, one line here. */
export const rules: readonly Rule[] = [
  yearOnYearRule,
  adjustedChangeRule,
  trendRule,
  cyclePhaseRule,
  turningPointsRule,
  largeResidualRule,
  calendarRule,
  forecastOutlookRule,
  outturnRule,
  forecastAccuracyRule,
  dataQualityRule,
  revisionsRule,
  forecastTrackingRule,
  forecastCheckRule,
  driversRule,
  versusTargetRule,
];
