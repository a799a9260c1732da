import { tokenStore } from './api-client';

// Where sign-in lives and whether this device holds a session: no query library, so the glove
// screen's own page can use it too.
export function hasSession(): boolean {
  return tokenStore.get() !== null;
}

export const SIGN_IN_PATH = '/sign-in';

export function signInPath(next?: string): string {
  return next && next !== '/' ? `${SIGN_IN_PATH}?next=${encodeURIComponent(next)}` : SIGN_IN_PATH;
}

// Only a path inside the app: never a full URL or a protocol-relative "//host" from a crafted link.
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (next === SIGN_IN_PATH || next.startsWith(`${SIGN_IN_PATH}?`)) return '/';
  return next;
}
