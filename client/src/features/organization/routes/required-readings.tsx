import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { PageHeading, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { currentOrganizationQueryOptions, useCurrentOrganization } from '@/lib/api/organizations';
import { RequiredReadingsForm } from '../components/required-readings-form';

export function requiredReadingsLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(currentOrganizationQueryOptions());
    return null;
  };
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
        {organization.isPending ? <Loading label={t('common.loading')} /> : null}
        {organization.isError ? <ErrorAlert>{describeError(organization.error)}</ErrorAlert> : null}
        {organization.data ? <RequiredReadingsForm organization={organization.data} /> : null}
      </Section>
    </div>
  );
}
