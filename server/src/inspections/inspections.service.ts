import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  DEFAULT_DISPLAY_SETTINGS,
  DEFAULT_TIME_ZONE,
  LimitError,
  canonicalUnitOf,
  evaluateMeasurement,
  isReadingRequired,
  rushedFlag,
  summarizeInspection,
  toCanonical,
  walkedRoute,
  type Checklist,
  type ChecklistItem,
  type FieldProblem,
  type InspectionListItem,
  type InspectionPage,
  type InspectionResponse,
  type ItemResultResponse,
  type MeasurementValue,
  type NoReadingReason,
  type SpotFix,
  type Verdict,
} from '@yardcall/shared';
import { DataSource, Repository, type SelectQueryBuilder } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import { toDefectResponses } from '../defects/defect-view';
import { Defect } from '../defects/entities/defect.entity';
import { refreshVehicleStatus } from '../defects/vehicle-status';
import { Organization } from '../organizations/entities/organization.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import {
  ChecklistCache,
  checklistOfSnapshot,
  snapshotVehicles,
  type BuiltChecklist,
} from '../vehicles/vehicle-checklist';
import { JOB_SAFETY_DEFECT_REPORTED, type SafetyDefectReportedJob } from '../jobs/job-names';
import { JobsService } from '../jobs/jobs.service';
import { AcknowledgementsService } from './acknowledgements.service';
import { decodeCursor, encodeCursor } from './cursor';
import {
  PAGE_LIMIT_DEFAULT,
  type CreateInspectionDto,
  type ListInspectionsQuery,
  type SubmitInspectionDto,
} from './dto/inspection.dto';
import type { MeasurementValueDto, PutResultsDto, ResultUpsertDto, SpotFixDto } from './dto/result.dto';
import { InspectionVehicle } from './entities/inspection-vehicle.entity';
import { Inspection } from './entities/inspection.entity';
import { ItemResult } from './entities/item-result.entity';
import { Signature } from './entities/signature.entity';
import { InspectionAttachmentsRegistry } from './inspection-attachments';
import { toListItem, toResultResponse, toSharedResult, toSignatureResponse } from './inspection-view';
import { recurringDefectsOf } from './review';
import { driverStatement } from './statements';

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

export const SUBMITTED_MESSAGE =
  "This report is submitted and signed, so it can no longer be changed: changes now go through the mechanic's repair certification and the next driver's acknowledgement.";
const NOT_FOUND = 'No inspection with this id in your organisation.';
const CLIENT_ID_INDEX = 'UQ_inspections_driver_client';
// Checklists are rebuilt from the stored snapshot, which never changes: keep the recent ones.
const CHECKLIST_CACHE_MAX = 500;

// One answer, ready for the database: measurement in the canonical unit, verdict and limit from the server.
interface PreparedResult {
  input: ResultUpsertDto;
  quantity: string | null;
  value: number | null;
  unit: string | null;
  verdict: Verdict | null;
  limitValue: number | null;
  limitUnit: string | null;
  limitSource: string | null;
  noReading: NoReadingReason | null;
  fixed: SpotFix | null;
}

// A reading in the canonical unit with the server's verdict and the limit that decided it.
interface JudgedReading {
  measurement: MeasurementValue;
  verdict: Verdict;
  limitValue: number;
  limitUnit: string;
  limitSource: string;
}

interface ItemResultRow {
  id: string;
  inspection_id: string;
  item_key: string;
  client_id: string;
  answer: ItemResult['answer'];
  measurement_quantity: ItemResult['measurementQuantity'];
  measurement_value: number | null;
  measurement_unit: string | null;
  verdict: Verdict | null;
  limit_value: number | null;
  limit_unit: string | null;
  limit_source: string | null;
  no_reading: NoReadingReason | null;
  fixed: SpotFix | null;
  detail: string | null;
  heard: string | null;
  confidence: number | null;
  answered_at: Date;
}

