import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
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
      <QueryState query={attempt}>{(data) => <AttemptReview key={data.id} attempt={data} />}</QueryState>
    </div>
  );
}
