import { useTranslation } from 'react-i18next';
import { Navigate, useNavigate, useParams } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useLocalInspection } from '../api/get-local-inspection';
import { GloveScreen } from '../components/glove-screen';
import { finishPath } from '../walkaround-paths';

export function RunInspectionRoute() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const clientId = useParams().clientId ?? '';
  const local = useLocalInspection(clientId);
  if (local.isPending) return <Loading label={t('common.loading')} />;
  if (local.isError) return <ErrorAlert>{describeError(local.error)}</ErrorAlert>;
  if (!local.data) {
    return (
      <EmptyState title={t('walkaround.run.notHere')}>
        <LinkButton to="/driver/start">{t('start.title')}</LinkButton>
      </EmptyState>
    );
  }
  // Signed on this phone: the walk-around is read-only; its report waits on the finish screen.
  if (local.data.inspection.signed) return <Navigate to={finishPath(clientId)} replace />;
  return (
    <GloveScreen
      // A fresh screen per walk-around: its voice loop and store keys belong to one inspection.
      key={clientId}
      walkaround={local.data}
      onFinished={() => void navigate(finishPath(clientId))}
    />
  );
}
