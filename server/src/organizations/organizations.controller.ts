import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { OrganizationSummary } from '@yardcall/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { OrganizationSummaryDto } from './dto/organization-summary.dto';
import { OrganizationsService } from './organizations.service';

@ApiTags('organizations')
@ApiBearerAuth()
@Controller('organizations')
export class OrganizationsController {
  constructor(private readonly organizations: OrganizationsService) {}

  @Get('current')
  @ApiOperation({ summary: "The signed-in user's organisation." })
  @ApiOkResponse({ type: OrganizationSummaryDto })
  current(@CurrentUser() user: AuthUser): Promise<OrganizationSummary> {
    return this.organizations.summary(user.organizationId);
  }
}
