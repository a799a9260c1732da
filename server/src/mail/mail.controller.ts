import { Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { CaughtMail } from '@yardcall/shared';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CaughtMailDto } from './dto/caught-mail.dto';
import { MailService } from './mail.service';

@SignedInController('mail')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get('outbox')
  @Roles('admin')
  @ApiOperation({ summary: "E-mail caught by the built-in catcher for this organisation's users, newest first." })
  @ApiOkResponse({ type: [CaughtMailDto] })
  @ApiErrors({ notFound: 'Real SMTP is configured: nothing is caught.' })
  outbox(@CurrentUser() user: AuthUser): Promise<CaughtMail[]> {
    return this.mail.outboxFor(user.organizationId);
  }
}