// One statement per batch: unnest the columns, upsert on (inspection, item key) where the stored answer
// is older (a retried answer, same time and client id, writes nothing), and read back the stored row of
// every key sent (the CTE's own rows first: a plain read in the same statement would not see them).
// The FOR SHARE guard makes a batch racing a submit wait, then write nothing.
const UPSERT_SQL = `
WITH input AS (
  SELECT * FROM unnest($2::text[], $3::text[], $4::item_answer[], $5::text[], $6::float8[], $7::text[],
                       $8::item_verdict[], $9::float8[], $10::text[], $11::text[], $12::text[], $13::text[],
                       $14::real[], $15::timestamptz[], $16::item_no_reading[], $17::jsonb[])
    AS t(item_key, client_id, answer, measurement_quantity, measurement_value, measurement_unit, verdict,
         limit_value, limit_unit, limit_source, detail, heard, confidence, answered_at, no_reading, fixed)
), upserted AS (
  INSERT INTO item_results AS r (inspection_id, item_key, client_id, answer, measurement_quantity,
    measurement_value, measurement_unit, verdict, limit_value, limit_unit, limit_source, detail, heard,
    confidence, answered_at, no_reading, fixed)
  SELECT $1::uuid, item_key, client_id, answer, measurement_quantity, measurement_value, measurement_unit,
         verdict, limit_value, limit_unit, limit_source, detail, heard, confidence, answered_at, no_reading, fixed
  FROM input
  WHERE EXISTS (SELECT 1 FROM inspections WHERE id = $1::uuid AND status = 'in_progress' FOR SHARE)
  ON CONFLICT (inspection_id, item_key) DO UPDATE SET
    client_id = EXCLUDED.client_id, answer = EXCLUDED.answer,
    measurement_quantity = EXCLUDED.measurement_quantity, measurement_value = EXCLUDED.measurement_value,
    measurement_unit = EXCLUDED.measurement_unit, verdict = EXCLUDED.verdict,
    limit_value = EXCLUDED.limit_value, limit_unit = EXCLUDED.limit_unit, limit_source = EXCLUDED.limit_source,
    detail = EXCLUDED.detail, heard = EXCLUDED.heard, confidence = EXCLUDED.confidence,
    answered_at = EXCLUDED.answered_at, no_reading = EXCLUDED.no_reading, fixed = EXCLUDED.fixed,
    received_at = now()
  WHERE r.answered_at < EXCLUDED.answered_at
     OR (r.answered_at = EXCLUDED.answered_at AND r.client_id <> EXCLUDED.client_id)
  RETURNING r.*
)
SELECT * FROM upserted
UNION ALL
SELECT s.* FROM item_results s
WHERE s.inspection_id = $1::uuid AND s.item_key = ANY($2::text[])
  AND NOT EXISTS (SELECT 1 FROM upserted u WHERE u.item_key = s.item_key)`;

function rowToEntity(row: ItemResultRow): ItemResult {
  return Object.assign(new ItemResult(), {
    id: row.id,
    inspectionId: row.inspection_id,
    itemKey: row.item_key,
    clientId: row.client_id,
    answer: row.answer,
    measurementQuantity: row.measurement_quantity,
    measurementValue: row.measurement_value,
    measurementUnit: row.measurement_unit,
    verdict: row.verdict,
    limitValue: row.limit_value,
    limitUnit: row.limit_unit,
    limitSource: row.limit_source,
    noReading: row.no_reading,
    fixed: row.fixed,
    detail: row.detail,
    heard: row.heard,
    confidence: row.confidence,
    answeredAt: row.answered_at,
  });
}

function timeOf(iso: string): number {
  return Date.parse(iso);
}

// An answer is given during its walk-around: never before the start (both times are the phone's).
function assertAnsweredAfterStart(results: readonly ResultUpsertDto[], startedAt: Date): void {
  const problems = results.flatMap((result, index) =>
    timeOf(result.answeredAt) < startedAt.getTime()
      ? [
          {
            field: `results.${index}.answeredAt`,
            message: `${result.answeredAt} is before this walk-around started (${startedAt.toISOString()}): check the phone's date and time.`,
          },
        ]
      : [],
  );
  if (problems.length > 0) throw new ApiValidationException(problems);
}

