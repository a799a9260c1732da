import { useTranslation } from 'react-i18next';
import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { ApiError } from '@/lib/api-client';
import { describeError } from '@/lib/errors';

export function RouteLoading() {
  const { t } = useTranslation();
  return <Loading label={t('common.loading')} />;
}

// What a screen shows when its data or code could not be loaded.
export function RouteError() {
  const { t } = useTranslation();
  const error = useRouteError();
  const notFound =
    (isRouteErrorResponse(error) && error.status === 404) || (error instanceof ApiError && error.status === 404);
  return (
    <div data-testid="route-error">
      <h1 className="mb-4 text-3xl font-bold">{notFound ? t('errors.notFoundTitle') : t('errors.title')}</h1>
      <ErrorAlert>{notFound ? t('errors.notFound') : describeError(error)}</ErrorAlert>
      <div className="mt-4">
        <LinkButton to="/" variant="secondary">
          {t('errors.home')}
        </LinkButton>
      </div>
    </div>
  );
}

// When even the shell failed: the error alone, still inside a main landmark.
export function RootError() {
  return (
    <main id="main" className="mx-auto max-w-3xl px-3 py-6">
      <RouteError />
    </main>
  );
}
