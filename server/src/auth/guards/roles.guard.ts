import { ForbiddenException, Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@yardcall/shared';
import type { Request } from 'express';
import type { AuthUser } from '../auth-user';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY } from '../decorators/roles.decorator';

// Runs after JwtAuthGuard: a route with @Roles(...) refuses every other role with a sentence naming those allowed.
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC_KEY, targets)) return true;
    const allowed = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!allowed || allowed.length === 0) return true;
    const user = context.switchToHttp().getRequest<Request & { user?: AuthUser }>().user;
    if (user && allowed.includes(user.role)) return true;
    throw new ForbiddenException(
      `Only ${allowed.length === 1 ? 'the role' : 'these roles'} ${allowed.join(', ')} may do this; you are signed in as ${user?.role ?? 'nobody'}.`,
    );
  }
}
