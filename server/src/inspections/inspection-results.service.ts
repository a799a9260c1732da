import { ConflictException, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  LimitError,
  canonicalUnitOf,
  evaluateMeasurement,
  fixNeedsReading,
  isReadingRequired,
  toCanonical,
  type ChecklistItem,
  type FieldProblem,
  type ItemResultResponse,
  type MeasurementValue,
  type NoReadingReason,
  type SpotFix,
  type Verdict,
} from '@yardcall/shared';
import { DataSource, Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import type { MeasurementValueDto, PutResultsDto, ResultUpsertDto, SpotFixDto } from './dto/result.dto';
import { Inspection } from './entities/inspection.entity';
import { ItemResult } from './entities/item-result.entity';
import { assertEditable, SUBMITTED_MESSAGE } from './inspection-access';
import { InspectionChecklists } from './inspection-checklists';
import { toResultResponse } from './inspection-view';

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

// The driver's answers: each measurement re-evaluated by the server, stored in one statement a batch.
@Injectable()
export class InspectionResultsService {
  constructor(
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    private readonly dataSource: DataSource,
    private readonly checklists: InspectionChecklists,
  ) {}

  async putResults(user: AuthUser, id: string, dto: PutResultsDto): Promise<ItemResultResponse[]> {
    // The hot path: the vehicles snapshot is read only when the checklist is not cached. The cache is
    // read once: a later read could find the entry evicted meanwhile, with no snapshot to rebuild from.
    const cached = this.checklists.get(id);
    const inspection = assertEditable(
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
    const { byKey } = cached ?? this.checklists.of(inspection);
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
    // A value out of limit is fixed only by a new reading within it (shared's rule, which the voice loop
    // and the summary follow); a described defect is fixed on the driver's word.
    if (!fix.measurement) {
      if (reading && fixNeedsReading(reading)) {
        const { value, unit } = reading.measurement;
        problems.push({
          field: `${field}.fixed.measurement`,
          message: `${item.key} was read at ${value} ${unit}, out of limit (${reading.limitValue} ${reading.limitUnit}, ${reading.limitSource}): a fix on the spot needs the new reading, within the limit; without one, send it as a defect.`,
        });
        return null;
      }
      return spotFix;
    }
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
}
