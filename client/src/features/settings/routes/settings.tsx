import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { Loading } from '@/components/ui/alert';
import { PageHeading } from '@/components/ui/layout';
import { readCachedDisplaySettings } from '@/lib/display-settings';
import { meQueryOptions } from '@/lib/api/auth';
import { hasSession } from '@/lib/sign-in';
import { SettingsForm } from '../components/settings-form';

// Reachable signed in or not: the sign-in screen at night needs it too.
export function SettingsRoute() {
  const { t } = useTranslation();
  const signedIn = hasSession();
  const me = useQuery({ ...meQueryOptions(), enabled: signedIn });
  return (
    <>
      <PageHeading title={t('settings.title')} lead={t('settings.lead')} />
      {signedIn && me.isPending ? (
        <Loading label={t('common.loading')} />
      ) : (
        <SettingsForm
          initial={me.data?.settings ?? readCachedDisplaySettings()}
          saveToAccount={signedIn && me.isSuccess}
        />
      )}
    </>
  );
}
