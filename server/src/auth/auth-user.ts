import type { Role } from '@yardcall/shared';

// Who is calling: set on the request by the JWT strategy after the user was re-read from the database.
export interface AuthUser {
  id: string;
  organizationId: string;
  role: Role;
  email: string;
}

// The claims inside an access token.
export interface AccessTokenPayload {
  sub: string;
  org: string;
  role: Role;
}
