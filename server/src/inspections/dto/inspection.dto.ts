import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  INSPECTION_KINDS,
  INSPECTION_SORT_FIELDS,
  INSPECTION_STATUSES,
  LOCALES,
  READING_RULES,
  SORT_DIRECTIONS,
  type InspectionListQuery,
  type InspectionSortField,
  type ReviewFlags,
  type SortDirection,
  type ZoneVisit,
  type AcknowledgeRequest,
  type Checklist,
  type CreateInspectionRequest,
  type InspectionKind,
  type InspectionListItem,
  type InspectionPage,
  type InspectionResponse,
  type InspectionStatus,
  type InspectionSummary,
  type Locale,
  type PendingAcknowledgement,
  type PhotoResponse,
  type ReadingRule,
  type SubmitInspectionRequest,
  type VoiceNoteResponse,
} from '@yardcall/shared';
import { Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsNotEmpty,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { NotInTheFuture, WithinOfflineWindow } from '../../common/client-time';
import { VehicleIds } from '../../common/dto/vehicle-ids.decorator';
import { DefectResponseDto } from '../../defects/dto/defect.dto';
import { InspectionVehicleDto, PersonRefDto } from './person-ref.dto';
import { CLIENT_ID_MAX, ItemResultResponseDto } from './result.dto';
import { SignatureInputDto, SignatureResponseDto } from './signature.dto';

export const PAGE_LIMIT_DEFAULT = 25;
export const PAGE_LIMIT_MAX = 100;
const ISO_TIME = 'an ISO 8601 time, e.g. 2026-12-01T06:15:00.000Z';

export class CreateInspectionDto implements CreateInspectionRequest {
  @VehicleIds()
  vehicleIds: string[];

  @ApiProperty({ enum: INSPECTION_KINDS })
  @IsIn(INSPECTION_KINDS, { message: `Choose a kind: ${INSPECTION_KINDS.join(', ')}.` })
  kind: InspectionKind;

  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true }, { message: `Send startedAt as ${ISO_TIME}.` })
  @NotInTheFuture()
  @WithinOfflineWindow()
  startedAt: string;

  @ApiPropertyOptional({ example: 'Kestrel Valley yard, bay 3' })
  @IsOptional()
  @IsString({ message: 'Write the location as text.' })
  @MaxLength(200, { message: 'Keep the location under 200 characters.' })
  location?: string;

  @ApiPropertyOptional({ enum: LOCALES, description: "Defaults to the driver's language." })
  @IsOptional()
  @IsIn(LOCALES, { message: `Choose a language: ${LOCALES.join(', ')}.` })
  locale?: Locale;

  @ApiProperty({ description: 'Made by the client: a retried create with the same id returns the same inspection.' })
  @IsString({ message: 'Send the client id as text.' })
  @IsNotEmpty({ message: 'Send a client id.' })
  @MaxLength(CLIENT_ID_MAX, { message: `A client id has at most ${CLIENT_ID_MAX} characters.` })
  clientId: string;
}

export class SubmitInspectionDto implements SubmitInspectionRequest {
  @ApiProperty({ type: SignatureInputDto })
  @IsObject({ message: 'Sign with {name, drawing?}.' })
  @ValidateNested()
  @Type(() => SignatureInputDto)
  signature: SignatureInputDto;

  @ApiPropertyOptional({ example: 412_803 })
  @IsOptional()
  @IsInt({ message: 'Send the odometer reading as a whole number.' })
  @Min(0, { message: 'The odometer reading cannot be negative.' })
  @Max(99_999_999, { message: 'The odometer reading has at most 8 digits.' })
  odometer?: number;

  // Signed on the phone, perhaps with no signal: the report may arrive hours later.
  @ApiPropertyOptional({ format: 'date-time' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: `Send signedAt as ${ISO_TIME}.` })
  @NotInTheFuture()
  signedAt?: string;
}

export class AcknowledgeDto implements AcknowledgeRequest {
  @ApiProperty({ type: SignatureInputDto })
  @IsObject({ message: 'Sign with {name, drawing?}.' })
  @ValidateNested()
  @Type(() => SignatureInputDto)
  signature: SignatureInputDto;
}

// Query strings arrive as text: "true"/"false" become booleans, anything else fails validation.
function toBoolean({ value }: { value: unknown }): unknown {
  if (value === 'true') return true;
  if (value === 'false') return false;
  return value;
}

// A day ("2026-11-30") or a moment ("2026-11-30T06:00:00Z"); days are UTC.
const DATE_OR_TIME = 'a date (2026-11-30) or an ISO 8601 time (2026-11-30T06:00:00Z)';

