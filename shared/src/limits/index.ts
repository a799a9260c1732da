// The table's rows are the evaluator's; other areas and the apps ask evaluateMeasurement and applicableLimits.
export type { BoundKind, LimitBasis, LimitBound, LimitCondition, LimitRow, LimitValue } from './limits-table.js';
export * from './evaluate-measurement.js';
