import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type InviteUserRequest, type Role } from '@yardcall/shared';
import { IsBoolean, IsEmail, IsIn, IsOptional, IsString, Length, MaxLength } from 'class-validator';

export const NAME_MESSAGE = 'Enter a name of 1 to 120 characters.';
export const ROLE_MESSAGE = `Choose a role: ${ROLES.join(', ')}.`;

export class InviteUserDto implements InviteUserRequest {
  @ApiProperty({ example: 'new.driver@yardcall.test' })
  @IsEmail({}, { message: 'Enter an e-mail address, e.g. name@example.com.' })
  @MaxLength(254, { message: 'An e-mail address has at most 254 characters.' })
  email: string;

  @ApiProperty({ example: 'Sam Whitfield' })
  @IsString({ message: NAME_MESSAGE })
  @Length(1, 120, { message: NAME_MESSAGE })
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: ROLE_MESSAGE })
  role: Role;

  @ApiPropertyOptional({ default: false, description: 'A driver in training.' })
  @IsOptional()
  @IsBoolean({ message: 'isStudent is true or false.' })
  isStudent?: boolean;
}
