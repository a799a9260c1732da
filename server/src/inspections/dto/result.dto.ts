import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ANSWERS,
  NO_READING_REASONS,
  QUANTITIES,
  VERDICTS,
  type Answer,
  type ItemResultResponse,
  type MeasurementValue,
  type NoReadingReason,
  type PutResultsRequest,
  type PutResultsResponse,
  type Quantity,
  type ResultLimit,
  type ResultUpsert,
  type SpotFix,
  type Verdict,
} from '@yardcall/shared';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsISO8601,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { ItemRecordDto } from '../../common/dto/item-record.dto';
import { NotInTheFuture } from '../../common/client-time';

// One batch holds a whole walk-around of a tractor and two trailers with room to spare.
export const RESULTS_BATCH_MAX = 500;
export const CLIENT_ID_MAX = 64;
// What was done on the spot is a few words ("added air", "replaced the bulb"); a note says more.
export const SPOT_FIX_ACTION_MAX = 300;

export class MeasurementValueDto implements MeasurementValue {
  @ApiProperty({ enum: QUANTITIES })
  @IsIn(QUANTITIES, { message: `Choose a quantity: ${QUANTITIES.join(', ')}.` })
  quantity: Quantity;

  @ApiProperty({ example: 5 })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'Send the measured value as a number.' })
  value: number;

  @ApiProperty({ example: 'in/32' })
  @IsString({ message: 'Send the unit as text, e.g. in/32, psi, in.' })
  @MaxLength(16, { message: 'A unit has at most 16 characters.' })
  unit: string;
}

// A defect corrected during the walk-around. Whether it may be sent with an answer, and the verdict on
// its new reading, are the service's (it knows the item); the client's verdict is informative only.
export class SpotFixDto implements SpotFix {
  @ApiProperty({ example: 'added air', maxLength: SPOT_FIX_ACTION_MAX })
  @IsString({ message: 'Send what was done on the spot as text, e.g. "added air".' })
  @IsNotEmpty({ message: 'Say what was done on the spot, e.g. "added air".' })
  @MaxLength(SPOT_FIX_ACTION_MAX, {
    message: `Keep what was done on the spot under ${SPOT_FIX_ACTION_MAX} characters; a note can say more.`,
  })
  action: string;

  @ApiPropertyOptional({
    type: MeasurementValueDto,
    description: 'The new reading; in the canonical unit when answered.',
  })
  @IsOptional()
  @IsObject({ message: 'Send the new reading as {quantity, value, unit}.' })
  @ValidateNested()
  @Type(() => MeasurementValueDto)
  measurement?: MeasurementValueDto;

  @ApiPropertyOptional({ enum: VERDICTS, description: 'Informative when sent; answered with the server’s verdict.' })
  @IsOptional()
  @IsIn(VERDICTS, { message: `Choose a verdict: ${VERDICTS.join(', ')}.` })
  verdict?: Verdict;

  @ApiPropertyOptional({ description: 'What the recogniser heard.' })
  @IsOptional()
  @IsString({ message: 'Send what was heard as text.' })
  @MaxLength(2000, { message: 'Keep what was heard under 2000 characters.' })
  heard?: string;

  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true }, { message: 'Send fixed.at as an ISO 8601 time, e.g. 2026-12-01T06:15:00.000Z.' })
  @NotInTheFuture()
  at: string;
}

export class ResultUpsertDto implements ResultUpsert {
  @ApiProperty({ example: 'u1.axle1.left.tire.tread' })
  @IsString({ message: 'Send the item key as text.' })
  @IsNotEmpty({ message: 'Send the item key of the checklist item.' })
  @MaxLength(160, { message: 'An item key has at most 160 characters.' })
  itemKey: string;

  @ApiProperty({ enum: ANSWERS })
  @IsIn(ANSWERS, { message: `Choose an answer: ${ANSWERS.join(', ')}.` })
  answer: Answer;

  @ApiPropertyOptional({ type: MeasurementValueDto })
  @IsOptional()
  @IsObject({ message: 'Send the measurement as {quantity, value, unit}.' })
  @ValidateNested()
  @Type(() => MeasurementValueDto)
  measurement?: MeasurementValueDto;

  @ApiPropertyOptional({ enum: VERDICTS, description: 'Informative only: the server re-evaluates.' })
  @IsOptional()
  @IsIn(VERDICTS, { message: `Choose a verdict: ${VERDICTS.join(', ')}.` })
  verdict?: Verdict;

