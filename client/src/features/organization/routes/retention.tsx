import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { PageHeading, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { retentionQueryOptions, useRetention } from '@/lib/api/organizations';
import { PurgeRecords } from '../components/purge-dialog';
import { RetentionForm } from '../components/retention-form';

export function retentionLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(retentionQueryOptions());
    return null;
  };
}

export function RetentionRoute() {
  const { t } = useTranslation();
  const retention = useRetention();
  return (
    <div data-testid="retention-screen">
      <PageHeading title={t('retention.title')} lead={t('retention.lead')} />
      {retention.isPending ? <Loading label={t('common.loading')} /> : null}
      {retention.isError ? <ErrorAlert>{describeError(retention.error)}</ErrorAlert> : null}
      {retention.data ? (
        <>
          <Section title={t('retention.settingTitle')} id="retention-setting">
            <RetentionForm settings={retention.data} />
          </Section>
          <Section title={t('retention.purgeTitle')} id="retention-purge">
            <PurgeRecords settings={retention.data} />
          </Section>
        </>
      ) : null}
    </div>
  );
}
