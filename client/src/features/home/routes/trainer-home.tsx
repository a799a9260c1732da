import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { Section } from '@/components/ui/layout';
import { HomePage } from '../components/home-page';

// The trainer's home: what waits for review first, then the students and every recent attempt.
export function TrainerHome({
  students,
  waiting,
  recent,
}: {
  students: ReactNode;
  waiting?: ReactNode;
  recent?: ReactNode;
}) {
  const { t } = useTranslation();
  return (
    <HomePage forRole="trainer" title={t('trainer.title')} lead={t('trainer.lead')}>
      {waiting ? (
        <Section title={t('training.home.waiting')} id="attempts-waiting">
          {waiting}
        </Section>
      ) : null}
      <Section title={t('trainer.students')} id="students">
        {students}
      </Section>
      {recent ? (
        <Section title={t('training.home.recent')} id="attempts-recent">
          {recent}
        </Section>
      ) : null}
    </HomePage>
  );
}
