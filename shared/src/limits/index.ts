// The limits area's surface: other areas and the apps ask evaluateMeasurement and applicableLimits; the
// table's rows are the evaluator's.
export {
  LimitError,
  applicableLimits,
  evaluateMeasurement,
  safetyCaution,
  type MeasurementVerdict,
} from './evaluate-measurement.js';
