import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { attemptQueryOptions, useAttempt } from '@/lib/api/training';
import { AttemptFeedback } from '../components/attempt-feedback';
import { FEEDBACK_LIST_PATH } from '../paths';

export function feedbackAttemptLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    await queryClient.prefetchQuery(attemptQueryOptions(params.attemptId ?? ''));
    return null;
  };
}

export function FeedbackAttemptRoute() {
  const { t } = useTranslation();
  const { attemptId = '' } = useParams();
  const attempt = useAttempt(attemptId);
  return (
    <div data-testid="feedback-attempt-screen">
      <PageHeading
        title={t('training.feedback.attemptTitle')}
        actions={
          <LinkButton to={FEEDBACK_LIST_PATH} variant="secondary">
            {t('training.feedback.back')}
          </LinkButton>
        }
      />
      <QueryState query={attempt}>{(data) => <AttemptFeedback attempt={data} />}</QueryState>
    </div>
  );
}
