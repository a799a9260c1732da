import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { PageHeading, Section } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { ensuringLoader } from '@/lib/route-loader';
import { currentOrganizationQueryOptions, useCurrentOrganization } from '@/lib/api/organizations';
import { RequiredReadingsForm } from '../components/required-readings-form';

export function requiredReadingsLoader(queryClient: QueryClient) {
  return ensuringLoader(queryClient, currentOrganizationQueryOptions());
}

export function RequiredReadingsRoute() {
  const { t } = useTranslation();
  const organization = useCurrentOrganization();
  return (
    <div data-testid="readings-screen">
      <PageHeading title={t('readings.title')} lead={t('readings.lead')} />
      <Section title={t('readings.settingTitle')} id="readings-setting">
        <p className="mb-2">{t('readings.byDefault')}</p>
        <p className="mb-4">{t('readings.noGauge')}</p>
        <QueryState query={organization}>{(current) => <RequiredReadingsForm organization={current} />}</QueryState>
      </Section>
    </div>
  );
}
