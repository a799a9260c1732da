import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { InspectionResponse } from '@yardcall/shared';

// Defects the driver corrected during the walk-around (the shared summary's list), apart from the
// defects sent to the shop.
export function FixedOnTheSpot({ inspection }: { inspection: Pick<InspectionResponse, 'summary'> }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const fixed = inspection.summary.fixedOnTheSpot;
  if (fixed.length === 0) return <p data-testid="no-fixes">{t('inspections.detail.noFixes')}</p>;
  return (
    <div className="flex flex-col gap-2">
      <p>{t('inspections.detail.fixesLead')}</p>
      <ul className="flex flex-col gap-2" data-testid="fixes">
        {fixed.map((fix) => (
          <li
            key={fix.itemKey}
            className="flex flex-col gap-1 rounded-lg border-2 border-line bg-surface p-3"
            data-testid="fix"
            data-item-key={fix.itemKey}
          >
            <p>
              <span className="font-bold">{fix.title}</span> <span className="text-muted">· {fix.positionLabel}</span>
            </p>
            {fix.detail ? (
              <p>
                <span className="font-bold">{t('inspections.items.detail')}</span> {fix.detail}
              </p>
            ) : null}
            {fix.measurement ? (
              <p>{t('inspections.detail.fixFound', { value: fix.measurement.value, unit: fix.measurement.unit })}</p>
            ) : null}
            <p className="font-bold">
              {t('inspections.items.fixedAction', { action: fix.action })}{' '}
              <span className="font-normal text-muted">{dates.dateTime(fix.fixedAt)}</span>
            </p>
            {fix.newMeasurement ? (
              <p>
                {t('inspections.items.newReading', { value: fix.newMeasurement.value, unit: fix.newMeasurement.unit })}
                {fix.newVerdict ? ` (${t(`inspections.verdicts.${fix.newVerdict}`)})` : ''}
              </p>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
