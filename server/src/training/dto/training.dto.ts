import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  LOCALES,
  TRAINING_ITEM_MARKS,
  TRAINING_COMMENT_MAX,
  TRAINING_GRADES,
  TRAINING_SEGMENT_TEXT_MAX,
  TRAINING_SEGMENTS_MAX,
  type CreateTrainingAttemptRequest,
  type FinishTrainingAttemptRequest,
  type Locale,
  type PutTrainingReviewRequest,
  type PutTrainingSegmentsRequest,
  type TrainingAudioUpload,
  type TrainingGrade,
  type TrainingItemMarkInput,
  type TrainingItemMarkValue,
  type TrainingSegmentUpsert,
} from '@yardcall/shared';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsInt,
  IsISO8601,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { DurationMs } from '../../common/dto/duration-ms.decorator';
import { NotInTheFuture, WithinOfflineWindow } from '../../common/client-time';
import { VehicleIds } from '../../common/dto/vehicle-ids.decorator';

const CLIENT_ID_MAX = 64;
const ITEM_KEY_MAX = 160;
// Our own bound: three hours, far past any practice walk-around; stops nonsense numbers.
const DURATION_MAX_MS = 3 * 60 * 60 * 1000;
const ISO_TIME = 'an ISO 8601 time, e.g. 2026-12-01T06:15:00.000Z';

export class CreateTrainingAttemptDto implements CreateTrainingAttemptRequest {
  @ApiProperty({ description: 'Made by the client: a retried create with the same id returns the same attempt.' })
  @IsString({ message: 'Send the client id as text.' })
  @IsNotEmpty({ message: 'Send a client id.' })
  @MaxLength(CLIENT_ID_MAX, { message: `A client id has at most ${CLIENT_ID_MAX} characters.` })
  @Matches(/^[A-Za-z0-9_-]+$/, { message: 'A client id uses only letters, digits, hyphens and underscores.' })
  clientId: string;

  @VehicleIds()
  vehicleIds: string[];

  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true }, { message: `Send startedAt as ${ISO_TIME}.` })
  @NotInTheFuture()
  @WithinOfflineWindow()
  startedAt: string;

  @ApiPropertyOptional({ enum: LOCALES, description: "Defaults to the student's language." })
  @IsOptional()
  @IsIn(LOCALES, { message: `Choose a language: ${LOCALES.join(', ')}.` })
  locale?: Locale;
}

export class TrainingSegmentDto implements TrainingSegmentUpsert {
  @ApiProperty({ description: 'The segment’s number within the attempt, from 0.' })
  @IsInt({ message: 'Send seq as a whole number.' })
  @Min(0, { message: 'seq cannot be negative.' })
  @Max(TRAINING_SEGMENTS_MAX - 1, { message: `An attempt has at most ${TRAINING_SEGMENTS_MAX} segments.` })
  seq: number;

  @ApiProperty({ example: 'checking the left steer tire tread looks good' })
  @IsString({ message: 'Send what was heard as text.' })
  @MaxLength(TRAINING_SEGMENT_TEXT_MAX, {
    message: `A segment has at most ${TRAINING_SEGMENT_TEXT_MAX} characters: send long speech as several segments.`,
  })
  text: string;

  @ApiProperty({ description: 'Milliseconds from the start of the recording.' })
  @IsInt({ message: 'Send startMs as a whole number of milliseconds.' })
  @Min(0, { message: 'startMs cannot be negative.' })
  @Max(DURATION_MAX_MS, { message: `startMs is at most ${DURATION_MAX_MS} (three hours).` })
  startMs: number;

  @ApiProperty({ description: 'Milliseconds from the start of the recording.' })
  @IsInt({ message: 'Send endMs as a whole number of milliseconds.' })
  @Min(0, { message: 'endMs cannot be negative.' })
  @Max(DURATION_MAX_MS, { message: `endMs is at most ${DURATION_MAX_MS} (three hours).` })
  endMs: number;
}

