import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension, ApiForbiddenResponse } from '@nestjs/swagger';
import type { Role } from '@yardcall/shared';

export const ROLES_KEY = 'yardcall:roles';

// Restricts a route to these roles (RolesGuard); documented in OpenAPI as x-roles.
export function Roles(...roles: Role[]): MethodDecorator & ClassDecorator {
  return applyDecorators(
    SetMetadata(ROLES_KEY, roles),
    ApiExtension('x-roles', roles),
    ApiForbiddenResponse({ description: `Only ${roles.join(', ')} may call this route.` }),
  );
}
