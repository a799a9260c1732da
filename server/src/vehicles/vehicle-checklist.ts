import { NotFoundException } from '@nestjs/common';
import {
  ChecklistError,
  buildChecklist,
  type Checklist,
  type ChecklistItem,
  type InspectionKind,
  type Locale,
  type VehicleConfig,
  type VehicleKind,
} from '@yardcall/shared';
import { In, type Repository } from 'typeorm';
import { ApiValidationException } from '../common/api-validation.exception';
import { BoundedCache } from '../common/bounded-cache';
import type { Vehicle } from './entities/vehicle.entity';

// The vehicles as they were configured when a walk-around (or a practice attempt) began: its checklist
// is rebuilt from this, so editing a vehicle later never changes its items.
export interface VehicleSnapshot {
  id: string;
  unitNumber: string;
  kind: VehicleKind;
  config: VehicleConfig;
}

// The chosen vehicles of the caller's organisation, in the order given (power unit first); 404 naming
// the first id that is not there.
export async function snapshotVehicles(
  vehicles: Repository<Vehicle>,
  organizationId: string,
  vehicleIds: readonly string[],
): Promise<VehicleSnapshot[]> {
  const found = await vehicles.findBy({ id: In([...vehicleIds]), organizationId });
  const byId = new Map(found.map((v) => [v.id, v]));
  const missing = vehicleIds.find((id) => !byId.has(id));
  if (missing) throw new NotFoundException(`No vehicle with id ${missing} in your organisation.`);
  return vehicleIds.map((id) => {
    const vehicle = byId.get(id) as Vehicle;
    return { id: vehicle.id, unitNumber: vehicle.unitNumber, kind: vehicle.kind, config: vehicle.config };
  });
}

// A new checklist for the chosen vehicles; a combination the checklist engine refuses is the
// caller's mistake in vehicleIds (400), not the server's.
export function checklistOfSnapshot(
  snapshot: readonly VehicleSnapshot[],
  kind: InspectionKind,
  locale: Locale,
): Checklist {
  try {
    return buildChecklist(snapshot, kind, locale);
  } catch (error) {
    if (error instanceof ChecklistError) {
      throw new ApiValidationException([{ field: 'vehicleIds', message: error.message }]);
    }
    throw error;
  }
}

export interface BuiltChecklist {
  checklist: Checklist;
  byKey: ReadonlyMap<string, ChecklistItem>;
}

// What a checklist is rebuilt from: a stored snapshot, which never changes.
export interface ChecklistSource {
  id: string;
  vehicles: readonly VehicleSnapshot[];
  kind: InspectionKind;
  locale: Locale;
}

// Checklists rebuilt from stored snapshots, the recent ones kept (the snapshot never changes).
export class ChecklistCache {
  private readonly built: BoundedCache<string, BuiltChecklist>;

  constructor(max: number) {
    this.built = new BoundedCache(max);
  }

  get(id: string): BuiltChecklist | undefined {
    return this.built.get(id);
  }

  of(source: ChecklistSource): BuiltChecklist {
    return this.get(source.id) ?? this.remember(source.id, buildChecklist(source.vehicles, source.kind, source.locale));
  }

  remember(id: string, checklist: Checklist): BuiltChecklist {
    return this.built.set(id, { checklist, byKey: new Map(checklist.items.map((item) => [item.key, item])) });
  }
}
