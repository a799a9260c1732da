import type { DefectResponse, RepairResponse } from '@yardcall/shared';
import { In, type EntityManager } from 'typeorm';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import type { Defect } from './entities/defect.entity';
import { Repair } from './entities/repair.entity';

// The response of each defect with its vehicle and latest certification: three queries whatever the count.
export async function toDefectResponses(manager: EntityManager, defects: readonly Defect[]): Promise<DefectResponse[]> {
  if (defects.length === 0) return [];
  const vehicleIds = [...new Set(defects.map((d) => d.vehicleId))];
  const vehicles = new Map(
    (
      await manager.find(Vehicle, { select: { id: true, unitNumber: true, kind: true }, where: { id: In(vehicleIds) } })
    ).map((v) => [v.id, v]),
  );
  const repairs = await manager.find(Repair, {
    where: { defectId: In(defects.map((d) => d.id)) },
    order: { signedAt: 'ASC', id: 'ASC' },
  });
  const mechanicIds = [...new Set(repairs.map((r) => r.mechanicId))];
  const names = new Map(
    mechanicIds.length
      ? (await manager.find(User, { select: { id: true, name: true }, where: { id: In(mechanicIds) } })).map((u) => [
          u.id,
          u.name,
        ])
      : [],
  );
  const latest = new Map<string, RepairResponse>();
  for (const repair of repairs) {
    latest.set(repair.defectId, {
      action: repair.action,
      note: repair.note,
      deferredUntil: repair.deferredUntil?.toISOString() ?? null,
      mechanic: { id: repair.mechanicId, name: names.get(repair.mechanicId) ?? '' },
      signedAt: repair.signedAt.toISOString(),
    });
  }
  return defects.map((defect) => {
    const vehicle = vehicles.get(defect.vehicleId);
    return {
      id: defect.id,
      inspectionId: defect.inspectionId,
      vehicle: { id: defect.vehicleId, unitNumber: vehicle?.unitNumber ?? '', kind: vehicle?.kind ?? 'tractor' },
      itemKey: defect.itemKey,
      title: defect.title,
      positionLabel: defect.positionLabel,
      safety: defect.safety,
      detail: defect.detail,
      measurement: defect.measurement,
      limit: defect.measurementLimit,
      status: defect.status,
      createdAt: defect.createdAt.toISOString(),
      repair: latest.get(defect.id) ?? null,
    };
  });
}
