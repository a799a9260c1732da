import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading, Notice } from '@/components/ui/alert';
import { PageHeading } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { isLocale } from '@/lib/i18n';
import { useCurrentUser } from '@/lib/api/auth';
import { useVehicles, vehiclesQueryOptions } from '@/lib/api/vehicles';
import { PracticeSession } from '../components/practice-session';

export function practiceLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(vehiclesQueryOptions());
    return null;
  };
}

// The student's narration mode: pick a unit, start, talk through the walk-around, stop.
export function PracticeRoute() {
  const { t, i18n } = useTranslation();
  const user = useCurrentUser();
  // The units a student may practise on: the organisation's.
  const units = useVehicles();
  const locale = isLocale(i18n.language) ? i18n.language : 'en';
  return (
    <div data-testid="practice-screen">
      <PageHeading title={t('training.practice.title')} lead={t('training.practice.lead')} />
      {!user.isStudent ? (
        <Notice>{t('training.practice.notStudent')}</Notice>
      ) : units.isPending ? (
        <Loading label={t('common.loading')} />
      ) : units.isError ? (
        <ErrorAlert>{describeError(units.error)}</ErrorAlert>
      ) : (
        <PracticeSession units={units.data} locale={locale} />
      )}
    </div>
  );
}
