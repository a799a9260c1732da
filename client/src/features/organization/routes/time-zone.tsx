import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { PageHeading, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { timeZoneQueryOptions, useTimeZone } from '@/lib/api/organizations';
import { TimeZoneForm } from '../components/time-zone-form';

export function timeZoneLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(timeZoneQueryOptions());
    return null;
  };
}

export function TimeZoneRoute() {
  const { t } = useTranslation();
  const timeZone = useTimeZone();
  return (
    <div data-testid="time-zone-screen">
      <PageHeading title={t('timeZone.title')} lead={t('timeZone.lead')} />
      {timeZone.isPending ? <Loading label={t('common.loading')} /> : null}
      {timeZone.isError ? <ErrorAlert>{describeError(timeZone.error)}</ErrorAlert> : null}
      {timeZone.data ? (
        <Section title={t('timeZone.settingTitle')} id="time-zone-setting">
          <TimeZoneForm current={timeZone.data} />
        </Section>
      ) : null}
    </div>
  );
}
