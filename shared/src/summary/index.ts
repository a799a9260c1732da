// The summary area's surface: the report's summary, the certification choices and the rushed rule.
export {
  CERTIFICATION_ACTIONS,
  RUSHED_RULE,
  summarizeInspection,
  type CertificationAction,
  type InspectionSummary,
  type PassedWithoutReading,
  type RushedCheck,
  type RushedReason,
  type SpotFixedDefect,
} from './summarize-inspection.js';
export { fixNeedsReading } from './spot-fix.js';
