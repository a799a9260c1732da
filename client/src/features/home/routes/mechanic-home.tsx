import { useTranslation } from 'react-i18next';
import { EmptyState, Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

export function MechanicHome() {
  const { t } = useTranslation();
  return (
    <HomePage role="mechanic" title={t('mechanic.title')} lead={t('mechanic.lead')}>
      <Section title={t('mechanic.openDefects')} id="open-defects">
        <EmptyState title={t('mechanic.noDefects')}>{t('mechanic.noDefectsHint')}</EmptyState>
      </Section>
      <Section title={t('mechanic.recentRepairs')} id="recent-repairs">
        <EmptyState title={t('mechanic.noRepairs')} />
      </Section>
    </HomePage>
  );
}
