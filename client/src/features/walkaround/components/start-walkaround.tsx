import { lazy, Suspense, useState, type ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router';
import { useQueryClient } from '@tanstack/react-query';
import { isPowerUnit, type InspectionKind, type PendingAcknowledgement, type VehicleResponse } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageHeading, Section } from '@/components/ui/layout';
import { RadioGroup } from '@/components/ui/radio-group';
import { ApiError, NETWORK_ERROR_STATUS } from '@/lib/api-client';
import { describeError } from '@/lib/errors';
import { isLocale } from '@/lib/i18n';
import { describeCopyAge } from '@/lib/offline';
import { useCreateLocalInspection } from '../api/create-local-inspection';
import { pendingAcknowledgementQueryOptions } from '@/lib/api/vehicles';
import { useStartData } from '../api/get-start-data';
import { runPath } from '../walkaround-paths';

// Loaded only when a review is waiting: its signature pad and form stay off the start's first load.
const PendingAcknowledgementReview = lazy(async () => ({
  default: (await import('./pending-acknowledgement-review')).PendingAcknowledgementReview,
}));

export const START_KINDS = ['pre_trip', 'post_trip', 'en_route'] as const satisfies readonly InspectionKind[];

export interface StartWalkaroundProps {
  // The unit list (recent first, search); calls back with the tapped unit.
  renderPicker: (onPick: (vehicle: VehicleResponse) => void) => ReactNode;
  // Every unit the driver may pick, for the trailer step.
  vehicles: readonly VehicleResponse[];
}

