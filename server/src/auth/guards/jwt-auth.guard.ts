import { HttpException, Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { AuthUser } from '../auth-user';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';

// Every route needs a valid access token unless marked @Public().
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (isPublic) return true;
    return super.canActivate(context);
  }

  // passport-jwt reports why a token failed in `info`; say it in words a person can act on.
  override handleRequest<TUser = AuthUser>(err: unknown, user: TUser | false, info: unknown): TUser {
    if (err instanceof HttpException) throw err;
    if (user && !err) return user;
    const reason = info instanceof Error ? info : null;
    if (reason?.name === 'TokenExpiredError') {
      throw new UnauthorizedException('Your session has expired: sign in again.');
    }
    if (reason?.message === 'No auth token') {
      throw new UnauthorizedException('Sign in first: send your access token as "Authorization: Bearer <token>".');
    }
    throw new UnauthorizedException('The access token is not valid: sign in again.');
  }
}