const EXPORT_PAGE = 500;
const BARE_DATE = /^\d{4}-\d{2}-\d{2}$/;

// A bare date is a day of the organisation's time zone: `from` its start, `to` the end of it (the next
// day's start, exclusive). PostgreSQL works out the day's edges, daylight saving time included.
function whereStartedWithin(
  builder: SelectQueryBuilder<Inspection>,
  bound: 'from' | 'to',
  text: string,
  timeZone: string,
): void {
  const operator = bound === 'from' ? '>=' : '<';
  if (BARE_DATE.test(text)) {
    const day = bound === 'from' ? `:${bound}Day::date` : `(:${bound}Day::date + 1)`;
    builder.andWhere(`inspection.started_at ${operator} (${day})::timestamp AT TIME ZONE :dayZone`, {
      [`${bound}Day`]: text,
      dayZone: timeZone,
    });
    return;
  }
  const date = new Date(text);
  if (Number.isNaN(date.getTime())) {
    throw new ApiValidationException([{ field: bound, message: `${text} is not a day or time this list knows.` }]);
  }
  builder.andWhere(`inspection.started_at ${operator} :${bound}`, { [bound]: date });
}

@Injectable()
export class InspectionsService {
  private readonly checklists = new ChecklistCache(CHECKLIST_CACHE_MAX);

  constructor(
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    @InjectRepository(Vehicle) private readonly vehicles: Repository<Vehicle>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly dataSource: DataSource,
    private readonly attachments: InspectionAttachmentsRegistry,
    private readonly acknowledgements: AcknowledgementsService,
    private readonly jobs: JobsService,
  ) {}

