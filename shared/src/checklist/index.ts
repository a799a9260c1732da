// The checklist area's surface: the shapes of a checklist and its answers, the generator and the
// words a reading is shown with. Chamber codes, air checks and zone keys stay inside (limits reads the
// file); the sample vehicles are in @yardcall/shared/testing.
export {
  ANSWERS,
  INSPECTION_KINDS,
  LOCALES,
  NO_READING_REASONS,
  READING_RULES,
  VERDICTS,
  type Answer,
  type Checklist,
  type ChecklistItem,
  type ChecklistStop,
  type Expectation,
  type InspectionKind,
  type ItemCategory,
  type ItemResult,
  type Locale,
  type MeasurementValue,
  type NoReadingReason,
  type ReadingRule,
  type SpotFix,
  type Verdict,
  type WheelPosition,
} from './types.js';
export { ChecklistError, MAX_UNITS, buildChecklist } from './build-checklist.js';
export { isReadingRequired } from './required-readings.js';
export { formatMeasure, verdictWords } from './measure-words.js';
