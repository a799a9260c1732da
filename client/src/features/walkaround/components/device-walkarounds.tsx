import { useEffect } from 'react';
import { useTranslation } from 'react-i18next';
import { useQueryClient } from '@tanstack/react-query';
import { ErrorAlert, Loading, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, Section } from '@/components/ui/layout';
import { LinkButton } from '@/components/ui/link-button';
import { describeError } from '@/lib/errors';
import { describeCopyAge, useSyncStatus, type RefusedEntry } from '@/lib/offline';
import { useDeviceWalkarounds, type DeviceWalkaround } from '../api/get-device-walkarounds';
import { useRefusalActions } from '../api/retry-refused';
import { walkaroundKeys } from '../api/walkaround-keys';
import { finishPath, runPath } from '../walkaround-paths';

const START_PATH = '/driver/start';

function unitsOf(walkaround: DeviceWalkaround): string {
  return walkaround.inspection.vehicles.map((v) => v.unitNumber).join(', ');
}

function Refusals({ walkaround }: { walkaround: DeviceWalkaround }) {
  const { t } = useTranslation();
  const { retry, leaveOut } = useRefusalActions();
  const first: RefusedEntry | undefined = walkaround.refused[0];
  if (!first) return null;
  const { clientId } = walkaround.inspection;
  return (
    <Card>
      <p className="text-xl font-bold">{t('driver.refusedTitle', { units: unitsOf(walkaround) })}</p>
      <ul className="my-2 flex flex-col gap-1">
        {walkaround.refused.map((entry) => (
          <li key={`${entry.kind}:${entry.clientId}`} data-testid="refusal">
            {t(`driver.refusedKind.${entry.kind}`)}: {entry.refusal.message}
          </li>
        ))}
      </ul>
      <div className="flex flex-wrap gap-tap-gap">
        <Button onClick={() => retry.mutate(clientId)} busy={retry.isPending}>
          {t('driver.tryAgain')}
        </Button>
        {/* A create or a report cannot be left out: without it nothing of the walk-around arrives. */}
        {walkaround.refused.some((e) => e.kind === 'result' || e.kind === 'note' || e.kind === 'photo') ? (
          <Button
            variant="secondary"
            onClick={() => {
              for (const entry of walkaround.refused) {
                if (entry.kind !== 'inspection' && entry.kind !== 'submit') leaveOut.mutate(entry);
              }
            }}
          >
            {t('driver.leaveOut')}
          </Button>
        ) : null}
        {first.kind === 'inspection' && first.refusal.status === 409 ? (
          <LinkButton to={START_PATH} variant="quiet">
            {t('driver.reviewOnStart')}
          </LinkButton>
        ) : null}
      </div>
      {retry.isError ? <ErrorAlert>{describeError(retry.error)}</ErrorAlert> : null}
    </Card>
  );
}

// The phone's side of the driver home: what needs the driver, walk-arounds to resume, and signed
// reports waiting for a signal. Read from this device only, so it shows with no signal.
export function DeviceWalkarounds() {
  const { t, i18n } = useTranslation();
  const queryClient = useQueryClient();
  const device = useDeviceWalkarounds();
  const status = useSyncStatus();
  useEffect(() => {
    // An acknowledgement or a refusal changes what waits: read the phone's lists again.
    void queryClient.invalidateQueries({ queryKey: walkaroundKeys.localLists() });
  }, [status.lastSyncedAt, status.waiting, queryClient]);

  if (device.isPending) return <Loading label={t('common.loading')} />;
  if (device.isError) return <ErrorAlert>{describeError(device.error)}</ErrorAlert>;
  const { unfinished, signedWaiting, refused, pendingAcknowledgements, outOfService, storage } = device.data;
  const needsAttention =
    refused.length > 0 || pendingAcknowledgements.length > 0 || outOfService.length > 0 || storage?.short === true;
  const age = (iso: string) => describeCopyAge(iso, i18n.language);

  return (
    <>
      {needsAttention ? (
        <Section title={t('driver.attention')} id="driver-attention">
          <ul className="flex flex-col gap-tap-gap">
            {storage?.short ? (
              <li>
                <Notice>
                  {t('driver.storageShort', {
                    freeMb: Math.max(0, Math.floor((storage.quotaBytes - storage.usageBytes) / 1_048_576)),
                  })}
                </Notice>
              </li>
            ) : null}
            {refused.map((walkaround) => (
              <li key={walkaround.inspection.clientId}>
                <Refusals walkaround={walkaround} />
              </li>
            ))}
            {pendingAcknowledgements.map(({ vehicle, pending }) => (
              <li key={vehicle.id}>
                <Card>
                  <p className="font-bold">
                    {t('driver.reviewWaits', { unit: vehicle.unitNumber, count: pending.defects.length })}
                  </p>
                  <LinkButton to={START_PATH} variant="quiet">
                    {t('driver.reviewOnStart')}
                  </LinkButton>
                </Card>
              </li>
            ))}
            {outOfService.map((vehicle) => (
              <li key={vehicle.id}>
                <Card>
                  <p className="font-bold">{t('driver.outOfService', { unit: vehicle.unitNumber })}</p>
                  {vehicle.statusReason ? <p>{vehicle.statusReason}</p> : null}
                </Card>
              </li>
            ))}
          </ul>
          {device.data.keptAt ? (
            <p className="mt-2 text-muted">{t('driver.keptAt', { age: age(device.data.keptAt) })}</p>
          ) : null}
        </Section>
      ) : null}

      {unfinished.length > 0 ? (
        <Section title={t('driver.unfinished')} id="driver-unfinished">
          <ul className="flex flex-col gap-tap-gap">
            {unfinished.map((walkaround) => (
              <li key={walkaround.inspection.clientId}>
                <Card>
                  <p className="text-xl font-bold">{t('driver.units', { units: unitsOf(walkaround) })}</p>
                  <p>
                    {t('driver.progress', {
                      answered: walkaround.answered,
                      items: walkaround.items,
                      age: age(walkaround.inspection.updatedAt),
                    })}
                  </p>
                  <div className="mt-2">
                    <LinkButton to={runPath(walkaround.inspection.clientId)} data-testid="resume-walkaround">
                      {t('driver.resume')}
                    </LinkButton>
                  </div>
                </Card>
              </li>
            ))}
          </ul>
        </Section>
      ) : null}

      {signedWaiting.length > 0 ? (
        <Section title={t('driver.signedWaiting')} id="driver-signed-waiting">
          <p className="mb-3">{status.syncing ? t('driver.sending') : t('driver.sentWhenSignal')}</p>
          <ul className="flex flex-col gap-tap-gap">
            {signedWaiting.map((walkaround) => (
              <li key={walkaround.inspection.clientId}>
                <Card>
                  <p className="text-xl font-bold">{t('driver.units', { units: unitsOf(walkaround) })}</p>
                  <p>
                    {t('driver.signedAt', {
                      age: age(walkaround.inspection.signed?.signedAt ?? walkaround.inspection.updatedAt),
                    })}
                  </p>
                  <LinkButton to={finishPath(walkaround.inspection.clientId)} variant="quiet">
                    {t('driver.open')}
                  </LinkButton>
                </Card>
              </li>
            ))}
          </ul>
        </Section>
      ) : null}
    </>
  );
}
