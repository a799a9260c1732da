import { createHash, randomBytes } from 'node:crypto';

// 32 random bytes (256 bits), base64url: 43 characters in the link.
export function createInvitationToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function looksLikeInvitationToken(token: string): boolean {
  return /^[A-Za-z0-9_-]{43}$/.test(token);
}

// How long an invitation link works (a product choice: long enough for a driver off shift for a week).
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;
