import { ApiProperty } from '@nestjs/swagger';
import { VEHICLE_KINDS, type InspectionVehicle, type PersonRef, type VehicleKind } from '@yardcall/shared';

export class PersonRefDto implements PersonRef {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Dana Okafor' })
  name: string;
}

export class InspectionVehicleDto implements InspectionVehicle {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'KV-101' })
  unitNumber: string;

  @ApiProperty({ enum: VEHICLE_KINDS })
  kind: VehicleKind;
}
