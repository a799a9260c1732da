import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  CERTIFICATION_ACTIONS,
  DEFECT_STATUSES,
  type CertificationAction,
  type DefectResponse,
  type DefectStatus,
  type RepairRequest,
  type RepairResponse,
} from '@yardcall/shared';
import { Type } from 'class-transformer';
import { IsIn, IsISO8601, IsObject, IsOptional, IsString, IsUUID, MaxLength, ValidateNested } from 'class-validator';
import { InspectionVehicleDto, PersonRefDto } from '../../inspections/dto/person-ref.dto';
import { MeasurementValueDto, ResultLimitDto } from '../../inspections/dto/result.dto';
import { SignatureInputDto } from '../../inspections/dto/signature.dto';

export class RepairRequestDto implements RepairRequest {
  @ApiProperty({ enum: CERTIFICATION_ACTIONS })
  @IsIn(CERTIFICATION_ACTIONS, { message: `Choose an action: ${CERTIFICATION_ACTIONS.join(', ')}.` })
  action: CertificationAction;

  @ApiProperty({ example: 'Replaced the left steer tire.', description: 'What was done, or why repair waits.' })
  @IsString({ message: 'Write the note as text.' })
  @MaxLength(2000, { message: 'Keep the note under 2000 characters.' })
  note: string;

  @ApiPropertyOptional({ format: 'date-time', description: 'Required when deferring: a future date.' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'Send deferredUntil as an ISO 8601 date, e.g. 2026-12-15.' })
  deferredUntil?: string;

  @ApiProperty({ type: SignatureInputDto })
  @IsObject({ message: 'Sign with {name, drawing?}.' })
  @ValidateNested()
  @Type(() => SignatureInputDto)
  signature: SignatureInputDto;
}

export class RepairResponseDto implements RepairResponse {
  @ApiProperty({ enum: CERTIFICATION_ACTIONS })
  action: CertificationAction;

  @ApiProperty()
  note: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  deferredUntil: string | null;

  @ApiProperty({ type: PersonRefDto })
  mechanic: PersonRefDto;

  @ApiProperty({ format: 'date-time' })
  signedAt: string;
}

export class DefectResponseDto implements DefectResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ format: 'uuid' })
  inspectionId: string;

  @ApiProperty({ type: InspectionVehicleDto })
  vehicle: InspectionVehicleDto;

  @ApiProperty()
  itemKey: string;

  @ApiProperty()
  title: string;

  @ApiProperty()
  positionLabel: string;

  @ApiProperty({ description: 'Blocks driving until repaired or certified as not needing repair.' })
  safety: boolean;

  @ApiProperty({ type: String, nullable: true })
  detail: string | null;

  @ApiProperty({ type: MeasurementValueDto, nullable: true })
  measurement: MeasurementValueDto | null;

  @ApiProperty({ type: ResultLimitDto, nullable: true })
  limit: ResultLimitDto | null;

  @ApiProperty({ enum: DEFECT_STATUSES })
  status: DefectStatus;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: RepairResponseDto, nullable: true, description: 'The latest certification.' })
  repair: RepairResponseDto | null;
}

export class ListDefectsQuery {
  @ApiPropertyOptional({ enum: DEFECT_STATUSES })
  @IsOptional()
  @IsIn(DEFECT_STATUSES, { message: `Choose a status: ${DEFECT_STATUSES.join(', ')}.` })
  status?: DefectStatus;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'vehicleId must be a vehicle id (a UUID).' })
  vehicleId?: string;
}
