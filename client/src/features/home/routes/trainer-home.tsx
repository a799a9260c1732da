import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

export function TrainerHome({ students }: { students: ReactNode }) {
  const { t } = useTranslation();
  return (
    <HomePage role="trainer" title={t('trainer.title')} lead={t('trainer.lead')}>
      <Section title={t('trainer.students')} id="students">
        {students}
      </Section>
    </HomePage>
  );
}