  @ApiPropertyOptional({
    enum: NO_READING_REASONS,
    description:
      'Only on a pass of a measured check without a value. Informative: the server records no_gauge where the inspection requires the reading, visual elsewhere.',
  })
  @IsOptional()
  @IsIn(NO_READING_REASONS, { message: `Choose why there is no reading: ${NO_READING_REASONS.join(', ')}.` })
  noReading?: NoReadingReason;

  @ApiPropertyOptional({ type: SpotFixDto, description: 'Only on a defect corrected on the spot.' })
  @IsOptional()
  @IsObject({ message: 'Send the fix as {action, measurement?, heard?, at}.' })
  @ValidateNested()
  @Type(() => SpotFixDto)
  fixed?: SpotFixDto;

  @ApiPropertyOptional({ example: 'cracked lens' })
  @IsOptional()
  @IsString({ message: 'Send the detail as text.' })
  @MaxLength(2000, { message: 'Keep the detail under 2000 characters.' })
  detail?: string;

  @ApiPropertyOptional({ description: 'What the recogniser heard.' })
  @IsOptional()
  @IsString({ message: 'Send what was heard as text.' })
  @MaxLength(2000, { message: 'Keep what was heard under 2000 characters.' })
  heard?: string;

  @ApiPropertyOptional({ minimum: 0, maximum: 1 })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'Send the confidence as a number from 0 to 1.' })
  @Min(0, { message: 'The confidence is from 0 to 1.' })
  @Max(1, { message: 'The confidence is from 0 to 1.' })
  confidence?: number;

  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true }, { message: 'Send answeredAt as an ISO 8601 time, e.g. 2026-12-01T06:15:00.000Z.' })
  @NotInTheFuture()
  answeredAt: string;

  @ApiProperty({ description: 'Made by the client; a retried answer with the same id changes nothing.' })
  @IsString({ message: 'Send the client id as text.' })
  @IsNotEmpty({ message: 'Send a client id for each answer.' })
  @MaxLength(CLIENT_ID_MAX, { message: `A client id has at most ${CLIENT_ID_MAX} characters.` })
  clientId: string;
}

export class PutResultsDto implements PutResultsRequest {
  @ApiProperty({ type: [ResultUpsertDto], maxItems: RESULTS_BATCH_MAX })
  @IsArray({ message: 'Send the results as a list.' })
  @ArrayMaxSize(RESULTS_BATCH_MAX, { message: `Send at most ${RESULTS_BATCH_MAX} results at a time.` })
  @ValidateNested({ each: true })
  @Type(() => ResultUpsertDto)
  results: ResultUpsertDto[];
}

export class ResultLimitDto implements ResultLimit {
  @ApiProperty({ example: 4 })
  value: number;

  @ApiProperty({ example: 'in/32' })
  unit: string;

  @ApiProperty({ example: '49 CFR 393.75(b)' })
  source: string;
}

export class ItemResultResponseDto extends ItemRecordDto implements ItemResultResponse {
  @ApiProperty({ enum: ANSWERS })
  answer: Answer;

  @ApiProperty({ type: MeasurementValueDto, nullable: true, description: 'In the canonical unit.' })
  measurement: MeasurementValueDto | null;

  @ApiProperty({ enum: VERDICTS, nullable: true, description: 'The server’s verdict.' })
  verdict: Verdict | null;

  @ApiProperty({ type: ResultLimitDto, nullable: true })
  limit: ResultLimitDto | null;

  @ApiProperty({ enum: NO_READING_REASONS, nullable: true, description: 'A measured check passed without a value.' })
  noReading: NoReadingReason | null;

  @ApiProperty({ type: SpotFixDto, nullable: true, description: 'A defect corrected on the spot.' })
  fixed: SpotFixDto | null;

  @ApiProperty({ type: String, nullable: true })
  detail: string | null;

  @ApiProperty({ type: String, nullable: true })
  heard: string | null;

  @ApiProperty({ type: Number, nullable: true })
  confidence: number | null;

  @ApiProperty({ format: 'date-time' })
  answeredAt: string;
}

export class PutResultsResponseDto implements PutResultsResponse {
  @ApiProperty({ type: [ItemResultResponseDto], description: 'The stored answer of every item key sent.' })
  results: ItemResultResponseDto[];
}
