import { ApiProperty } from '@nestjs/swagger';
import {
  INSPECTION_KINDS,
  VEHICLE_KINDS,
  VEHICLE_STATUSES,
  type FleetBoard,
  type FleetBoardDefect,
  type FleetBoardInspection,
  type FleetBoardVehicle,
  type InspectionKind,
  type VehicleKind,
  type VehicleStatus,
} from '@yardcall/shared';
import { PersonRefDto } from '../../inspections/dto/person-ref.dto';

export class FleetBoardDefectDto implements FleetBoardDefect {
  @ApiProperty({ format: 'uuid' })
  defectId: string;

  @ApiProperty({ example: 'Brake chamber pushrod stroke' })
  title: string;

  @ApiProperty({ example: 'Tractor, axle 2, left' })
  positionLabel: string;

  @ApiProperty({ format: 'uuid' })
  inspectionId: string;

  @ApiProperty({ format: 'date-time' })
  reportedAt: string;
}

export class FleetBoardInspectionDto implements FleetBoardInspection {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: INSPECTION_KINDS })
  kind: InspectionKind;

  @ApiProperty({ format: 'date-time' })
  submittedAt: string;

  @ApiProperty({ type: PersonRefDto })
  driver: PersonRefDto;
}

export class FleetBoardTodayDto {
  @ApiProperty({ type: FleetBoardInspectionDto, nullable: true, description: "Today's first pre-trip." })
  preTrip: FleetBoardInspectionDto | null;

  @ApiProperty({
    type: FleetBoardInspectionDto,
    nullable: true,
    description: 'A post-trip or en-route inspection today with no pre-trip before it: the unit was used without one.',
  })
  usedWithoutPreTrip: FleetBoardInspectionDto | null;
}

export class FleetBoardVehicleDto implements FleetBoardVehicle {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'KV-214' })
  unitNumber: string;

  @ApiProperty({ enum: VEHICLE_KINDS })
  kind: VehicleKind;

  @ApiProperty({ enum: VEHICLE_STATUSES })
  status: VehicleStatus;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  outOfServiceSince: string | null;

  @ApiProperty({
    type: String,
    nullable: true,
    description: 'Why it is out of service, in words: a hold put by hand first, then the open safety defects.',
  })
  statusReason: string | null;

  @ApiProperty({ type: [FleetBoardDefectDto], description: 'Why it is out of service: its open safety defects.' })
  openSafetyDefects: FleetBoardDefectDto[];

  @ApiProperty({ type: FleetBoardInspectionDto, nullable: true })
  lastInspection: FleetBoardInspectionDto | null;

  @ApiProperty({ type: FleetBoardTodayDto, description: "Today, in the organisation's time zone." })
  today: FleetBoardTodayDto;
}

export class FleetBoardDto implements FleetBoard {
  @ApiProperty({ type: [FleetBoardVehicleDto], description: 'Out of service first, then by unit number.' })
  vehicles: FleetBoardVehicleDto[];

  @ApiProperty()
  inServiceCount: number;

  @ApiProperty()
  outOfServiceCount: number;

  @ApiProperty({ format: 'date-time' })
  generatedAt: string;

  @ApiProperty({ example: '2026-12-03', description: "Today's date in the organisation's time zone." })
  day: string;

  @ApiProperty({ example: 'America/Chicago', description: "The organisation's IANA time zone." })
  timeZone: string;
}
