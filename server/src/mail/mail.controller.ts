import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { CaughtMail } from '@yardcall/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { ApiErrorBodyDto } from '../common/dto/api-error-body.dto';
import { CaughtMailDto } from './dto/caught-mail.dto';
import { MailService } from './mail.service';

@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get('outbox')
  @Roles('admin')
  @ApiOperation({ summary: "E-mail caught by the built-in catcher for this organisation's users, newest first." })
  @ApiOkResponse({ type: [CaughtMailDto] })
  @ApiNotFoundResponse({ type: ApiErrorBodyDto, description: 'Real SMTP is configured: nothing is caught.' })
  outbox(@CurrentUser() user: AuthUser): Promise<CaughtMail[]> {
    return this.mail.outboxFor(user.organizationId);
  }
}
