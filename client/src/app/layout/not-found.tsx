import { useTranslation } from 'react-i18next';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeading } from '@/components/ui/layout';

export function NotFound() {
  const { t } = useTranslation();
  return (
    <>
      <PageHeading title={t('errors.notFoundTitle')} lead={t('errors.notFound')} />
      <LinkButton to="/" variant="secondary">
        {t('errors.home')}
      </LinkButton>
    </>
  );
}
