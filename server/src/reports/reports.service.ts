import { Injectable } from '@nestjs/common';
import type { InspectionResponse } from '@yardcall/shared';
import { DataSource, In } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { Signature } from '../inspections/entities/signature.entity';
import { Organization } from '../organizations/entities/organization.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { renderInspectionReport, type InspectionReport } from './inspection-report';

export interface RenderedReport {
  pdf: Buffer;
  filename: string;
}

@Injectable()
export class ReportsService {
  // Three reads beside the inspection, once per report: through the data source, no repositories.
  constructor(private readonly dataSource: DataSource) {}

  // The report of an inspection the caller may read (the inspections module found it, 404 otherwise).
  async build(user: AuthUser, inspection: InspectionResponse, now = new Date()): Promise<InspectionReport> {
    const inspectionId = inspection.id;
    const vehicleIds = inspection.vehicles.map((v) => v.id);
    const { manager } = this.dataSource;
    const [organization, vehicleRows, drawings] = await Promise.all([
      manager.findOneByOrFail(Organization, { id: user.organizationId }),
      manager.findBy(Vehicle, { id: In(vehicleIds), organizationId: user.organizationId }),
      manager.find(Signature, { select: { id: true, drawing: true }, where: { inspectionId } }),
    ]);
    const byId = new Map(vehicleRows.map((v) => [v.id, v]));
    const drawingOf = new Map(drawings.map((s) => [s.id, s.drawing]));
    return {
      organizationName: organization.name,
      inspection,
      // VIN and plate as the vehicle stands now: the inspection keeps only unit, kind and configuration.
      vehicles: inspection.vehicles.map((v) => ({
        unitNumber: v.unitNumber,
        kind: v.kind,
        vin: byId.get(v.id)?.vin ?? '—',
        plate: byId.get(v.id)?.plate ?? '—',
      })),
      signatures: inspection.signatures.map((s) => ({
        role: s.role,
        name: s.name,
        signerName: s.signer.name,
        statement: s.statement,
        signedAt: s.signedAt,
        drawing: drawingOf.get(s.id) ?? null,
      })),
      generatedAt: now.toISOString(),
      timeZone: organization.timeZone,
    };
  }

  async render(user: AuthUser, inspection: InspectionResponse): Promise<RenderedReport> {
    const report = await this.build(user, inspection);
    const units = report.vehicles.map((v) => v.unitNumber).join('-');
    const day = report.inspection.startedAt.slice(0, 10);
    const filename = `yardcall-${report.inspection.kind}-${units}-${day}.pdf`.replace(/[^A-Za-z0-9._-]/g, '_');
    return { pdf: await renderInspectionReport(report), filename };
  }
}
