import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useParams } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { localInspectionQueryOptions } from '../api/get-local-inspection';
import { useInspection } from '@/lib/api/inspections';
import { FinishReview } from '../components/finish-review';
import { ReportView } from '../components/report-view';
import { runPath } from '../walkaround-paths';

export function FinishInspectionRoute() {
  const { t } = useTranslation();
  const clientId = useParams().clientId ?? '';
  // Read again on arrival: the run screen has written answers since the first read.
  const local = useQuery({ ...localInspectionQueryOptions(clientId), refetchOnMount: 'always' });
  const server = useInspection(local.data?.inspection.serverId);
  if (local.isPending) return <Loading label={t('common.loading')} />;
  if (local.isError) return <ErrorAlert>{describeError(local.error)}</ErrorAlert>;
  if (!local.data) return <EmptyState title={t('walkaround.run.notHere')} />;
  if (server.data?.status === 'submitted') return <ReportView inspection={server.data} />;
  return <FinishReview walkaround={local.data} runPath={runPath(clientId)} />;
}
