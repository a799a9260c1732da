import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import type { Role } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/layout';
import { useAppUpdate } from '@/lib/offline/app-update';

// A new version is offered here, between walk-arounds, and applied only when accepted.
function AppUpdateOffer() {
  const { t } = useTranslation();
  const update = useAppUpdate();
  if (!update.ready) return null;
  return (
    <div
      className="mb-6 flex flex-wrap items-center gap-tap-gap rounded-lg border-2 border-primary bg-surface p-3"
      role="status"
    >
      <p className="font-bold">{t('app.updateReady')}</p>
      <Button variant="secondary" onClick={update.apply} data-testid="apply-update">
        {t('app.updateNow')}
      </Button>
    </div>
  );
}

// Every home: an h1 naming it and a stable test id per role (`forRole`: `role` is ARIA's word).
export function HomePage({
  forRole,
  title,
  lead,
  children,
}: {
  forRole: Role;
  title: string;
  lead?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div data-testid={`home-${forRole}`}>
      <AppUpdateOffer />
      <PageHeading title={title} lead={lead} />
      {children}
    </div>
  );
}