// Two taps: the power unit, then a trailer or "no trailer". The kind defaults to pre-trip.
export function StartWalkaround({ renderPicker, vehicles }: StartWalkaroundProps) {
  const { t, i18n } = useTranslation();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [kind, setKind] = useState<InspectionKind>('pre_trip');
  const [powerUnit, setPowerUnit] = useState<VehicleResponse | null>(null);
  const [pending, setPending] = useState<{ list: PendingAcknowledgement[]; chosen: VehicleResponse[] } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [checking, setChecking] = useState(false);
  // With no signal, reviews the phone's copy says are waiting: shown before the start, signed later.
  const [waitingReviews, setWaitingReviews] = useState<{
    list: PendingAcknowledgement[];
    chosen: VehicleResponse[];
  } | null>(null);
  const create = useCreateLocalInspection();
  const startData = useStartData();
  const trailers = vehicles.filter((v) => v.kind === 'trailer');

  const begin = async (chosen: VehicleResponse[]) => {
    const locale = isLocale(i18n.language) ? i18n.language : 'en';
    const requiredReadings = startData.data?.data.requiredReadings ?? [];
    const inspection = await create.mutateAsync({ vehicles: chosen, kind, locale, requiredReadings });
    await navigate(runPath(inspection.clientId));
  };

  const keptReviewsFor = (chosen: VehicleResponse[]): PendingAcknowledgement[] =>
    chosen.flatMap((v) => {
      const pending = startData.data?.data.pendingAcknowledgements[v.id];
      return pending ? [pending] : [];
    });

  // The last report of each unit may wait for this driver's review (pre-trip only, 396.13).
  const checkThenBegin = async (chosen: VehicleResponse[]) => {
    setProblem(null);
    if (kind !== 'pre_trip') return begin(chosen);
    setChecking(true);
    try {
      const found = await Promise.all(
        chosen.map((v) => queryClient.fetchQuery(pendingAcknowledgementQueryOptions(v.id))),
      );
      const list = found.filter((p): p is PendingAcknowledgement => p !== null);
      if (list.length > 0) {
        setPending({ list, chosen });
        return;
      }
    } catch (error) {
      if (!(error instanceof ApiError && error.status === NETWORK_ERROR_STATUS)) {
        setProblem(describeError(error));
        return;
      }
      // No signal: the phone's copy says whether a review waits. The driver is told, may start,
      // and signs the review when the phone has a signal (the server asks for it when the walk-around syncs).
      const kept = keptReviewsFor(chosen);
      if (kept.length > 0) {
        setWaitingReviews({ list: kept, chosen });
        return;
      }
    } finally {
      setChecking(false);
    }
    return begin(chosen);
  };

  const run = (chosen: VehicleResponse[]) => {
    checkThenBegin(chosen).catch((error: unknown) => setProblem(describeError(error)));
  };

  const pickPowerUnit = (vehicle: VehicleResponse) => {
    if (!isPowerUnit(vehicle.kind)) {
      setProblem(t('walkaround.start.powerFirst'));
      return;
    }
    setProblem(null);
    // Only a tractor pulls a trailer in this version; a truck or bus starts at once.
    if (vehicle.kind === 'tractor') setPowerUnit(vehicle);
    else run([vehicle]);
  };

  const firstPending = pending?.list[0];
  const kept = startData.data?.fromPhone ? startData.data : null;

  return (
    <div data-testid="start-inspection-screen">
      <PageHeading title={t('start.title')} lead={t('walkaround.start.lead')} />
      {problem ? (
        <div className="mb-4">
          <ErrorAlert>{problem}</ErrorAlert>
        </div>
      ) : null}
      {create.isError ? (
        <div className="mb-4">
          <ErrorAlert>{describeError(create.error)}</ErrorAlert>
        </div>
      ) : null}
      {kept ? (
        <p className="mb-4 rounded-lg border-2 border-line bg-surface p-3" role="status" data-testid="kept-copy">
          {t('walkaround.start.keptCopy', { age: describeCopyAge(kept.savedAt, i18n.language) })}
        </p>
      ) : null}
      {checking || create.isPending ? <Loading label={t('walkaround.start.preparing')} /> : null}

      {waitingReviews ? (
        <Section title={t('walkaround.start.reviewWaitsTitle')} id="start-review-waits">
          <ul className="mb-4 flex flex-col gap-2" data-testid="review-waits">
            {waitingReviews.list.map((review) => (
              <li key={review.inspectionId}>
                {t('walkaround.start.reviewWaits', {
                  unit: review.vehicle.unitNumber,
                  count: review.defects.length,
                })}
              </li>
            ))}
          </ul>
          <div className="flex flex-wrap gap-tap-gap">
            <Button
              size="large"
              onClick={() => {
                const { chosen } = waitingReviews;
                setWaitingReviews(null);
                begin(chosen).catch((error: unknown) => setProblem(describeError(error)));
              }}
            >
              {t('walkaround.start.startAnyway')}
            </Button>
            <Button
              variant="quiet"
              onClick={() => {
                setWaitingReviews(null);
                setPowerUnit(null);
              }}
            >
              {t('walkaround.start.otherUnit')}
            </Button>
          </div>
        </Section>
      ) : pending && firstPending ? (
        <Suspense fallback={<Loading label={t('common.loading')} />}>
          <PendingAcknowledgementReview
            key={firstPending.inspectionId}
            pending={firstPending}
            onCancel={() => {
              setPending(null);
              setPowerUnit(null);
            }}
            onSigned={() => {
              const rest = pending.list.slice(1);
              if (rest.length > 0) setPending({ ...pending, list: rest });
              else {
                setPending(null);
                run(pending.chosen);
              }
            }}
          />
        </Suspense>
      ) : powerUnit ? (
        <Section title={t('walkaround.start.trailerTitle', { unit: powerUnit.unitNumber })} id="start-trailers">
          <ul className="flex flex-col gap-tap-gap" aria-label={t('walkaround.start.trailers')}>
            <li>
              <Button size="large" variant="secondary" onClick={() => run([powerUnit])} data-testid="no-trailer">
                {t('walkaround.start.noTrailer')}
              </Button>
            </li>
            {trailers.map((trailer) => (
              <li key={trailer.id}>
                <Button size="large" variant="secondary" onClick={() => run([powerUnit, trailer])}>
                  {t('vehicles.list.unit', { unit: trailer.unitNumber })}
                </Button>
              </li>
            ))}
          </ul>
          <div className="mt-4">
            <Button variant="quiet" onClick={() => setPowerUnit(null)}>
              {t('walkaround.start.otherUnit')}
            </Button>
          </div>
        </Section>
      ) : (
        <>
          <RadioGroup
            legend={t('walkaround.start.kind')}
            name="inspection-kind"
            choices={START_KINDS}
            labelOf={(k) => t(`walkaround.kinds.${k}`)}
            value={kind}
            onChange={setKind}
            className="mb-6"
          />
          <Section title={t('walkaround.start.powerUnit')} id="start-vehicles">
            {renderPicker(pickPowerUnit)}
          </Section>
        </>
      )}
    </div>
  );
}
