import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { usePhoneDates } from '@/lib/format-date';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Card, EmptyState, Section } from '@/components/ui/layout';
import { LinkButton } from '@/components/ui/link-button';
import { describeError } from '@/lib/errors';
import { describeCopyAge } from '@/lib/offline';
import { useRecentReports } from '@/lib/api/inspections';
import { HomePage } from '../components/home-page';

export const START_INSPECTION_PATH = '/driver/start';

function RecentReports() {
  const { t, i18n } = useTranslation();
  const dates = usePhoneDates();
  const reports = useRecentReports();
  if (reports.isPending) return <Loading label={t('common.loading')} />;
  if (reports.isError) return <ErrorAlert>{describeError(reports.error)}</ErrorAlert>;
  const { data: items, savedAt, fromPhone } = reports.data;
  return (
    <>
      {fromPhone ? (
        <p className="mb-3 text-muted" role="status">
          {t('driver.reportsKept', { age: describeCopyAge(savedAt, i18n.language) })}
        </p>
      ) : null}
      {items.length === 0 ? (
        <EmptyState title={t('driver.noInspections')}>{t('driver.noInspectionsHint')}</EmptyState>
      ) : (
        <ul className="flex flex-col gap-tap-gap" data-testid="recent-reports">
          {items.map((report) => (
            <li key={report.id}>
              <Card>
                <p className="text-xl font-bold">
                  {t('driver.units', { units: report.vehicles.map((v) => v.unitNumber).join(', ') })}
                </p>
                <p>
                  {t(`driver.reportStatus.${report.status}`)} · {dates.dateTime(report.submittedAt ?? report.startedAt)}{' '}
                  · {t('driver.defects', { count: report.defectCount })}
                </p>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

// The driver's home: start, then what the phone holds (given by the app: walk-arounds to resume,
// reports waiting, anything needing attention), then the latest reports the server has.
export function DriverHome({ onThisPhone }: { onThisPhone?: ReactNode }) {
  const { t } = useTranslation();
  return (
    <HomePage forRole="driver" title={t('driver.title')} lead={t('driver.lead')}>
      <div className="mb-8">
        <LinkButton to={START_INSPECTION_PATH} size="large" data-testid="start-inspection">
          {t('driver.start')}
        </LinkButton>
      </div>
      {onThisPhone}
      <Section title={t('driver.recent')} id="recent-inspections">
        <RecentReports />
      </Section>
    </HomePage>
  );
}
