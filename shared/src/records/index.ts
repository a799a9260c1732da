export {
  RETENTION_MAX_MONTHS,
  RETENTION_MIN_MONTHS,
  RetentionError,
  checkRetentionMonths,
  retentionCutoff,
} from './retention.js';
