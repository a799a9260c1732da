import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { DefectResponse, FieldProblem } from '@yardcall/shared';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { Inspection } from '../inspections/entities/inspection.entity';
import { Signature } from '../inspections/entities/signature.entity';
import { mechanicStatement } from '../inspections/statements';
import { toDefectResponses } from './defect-view';
import type { ListDefectsQuery, RepairRequestDto } from './dto/defect.dto';
import { Defect } from './entities/defect.entity';
import { Repair } from './entities/repair.entity';
import { refreshVehicleStatus } from './vehicle-status';

const LIST_MAX = 500;

@Injectable()
export class DefectsService {
  constructor(private readonly dataSource: DataSource) {}

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
        signerId: user.id,
        name: dto.signature.name,
        drawing: dto.signature.drawing ?? null,
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
