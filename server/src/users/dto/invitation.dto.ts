import { ApiProperty } from '@nestjs/swagger';
import { PASSWORD_MIN_LENGTH, type AcceptInvitationRequest, type InvitationSummary } from '@yardcall/shared';
import { IsString, Length } from 'class-validator';

export class InvitationSummaryDto implements InvitationSummary {
  @ApiProperty()
  email: string;

  @ApiProperty()
  name: string;

  @ApiProperty()
  organizationName: string;

  @ApiProperty({ format: 'date-time' })
  expiresAt: string;
}

const PASSWORD_MESSAGE = `Choose a password of at least ${PASSWORD_MIN_LENGTH} characters (at most 200).`;

export class AcceptInvitationDto implements AcceptInvitationRequest {
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH })
  @IsString({ message: PASSWORD_MESSAGE })
  @Length(PASSWORD_MIN_LENGTH, 200, { message: PASSWORD_MESSAGE })
  password: string;
}
