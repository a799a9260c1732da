import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { outboxQueryOptions, useOutbox } from '@/lib/api/mail';
import { OutboxList } from '../components/outbox-list';

export function outboxLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(outboxQueryOptions());
    return null;
  };
}

export function OutboxRoute() {
  const { t } = useTranslation();
  const outbox = useOutbox();
  return (
    <>
      <PageHeading
        title={t('outbox.title')}
        lead={t('outbox.lead')}
        actions={
          <Button variant="secondary" busy={outbox.isFetching} onClick={() => void outbox.refetch()}>
            {t('outbox.refresh')}
          </Button>
        }
      />
      {outbox.isPending ? <Loading label={t('common.loading')} /> : null}
      {outbox.isError ? <ErrorAlert>{describeError(outbox.error)}</ErrorAlert> : null}
      {outbox.data ? <OutboxList mails={outbox.data} /> : null}
    </>
  );
}