  async create(
    user: AuthUser,
    dto: CreateInspectionDto,
  ): Promise<{ created: boolean; inspection: InspectionResponse }> {
    const existing = await this.inspections.findOneBy({ driverId: user.id, clientId: dto.clientId });
    if (existing) return { created: false, inspection: await this.assemble(existing) };

    const snapshot = await snapshotVehicles(this.vehicles, user.organizationId, dto.vehicleIds);
    const [driver, organization] = await Promise.all([
      this.users.findOne({ select: { id: true, settings: true }, where: { id: user.id } }),
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

  async list(user: AuthUser, query: ListInspectionsQuery): Promise<InspectionPage> {
    return this.page(user, query, query.limit ?? PAGE_LIMIT_DEFAULT);
  }

  // Every row the filters select, page after page (the CSV export), up to `max` rows.
  async *listAll(user: AuthUser, query: ListInspectionsQuery, max: number): AsyncGenerator<InspectionListItem[]> {
    let cursor = query.cursor;
    let left = max;
    while (left > 0) {
      const page = await this.page(user, { ...query, cursor }, Math.min(EXPORT_PAGE, left));
      if (page.items.length > 0) yield page.items;
      left -= page.items.length;
      if (!page.nextCursor) return;
      cursor = page.nextCursor;
    }
  }

  // Keyset pages: (sort time, id) after the cursor, backed by the (organization_id, time DESC, id DESC)
  // indexes (read backwards for asc). The driver's name comes from a join on the primary key.
  private async page(user: AuthUser, query: ListInspectionsQuery, limit: number): Promise<InspectionPage> {
    const sort = query.sort ?? 'startedAt';
    const order = query.order ?? 'desc';
    const column = sort === 'submittedAt' ? 'inspection.submitted_at' : 'inspection.started_at';
    const builder = this.inspections
      .createQueryBuilder('inspection')
      .innerJoin('inspection.driver', 'driver')
      .addSelect(['driver.id', 'driver.name'])
      .where('inspection.organization_id = :organizationId', { organizationId: user.organizationId });
    // Drivers see their own walk-arounds; trainers their students' practice ones; the shop and the office all.
    if (user.role === 'driver') builder.andWhere('inspection.driver_id = :self', { self: user.id });
    if (user.role === 'trainer') builder.andWhere("inspection.kind = 'practice'");
    if (sort === 'submittedAt') builder.andWhere('inspection.submitted_at IS NOT NULL');
    if (query.driverId) builder.andWhere('inspection.driver_id = :driverId', { driverId: query.driverId });
    if (query.kind) builder.andWhere('inspection.kind = :kind', { kind: query.kind });
    if (query.status) builder.andWhere('inspection.status = :status', { status: query.status });
    if (query.from || query.to) {
      const timeZone = await this.timeZoneOf(user.organizationId);
      if (query.from) whereStartedWithin(builder, 'from', query.from, timeZone);
      if (query.to) whereStartedWithin(builder, 'to', query.to, timeZone);
    }
    // Written as the partial indexes' predicates, so the planner can use them.
    if (query.hasDefects !== undefined) {
      builder.andWhere(query.hasDefects ? 'inspection.defect_count > 0' : 'inspection.defect_count = 0');
    }
    if (query.rushed !== undefined) builder.andWhere(query.rushed ? 'inspection.rushed' : 'NOT inspection.rushed');
    if (query.vehicleId) {
      builder.andWhere(
        'EXISTS (SELECT 1 FROM inspection_vehicles iv WHERE iv.inspection_id = inspection.id AND iv.vehicle_id = :vehicleId)',
        { vehicleId: query.vehicleId },
      );
    }
    if (query.cursor) {
      const cursor = decodeCursor(query.cursor, sort, order);
      builder.andWhere(`(${column}, inspection.id) ${order === 'desc' ? '<' : '>'} (:cursorAt, :cursorId)`, {
        cursorAt: cursor.at,
        cursorId: cursor.id,
      });
    }
    const direction = order === 'desc' ? 'DESC' : 'ASC';
    const { entities: rows, raw } = await builder
      // The sort time to the microsecond, for the next cursor.
      .addSelect(`to_char(${column} AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`, 'cursor_at')
      .orderBy(column, direction)
      .addOrderBy('inspection.id', direction)
      .limit(limit + 1)
      .getRawAndEntities<{ cursor_at: string; inspection_id: string }>();
    const page = rows.slice(0, limit);
    const last = page[page.length - 1];
    const lastAt = last ? raw.find((r) => r.inspection_id === last.id)?.cursor_at : undefined;
    return {
      items: page.map((i) => toListItem(i, i.driver?.name ?? '')),
      nextCursor: rows.length > limit && last && lastAt ? encodeCursor({ sort, order, at: lastAt, id: last.id }) : null,
    };
  }

  private async timeZoneOf(organizationId: string): Promise<string> {
    const organization = await this.dataSource.manager.findOne(Organization, {
      select: { id: true, timeZone: true },
      where: { id: organizationId },
    });
    return organization?.timeZone ?? DEFAULT_TIME_ZONE;
  }

  async get(user: AuthUser, id: string): Promise<InspectionResponse> {
    return this.assemble(await this.findReadable(user, id));
  }

  // An inspection the caller may read: their organisation's, a driver's own, a trainer's practice ones.
  async findReadable(user: AuthUser, id: string): Promise<Inspection> {
    const inspection = await this.inspections.findOneBy({ id, organizationId: user.organizationId });
    if (
      !inspection ||
      (user.role === 'driver' && inspection.driverId !== user.id) ||
      (user.role === 'trainer' && inspection.kind !== 'practice')
    ) {
      throw new NotFoundException(NOT_FOUND);
    }
    return inspection;
  }

  // The caller's own inspection while it is in progress, with its checklist (also for attachments).
  async findEditable(user: AuthUser, id: string): Promise<{ inspection: Inspection; checklist: Checklist }> {
    const inspection = await this.inspections.findOneBy({ id, organizationId: user.organizationId, driverId: user.id });
    return this.editable(inspection);
  }

  private editable(found: Inspection | null): { inspection: Inspection; checklist: Checklist } {
    const inspection = this.assertEditable(found);
    return { inspection, checklist: this.checklistOf(inspection).checklist };
  }

  private assertEditable(inspection: Inspection | null): Inspection {
    if (!inspection) throw new NotFoundException(NOT_FOUND);
    if (inspection.status === 'submitted') throw new ConflictException(SUBMITTED_MESSAGE);
    return inspection;
  }

  async putResults(user: AuthUser, id: string, dto: PutResultsDto): Promise<ItemResultResponse[]> {
    // The hot path: the vehicles snapshot is read only when the checklist is not cached. The cache is
    // read once: a later read could find the entry evicted meanwhile, with no snapshot to rebuild from.
    const cached = this.checklists.get(id);
    const inspection = this.assertEditable(
      await this.inspections.findOne({
        select: {
          id: true,
          kind: true,
          status: true,
          locale: true,
          requiredReadings: true,
          startedAt: true,
          vehicles: !cached,
        },
        where: { id, organizationId: user.organizationId, driverId: user.id },
      }),
    );
    const { byKey } = cached ?? this.checklistOf(inspection);
    assertAnsweredAfterStart(dto.results, inspection.startedAt);
    const prepared = this.prepareResults(dto.results, byKey, inspection);
    if (prepared.length === 0) return [];
    const column = <T>(pick: (p: PreparedResult) => T): T[] => prepared.map(pick);
    const rows = await this.dataSource.query<ItemResultRow[]>(UPSERT_SQL, [
      inspection.id,
      column((p) => p.input.itemKey),
      column((p) => p.input.clientId),
      column((p) => p.input.answer),
      column((p) => p.quantity),
      column((p) => p.value),
      column((p) => p.unit),
      column((p) => p.verdict),
      column((p) => p.limitValue),
      column((p) => p.limitUnit),
      column((p) => p.limitSource),
      column((p) => p.input.detail ?? null),
      column((p) => p.input.heard ?? null),
      column((p) => p.input.confidence ?? null),
      column((p) => p.input.answeredAt),
      column((p) => p.noReading),
      // jsonb[] elements go as JSON text.
      column((p) => (p.fixed ? JSON.stringify(p.fixed) : null)),
    ]);
    const stored = new Map(rows.map((row) => [row.item_key, row]));
    if (stored.size < prepared.length) {
      // The guard found the inspection submitted meanwhile: nothing of this batch was written.
      throw new ConflictException(SUBMITTED_MESSAGE);
    }
    return prepared.map((p) => toResultResponse(rowToEntity(stored.get(p.input.itemKey) as ItemResultRow)));
  }

  async submit(user: AuthUser, id: string, dto: SubmitInspectionDto): Promise<InspectionResponse> {
    await this.dataSource.transaction(async (manager) => {
      const inspection = await manager.findOne(Inspection, {
        where: { id, organizationId: user.organizationId, driverId: user.id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!inspection) throw new NotFoundException(NOT_FOUND);
      if (inspection.status === 'submitted') throw new ConflictException(SUBMITTED_MESSAGE);
      const { checklist, byKey } = this.checklistOf(inspection);
      const rows = await manager.find(ItemResult, { where: { inspectionId: id } });
      const rowByKey = new Map(rows.map((r) => [r.itemKey, r]));
      const summary = summarizeInspection(checklist, rows.map(toSharedResult), {
        startedAt: inspection.startedAt.toISOString(),
      });
      // The server's clock says when the report arrived (submittedAt); the driver's signature keeps
      // when it was signed on the phone, which may be hours earlier with no signal.
      const now = new Date();
      const signedAt = signedTimeOf(dto, inspection.startedAt, now);
      await manager.insert(Signature, {
        inspectionId: id,
        defectId: null,
        role: 'driver',
        signerId: user.id,
        name: dto.signature.name,
        drawing: dto.signature.drawing ?? null,
        statement: driverStatement(inspection.locale, {
          name: dto.signature.name,
          units: inspection.vehicles.map((v) => v.unitNumber),
          date: inspection.startedAt,
          defectCount: summary.defects.length,
        }),
        signedAt,
      });
      const defects = summary.defects.map((defect) => {
        const item = byKey.get(defect.itemKey) as ChecklistItem;
        const row = rowByKey.get(defect.itemKey);
        const vehicle = inspection.vehicles[item.unitIndex] ?? inspection.vehicles[0]!;
        return manager.create(Defect, {
          organizationId: user.organizationId,
          inspectionId: id,
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
      if (defects.length > 0) await manager.save(Defect, defects);
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
      await refreshVehicleStatus(
        manager,
        defects.filter((d) => d.safety).map((d) => d.vehicleId),
      );
      // Committed with the report: the mechanics and supervisors hear of a safety defect exactly once.
      if (defects.some((d) => d.safety)) {
        const job: SafetyDefectReportedJob = { organizationId: user.organizationId, inspectionId: id };
        await this.jobs.send(JOB_SAFETY_DEFECT_REPORTED, job, manager);
      }
    });
    return this.get(user, id);
  }

  private prepareResults(
    results: readonly ResultUpsertDto[],
    byKey: ReadonlyMap<string, ChecklistItem>,
    inspection: Inspection,
  ): PreparedResult[] {
    const unknown = results.map((r, index) => ({ key: r.itemKey, index })).filter(({ key }) => !byKey.has(key));
    if (unknown.length > 0) {
      const keys = [...new Set(unknown.map((u) => u.key))];
      throw new ApiValidationException(
        unknown.map(({ key, index }) => ({
          field: `results.${index}.itemKey`,
          message: `${key} is not an item of this inspection's checklist.`,
        })),
        `These item keys are not on this inspection's checklist: ${keys.join(', ')}.`,
      );
    }
    // Within a batch too, the latest answer of an item stands; on equal times the later one in the list.
    const latest = new Map<string, { input: ResultUpsertDto; index: number }>();
    results.forEach((input, index) => {
      const previous = latest.get(input.itemKey);
      if (!previous || timeOf(input.answeredAt) >= timeOf(previous.input.answeredAt)) {
        latest.set(input.itemKey, { input, index });
      }
    });
    const problems: FieldProblem[] = [];
    const clientIds = new Map<string, string>();
    const prepared: PreparedResult[] = [];
    for (const { input, index } of latest.values()) {
      const other = clientIds.get(input.clientId);
      if (other !== undefined && other !== input.itemKey) {
        problems.push({
          field: `results.${index}.clientId`,
          message: `The client id ${input.clientId} is also used for ${other}: give each answer its own id.`,
        });
        continue;
      }
      clientIds.set(input.clientId, input.itemKey);
      const item = byKey.get(input.itemKey) as ChecklistItem;
      const field = `results.${index}`;
      const before = problems.length;
      const reading = input.measurement
        ? this.judgeReading(input.measurement, item, inspection, `${field}.measurement`, problems)
        : null;
      const noReading = this.noReadingOf(input, item, inspection, field, problems);
      const fixed = input.fixed ? this.spotFixOf(input, input.fixed, reading, item, inspection, field, problems) : null;
      if (problems.length > before) continue;
      prepared.push({
        input,
        quantity: reading?.measurement.quantity ?? null,
        value: reading?.measurement.value ?? null,
        unit: reading?.measurement.unit ?? null,
        verdict: reading?.verdict ?? null,
        limitValue: reading?.limitValue ?? null,
        limitUnit: reading?.limitUnit ?? null,
        limitSource: reading?.limitSource ?? null,
        noReading,
        fixed,
      });
    }
    if (problems.length > 0) throw new ApiValidationException(problems);
    return prepared;
  }

  // A reading of the item, evaluated by the server: the client's verdict is never trusted.
  private judgeReading(
    measurement: MeasurementValueDto,
    item: ChecklistItem,
    inspection: Inspection,
    field: string,
    problems: FieldProblem[],
  ): JudgedReading | null {
    const { quantity, value, unit } = measurement;
    if (item.expects.type !== 'measure') {
      problems.push({ field, message: `${item.key} takes no measurement: send the answer only.` });
      return null;
    }
    if (item.expects.quantity !== quantity) {
      problems.push({
        field: `${field}.quantity`,
        message: `${item.key} measures ${item.expects.quantity}, not ${quantity}.`,
      });
      return null;
    }
    try {
      const judged = evaluateMeasurement(quantity, value, unit, item.limitContext ?? {}, inspection.locale);
      return {
        measurement: {
          quantity,
          value: Math.round(toCanonical(quantity, value, unit) * 1e6) / 1e6,
          unit: canonicalUnitOf(quantity),
        },
        verdict: judged.verdict,
        limitValue: judged.limit,
        limitUnit: judged.unit,
        limitSource: judged.source,
      };
    } catch (error) {
      if (!(error instanceof LimitError)) throw error;
      problems.push({ field, message: error.message });
      return null;
    }
  }

  // A measured check passed without a value is recorded as such; whether the reading was required is the
  // inspection's word (its required readings), not the client's.
  private noReadingOf(
    input: ResultUpsertDto,
    item: ChecklistItem,
    inspection: Inspection,
    field: string,
    problems: FieldProblem[],
  ): NoReadingReason | null {
    const measured = item.expects.type === 'measure';
    if (input.noReading !== undefined) {
      const problem = !measured
        ? `${item.key} takes no reading: send noReading only on a measured check.`
        : input.answer !== 'pass'
          ? `noReading goes only with a pass; ${item.key} is answered ${input.answer}.`
          : input.measurement
            ? `${item.key} has a reading: send the measurement or noReading, not both.`
            : null;
      if (problem) {
        problems.push({ field: `${field}.noReading`, message: problem });
        return null;
      }
    }
    if (!measured || input.answer !== 'pass' || input.measurement) return null;
    return isReadingRequired(item, inspection.requiredReadings) ? 'no_gauge' : 'visual';
  }

  // A defect corrected on the spot. A new reading still out of limit is refused: that is a defect, not a fix.
  private spotFixOf(
    input: ResultUpsertDto,
    fix: SpotFixDto,
    reading: JudgedReading | null,
    item: ChecklistItem,
    inspection: Inspection,
    field: string,
    problems: FieldProblem[],
  ): SpotFix | null {
    if (input.answer !== 'defect' && reading?.verdict !== 'out_of_limit') {
      problems.push({
        field: `${field}.fixed`,
        message: `A fix on the spot goes only with a defect; ${item.key} is answered ${input.answer}.`,
      });
      return null;
    }
    const spotFix: SpotFix = { action: fix.action.trim(), at: fix.at };
    if (fix.heard !== undefined) spotFix.heard = fix.heard;
    if (!spotFix.action) {
      problems.push({ field: `${field}.fixed.action`, message: 'Say what was done on the spot, e.g. "added air".' });
      return null;
    }
    // Without a new reading the fix is kept as said; the shared summary decides whether it counts.
    if (!fix.measurement) return spotFix;
    const judged = this.judgeReading(fix.measurement, item, inspection, `${field}.fixed.measurement`, problems);
    if (!judged) return null;
    if (judged.verdict === 'out_of_limit') {
      const { value, unit } = judged.measurement;
      problems.push({
        field: `${field}.fixed.measurement`,
        message: `The new reading of ${item.key}, ${value} ${unit}, is still out of limit (${judged.limitValue} ${judged.limitUnit}, ${judged.limitSource}): it is not fixed; send it as a defect.`,
      });
      return null;
    }
    spotFix.measurement = judged.measurement;
    spotFix.verdict = judged.verdict;
    return spotFix;
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
      this.attachments.collect(inspection.id),
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
