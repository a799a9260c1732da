import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { DefectResponse } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Card, EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useDefects } from '@/lib/api/defects';

const SHOWN = 20;

// Certified defects, the latest certification first.
export function certifiedNewestFirst(defects: readonly DefectResponse[]): DefectResponse[] {
  return defects
    .filter((defect) => defect.status !== 'open' && defect.repair !== null)
    .sort((a, b) => (b.repair?.signedAt ?? '').localeCompare(a.repair?.signedAt ?? ''));
}

export function RecentRepairs() {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  const defects = useDefects();
  if (defects.isPending) return <Loading label={t('common.loading')} />;
  if (defects.isError) return <ErrorAlert>{describeError(defects.error)}</ErrorAlert>;
  const certified = certifiedNewestFirst(defects.data).slice(0, SHOWN);
  if (certified.length === 0) return <EmptyState title={t('mechanic.noRepairs')} />;
  return (
    <ul className="flex flex-col gap-tap-gap">
      {certified.map((defect) => (
        <li key={defect.id} data-testid="recent-repair">
          <Card>
            <p className="text-lg font-bold">
              {t('mechanic.unit', { unit: defect.vehicle.unitNumber })}: {defect.title} — {defect.positionLabel}
            </p>
            {defect.repair ? (
              <>
                <p>
                  {t('mechanic.repairLine', {
                    action: t(`mechanic.actions.${defect.repair.action}`),
                    mechanic: defect.repair.mechanic.name,
                    date: dates.dateTime(defect.repair.signedAt),
                  })}
                </p>
                <p>“{defect.repair.note}”</p>
                {defect.repair.deferredUntil ? (
                  <p>
                    {t('mechanic.deferredUntil', {
                      date: dates.calendarDate(defect.repair.deferredUntil),
                    })}
                  </p>
                ) : null}
              </>
            ) : null}
          </Card>
        </li>
      ))}
    </ul>
  );
}
