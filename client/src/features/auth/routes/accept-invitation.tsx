import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router';
import { PageHeading } from '@/components/ui/layout';
import { AcceptInvitationForm } from '../components/accept-invitation-form';

export function AcceptInvitationRoute() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const { token = '' } = useParams();
  return (
    <>
      <PageHeading title={t('invite.title')} />
      <AcceptInvitationForm token={token} onAccepted={() => void navigate('/', { replace: true })} />
    </>
  );
}
