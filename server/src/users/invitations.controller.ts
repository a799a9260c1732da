import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ApiErrors } from '../common/api-docs';
import type { InvitationSummary, LoginResponse } from '@yardcall/shared';
import { Public } from '../auth/decorators/public.decorator';
import { LoginResponseDto } from '../auth/dto/login-response.dto';
import { AcceptInvitationDto, InvitationSummaryDto } from './dto/invitation.dto';
import { InvitationsService } from './invitations.service';

@ApiTags('invitations')
@Public()
@Controller('invitations')
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get(':token')
  @ApiOperation({ summary: 'Who an invitation link is for, before they choose a password.' })
  @ApiOkResponse({ type: InvitationSummaryDto })
  @ApiErrors({ notFound: 'No such invitation.', gone: 'Used or expired.' })
  summary(@Param('token') token: string): Promise<InvitationSummary> {
    return this.invitations.summary(token);
  }

  @Post(':token/accept')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Choose a password, activate the account and sign in.' })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiErrors({ notFound: 'No such invitation.', gone: 'Used or expired.' })
  accept(@Param('token') token: string, @Body() body: AcceptInvitationDto): Promise<LoginResponse> {
    return this.invitations.accept(token, body.password);
  }
}
