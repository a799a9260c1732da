import { In, type EntityManager } from 'typeorm';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { Defect } from './entities/defect.entity';

const REASON_MAX = 500;

export function shortenReason(reason: string): string {
  return reason.length > REASON_MAX ? `${reason.slice(0, REASON_MAX - 1)}…` : reason;
}

// Why a unit is out of service, as the fleet board shows it: a hold put by hand first, then its defects.
export function holdReason(manualHoldReason: string | null, openSafetyDefects: readonly Defect[]): string | null {
  const defects =
    openSafetyDefects.length > 0
      ? `Open safety defect${openSafetyDefects.length > 1 ? 's' : ''}: ${openSafetyDefects
          .map((d) => `${d.title} (${d.positionLabel})`)
          .join('; ')}`
      : null;
  const parts = [manualHoldReason, defects].filter((part): part is string => Boolean(part));
  return parts.length > 0 ? shortenReason(parts.join('. ')) : null;
}

// A vehicle with an open safety defect is out of service until each one is repaired or certified as
// not needing repair (49 CFR 396.11(a)(3)); when none is left it returns to service, unless a
// supervisor or admin also holds it by hand. Runs inside the caller's transaction and locks the
// vehicles it changes.
export async function refreshVehicleStatus(manager: EntityManager, vehicleIds: readonly string[]): Promise<void> {
  const ids = [...new Set(vehicleIds)];
  if (ids.length === 0) return;
  const vehicles = await manager.find(Vehicle, {
    where: { id: In(ids) },
    order: { id: 'ASC' },
    lock: { mode: 'pessimistic_write' },
  });
  const open = await manager.find(Defect, {
    select: { id: true, vehicleId: true, title: true, positionLabel: true },
    where: { vehicleId: In(ids), status: 'open', safety: true },
    order: { createdAt: 'ASC', id: 'ASC' },
  });
  const now = new Date();
  for (const vehicle of vehicles) {
    const reason = holdReason(
      vehicle.manualHoldReason,
      open.filter((d) => d.vehicleId === vehicle.id),
    );
    if (reason) {
      const wasInService = vehicle.status !== 'out_of_service';
      vehicle.status = 'out_of_service';
      vehicle.statusReason = reason;
      if (wasInService) vehicle.statusSince = now;
      await manager.save(Vehicle, vehicle);
    } else if (vehicle.status === 'out_of_service') {
      vehicle.status = 'in_service';
      vehicle.statusReason = null;
      vehicle.statusSince = now;
      await manager.save(Vehicle, vehicle);
    }
  }
}
