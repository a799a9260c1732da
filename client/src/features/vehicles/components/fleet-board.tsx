import { useTranslation } from 'react-i18next';
import { Link } from 'react-router';
import type { FleetBoardVehicle } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/link-button';
import { describeError } from '@/lib/errors';
import { useFleetBoard } from '../api/get-fleet-board';
import { StatusBadge } from './status-badge';

// Where a supervisor reads one inspection (the inspections feature's screen).
const inspectionPath = (id: string) => `/supervisor/inspections/${encodeURIComponent(id)}`;

function byUrgency(a: FleetBoardVehicle, b: FleetBoardVehicle): number {
  return (
    Number(b.status === 'out_of_service') - Number(a.status === 'out_of_service') ||
    a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true })
  );
}

function BoardUnit({ vehicle }: { vehicle: FleetBoardVehicle }) {
  const { t, i18n } = useTranslation();
  const locale = i18n.language;
  const out = vehicle.status === 'out_of_service';
  const headingId = `board-unit-${vehicle.id}`;
  const last = vehicle.lastInspection;
  return (
    <li>
      <article
        aria-labelledby={headingId}
        className={`flex h-full flex-col gap-3 rounded-xl bg-surface p-4 ${out ? 'border-4 border-danger' : 'border-2 border-line'}`}
        data-testid="board-unit"
        data-unit={vehicle.unitNumber}
        data-status={vehicle.status}
      >
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 id={headingId} className="text-xl font-bold">
            {t('board.unit', { unit: vehicle.unitNumber })}{' '}
            <span className="font-normal text-muted">· {t(`vehicles.kinds.${vehicle.kind}`)}</span>
          </h3>
          <StatusBadge status={vehicle.status} />
        </div>
        {out ? (
          <>
            {vehicle.outOfServiceSince ? (
              <p className="font-bold">
                {t('board.since', { date: new Date(vehicle.outOfServiceSince).toLocaleString(locale) })}
              </p>
            ) : null}
            <div>
              <p className="font-bold">{t('board.why')}</p>
              {vehicle.openSafetyDefects.length === 0 ? (
                <p data-testid="board-reason">{vehicle.statusReason ?? t('board.noReason')}</p>
              ) : (
                <ul className="ml-5 list-disc" data-testid="board-defects">
                  {vehicle.openSafetyDefects.map((defect) => (
                    <li key={defect.defectId}>
                      <span aria-hidden="true">⚠ </span>
                      <span className="font-bold">{defect.title}</span>, {defect.positionLabel} (
                      <Link to={inspectionPath(defect.inspectionId)}>
                        {t('board.reportedAt', { date: new Date(defect.reportedAt).toLocaleDateString(locale) })}
                      </Link>
                      )
                    </li>
                  ))}
                </ul>
              )}
            </div>
          </>
        ) : (
          <p>{t('board.noOpenSafetyDefects')}</p>
        )}
        <div className="mt-auto border-t-2 border-line pt-2">
          {last ? (
            <p>
              {t('board.lastInspection')}{' '}
              <Link to={inspectionPath(last.id)} data-testid="board-last-inspection">
                {t('board.lastInspectionLink', {
                  kind: t(`inspections.kinds.${last.kind}`),
                  date: new Date(last.submittedAt).toLocaleString(locale),
                })}
              </Link>{' '}
              {t('board.by', { name: last.driver.name })}
            </p>
          ) : (
            <p className="text-muted">{t('board.neverInspected')}</p>
          )}
        </div>
      </article>
    </li>
  );
}

// Every unit, out of service first: what may be dispatched, what may not and why.
export function FleetBoard() {
  const { t, i18n } = useTranslation();
  const board = useFleetBoard();
  if (board.isPending) return <Loading label={t('common.loading')} />;
  if (board.isError) return <ErrorAlert>{describeError(board.error)}</ErrorAlert>;
  const vehicles = [...board.data.vehicles].sort(byUrgency);
  return (
    <div className="flex flex-col gap-4" data-testid="fleet-board">
      <p className="text-lg" role="status">
        {t('board.summary', {
          count: vehicles.length,
          inService: board.data.inServiceCount,
          out: board.data.outOfServiceCount,
        })}{' '}
        <span className="text-muted">
          {t('board.asOf', { time: new Date(board.data.generatedAt).toLocaleTimeString(i18n.language) })}
        </span>
      </p>
      <ul className="grid gap-4 md:grid-cols-2" aria-label={t('board.listLabel')}>
        {vehicles.map((vehicle) => (
          <BoardUnit key={vehicle.id} vehicle={vehicle} />
        ))}
      </ul>
      <div className="flex flex-wrap gap-tap-gap">
        <LinkButton to="/supervisor/inspections" variant="primary">
          {t('board.allInspections')}
        </LinkButton>
        <LinkButton to="/vehicles" variant="secondary">
          {t('fleet.allVehicles')}
        </LinkButton>
      </div>
    </div>
  );
}
