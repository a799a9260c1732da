import { Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { FleetBoard } from '@yardcall/shared';
import { SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { FleetBoardDto } from './dto/fleet-board.dto';
import { FleetService } from './fleet.service';

@SignedInController('fleet')
export class FleetController {
  constructor(private readonly fleet: FleetService) {}

  @Get('board')
  @Roles('supervisor', 'admin', 'mechanic')
  @ApiOperation({
    summary:
      'Which vehicles may be dispatched: each with its status, since when it is out of service and why (its open safety defects), and its last report.',
  })
  @ApiOkResponse({ type: FleetBoardDto })
  board(@CurrentUser() user: AuthUser): Promise<FleetBoard> {
    return this.fleet.board(user.organizationId);
  }
}
