import {
  RECURRING_RULE,
  findRecurringDefects,
  type Checklist,
  type CurrentDefect,
  type EarlierDefect,
  type InspectionSummary,
  type RecurringDefect,
} from '@yardcall/shared';
import type { EntityManager } from 'typeorm';
import type { Inspection } from './entities/inspection.entity';

interface EarlierRow {
  id: string;
  inspection_id: string;
  vehicle_id: string;
  item_key: string;
  status: EarlierDefect['state'];
  created_at: Date;
  certified_at: Date | null;
}

// The report's defects on the vehicle each item belongs to.
export function currentDefects(
  inspection: Inspection,
  checklist: Checklist,
  summary: InspectionSummary,
): CurrentDefect[] {
  const unitOf = new Map(checklist.items.map((item) => [item.key, item.unitIndex]));
  return summary.defects.flatMap((defect) => {
    const vehicle = inspection.vehicles[unitOf.get(defect.itemKey) ?? 0] ?? inspection.vehicles[0];
    return vehicle
      ? [{ vehicleId: vehicle.id, itemKey: defect.itemKey, title: defect.title, positionLabel: defect.positionLabel }]
      : [];
  });
}

// Defects of other reports on these vehicles from before this walk-around began. The SQL only narrows
// (still open or deferred, or touched within the window); the shared rule decides.
export async function earlierDefects(
  manager: EntityManager,
  inspection: Inspection,
  vehicleIds: readonly string[],
): Promise<EarlierDefect[]> {
  if (vehicleIds.length === 0) return [];
  const since = new Date(inspection.startedAt.getTime() - RECURRING_RULE.windowDays * 86_400_000);
  const rows = await manager.query<EarlierRow[]>(
    `SELECT d.id, d.inspection_id, d.vehicle_id, d.item_key, d.status, d.created_at,
            (SELECT max(r.signed_at) FROM repairs r WHERE r.defect_id = d.id) AS certified_at
       FROM defects d
      WHERE d.organization_id = $1 AND d.vehicle_id = ANY($2::uuid[]) AND d.inspection_id <> $3
        AND d.created_at < $4 AND (d.status IN ('open', 'deferred') OR d.updated_at >= $5)`,
    [inspection.organizationId, vehicleIds, inspection.id, inspection.startedAt, since],
  );
  return rows.map((row) => ({
    inspectionId: row.inspection_id,
    defectId: row.id,
    vehicleId: row.vehicle_id,
    itemKey: row.item_key,
    reportedAt: row.created_at.toISOString(),
    state: row.status,
    certifiedAt: row.certified_at?.toISOString() ?? null,
  }));
}

export async function recurringDefectsOf(
  manager: EntityManager,
  inspection: Inspection,
  checklist: Checklist,
  summary: InspectionSummary,
): Promise<RecurringDefect[]> {
  const current = currentDefects(inspection, checklist, summary);
  if (current.length === 0) return [];
  const earlier = await earlierDefects(manager, inspection, [...new Set(current.map((d) => d.vehicleId))]);
  return findRecurringDefects(current, earlier, inspection.startedAt.toISOString());
}
