import { useTranslation } from 'react-i18next';
import { useNavigate, useSearchParams } from 'react-router';
import { PageHeading } from '@/components/ui/layout';
import { safeNextPath } from '@/lib/sign-in';
import { SignInForm } from '../components/sign-in-form';

export function SignInRoute() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  return (
    <>
      <PageHeading title={t('signIn.title')} lead={t('signIn.lead')} />
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </>
  );
}
