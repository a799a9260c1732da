import { Body, Get, HttpCode, Patch, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type {
  OrganizationSummary,
  OrganizationTimeZone,
  RetentionPurgeResult,
  RetentionSettings,
} from '@yardcall/shared';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { OrganizationSummaryDto } from './dto/organization-summary.dto';
import { UpdateRequiredReadingsDto } from './dto/required-readings.dto';
import { RetentionPurgeResultDto, RetentionSettingsDto, UpdateRetentionDto } from './dto/retention.dto';
import { OrganizationTimeZoneDto, UpdateTimeZoneDto } from './dto/time-zone.dto';
import { OrganizationsService } from './organizations.service';
import { RetentionService } from './retention.service';

@SignedInController('organizations')
export class OrganizationsController {
  constructor(
    private readonly organizations: OrganizationsService,
    private readonly retention: RetentionService,
  ) {}

  @Get('current')
  @ApiOperation({ summary: "The signed-in user's organisation." })
  @ApiOkResponse({ type: OrganizationSummaryDto })
  current(@CurrentUser() user: AuthUser): Promise<OrganizationSummary> {
    return this.organizations.summary(user.organizationId);
  }

  @Patch('readings')
  @Roles('admin')
  @ApiOperation({
    summary:
      'Choose the readings every walk-around must take (by default none). Walk-arounds already begun keep theirs; a driver may still answer "no gauge".',
  })
  @ApiOkResponse({ type: OrganizationSummaryDto })
  @ApiErrors({ badRequest: 'Not a list, or a reading the app does not know.' })
  updateReadings(@CurrentUser() user: AuthUser, @Body() body: UpdateRequiredReadingsDto): Promise<OrganizationSummary> {
    return this.organizations.updateRequiredReadings(user.organizationId, body.requiredReadings);
  }

  @Get('time-zone')
  @ApiOperation({ summary: "The organisation's time zone: days, report times and e-mails read in it." })
  @ApiOkResponse({ type: OrganizationTimeZoneDto })
  getTimeZone(@CurrentUser() user: AuthUser): Promise<OrganizationTimeZone> {
    return this.organizations.timeZone(user.organizationId);
  }

  @Patch('time-zone')
  @Roles('admin')
  @ApiOperation({ summary: "Set the organisation's time zone (an IANA name, e.g. America/Chicago)." })
  @ApiOkResponse({ type: OrganizationTimeZoneDto })
  @ApiErrors({ badRequest: 'Not a time zone name the server knows.' })
  updateTimeZone(@CurrentUser() user: AuthUser, @Body() body: UpdateTimeZoneDto): Promise<OrganizationTimeZone> {
    return this.organizations.updateTimeZone(user.organizationId, body.timeZone);
  }

  @Get('retention')
  @Roles('admin')
  @ApiOperation({ summary: 'How many months inspection records are kept (at least 3, 49 CFR 396.11(a)(4)).' })
  @ApiOkResponse({ type: RetentionSettingsDto })
  getRetention(@CurrentUser() user: AuthUser): Promise<RetentionSettings> {
    return this.retention.settings(user.organizationId);
  }

  @Patch('retention')
  @Roles('admin')
  @ApiOperation({ summary: 'Keep records longer (never below 3 months).' })
  @ApiOkResponse({ type: RetentionSettingsDto })
  @ApiErrors({ badRequest: 'Below the minimum, or not a whole number.' })
  updateRetention(@CurrentUser() user: AuthUser, @Body() body: UpdateRetentionDto): Promise<RetentionSettings> {
    return this.retention.update(user.organizationId, body.months);
  }

  @Post('retention/purge')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Remove now the submitted inspections whose every record is older than the setting; one with an open or deferred defect stays. Also runs daily.',
  })
  @ApiOkResponse({ type: RetentionPurgeResultDto })
  purge(@CurrentUser() user: AuthUser): Promise<RetentionPurgeResult> {
    return this.retention.purge(user.organizationId);
  }
}
