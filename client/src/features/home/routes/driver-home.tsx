import { useTranslation } from 'react-i18next';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

export const START_INSPECTION_PATH = '/driver/start';

export function DriverHome() {
  const { t } = useTranslation();
  return (
    <HomePage role="driver" title={t('driver.title')} lead={t('driver.lead')}>
      <div className="mb-8">
        <LinkButton to={START_INSPECTION_PATH} size="large" data-testid="start-inspection">
          {t('driver.start')}
        </LinkButton>
      </div>
      <Section title={t('driver.recent')} id="recent-inspections">
        <EmptyState title={t('driver.noInspections')}>{t('driver.noInspectionsHint')}</EmptyState>
      </Section>
    </HomePage>
  );
}
