import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { PendingAcknowledgement, SignatureResponse } from '@yardcall/shared';
import { DataSource, type EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { toDefectResponses } from '../defects/defect-view';
import { Defect } from '../defects/entities/defect.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import type { AcknowledgeDto } from './dto/inspection.dto';
import { InspectionVehicle } from './entities/inspection-vehicle.entity';
import { Inspection } from './entities/inspection.entity';
import { Signature } from './entities/signature.entity';
import { toSignatureResponse } from './inspection-view';
import { reportSignature } from './statements';

// Before driving, the next driver reviews the last report and signs that its repairs were certified (49 CFR 396.13).
@Injectable()
export class AcknowledgementsService {
  constructor(private readonly dataSource: DataSource) {}

  // The vehicle's last submitted report, when a mechanic certified one of its defects after its last acknowledgement.
  async pendingInspectionFor(
    manager: EntityManager,
    organizationId: string,
    vehicleId: string,
  ): Promise<Inspection | null> {
    const last = await manager
      .createQueryBuilder(Inspection, 'inspection')
      .innerJoin(InspectionVehicle, 'iv', 'iv.inspection_id = inspection.id')
      .where('inspection.organization_id = :organizationId', { organizationId })
      .andWhere('iv.vehicle_id = :vehicleId', { vehicleId })
      .andWhere("inspection.status = 'submitted'")
      .orderBy('inspection.submitted_at', 'DESC')
      .addOrderBy('inspection.id', 'DESC')
      .limit(1)
      .getOne();
    if (!last || last.defectCount === 0) return null;
    return (await this.awaitsAcknowledgement(manager, last.id)) ? last : null;
  }

  async awaitsAcknowledgement(manager: EntityManager, inspectionId: string): Promise<boolean> {
    const [row] = await manager.query<{ certified: Date | null; acknowledged: Date | null }[]>(
      `SELECT (SELECT max(r.signed_at) FROM repairs r JOIN defects d ON d.id = r.defect_id WHERE d.inspection_id = $1) AS certified,
              (SELECT max(s.signed_at) FROM signatures s WHERE s.inspection_id = $1 AND s.role = 'next_driver') AS acknowledged`,
      [inspectionId],
    );
    if (!row?.certified) return false;
    return !row.acknowledged || row.acknowledged.getTime() < row.certified.getTime();
  }

  async pending(user: AuthUser, vehicleId: string): Promise<PendingAcknowledgement | null> {
    const manager = this.dataSource.manager;
    const vehicle = await manager.findOne(Vehicle, {
      select: { id: true, unitNumber: true, kind: true },
      where: { id: vehicleId, organizationId: user.organizationId },
    });
    if (!vehicle) throw new NotFoundException('No vehicle with this id in your organisation.');
    const inspection = await this.pendingInspectionFor(manager, user.organizationId, vehicleId);
    if (!inspection) return null;
    const [driver, defects] = await Promise.all([
      manager.findOne(User, { select: { id: true, name: true }, where: { id: inspection.driverId } }),
      manager.find(Defect, { where: { inspectionId: inspection.id }, order: { createdAt: 'ASC', id: 'ASC' } }),
    ]);
    return {
      inspectionId: inspection.id,
      vehicle: { id: vehicle.id, unitNumber: vehicle.unitNumber, kind: vehicle.kind },
      submittedAt: (inspection.submittedAt ?? inspection.startedAt).toISOString(),
      driver: { id: inspection.driverId, name: driver?.name ?? '' },
      defects: await toDefectResponses(manager, defects),
    };
  }

  async acknowledge(user: AuthUser, inspectionId: string, dto: AcknowledgeDto): Promise<SignatureResponse> {
    return this.dataSource.transaction(async (manager) => {
      const inspection = await manager.findOne(Inspection, {
        where: { id: inspectionId, organizationId: user.organizationId },
        lock: { mode: 'pessimistic_write' },
      });
      const awaits =
        inspection !== null &&
        inspection.status === 'submitted' &&
        (await this.awaitsAcknowledgement(manager, inspection.id));
      if (!inspection || (!awaits && inspection.driverId !== user.id)) {
        // Another driver's report is visible only while it waits for the next driver's review.
        throw new NotFoundException('No inspection with this id in your organisation.');
      }
      if (!awaits) {
        throw new ConflictException(
          'Nothing on this report waits for an acknowledgement: the next driver signs once a mechanic has certified its defects.',
        );
      }
      const signedAt = new Date();
      const signature = await manager.save(
        manager.create(
          Signature,
          reportSignature(inspection, user, dto.signature, {
            role: 'next_driver',
            date: inspection.submittedAt ?? inspection.startedAt,
            signedAt,
          }),
        ),
      );
      const signer = await manager.findOne(User, { select: { id: true, name: true }, where: { id: user.id } });
      return toSignatureResponse(signature, signer?.name ?? '');
    });
  }
}
