import { Body, Get, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { DefectResponse } from '@yardcall/shared';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { DefectsService } from './defects.service';
import { DefectResponseDto, ListDefectsQuery, RepairRequestDto } from './dto/defect.dto';

@SignedInController('defects')
export class DefectsController {
  constructor(private readonly defects: DefectsService) {}

  @Get()
  @Roles('mechanic', 'supervisor', 'admin')
  @ApiOperation({ summary: "The organisation's defects, safety ones first, newest first; ?status= and ?vehicleId=." })
  @ApiOkResponse({ type: [DefectResponseDto] })
  @ApiErrors({ badRequest: true })
  list(@CurrentUser() user: AuthUser, @Query() query: ListDefectsQuery): Promise<DefectResponse[]> {
    return this.defects.list(user, query);
  }

  @Post(':id/repair')
  @Roles('mechanic')
  @ApiOperation({
    summary:
      'Certify a defect as repaired, as needing no repair, or (when it does not affect safe operation) deferred; signed by the mechanic.',
  })
  @ApiCreatedResponse({ type: DefectResponseDto })
  @ApiErrors({
    badRequest: 'A deferral needs a reason and a future date.',
    notFound: true,
    conflict: 'Already certified.',
  })
  repair(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: RepairRequestDto,
  ): Promise<DefectResponse> {
    return this.defects.repair(user, id, body);
  }
}
