import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { describeError } from '@/lib/errors';
import { ErrorAlert, Loading } from './alert';

export interface QueryStateProps<Data> {
  // A query's result, as TanStack Query hands it over.
  query: { isPending: boolean; isError: boolean; error: unknown; data: Data | undefined };
  children: (data: Data) => ReactNode;
}

// What a screen shows where its data goes: loading, then the error in words and whatever data is kept
// (a failed refetch leaves the last data on screen).
export function QueryState<Data>({ query, children }: QueryStateProps<Data>) {
  const { t } = useTranslation();
  if (query.isPending) return <Loading label={t('common.loading')} />;
  return (
    <>
      {query.isError ? <ErrorAlert>{describeError(query.error)}</ErrorAlert> : null}
      {query.data === undefined ? null : children(query.data)}
    </>
  );
}
