import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { MAX_UNITS } from '@yardcall/shared';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsUUID } from 'class-validator';

// The vehicles of one walk-around or practice attempt: a power unit first, then its trailers, at most
// as many units as the checklist engine takes (MAX_UNITS).
export function VehicleIds(): PropertyDecorator {
  return applyDecorators(
    ApiProperty({ type: [String], format: 'uuid', description: 'Power unit first, then trailer(s).' }),
    IsArray({ message: 'Send the vehicle ids as a list: the power unit first, then its trailers.' }),
    ArrayMinSize(1, { message: 'Choose at least one vehicle.' }),
    ArrayMaxSize(MAX_UNITS, { message: `Choose at most ${MAX_UNITS} vehicles: a power unit and its trailers.` }),
    ArrayUnique({ message: 'Each vehicle may appear only once.' }),
    IsUUID('all', { each: true, message: 'Each vehicle id is a UUID.' }),
  );
}
