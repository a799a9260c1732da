import { ApiProperty } from '@nestjs/swagger';
import {
  RETENTION_MAX_MONTHS,
  RETENTION_MIN_MONTHS,
  type RetentionPurgeResult,
  type RetentionSettings,
  type UpdateRetentionRequest,
} from '@yardcall/shared';
import { IsInt } from 'class-validator';

export class RetentionSettingsDto implements RetentionSettings {
  @ApiProperty({ example: 3 })
  months: number;

  @ApiProperty({ example: RETENTION_MIN_MONTHS, description: '49 CFR 396.11(a)(4): three months.' })
  minimumMonths: number;

  @ApiProperty({ format: 'date-time', description: 'Submitted inspections older than this may be removed now.' })
  cutoff: string;
}

export class UpdateRetentionDto implements UpdateRetentionRequest {
  @ApiProperty({ minimum: RETENTION_MIN_MONTHS, maximum: RETENTION_MAX_MONTHS, example: 12 })
  // The range and its source are checked by the shared rule, which words the message.
  @IsInt({ message: `Send months as a whole number from ${RETENTION_MIN_MONTHS} to ${RETENTION_MAX_MONTHS}.` })
  months: number;
}

export class RetentionRemovedDto {
  @ApiProperty() inspections: number;
  @ApiProperty() itemResults: number;
  @ApiProperty() voiceNotes: number;
  @ApiProperty() photos: number;
  @ApiProperty() defects: number;
  @ApiProperty() repairs: number;
  @ApiProperty() signatures: number;
  @ApiProperty({ description: 'Voice note and photo files removed from storage.' }) storedObjects: number;
}

export class RetentionPurgeResultDto implements RetentionPurgeResult {
  @ApiProperty({ format: 'date-time' })
  cutoff: string;

  @ApiProperty({ type: RetentionRemovedDto })
  removed: RetentionRemovedDto;

  @ApiProperty({ description: 'Old inspections kept because a defect of theirs is open or deferred (live work).' })
  keptWithOpenDefects: number;
}
