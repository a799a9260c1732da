import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

export function SupervisorHome({ board }: { board: ReactNode }) {
  const { t } = useTranslation();
  return (
    <HomePage forRole="supervisor" title={t('supervisor.title')} lead={t('supervisor.lead')}>
      <Section title={t('supervisor.vehicles')} id="fleet-status">
        {board}
      </Section>
    </HomePage>
  );
}
