// How long an organisation keeps its inspection records.

// 49 CFR 396.11(a)(4): the report, the certification of repairs and the next driver's review are kept
// three months from the date the report was prepared. An organisation may keep them longer.
export const RETENTION_MIN_MONTHS = 3;
export const RETENTION_DEFAULT_MONTHS = RETENTION_MIN_MONTHS;
// Our own bound (ten years), so a typing slip cannot keep records forever.
export const RETENTION_MAX_MONTHS = 120;

export class RetentionError extends Error {}

export function checkRetentionMonths(months: number): void {
  if (!Number.isInteger(months)) throw new RetentionError('Keep records for a whole number of months.');
  if (months < RETENTION_MIN_MONTHS) {
    throw new RetentionError(
      `Records must be kept at least ${RETENTION_MIN_MONTHS} months: reports, repair certifications and the next driver's review are kept three months from the date of the report (49 CFR 396.11(a)(4)).`,
    );
  }
  if (months > RETENTION_MAX_MONTHS) {
    throw new RetentionError(`Keep records at most ${RETENTION_MAX_MONTHS} months (ten years).`);
  }
}

// The moment before which a record is older than `months` calendar months, in UTC. A day missing in
// the target month (31 May minus 3 months) falls back to that month's last day, so the cutoff is
// never later than a true calendar month count: nothing is removed early.
export function retentionCutoff(now: Date, months: number): Date {
  const year = now.getUTCFullYear();
  const month = now.getUTCMonth() - months;
  const lastDay = new Date(Date.UTC(year, month + 1, 0)).getUTCDate();
  return new Date(
    Date.UTC(
      year,
      month,
      Math.min(now.getUTCDate(), lastDay),
      now.getUTCHours(),
      now.getUTCMinutes(),
      now.getUTCSeconds(),
      now.getUTCMilliseconds(),
    ),
  );
}
