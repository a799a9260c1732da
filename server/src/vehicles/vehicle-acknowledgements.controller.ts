import { Get, Res } from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { PendingAcknowledgement } from '@yardcall/shared';
import type { Response } from 'express';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { AcknowledgementsService } from '../inspections/acknowledgements.service';
import { PendingAcknowledgementDto } from '../inspections/dto/inspection.dto';

// A vehicle's report waiting for the next driver's acknowledgement: a /vehicles route, answered by the
// inspections module's AcknowledgementsService (tagged "inspections" in the API document, as it always was).
@SignedInController('vehicles', 'inspections')
export class VehicleAcknowledgementsController {
  constructor(private readonly acknowledgements: AcknowledgementsService) {}

  @Get(':id/pending-acknowledgement')
  @Roles('driver')
  @ApiOperation({
    summary:
      "The vehicle's last report when a mechanic certified its defects and no driver has acknowledged that yet; 204 when nothing waits.",
  })
  @ApiOkResponse({ type: PendingAcknowledgementDto })
  @ApiNoContentResponse({ description: 'Nothing waits for an acknowledgement.' })
  @ApiErrors({ notFound: true })
  async pending(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PendingAcknowledgement | undefined> {
    const pending = await this.acknowledgements.pending(user, id);
    if (!pending) {
      response.status(204);
      return undefined;
    }
    return pending;
  }
}
