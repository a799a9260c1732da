import { Body, Controller, Get, HttpCode, HttpStatus, Ip, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { LoginResponse, UserSummary } from '@yardcall/shared';
import { UserSummaryDto } from '../users/dto/user-summary.dto';
import { ApiErrors } from '../common/api-docs';
import type { AuthUser } from './auth-user';
import { AuthService } from './auth.service';
import { CurrentUser } from './decorators/current-user.decorator';
import { Public } from './decorators/public.decorator';
import { UpdateDisplaySettingsDto } from './dto/display-settings.dto';
import { LoginResponseDto } from './dto/login-response.dto';
import { LoginDto } from './dto/login.dto';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Sign in with e-mail and password; answers an access token and the user.' })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiErrors({
    unauthorized: 'Email or password is wrong.',
    tooManyRequests: 'Too many failed attempts for this e-mail address, or from this client, in the last minute.',
  })
  login(@Body() body: LoginDto, @Ip() client: string): Promise<LoginResponse> {
    return this.auth.login(body.email, body.password, client);
  }

  @ApiBearerAuth()
  @Get('me')
  @ApiOperation({ summary: 'The signed-in user.' })
  @ApiOkResponse({ type: UserSummaryDto })
  @ApiErrors({ unauthorized: true })
  me(@CurrentUser() user: AuthUser): Promise<UserSummary> {
    return this.auth.me(user.id);
  }

  @ApiBearerAuth()
  @Patch('me/settings')
  @ApiOperation({ summary: "Change the signed-in user's display settings (only the fields sent)." })
  @ApiOkResponse({ type: UserSummaryDto })
  @ApiErrors({ unauthorized: true })
  updateSettings(@CurrentUser() user: AuthUser, @Body() body: UpdateDisplaySettingsDto): Promise<UserSummary> {
    return this.auth.updateSettings(user.id, body);
  }
}
