import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { attemptsQueryOptions, progressQueryOptions, useProgress } from '@/lib/api/training';
import { AttemptList } from '../components/attempt-list';
import { ProgressChart } from '../components/progress-chart';
import { feedbackPath, PRACTICE_PATH } from '../paths';

export function feedbackLoader(queryClient: QueryClient) {
  return async () => {
    await Promise.all([
      queryClient.ensureQueryData(attemptsQueryOptions()),
      queryClient.ensureQueryData(progressQueryOptions()),
    ]);
    return null;
  };
}

// The student's attempts with their trainer's feedback, and how the share named changed over time.
export function FeedbackRoute() {
  const { t } = useTranslation();
  const progress = useProgress();
  return (
    <div data-testid="feedback-screen">
      <PageHeading
        title={t('training.feedback.title')}
        lead={t('training.feedback.lead')}
        actions={<LinkButton to={PRACTICE_PATH}>{t('training.feedback.practise')}</LinkButton>}
      />
      <Section title={t('training.progress.title')} id="feedback-progress">
        {progress.isPending ? (
          <Loading label={t('common.loading')} />
        ) : progress.isError ? (
          <ErrorAlert>{describeError(progress.error)}</ErrorAlert>
        ) : (
          <ProgressChart progress={progress.data} />
        )}
      </Section>
      <Section title={t('training.feedback.attempts')} id="feedback-attempts">
        <AttemptList
          filters={{}}
          pathFor={feedbackPath}
          showStudent={false}
          emptyTitle={t('training.feedback.none')}
          testId="feedback-attempt-list"
        />
      </Section>
    </div>
  );
}
