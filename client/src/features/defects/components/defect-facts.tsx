import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import { formatMeasure, type DefectResponse } from '@yardcall/shared';
import { isLocale } from '@/lib/i18n';

// What the driver reported: their words, and a measurement beside its published limit and source.
export function DefectFacts({ defect }: { defect: DefectResponse }) {
  const { t, i18n } = useTranslation();
  const locale = isLocale(i18n.language) ? i18n.language : 'en';
  const dates = useOfficeDates();
  return (
    <dl className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[max-content_1fr]">
      <dt className="font-bold">{t('mechanic.defect.words')}</dt>
      <dd data-testid="defect-words">{defect.detail ? `“${defect.detail}”` : t('mechanic.defect.noWords')}</dd>
      {defect.measurement ? (
        <>
          <dt className="font-bold">{t('mechanic.defect.measured')}</dt>
          <dd data-testid="defect-measurement">
            {formatMeasure(defect.measurement.value, defect.measurement.unit, locale)}
          </dd>
        </>
      ) : null}
      {defect.limit ? (
        <>
          <dt className="font-bold">{t('mechanic.defect.limit')}</dt>
          <dd data-testid="defect-limit">
            {t('mechanic.defect.limitValue', {
              value: formatMeasure(defect.limit.value, defect.limit.unit, locale),
              source: defect.limit.source,
            })}
          </dd>
        </>
      ) : null}
      <dt className="font-bold">{t('mechanic.defect.reported')}</dt>
      <dd>{dates.dateTime(defect.createdAt)}</dd>
    </dl>
  );
}
