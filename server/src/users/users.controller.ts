import { Body, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { UserSummary } from '@yardcall/shared';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { InviteUserDto } from './dto/invite-user.dto';
import { ListUsersQuery } from './dto/list-users.query';
import { UpdateUserDto } from './dto/update-user.dto';
import { UserSummaryDto } from './dto/user-summary.dto';
import { UsersService } from './users.service';

@SignedInController('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Roles('admin', 'supervisor', 'trainer')
  @ApiOperation({ summary: "The organisation's users; trainers filter students with ?student=true." })
  @ApiOkResponse({ type: [UserSummaryDto] })
  list(@CurrentUser() user: AuthUser, @Query() query: ListUsersQuery): Promise<UserSummary[]> {
    return this.users.list(user, query);
  }

  @Post()
  @Roles('admin')
  @ApiOperation({ summary: 'Invite a person by e-mail: they get a link to choose their password.' })
  @ApiCreatedResponse({ type: UserSummaryDto })
  @ApiErrors({ conflict: 'The e-mail address is taken.' })
  invite(@CurrentUser() user: AuthUser, @Body() body: InviteUserDto): Promise<UserSummary> {
    return this.users.invite(user, body);
  }

  @Patch(':id')
  @Roles('admin')
  @ApiOperation({ summary: "Change a user's role, name or student flag." })
  @ApiOkResponse({ type: UserSummaryDto })
  @ApiErrors({ notFound: true })
  update(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: UpdateUserDto,
  ): Promise<UserSummary> {
    return this.users.update(user, id, body);
  }
}
