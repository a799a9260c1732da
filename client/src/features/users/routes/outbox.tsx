import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { Button } from '@/components/ui/button';
import { PageHeading } from '@/components/ui/layout';
import { QueryState } from '@/components/ui/query-state';
import { ensuringLoader } from '@/lib/route-loader';
import { outboxQueryOptions, useOutbox } from '@/lib/api/mail';
import { OutboxList } from '../components/outbox-list';

export function outboxLoader(queryClient: QueryClient) {
  return ensuringLoader(queryClient, outboxQueryOptions());
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
      <QueryState query={outbox}>{(mails) => <OutboxList mails={mails} />}</QueryState>
    </>
  );
}
