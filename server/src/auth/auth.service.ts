import { Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import type { LoginResponse, UserSummary } from '@yardcall/shared';
import { Repository } from 'typeorm';
import { User } from '../users/entities/user.entity';
import { toUserSummary } from '../users/user-summary';
import type { AccessTokenPayload } from './auth-user';
import type { UpdateDisplaySettingsDto } from './dto/display-settings.dto';
import { LoginLimiter } from './login-limiter';
import { verifyPassword } from './password';

const WRONG_CREDENTIALS = 'Email or password is wrong.';

@Injectable()
export class AuthService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly jwt: JwtService,
    private readonly limiter: LoginLimiter,
  ) {}

  // `client` is the caller's address (behind a local proxy, the one it forwards).
  async login(email: string, password: string, client: string): Promise<LoginResponse> {
    this.limiter.assertAllowed(client, email);
    const user = await this.users
      .createQueryBuilder('user')
      .innerJoinAndSelect('user.organization', 'organization')
      .where('lower(user.email) = lower(:email)', { email: email.trim() })
      .getOne();
    const ok = await verifyPassword(password, user?.status === 'active' ? (user.passwordHash ?? null) : null);
    if (!user || !ok) {
      this.limiter.recordFailure(client, email);
      throw new UnauthorizedException(WRONG_CREDENTIALS);
    }
    this.limiter.recordSuccess(email);
    return this.issue(user);
  }

  // Used after sign-in and after an invitation is accepted.
  async issue(user: User): Promise<LoginResponse> {
    const organization = user.organization;
    if (!organization) throw new Error('issue() needs the user loaded with its organization');
    const payload: AccessTokenPayload = { sub: user.id, org: user.organizationId, role: user.role };
    return { accessToken: await this.jwt.signAsync(payload), user: toUserSummary(user, organization) };
  }

  async me(userId: string): Promise<UserSummary> {
    const user = await this.loadWithOrganization(userId);
    return toUserSummary(user, user.organization);
  }

  async updateSettings(userId: string, changes: UpdateDisplaySettingsDto): Promise<UserSummary> {
    const user = await this.loadWithOrganization(userId);
    const defined = Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined));
    user.settings = { ...user.settings, ...defined };
    await this.users.update({ id: user.id }, { settings: user.settings });
    return toUserSummary(user, user.organization);
  }

  private async loadWithOrganization(
    userId: string,
  ): Promise<User & { organization: NonNullable<User['organization']> }> {
    const user = await this.users.findOne({ where: { id: userId }, relations: { organization: true } });
    if (!user?.organization) throw new NotFoundException('Your account was not found: sign in again.');
    return user as User & { organization: NonNullable<User['organization']> };
  }
}
