import { ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type Role } from '@yardcall/shared';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional } from 'class-validator';
import { ROLE_MESSAGE } from './invite-user.dto';

// Query strings arrive as text: "true"/"false" become booleans, anything else fails validation.
function toBoolean({ value }: { value: unknown }): unknown {
  if (value === 'true') return true;
  if (value === 'false') return false;
  return value;
}

export class ListUsersQuery {
  @ApiPropertyOptional({ description: 'Only students (true) or only non-students (false).' })
  @IsOptional()
  @Transform(toBoolean)
  @IsBoolean({ message: 'student is true or false.' })
  student?: boolean;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: ROLE_MESSAGE })
  role?: Role;
}
