import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  DEFAULT_DISPLAY_SETTINGS,
  rushedFlag,
  summarizeInspection,
  walkedRoute,
  type InspectionResponse,
} from '@yardcall/shared';
import { DataSource, Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import { DefectsService } from '../defects/defects.service';
import { toDefectResponses } from '../defects/defect-view';
import { Defect } from '../defects/entities/defect.entity';
import { NotesService, type AttachmentTarget } from '../notes/notes.service';
import { Organization } from '../organizations/entities/organization.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { checklistOfSnapshot, snapshotVehicles, type BuiltChecklist } from '../vehicles/vehicle-checklist';
import { AcknowledgementsService } from './acknowledgements.service';
import type { CreateInspectionDto, SubmitInspectionDto } from './dto/inspection.dto';
import { InspectionVehicle } from './entities/inspection-vehicle.entity';
import { Inspection } from './entities/inspection.entity';
import { ItemResult } from './entities/item-result.entity';
import { Signature } from './entities/signature.entity';
import { assertEditable, findReadableInspection, INSPECTION_NOT_FOUND } from './inspection-access';
import { InspectionChecklists } from './inspection-checklists';
import { toListItem, toResultResponse, toSharedResult, toSignatureResponse } from './inspection-view';
import { recurringDefectsOf } from './review';
import { reportSignature } from './statements';

// A signature cannot come before the walk-around began (the future is the DTO's to refuse).
function signedTimeOf(dto: SubmitInspectionDto, startedAt: Date, now: Date): Date {
  if (dto.signedAt === undefined) return now;
  const signedAt = new Date(dto.signedAt);
  if (signedAt.getTime() < startedAt.getTime()) {
    throw new ApiValidationException([
      { field: 'signedAt', message: "signedAt is before the walk-around began: check the phone's date and time." },
    ]);
  }
  return signedAt;
}

const CLIENT_ID_INDEX = 'UQ_inspections_driver_client';

// A walk-around's life: started, read whole, signed and submitted. Answers are InspectionResultsService's,
// the list InspectionListService's, the defects a report opens DefectsService's.
@Injectable()
export class InspectionsService {
  constructor(
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    @InjectRepository(Vehicle) private readonly vehicles: Repository<Vehicle>,
    private readonly dataSource: DataSource,
    private readonly checklists: InspectionChecklists,
    private readonly notes: NotesService,
    private readonly acknowledgements: AcknowledgementsService,
    private readonly defects: DefectsService,
  ) {}

  async create(
    user: AuthUser,
    dto: CreateInspectionDto,
  ): Promise<{ created: boolean; inspection: InspectionResponse }> {
    const existing = await this.inspections.findOneBy({ driverId: user.id, clientId: dto.clientId });
    if (existing) return { created: false, inspection: await this.assemble(existing) };

    const snapshot = await snapshotVehicles(this.vehicles, user.organizationId, dto.vehicleIds);
    const [driver, organization] = await Promise.all([
      this.dataSource.manager.findOne(User, { select: { id: true, settings: true }, where: { id: user.id } }),
      this.dataSource.manager.findOne(Organization, {
        select: { id: true, requiredReadings: true },
        where: { id: user.organizationId },
      }),
    ]);
    const locale = dto.locale ?? driver?.settings.locale ?? DEFAULT_DISPLAY_SETTINGS.locale;
    const checklist = checklistOfSnapshot(snapshot, dto.kind, locale);
    if (dto.kind === 'pre_trip') {
      for (const vehicle of snapshot) {
        const pending = await this.acknowledgements.pendingInspectionFor(
          this.dataSource.manager,
          user.organizationId,
          vehicle.id,
        );
        if (pending) {
          throw new ConflictException(
            `Review and sign the last report of unit ${vehicle.unitNumber} first: a mechanic certified its defects, and the next driver acknowledges that before the pre-trip.`,
          );
        }
      }
    }

    let inspection: Inspection;
    try {
      inspection = await this.dataSource.transaction(async (manager) => {
        const saved = await manager.save(
          manager.create(Inspection, {
            organizationId: user.organizationId,
            driverId: user.id,
            kind: dto.kind,
            status: 'in_progress',
            locale,
            clientId: dto.clientId,
            startedAt: new Date(dto.startedAt),
            submittedAt: null,
            odometer: null,
            location: dto.location?.trim() || null,
            vehicles: snapshot,
            requiredReadings: organization?.requiredReadings ?? [],
            rushed: false,
            defectCount: 0,
          }),
        );
        await manager.insert(
          InspectionVehicle,
          snapshot.map((v, position) => ({ inspectionId: saved.id, position, vehicleId: v.id })),
        );
        return saved;
      });
    } catch (error) {
      // Two tries of the same create raced: the first one won, answer with it.
      if (!isUniqueViolation(error, CLIENT_ID_INDEX)) throw error;
      const winner = await this.inspections.findOneByOrFail({ driverId: user.id, clientId: dto.clientId });
      return { created: false, inspection: await this.assemble(winner) };
    }
    this.checklists.remember(inspection.id, checklist);
    return { created: true, inspection: await this.assemble(inspection) };
  }
  async get(user: AuthUser, id: string): Promise<InspectionResponse> {
    return this.assemble(await this.findReadable(user, id));
  }

  // An inspection the caller may read (inspection-access.ts says who).
  findReadable(user: AuthUser, id: string): Promise<Inspection> {
    return findReadableInspection(this.inspections, user, id);
  }

  // Where a voice note or photo goes: the caller's own inspection (404 for anyone else's), with its
  // checklist while in progress. Once submitted, `editable` is null: a retried upload may still be answered.
  async findAttachmentTarget(user: AuthUser, id: string): Promise<AttachmentTarget> {
    const inspection = await this.inspections.findOneBy({ id, organizationId: user.organizationId, driverId: user.id });
    if (!inspection) throw new NotFoundException(INSPECTION_NOT_FOUND);
    if (inspection.status === 'submitted') return { inspectionId: id, editable: null };
    return { inspectionId: id, editable: { inspection, checklist: this.checklistOf(inspection).checklist } };
  }

  async submit(user: AuthUser, id: string, dto: SubmitInspectionDto): Promise<InspectionResponse> {
    await this.dataSource.transaction(async (manager) => {
      const inspection = assertEditable(
        await manager.findOne(Inspection, {
          where: { id, organizationId: user.organizationId, driverId: user.id },
          lock: { mode: 'pessimistic_write' },
        }),
      );
      const { checklist, byKey } = this.checklistOf(inspection);
      const rows = await manager.find(ItemResult, { where: { inspectionId: id } });
      const summary = summarizeInspection(checklist, rows.map(toSharedResult), {
        startedAt: inspection.startedAt.toISOString(),
      });
      // The server's clock says when the report arrived (submittedAt); the driver's signature keeps
      // when it was signed on the phone, which may be hours earlier with no signal.
      const now = new Date();
      const signedAt = signedTimeOf(dto, inspection.startedAt, now);
      await manager.insert(
        Signature,
        reportSignature(inspection, user, dto.signature, {
          role: 'driver',
          date: inspection.startedAt,
          defectCount: summary.defects.length,
          signedAt,
        }),
      );
      const defects = await this.defects.openFromReport(manager, { inspection, summary, byKey, results: rows });
      const recurring = await recurringDefectsOf(manager, inspection, checklist, summary);
      await manager.update(Inspection, id, {
        status: 'submitted',
        submittedAt: now,
        odometer: dto.odometer ?? null,
        rushed: summary.rushed.rushed,
        defectCount: defects.length,
        recurringDefect: recurring.length > 0,
        durationSeconds: summary.totalDurationMs !== null ? Math.round(summary.totalDurationMs / 1000) : null,
      });
    });
    return this.get(user, id);
  }

  private checklistOf(inspection: Inspection): BuiltChecklist {
    return this.checklists.of(inspection);
  }

  private async assemble(inspection: Inspection): Promise<InspectionResponse> {
    const manager = this.dataSource.manager;
    const [driver, results, defects, signatures, attachments] = await Promise.all([
      manager.findOne(User, { select: { id: true, name: true }, where: { id: inspection.driverId } }),
      manager.find(ItemResult, { where: { inspectionId: inspection.id } }),
      manager.find(Defect, { where: { inspectionId: inspection.id }, order: { createdAt: 'ASC', id: 'ASC' } }),
      manager.find(Signature, {
        where: { inspectionId: inspection.id },
        relations: { signer: true },
        order: { signedAt: 'ASC', id: 'ASC' },
      }),
      this.notes.attachmentsOf(inspection.id),
    ]);
    const { checklist } = this.checklistOf(inspection);
    const order = new Map(checklist.items.map((item, index) => [item.key, index]));
    results.sort((a, b) => (order.get(a.itemKey) ?? 0) - (order.get(b.itemKey) ?? 0));
    const defectResponses = await toDefectResponses(manager, defects);
    const sharedResults = results.map(toSharedResult);
    const summary = summarizeInspection(checklist, sharedResults, {
      startedAt: inspection.startedAt.toISOString(),
      certifications: defectResponses.flatMap((d) =>
        d.repair ? [{ itemKey: d.itemKey, action: d.repair.action }] : [],
      ),
    });
    const recurring = await recurringDefectsOf(manager, inspection, checklist, summary);
    return {
      ...toListItem(inspection, driver?.name ?? ''),
      clientId: inspection.clientId,
      locale: inspection.locale,
      location: inspection.location,
      odometer: inspection.odometer,
      checklist,
      requiredReadings: inspection.requiredReadings,
      results: results.map(toResultResponse),
      notes: attachments.notes,
      photos: attachments.photos,
      defects: defectResponses,
      signatures: signatures.map((s) => toSignatureResponse(s, s.signer?.name ?? '')),
      summary,
      timeline: walkedRoute(checklist, sharedResults, { startedAt: inspection.startedAt.toISOString() }),
      flags: { rushed: rushedFlag(summary.rushed, summary.answeredCount), recurring },
    };
  }
}
