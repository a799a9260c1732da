import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

// The shop's home; the app fills it with the defects feature's lists.
export function MechanicHome({ openDefects, recentRepairs }: { openDefects: ReactNode; recentRepairs: ReactNode }) {
  const { t } = useTranslation();
  return (
    <HomePage forRole="mechanic" title={t('mechanic.title')} lead={t('mechanic.lead')}>
      <Section title={t('mechanic.openDefects')} id="open-defects">
        {openDefects}
      </Section>
      <Section title={t('mechanic.recentRepairs')} id="recent-repairs">
        {recentRepairs}
      </Section>
    </HomePage>
  );
}
