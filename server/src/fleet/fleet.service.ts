import { Injectable } from '@nestjs/common';
import {
  dayOfUse,
  type FleetBoard,
  type FleetBoardDefect,
  type FleetBoardInspection,
  type InspectionKind,
} from '@yardcall/shared';
import { DataSource } from 'typeorm';
import { Defect } from '../defects/entities/defect.entity';
import { Organization } from '../organizations/entities/organization.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';

interface LastInspectionRow {
  vehicle_id: string;
  id: string;
  kind: InspectionKind;
  submitted_at: Date;
  driver_id: string;
  driver_name: string;
}

interface TodayRow extends LastInspectionRow {
  started_at: Date;
}

const UNIT_ORDER = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

@Injectable()
export class FleetService {
  constructor(private readonly dataSource: DataSource) {}

  // Five queries whatever the fleet size: the organisation's zone and day, vehicles, open safety defects,
  // each vehicle's last report, and today's reports.
  async board(organizationId: string): Promise<FleetBoard> {
    const manager = this.dataSource.manager;
    const { timeZone } = await manager.findOneOrFail(Organization, {
      select: { id: true, timeZone: true },
      where: { id: organizationId },
    });
    const [vehicles, defects, last, todayRows, [clock]] = await Promise.all([
      manager.find(Vehicle, {
        select: { id: true, unitNumber: true, kind: true, status: true, statusSince: true, statusReason: true },
        where: { organizationId },
      }),
      manager.find(Defect, {
        select: { id: true, vehicleId: true, title: true, positionLabel: true, inspectionId: true, createdAt: true },
        where: { organizationId, status: 'open', safety: true },
        order: { createdAt: 'ASC', id: 'ASC' },
      }),
      manager.query<LastInspectionRow[]>(
        `SELECT DISTINCT ON (iv.vehicle_id) iv.vehicle_id, i.id, i.kind, i.submitted_at, i.driver_id, u.name AS driver_name
           FROM inspection_vehicles iv
           JOIN inspections i ON i.id = iv.inspection_id
           JOIN users u ON u.id = i.driver_id
          WHERE i.organization_id = $1 AND i.status = 'submitted' AND i.kind <> 'practice'
          ORDER BY iv.vehicle_id, i.submitted_at DESC, i.id DESC`,
        [organizationId],
      ),
      // Today starts at midnight in the organisation's zone; PostgreSQL works out the edge, daylight saving included.
      manager.query<TodayRow[]>(
        `SELECT iv.vehicle_id, i.id, i.kind, i.started_at, i.submitted_at, i.driver_id, u.name AS driver_name
           FROM inspection_vehicles iv
           JOIN inspections i ON i.id = iv.inspection_id
           JOIN users u ON u.id = i.driver_id
          WHERE i.organization_id = $1 AND i.status = 'submitted' AND i.kind <> 'practice'
            AND i.started_at >= date_trunc('day', now() AT TIME ZONE $2) AT TIME ZONE $2`,
        [organizationId, timeZone],
      ),
      manager.query<{ day: string }[]>(`SELECT to_char(now() AT TIME ZONE $1, 'YYYY-MM-DD') AS day`, [timeZone]),
    ]);
    const todayOf = new Map<string, TodayRow[]>();
    for (const row of todayRows) todayOf.set(row.vehicle_id, [...(todayOf.get(row.vehicle_id) ?? []), row]);
    const boardInspection = (row: LastInspectionRow): FleetBoardInspection => ({
      id: row.id,
      kind: row.kind,
      submittedAt: row.submitted_at.toISOString(),
      driver: { id: row.driver_id, name: row.driver_name },
    });
    const todayFor = (vehicleId: string) => {
      const day = dayOfUse(
        (todayOf.get(vehicleId) ?? []).map((row) => ({ ...row, startedAt: row.started_at.toISOString() })),
      );
      return {
        preTrip: day.preTrip ? boardInspection(day.preTrip) : null,
        usedWithoutPreTrip: day.usedWithoutPreTrip ? boardInspection(day.usedWithoutPreTrip) : null,
      };
    };
    const defectsOf = new Map<string, FleetBoardDefect[]>();
    for (const d of defects) {
      const list = defectsOf.get(d.vehicleId) ?? [];
      list.push({
        defectId: d.id,
        title: d.title,
        positionLabel: d.positionLabel,
        inspectionId: d.inspectionId,
        reportedAt: d.createdAt.toISOString(),
      });
      defectsOf.set(d.vehicleId, list);
    }
    const lastOf = new Map<string, FleetBoardInspection>(last.map((row) => [row.vehicle_id, boardInspection(row)]));
    const board = vehicles
      .map((v) => ({
        id: v.id,
        unitNumber: v.unitNumber,
        kind: v.kind,
        status: v.status,
        outOfServiceSince: v.status === 'out_of_service' ? v.statusSince.toISOString() : null,
        statusReason: v.status === 'out_of_service' ? v.statusReason : null,
        openSafetyDefects: defectsOf.get(v.id) ?? [],
        lastInspection: lastOf.get(v.id) ?? null,
        today: todayFor(v.id),
      }))
      .sort(
        (a, b) =>
          Number(b.status === 'out_of_service') - Number(a.status === 'out_of_service') ||
          UNIT_ORDER.compare(a.unitNumber, b.unitNumber),
      );
    const outOfServiceCount = board.filter((v) => v.status === 'out_of_service').length;
    return {
      vehicles: board,
      inServiceCount: board.length - outOfServiceCount,
      outOfServiceCount,
      generatedAt: new Date().toISOString(),
      day: clock?.day ?? '',
      timeZone,
    };
  }
}
