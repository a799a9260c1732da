import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { PageHeading, Section } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { ensuringLoader } from '@/lib/route-loader';
import { retentionQueryOptions, useRetention } from '@/lib/api/organizations';
import { PurgeRecords } from '../components/purge-dialog';
import { RetentionForm } from '../components/retention-form';

export function retentionLoader(queryClient: QueryClient) {
  return ensuringLoader(queryClient, retentionQueryOptions());
}

export function RetentionRoute() {
  const { t } = useTranslation();
  const retention = useRetention();
  return (
    <div data-testid="retention-screen">
      <PageHeading title={t('retention.title')} lead={t('retention.lead')} />
      <QueryState query={retention}>
        {(settings) => (
          <>
            <Section title={t('retention.settingTitle')} id="retention-setting">
              <RetentionForm settings={settings} />
            </Section>
            <Section title={t('retention.purgeTitle')} id="retention-purge">
              <PurgeRecords settings={settings} />
            </Section>
          </>
        )}
      </QueryState>
    </div>
  );
}
