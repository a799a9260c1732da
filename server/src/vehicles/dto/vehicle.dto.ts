import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import {
  VEHICLE_KINDS,
  VEHICLE_STATUSES,
  type VehicleKind,
  type VehicleRequest,
  type VehicleResponse,
  type VehicleStatus,
} from '@yardcall/shared';
import { Type } from 'class-transformer';
import { IsIn, IsObject, IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { TEXT, VehicleConfigDto } from './vehicle-config.dto';

// Only a bound on the request's size; the real lengths (a 17-character VIN...) are the shared vehicle
// rules' to check, with their own words.
const SHORT_TEXT = { message: 'This text is far too long for this field: check what was pasted here.' };

export class CreateVehicleDto implements VehicleRequest {
  @ApiProperty({ example: 'KV-104' })
  @IsString(TEXT)
  @MaxLength(100, SHORT_TEXT)
  unitNumber: string;

  @ApiProperty({ enum: VEHICLE_KINDS })
  @IsString(TEXT)
  kind: VehicleKind;

  @ApiProperty({ example: '7YCTA3K24SN100217' })
  @IsString(TEXT)
  @MaxLength(100, SHORT_TEXT)
  vin: string;

  @ApiProperty({ example: 'KVF 4417' })
  @IsString(TEXT)
  @MaxLength(100, SHORT_TEXT)
  plate: string;

  @ApiProperty({ type: VehicleConfigDto })
  @IsObject({ message: 'Send the configuration as an object with its axles.' })
  @ValidateNested()
  @Type(() => VehicleConfigDto)
  config: VehicleConfigDto;

  @ApiPropertyOptional({ enum: VEHICLE_STATUSES, default: 'in_service' })
  @IsOptional()
  @IsIn(VEHICLE_STATUSES, { message: `Choose a status: ${VEHICLE_STATUSES.join(', ')}.` })
  status?: VehicleStatus;

  @ApiPropertyOptional({ type: String, nullable: true, example: 'Air leak at the left drive chamber' })
  @IsOptional()
  @IsString(TEXT)
  @MaxLength(500, { message: 'Keep the reason under 500 characters.' })
  statusReason?: string | null;
}

// PATCH: fields not sent stay; a config sent replaces the whole configuration.
export class UpdateVehicleDto extends PartialType(CreateVehicleDto) {}

export class VehicleResponseDto implements VehicleResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  unitNumber: string;

  @ApiProperty({ enum: VEHICLE_KINDS })
  kind: VehicleKind;

  @ApiProperty()
  vin: string;

  @ApiProperty()
  plate: string;

  @ApiProperty({ enum: VEHICLE_STATUSES })
  status: VehicleStatus;

  @ApiProperty({ type: String, nullable: true })
  statusReason: string | null;

  @ApiProperty({ format: 'date-time' })
  statusSince: string;

  @ApiProperty({ type: VehicleConfigDto })
  config: VehicleConfigDto;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ format: 'date-time' })
  updatedAt: string;
}

export class ListVehiclesQuery {
  @ApiPropertyOptional({ description: 'Unit numbers starting with this text (any case).' })
  @IsOptional()
  @IsString(TEXT)
  @MaxLength(20, { message: 'A unit number has at most 20 characters.' })
  q?: string;

  @ApiPropertyOptional({ enum: VEHICLE_KINDS })
  @IsOptional()
  @IsIn(VEHICLE_KINDS, { message: `Choose a kind: ${VEHICLE_KINDS.join(', ')}.` })
  kind?: VehicleKind;
}
