import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import { Link } from 'react-router';
import type { InspectionResponse } from '@yardcall/shared';
import { formatSeconds, unitsLabel } from '../utils/format';
import { inspectionPath } from '../utils/paths';

function Fact({ term, children, testId }: { term: string; children: ReactNode; testId?: string }) {
  return (
    <div className="min-w-0">
      <dt className="font-bold">{term}</dt>
      <dd data-testid={testId}>{children}</dd>
    </div>
  );
}

export function InspectionFacts({ inspection }: { inspection: InspectionResponse }) {
  const { t, i18n } = useTranslation();
  const dates = useOfficeDates();
  const locale = i18n.language;
  return (
    <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="inspection-facts">
      <Fact term={t('inspections.detail.units')} testId="fact-units">
        {inspection.vehicles
          .map((vehicle) => `${vehicle.unitNumber} (${t(`vehicles.kinds.${vehicle.kind}`)})`)
          .join(' + ')}
      </Fact>
      <Fact term={t('inspections.detail.driver')}>{inspection.driver.name}</Fact>
      <Fact term={t('inspections.detail.kind')}>{t(`inspections.kinds.${inspection.kind}`)}</Fact>
      <Fact term={t('inspections.detail.status')}>
        <span aria-hidden="true">{inspection.status === 'submitted' ? '✔ ' : '… '}</span>
        {t(`inspections.statuses.${inspection.status}`)}
      </Fact>
      <Fact term={t('inspections.detail.started')}>{dates.dateTime(inspection.startedAt)}</Fact>
      <Fact term={t('inspections.detail.submitted')}>
        {dates.dateTime(inspection.submittedAt) || t('inspections.detail.notYet')}
      </Fact>
      <Fact term={t('inspections.detail.duration')}>
        {formatSeconds(inspection.durationSeconds) || t('inspections.detail.unknown')}
      </Fact>
      <Fact term={t('inspections.detail.odometer')}>
        {inspection.odometer === null
          ? t('inspections.detail.unknown')
          : t('inspections.detail.odometerValue', { value: inspection.odometer.toLocaleString(locale) })}
      </Fact>
      {inspection.location ? <Fact term={t('inspections.detail.location')}>{inspection.location}</Fact> : null}
    </dl>
  );
}

// Why the review flagged this walk-around: said in words, with the figures behind it.
export function InspectionFlags({ inspection }: { inspection: InspectionResponse }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const { rushed, recurring } = inspection.flags;
  if (!rushed && recurring.length === 0) {
    return (
      <p className="font-bold" data-testid="no-flags">
        <span aria-hidden="true">✔ </span>
        {t('inspections.detail.noFlags')}
      </p>
    );
  }
  return (
    <ul className="flex flex-col gap-3" data-testid="inspection-flags">
      {rushed ? (
        <li className="rounded-lg border-4 border-accent p-3" data-testid="flag-rushed-detail">
          <p className="font-bold">
            <span aria-hidden="true">◷ </span>
            {t('inspections.detail.rushedTitle')}
          </p>
          <ul className="ml-5 list-disc">
            {rushed.reasons.map((reason) => (
              <li key={reason}>
                {reason === 'median_gap'
                  ? t('inspections.detail.rushedMedianGap', {
                      seconds: rushed.medianGapSeconds?.toFixed(1) ?? '?',
                      minimum: rushed.minimumMedianGapSeconds,
                    })
                  : t('inspections.detail.rushedTotal', {
                      seconds: rushed.secondsPerStop?.toFixed(1) ?? '?',
                      minimum: rushed.minimumSecondsPerStop,
                      count: rushed.answeredStopCount,
                      items: rushed.answeredCount,
                    })}
              </li>
            ))}
          </ul>
        </li>
      ) : null}
      {recurring.map((defect) => (
        <li
          key={`${defect.vehicleId}-${defect.itemKey}`}
          className="rounded-lg border-4 border-accent p-3"
          data-testid="flag-recurring-detail"
        >
          <p className="font-bold">
            <span aria-hidden="true">↻ </span>
            {t('inspections.detail.recurringTitle', { title: defect.title, position: defect.positionLabel })}
          </p>
          <p>
            {t('inspections.detail.recurringBefore', { count: defect.earlierCount })}{' '}
            <Link to={inspectionPath(defect.earlier.inspectionId)} data-testid="recurring-earlier-link">
              {t('inspections.detail.recurringEarlier', {
                date: dates.dateTime(defect.earlier.reportedAt),
              })}
            </Link>{' '}
            ({t(`inspections.earlierStates.${defect.earlier.state}`)})
          </p>
        </li>
      ))}
    </ul>
  );
}

export function inspectionTitle(inspection: InspectionResponse): string {
  return unitsLabel(inspection.vehicles);
}
