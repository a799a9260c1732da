import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { ChecklistItem, DefectResponse, FieldProblem, InspectionSummary } from '@yardcall/shared';
import { DataSource, type EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { Inspection } from '../inspections/entities/inspection.entity';
import type { ItemResult } from '../inspections/entities/item-result.entity';
import { Signature } from '../inspections/entities/signature.entity';
import { mechanicStatement, signerColumns } from '../inspections/statements';
import { toDefectResponses } from './defect-view';
import type { ListDefectsQuery, RepairRequestDto } from './dto/defect.dto';
import { Defect } from './entities/defect.entity';
import { Repair } from './entities/repair.entity';
import { refreshVehicleStatus } from './vehicle-status';
import { JOB_SAFETY_DEFECT_REPORTED, type SafetyDefectReportedJob } from '../jobs/job-names';
import { JobsService } from '../jobs/jobs.service';

// A report being submitted: its checklist, its stored answers and the shared summary of them.
export interface SubmittedReport {
  inspection: Inspection;
  summary: InspectionSummary;
  byKey: ReadonlyMap<string, ChecklistItem>;
  results: readonly ItemResult[];
}

const LIST_MAX = 500;

// The shop's defects of a report, one per finding of its summary, on the unit its item belongs to (not
// saved): what a submit opens, and what the demo history stores.
export function defectsOfReport(manager: EntityManager, report: SubmittedReport): Defect[] {
  const { inspection, summary, byKey } = report;
  const rowByKey = new Map(report.results.map((r) => [r.itemKey, r]));
  return summary.defects.map((defect) => {
    const item = byKey.get(defect.itemKey) as ChecklistItem;
    const row = rowByKey.get(defect.itemKey);
    const vehicle = inspection.vehicles[item.unitIndex] ?? inspection.vehicles[0]!;
    return manager.create(Defect, {
      organizationId: inspection.organizationId,
      inspectionId: inspection.id,
      vehicleId: vehicle.id,
      itemKey: defect.itemKey,
      title: defect.title.slice(0, 200),
      positionLabel: defect.positionLabel.slice(0, 200),
      // A safety item, or any out-of-limit measurement: both keep the vehicle parked until certified.
      safety: defect.blocksDriving,
      detail: defect.detail ?? null,
      measurement: defect.measurement ?? null,
      measurementLimit:
        row && row.limitValue !== null && row.limitUnit !== null && row.limitSource !== null
          ? { value: row.limitValue, unit: row.limitUnit, source: row.limitSource }
          : null,
      status: 'open',
    });
  });
}

@Injectable()
export class DefectsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
  ) {}

  // One open defect per finding of a submitted report, inside the submit's transaction. A safety defect
  // takes its vehicle out of service, and the mechanics and supervisors hear of it exactly once (a job
  // committed with the report).
  async openFromReport(manager: EntityManager, report: SubmittedReport): Promise<Defect[]> {
    const { inspection } = report;
    const defects = defectsOfReport(manager, report);
    if (defects.length === 0) return defects;
    await manager.save(Defect, defects);
    const safety = defects.filter((d) => d.safety);
    await refreshVehicleStatus(
      manager,
      safety.map((d) => d.vehicleId),
    );
    if (safety.length > 0) {
      const job: SafetyDefectReportedJob = { organizationId: inspection.organizationId, inspectionId: inspection.id };
      await this.jobs.send(JOB_SAFETY_DEFECT_REPORTED, job, manager);
    }
    return defects;
  }

  async list(user: AuthUser, query: ListDefectsQuery): Promise<DefectResponse[]> {
    const builder = this.dataSource.manager
      .createQueryBuilder(Defect, 'defect')
      .where('defect.organization_id = :organizationId', { organizationId: user.organizationId });
    if (query.status) builder.andWhere('defect.status = :status', { status: query.status });
    if (query.vehicleId) builder.andWhere('defect.vehicle_id = :vehicleId', { vehicleId: query.vehicleId });
    const defects = await builder
      .orderBy('defect.safety', 'DESC')
      .addOrderBy('defect.created_at', 'DESC')
      .addOrderBy('defect.id', 'DESC')
      .limit(LIST_MAX)
      .getMany();
    return toDefectResponses(this.dataSource.manager, defects);
  }

  // The mechanic's certification (49 CFR 396.11(a)(3)): repaired, no repair needed, or, for a defect
  // that does not affect safe operation, deferred to a date.
  async repair(user: AuthUser, id: string, dto: RepairRequestDto): Promise<DefectResponse> {
    const note = dto.note.trim();
    const deferredUntil = dto.deferredUntil ? new Date(dto.deferredUntil) : null;
    const problems: FieldProblem[] = [];
    if (!note) {
      problems.push({
        field: 'note',
        message:
          dto.action === 'deferred' ? 'Say why the repair can wait.' : 'Say what was done, or why no repair is needed.',
      });
    }
    if (dto.action === 'deferred' && (!deferredUntil || deferredUntil.getTime() <= Date.now())) {
      problems.push({ field: 'deferredUntil', message: 'Give the date the repair is deferred until: a future date.' });
    }
    if (dto.action !== 'deferred' && deferredUntil) {
      problems.push({ field: 'deferredUntil', message: 'Only a deferral takes a date: remove deferredUntil.' });
    }
    if (problems.length > 0) throw new ApiValidationException(problems);

    return this.dataSource.transaction(async (manager) => {
      const defect = await manager.findOne(Defect, {
        where: { id, organizationId: user.organizationId },
        lock: { mode: 'pessimistic_write' },
      });
      if (!defect) throw new NotFoundException('No defect with this id in your organisation.');
      if (defect.status === 'repaired' || defect.status === 'no_repair_needed') {
        throw new ConflictException(
          `This defect is already certified (${defect.status.replace(/_/g, ' ')}): a certification is final.`,
        );
      }
      if (dto.action === 'deferred' && defect.safety) {
        throw new ApiValidationException([
          {
            field: 'action',
            message:
              'A defect that affects safe operation cannot be deferred: repair it, or certify that no repair is needed, before the vehicle is driven.',
          },
        ]);
      }
      const inspection = await manager.findOneOrFail(Inspection, {
        select: { id: true, locale: true, vehicles: true },
        where: { id: defect.inspectionId },
      });
      const unit = inspection.vehicles.find((v) => v.id === defect.vehicleId)?.unitNumber ?? '';
      const signedAt = new Date();
      await manager.insert(Repair, {
        defectId: defect.id,
        action: dto.action,
        note,
        deferredUntil: dto.action === 'deferred' ? deferredUntil : null,
        mechanicId: user.id,
        signedAt,
      });
      await manager.insert(Signature, {
        inspectionId: defect.inspectionId,
        defectId: defect.id,
        role: 'mechanic',
        ...signerColumns(user, dto.signature),
        statement: mechanicStatement(inspection.locale, {
          name: dto.signature.name,
          unit,
          defect: `${defect.title} (${defect.positionLabel})`,
          action: dto.action,
          deferredUntil,
        }),
        signedAt,
      });
      defect.status = dto.action;
      await manager.save(Defect, defect);
      await refreshVehicleStatus(manager, [defect.vehicleId]);
      const [response] = await toDefectResponses(manager, [defect]);
      return response as DefectResponse;
    });
  }
}
