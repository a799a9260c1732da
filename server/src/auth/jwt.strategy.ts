import { Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import type { AppEnv } from '../config/env.validation';
import { User } from '../users/entities/user.entity';
import type { AccessTokenPayload, AuthUser } from './auth-user';

// Re-reads the user on every request, so a changed role or a removed account takes effect at once.
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService<AppEnv, true>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      secretOrKey: config.get('JWT_SECRET', { infer: true }),
      algorithms: ['HS256'],
    });
  }

  async validate(payload: AccessTokenPayload): Promise<AuthUser> {
    const user = typeof payload.sub === 'string' ? await this.users.findOneBy({ id: payload.sub }) : null;
    if (!user || user.status !== 'active' || user.organizationId !== payload.org) {
      throw new UnauthorizedException('Your account is not active any more: ask your administrator.');
    }
    return { id: user.id, organizationId: user.organizationId, role: user.role, email: user.email };
  }
}
