import { ApiProperty } from '@nestjs/swagger';
import type { LoginResponse } from '@yardcall/shared';
import { UserSummaryDto } from '../../users/dto/user-summary.dto';

export class LoginResponseDto implements LoginResponse {
  @ApiProperty({ description: 'Send as "Authorization: Bearer <accessToken>".' })
  accessToken: string;

  @ApiProperty({ type: UserSummaryDto })
  user: UserSummaryDto;
}
