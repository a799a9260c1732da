import { useState, type ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import type { DefectResponse, InspectionVehicle } from '@yardcall/shared';
import { ErrorAlert, Loading, Notice } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useDefects } from '@/lib/api/defects';
import { DefectCard } from './defect-card';

interface VehicleGroup {
  vehicle: InspectionVehicle;
  defects: DefectResponse[];
}

// The server's order (safety first, newest first) is kept inside each unit; a unit with a safety
// defect comes before one without.
export function groupByVehicle(defects: readonly DefectResponse[]): VehicleGroup[] {
  const groups = new Map<string, VehicleGroup>();
  for (const defect of defects) {
    const group = groups.get(defect.vehicle.id) ?? { vehicle: defect.vehicle, defects: [] };
    group.defects.push(defect);
    groups.set(defect.vehicle.id, group);
  }
  const safetyFirst = (group: VehicleGroup) => (group.defects.some((d) => d.safety) ? 0 : 1);
  return [...groups.values()].sort((a, b) => safetyFirst(a) - safetyFirst(b));
}

export interface OpenDefectsProps {
  // The unit's current status (in or out of service), from the vehicles the app knows.
  renderVehicleStatus: (vehicleId: string) => ReactNode;
  // After a certification, so the app can refresh what else depends on it (the units' status).
  onCertified?: (defect: DefectResponse) => Promise<void> | void;
}

export function OpenDefects({ renderVehicleStatus, onCertified }: OpenDefectsProps) {
  const { t } = useTranslation();
  const defects = useDefects({ status: 'open' });
  const [editing, setEditing] = useState<string | null>(null);
  const [certified, setCertified] = useState<DefectResponse | null>(null);

  const done = (defect: DefectResponse) => {
    setEditing(null);
    setCertified(defect);
    void onCertified?.(defect);
  };

  const confirmation = certified ? (
    <div className="mb-4" data-testid="certified-notice">
      <Notice>
        <p className="font-bold">
          {t('mechanic.certified', {
            title: certified.title,
            position: certified.positionLabel,
            unit: certified.vehicle.unitNumber,
            action: t(`mechanic.actions.${certified.status === 'open' ? 'repaired' : certified.status}`),
          })}
        </p>
        <p className="mt-2 flex flex-wrap items-center gap-2">
          {t('mechanic.unitNow', { unit: certified.vehicle.unitNumber })} {renderVehicleStatus(certified.vehicle.id)}
        </p>
      </Notice>
    </div>
  ) : null;

  if (defects.isPending) return <Loading label={t('common.loading')} />;
  if (defects.isError) return <ErrorAlert>{describeError(defects.error)}</ErrorAlert>;
  const groups = groupByVehicle(defects.data);

  return (
    <div>
      {confirmation}
      {groups.length === 0 ? (
        <EmptyState title={t('mechanic.noDefects')}>{t('mechanic.noDefectsHint')}</EmptyState>
      ) : (
        <ul className="flex flex-col gap-6" aria-label={t('mechanic.byUnit')}>
          {groups.map((group) => (
            <li key={group.vehicle.id} data-testid="defect-unit" data-unit={group.vehicle.unitNumber}>
              <section aria-labelledby={`unit-${group.vehicle.id}-heading`}>
                <div className="mb-3 flex flex-wrap items-center gap-3">
                  <h3 id={`unit-${group.vehicle.id}-heading`} className="text-2xl font-bold">
                    {t('mechanic.unit', { unit: group.vehicle.unitNumber })}
                  </h3>
                  {renderVehicleStatus(group.vehicle.id)}
                  <span className="text-muted">{t('mechanic.openCount', { count: group.defects.length })}</span>
                </div>
                <ul className="flex flex-col gap-tap-gap">
                  {group.defects.map((defect) => (
                    <li key={defect.id}>
                      <DefectCard
                        defect={defect}
                        editing={editing === defect.id}
                        onEdit={() => {
                          setCertified(null);
                          setEditing(defect.id);
                        }}
                        onClose={() => setEditing(null)}
                        onCertified={done}
                      />
                    </li>
                  ))}
                </ul>
              </section>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
