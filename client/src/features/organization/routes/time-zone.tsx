import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { PageHeading, Section } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { ensuringLoader } from '@/lib/route-loader';
import { timeZoneQueryOptions, useTimeZone } from '@/lib/api/organizations';
import { TimeZoneForm } from '../components/time-zone-form';

export function timeZoneLoader(queryClient: QueryClient) {
  return ensuringLoader(queryClient, timeZoneQueryOptions());
}

export function TimeZoneRoute() {
  const { t } = useTranslation();
  const timeZone = useTimeZone();
  return (
    <div data-testid="time-zone-screen">
      <PageHeading title={t('timeZone.title')} lead={t('timeZone.lead')} />
      <QueryState query={timeZone}>
        {(current) => (
          <Section title={t('timeZone.settingTitle')} id="time-zone-setting">
            <TimeZoneForm current={current} />
          </Section>
        )}
      </QueryState>
    </div>
  );
}