export class ListInspectionsQuery implements InspectionListQuery {
  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'vehicleId must be a vehicle id (a UUID).' })
  vehicleId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'driverId must be a user id (a UUID).' })
  driverId?: string;

  @ApiPropertyOptional({ enum: INSPECTION_KINDS })
  @IsOptional()
  @IsIn(INSPECTION_KINDS, { message: `Choose a kind: ${INSPECTION_KINDS.join(', ')}.` })
  kind?: InspectionKind;

  @ApiPropertyOptional({ enum: INSPECTION_STATUSES })
  @IsOptional()
  @IsIn(INSPECTION_STATUSES, { message: `Choose a status: ${INSPECTION_STATUSES.join(', ')}.` })
  status?: InspectionStatus;

  @ApiPropertyOptional({ description: 'Started at or after this day (UTC) or time.', example: '2026-11-01' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: `Send from as ${DATE_OR_TIME}.` })
  from?: string;

  @ApiPropertyOptional({
    description: 'Started before this time, or on or before this day (UTC) when a bare date.',
    example: '2026-11-30',
  })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: `Send to as ${DATE_OR_TIME}.` })
  to?: string;

  @ApiPropertyOptional({ description: 'Only reports with defects (true) or without (false).' })
  @IsOptional()
  @Transform(toBoolean)
  @IsBoolean({ message: 'hasDefects is true or false.' })
  hasDefects?: boolean;

  @ApiPropertyOptional({ description: 'Only reports flagged as rushed (true) or not (false).' })
  @IsOptional()
  @Transform(toBoolean)
  @IsBoolean({ message: 'rushed is true or false.' })
  rushed?: boolean;

  @ApiPropertyOptional({
    enum: INSPECTION_SORT_FIELDS,
    default: 'startedAt',
    description: 'submittedAt leaves out inspections in progress.',
  })
  @IsOptional()
  @IsIn(INSPECTION_SORT_FIELDS, { message: `Sort by ${INSPECTION_SORT_FIELDS.join(' or ')}.` })
  sort?: InspectionSortField;

  @ApiPropertyOptional({ enum: SORT_DIRECTIONS, default: 'desc' })
  @IsOptional()
  @IsIn(SORT_DIRECTIONS, { message: 'order is asc (oldest first) or desc (newest first).' })
  order?: SortDirection;

  @ApiPropertyOptional({ description: 'The nextCursor of the previous page.' })
  @IsOptional()
  @IsString({ message: 'Send the cursor as the text the previous page gave.' })
  @MaxLength(200, { message: 'This cursor is not one the list gave: start again without it.' })
  cursor?: string;

  @ApiPropertyOptional({ default: PAGE_LIMIT_DEFAULT, minimum: 1, maximum: PAGE_LIMIT_MAX })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: `limit is a whole number from 1 to ${PAGE_LIMIT_MAX}.` })
  @Min(1, { message: `limit is a whole number from 1 to ${PAGE_LIMIT_MAX}.` })
  @Max(PAGE_LIMIT_MAX, { message: `limit is a whole number from 1 to ${PAGE_LIMIT_MAX}.` })
  limit?: number;
}

export class InspectionListItemDto implements InspectionListItem {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: INSPECTION_KINDS })
  kind: InspectionKind;

  @ApiProperty({ enum: INSPECTION_STATUSES })
  status: InspectionStatus;

  @ApiProperty({ format: 'date-time' })
  startedAt: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  submittedAt: string | null;

  @ApiProperty({ type: PersonRefDto })
  driver: PersonRefDto;

  @ApiProperty({ type: [InspectionVehicleDto] })
  vehicles: InspectionVehicleDto[];

  @ApiProperty()
  defectCount: number;

  @ApiProperty({ description: 'Answered faster than the walk-around usually takes; asks a supervisor to look.' })
  rushed: boolean;

  @ApiProperty({ description: 'A defect of this report was reported before on the same vehicle and item.' })
  recurringDefect: boolean;

  @ApiProperty({ type: Number, nullable: true, description: 'From the start to the last answer.' })
  durationSeconds: number | null;
}

export class ZoneVisitDto implements ZoneVisit {
  @ApiProperty()
  zone: string;

  @ApiProperty()
  title: string;

  @ApiProperty({ format: 'date-time' })
  firstAnsweredAt: string;

  @ApiProperty({ format: 'date-time' })
  lastAnsweredAt: string;

  @ApiProperty({ description: 'Time credited to this stretch; the stretches add up to the walk-around.' })
  seconds: number;

  @ApiProperty()
  answerCount: number;
}

export class InspectionPageDto implements InspectionPage {
  @ApiProperty({ type: [InspectionListItemDto] })
  items: InspectionListItemDto[];

  @ApiProperty({ type: String, nullable: true, description: 'Pass as cursor for the next page; null on the last.' })
  nextCursor: string | null;
}

export class InspectionResponseDto extends InspectionListItemDto implements InspectionResponse {
  @ApiProperty()
  clientId: string;

  @ApiProperty({ enum: LOCALES })
  locale: Locale;

  @ApiProperty({ type: String, nullable: true })
  location: string | null;

  @ApiProperty({ type: Number, nullable: true })
  odometer: number | null;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'Built by the server from the vehicles as configured when the walk-around began.',
  })
  checklist: Checklist;

  @ApiProperty({
    enum: READING_RULES,
    isArray: true,
    description: "The organisation's required readings when the walk-around began; empty: none.",
  })
  requiredReadings: ReadingRule[];

  @ApiProperty({ type: [ItemResultResponseDto] })
  results: ItemResultResponseDto[];

  @ApiProperty({ type: 'array', items: { type: 'object' }, description: 'Voice notes at their items.' })
  notes: VoiceNoteResponse[];

  @ApiProperty({ type: 'array', items: { type: 'object' } })
  photos: PhotoResponse[];

  @ApiProperty({ type: [DefectResponseDto] })
  defects: DefectResponseDto[];

  @ApiProperty({ type: [SignatureResponseDto] })
  signatures: SignatureResponseDto[];

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Defects, gaps, zone times, rushed flag.' })
  summary: InspectionSummary;

  @ApiProperty({ type: [ZoneVisitDto], description: 'The route as zones in the order walked.' })
  timeline: ZoneVisitDto[];

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'rushed (why, or null) and recurring defects (naming the earlier inspection).',
  })
  flags: ReviewFlags;
}

export class PendingAcknowledgementDto implements PendingAcknowledgement {
  @ApiProperty({ format: 'uuid' })
  inspectionId: string;

  @ApiProperty({ type: InspectionVehicleDto })
  vehicle: InspectionVehicleDto;

  @ApiProperty({ format: 'date-time' })
  submittedAt: string;

  @ApiProperty({ type: PersonRefDto })
  driver: PersonRefDto;

  @ApiProperty({ type: [DefectResponseDto] })
  defects: DefectResponseDto[];
}
