import { useTranslation } from 'react-i18next';
import { dateFormats, type DateFormats } from '@/lib/format-date';
import { Link } from 'react-router';
import type { FleetBoard as FleetBoardData, FleetBoardVehicle } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Panel } from '@/components/ui/layout';
import { LinkButton } from '@/components/ui/link-button';
import { describeError } from '@/lib/errors';
import { useFleetBoard } from '@/lib/api/fleet';
import { StatusBadge } from './status-badge';

// Where a supervisor reads one inspection (the inspections feature's screen).
const inspectionPath = (id: string) => `/supervisor/inspections/${encodeURIComponent(id)}`;

function byUrgency(a: FleetBoardVehicle, b: FleetBoardVehicle): number {
  return (
    Number(b.status === 'out_of_service') - Number(a.status === 'out_of_service') ||
    a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true })
  );
}

function TodayLine({ vehicle, format }: { vehicle: FleetBoardVehicle; format: DateFormats }) {
  const { t } = useTranslation();
  const { preTrip, usedWithoutPreTrip } = vehicle.today;
  if (usedWithoutPreTrip) {
    return (
      <p className="font-bold text-danger" data-testid="board-today" data-today="used-without-pre-trip">
        <span aria-hidden="true">⚠ </span>
        <Link to={inspectionPath(usedWithoutPreTrip.id)}>
          {t('board.todayUsed', {
            kind: t(`inspections.kinds.${usedWithoutPreTrip.kind}`),
            time: format.time(usedWithoutPreTrip.submittedAt),
          })}
        </Link>{' '}
        {t('board.by', { name: usedWithoutPreTrip.driver.name })}
      </p>
    );
  }
  if (preTrip) {
    return (
      <p data-testid="board-today" data-today="pre-trip">
        <span aria-hidden="true">✓ </span>
        <Link to={inspectionPath(preTrip.id)}>
          {t('board.todayPreTrip', { time: format.time(preTrip.submittedAt) })}
        </Link>{' '}
        {t('board.by', { name: preTrip.driver.name })}
      </p>
    );
  }
  return (
    <p className="text-muted" data-testid="board-today" data-today="none">
      {t('board.todayNone')}
    </p>
  );
}

// The supervisor's day at a glance: pre-trips done, units used without one, units out of service.
function TodaySummary({ board, format }: { board: FleetBoardData; format: DateFormats }) {
  const { t } = useTranslation();
  const preTrip = board.vehicles.filter((v) => v.today.preTrip !== null).length;
  const used = board.vehicles.filter((v) => v.today.usedWithoutPreTrip !== null).length;
  // Noon of the board's day, so the date reads the same in any zone.
  const day = format.calendarDate(board.day);
  return (
    <Panel title={t('board.todayTitle', { day })} level={3} data-testid="board-today-summary">
      <p className="text-lg">
        {t('board.todaySummary', {
          preTrip,
          count: board.vehicles.length,
          used,
          out: board.outOfServiceCount,
        })}
      </p>
      <p className="text-sm text-muted">{t('board.usedMeans')}</p>
      <p className="text-sm text-muted">{t('board.todayZone', { zone: board.timeZone })}</p>
    </Panel>
  );
}

function BoardUnit({ vehicle, format }: { vehicle: FleetBoardVehicle; format: DateFormats }) {
  const { t } = useTranslation();
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
              <p className="font-bold">{t('board.since', { date: format.dateTime(vehicle.outOfServiceSince) })}</p>
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
                        {t('board.reportedAt', { date: format.date(defect.reportedAt) })}
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
        <TodayLine vehicle={vehicle} format={format} />
        <div className="mt-auto border-t-2 border-line pt-2">
          {last ? (
            <p>
              {t('board.lastInspection')}{' '}
              <Link to={inspectionPath(last.id)} data-testid="board-last-inspection">
                {t('board.lastInspectionLink', {
                  kind: t(`inspections.kinds.${last.kind}`),
                  date: format.dateTime(last.submittedAt),
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
  // Times read in the organisation's zone, as the board's "today" is.
  const format = dateFormats(i18n.language, board.data.timeZone);
  return (
    <div className="flex flex-col gap-4" data-testid="fleet-board">
      <TodaySummary board={board.data} format={format} />
      <p className="text-lg" role="status">
        {t('board.summary', {
          count: vehicles.length,
          inService: board.data.inServiceCount,
          out: board.data.outOfServiceCount,
        })}{' '}
        <span className="text-muted">{t('board.asOf', { time: format.time(board.data.generatedAt) })}</span>
      </p>
      <ul className="grid gap-4 md:grid-cols-2" aria-label={t('board.listLabel')}>
        {vehicles.map((vehicle) => (
          <BoardUnit key={vehicle.id} vehicle={vehicle} format={format} />
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
