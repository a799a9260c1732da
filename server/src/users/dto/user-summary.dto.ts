import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role, type UserSummary } from '@yardcall/shared';
import { DisplaySettingsDto } from '../../auth/dto/display-settings.dto';

export class UserSummaryDto implements UserSummary {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'driver@yardcall.test' })
  email: string;

  @ApiProperty({ example: 'Dana Okafor' })
  name: string;

  @ApiProperty({ enum: ROLES })
  role: Role;

  @ApiProperty()
  isStudent: boolean;

  @ApiProperty({ enum: ['active', 'invited'] })
  status: 'active' | 'invited';

  @ApiProperty({ format: 'uuid' })
  organizationId: string;

  @ApiProperty()
  organizationName: string;

  @ApiProperty({ type: DisplaySettingsDto })
  settings: DisplaySettingsDto;
}
