import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { attemptQueryOptions, useAttempt } from '@/lib/api/training';
import { AttemptReview } from '../components/attempt-review';

export function reviewAttemptLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    await queryClient.prefetchQuery(attemptQueryOptions(params.attemptId ?? ''));
    return null;
  };
}

// The trainer's review of one practice attempt.
export function ReviewAttemptRoute() {
  const { t } = useTranslation();
  const { attemptId = '' } = useParams();
  const attempt = useAttempt(attemptId);
  return (
    <div data-testid="review-attempt-screen">
      <PageHeading
        title={t('training.review.title')}
        actions={
          <LinkButton to="/trainer" variant="secondary">
            {t('training.review.back')}
          </LinkButton>
        }
      />
      {attempt.isPending ? (
        <Loading label={t('common.loading')} />
      ) : attempt.isError ? (
        <ErrorAlert>{describeError(attempt.error)}</ErrorAlert>
      ) : (
        <AttemptReview key={attempt.data.id} attempt={attempt.data} />
      )}
    </div>
  );
}
