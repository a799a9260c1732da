import { ApiProperty } from '@nestjs/swagger';
import type { OrganizationTimeZone, UpdateTimeZoneRequest } from '@yardcall/shared';
import { IsString, MaxLength } from 'class-validator';

export class OrganizationTimeZoneDto implements OrganizationTimeZone {
  @ApiProperty({ example: 'America/Chicago', description: 'An IANA time zone name.' })
  timeZone: string;
}

export class UpdateTimeZoneDto implements UpdateTimeZoneRequest {
  @ApiProperty({ example: 'America/Chicago', description: 'An IANA time zone name, e.g. America/Denver or UTC.' })
  // Whether the name is a real zone is the service's check (shared canonicalTimeZone).
  @IsString({ message: 'Send the time zone as text, e.g. America/Chicago.' })
  @MaxLength(64, { message: 'A time zone name has at most 64 characters.' })
  timeZone: string;
}
