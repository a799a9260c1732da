import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  AXLE_POSITIONS,
  BRAKE_TYPES,
  CHAMBER_SIZES,
  CHAMBER_STROKES,
  STEERING_TYPES,
  TIRE_ARRANGEMENTS,
} from '@yardcall/shared';
import type {
  AxleConfig,
  AxlePosition,
  BrakeChamber,
  BrakeType,
  ChamberSize,
  ChamberStroke,
  SteeringConfig,
  SteeringType,
  TireArrangement,
  TireSpec,
  VehicleConfig,
} from '@yardcall/shared';
import { Type } from 'class-transformer';
import { IsArray, IsBoolean, IsNumber, IsObject, IsOptional, IsString, ValidateNested } from 'class-validator';

// These classes check only the shape (types, no unknown fields). The vehicle rules themselves
// (allowed values, ranges, which axle needs what) live in @yardcall/shared validateVehicle.
export const TEXT = { message: 'Enter this as text.' };
const NUMBER = { message: 'Enter this as a number.' };
const OBJECT = { message: 'Send this as an object.' };

export class BrakeChamberDto implements BrakeChamber {
  @ApiProperty({ enum: CHAMBER_SIZES, example: 30 })
  @IsNumber({}, NUMBER)
  size: ChamberSize;

  @ApiProperty({ enum: CHAMBER_STROKES })
  @IsString(TEXT)
  stroke: ChamberStroke;

  @ApiPropertyOptional({ description: 'Long-stroke type 20/24 with a 3 in rated stroke.' })
  @IsOptional()
  @IsBoolean({ message: 'Send true or false.' })
  ratedStroke3In?: boolean;
}

export class TireSpecDto implements TireSpec {
  @ApiProperty({ example: '11R22.5' })
  @IsString(TEXT)
  size: string;

  @ApiProperty({ example: 105 })
  @IsNumber({}, NUMBER)
  coldInflationPsi: number;

  @ApiProperty({ example: 120 })
  @IsNumber({}, NUMBER)
  sidewallMaxPsi: number;
}

export class AxleConfigDto implements AxleConfig {
  @ApiProperty({ enum: AXLE_POSITIONS })
  @IsString(TEXT)
  position: AxlePosition;

  @ApiProperty({ enum: TIRE_ARRANGEMENTS })
  @IsString(TEXT)
  tires: TireArrangement;

  @ApiProperty({ enum: BRAKE_TYPES })
  @IsString(TEXT)
  brake: BrakeType;

  @ApiPropertyOptional({ type: BrakeChamberDto, description: 'Present exactly when the brake is air-operated.' })
  @IsOptional()
  @IsObject(OBJECT)
  @ValidateNested()
  @Type(() => BrakeChamberDto)
  chamber?: BrakeChamberDto;

  @ApiProperty({ type: TireSpecDto })
  @IsObject(OBJECT)
  @ValidateNested()
  @Type(() => TireSpecDto)
  tire: TireSpecDto;
}

export class SteeringConfigDto implements SteeringConfig {
  @ApiProperty({ example: 20 })
  @IsNumber({}, NUMBER)
  wheelDiameterIn: number;

  @ApiProperty({ enum: STEERING_TYPES })
  @IsString(TEXT)
  type: SteeringType;
}

export class VehicleConfigDto implements VehicleConfig {
  @ApiProperty({ type: [AxleConfigDto], description: 'Front to back.' })
  @IsArray({ message: 'Send the axles as a list, front to back.' })
  @ValidateNested({ each: true })
  @Type(() => AxleConfigDto)
  axles: AxleConfigDto[];

  @ApiPropertyOptional({ type: SteeringConfigDto, description: 'Power units only.' })
  @IsOptional()
  @IsObject(OBJECT)
  @ValidateNested()
  @Type(() => SteeringConfigDto)
  steering?: SteeringConfigDto;
}
