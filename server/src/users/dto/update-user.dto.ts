import { ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type Role, type UpdateUserRequest } from '@yardcall/shared';
import { IsBoolean, IsIn, IsOptional, IsString, Length } from 'class-validator';
import { NAME_MESSAGE, ROLE_MESSAGE } from './invite-user.dto';

export class UpdateUserDto implements UpdateUserRequest {
  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: ROLE_MESSAGE })
  role?: Role;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: NAME_MESSAGE })
  @Length(1, 120, { message: NAME_MESSAGE })
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'isStudent is true or false.' })
  isStudent?: boolean;
}