export class PutTrainingSegmentsDto implements PutTrainingSegmentsRequest {
  @ApiProperty({ type: [TrainingSegmentDto] })
  @IsArray({ message: 'Send the segments as a list.' })
  @ArrayMaxSize(TRAINING_SEGMENTS_MAX, { message: `Send at most ${TRAINING_SEGMENTS_MAX} segments at once.` })
  @ValidateNested({ each: true })
  @Type(() => TrainingSegmentDto)
  segments: TrainingSegmentDto[];
}

// The text field that comes with the recording, as multipart/form-data.
export class TrainingAudioUploadDto implements TrainingAudioUpload {
  @ApiProperty({ description: 'Length of the recording in milliseconds.', example: 184000 })
  @Type(() => Number)
  @DurationMs(DURATION_MAX_MS, 'A practice recording', 'three hours')
  durationMs: number;
}

export class FinishTrainingAttemptDto implements FinishTrainingAttemptRequest {
  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true }, { message: `Send finishedAt as ${ISO_TIME}.` })
  @NotInTheFuture()
  finishedAt: string;

  @ApiProperty({ description: 'Length of the narration in milliseconds.' })
  @DurationMs(DURATION_MAX_MS, 'A practice attempt', 'three hours')
  durationMs: number;
}

export class TrainingItemMarkDto implements TrainingItemMarkInput {
  @ApiProperty({ example: 'u1.axle1.left.tire.tread' })
  @IsString({ message: 'Send the item key as text.' })
  @IsNotEmpty({ message: 'Send the key of the checklist item.' })
  @MaxLength(ITEM_KEY_MAX, { message: `An item key has at most ${ITEM_KEY_MAX} characters.` })
  itemKey: string;

  @ApiProperty({ enum: TRAINING_ITEM_MARKS })
  @IsIn(TRAINING_ITEM_MARKS, { message: `Mark the item ${TRAINING_ITEM_MARKS.join(', ')}.` })
  mark: TrainingItemMarkValue;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'Write the comment as text.' })
  @MaxLength(TRAINING_COMMENT_MAX, { message: `Keep a comment under ${TRAINING_COMMENT_MAX} characters.` })
  comment?: string;
}

export class PutTrainingReviewDto implements PutTrainingReviewRequest {
  @ApiProperty({ type: [TrainingItemMarkDto] })
  @IsArray({ message: 'Send the marks as a list.' })
  @ArrayMaxSize(2000, { message: 'Send at most 2000 marks.' })
  @ValidateNested({ each: true })
  @Type(() => TrainingItemMarkDto)
  marks: TrainingItemMarkDto[];

  @ApiProperty({ enum: TRAINING_GRADES })
  @IsIn(TRAINING_GRADES, { message: `Choose a grade: ${TRAINING_GRADES.join(', ')}.` })
  grade: TrainingGrade;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'Write the comment as text.' })
  @MaxLength(TRAINING_COMMENT_MAX, { message: `Keep the comment under ${TRAINING_COMMENT_MAX} characters.` })
  comment?: string;
}

export class ListTrainingAttemptsQuery {
  @ApiPropertyOptional({ format: 'uuid', description: "Trainers: only this student's attempts." })
  @IsOptional()
  @IsUUID('all', { message: 'studentId is a UUID.' })
  studentId?: string;

  @ApiPropertyOptional({ enum: ['waiting', 'reviewed'], description: 'Finished and not reviewed yet, or reviewed.' })
  @IsOptional()
  @IsIn(['waiting', 'reviewed'], { message: 'review is waiting or reviewed.' })
  review?: 'waiting' | 'reviewed';
}

export class TrainingProgressQuery {
  @ApiPropertyOptional({ format: 'uuid', description: 'Trainers: the student whose progress to show.' })
  @IsOptional()
  @IsUUID('all', { message: 'studentId is a UUID.' })
  studentId?: string;
}
