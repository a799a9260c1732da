import { compare, hash, hashSync } from 'bcryptjs';

// bcrypt cost 10: about 60-100 ms per hash on this class of machine (common practice for interactive sign-in).
export const BCRYPT_COST = 10;

// A real hash to compare against when the e-mail is unknown, so timing does not reveal which accounts exist.
const DUMMY_HASH = hashSync('no account has this password', BCRYPT_COST);

export function hashPassword(password: string): Promise<string> {
  return hash(password, BCRYPT_COST);
}

export async function verifyPassword(password: string, passwordHash: string | null): Promise<boolean> {
  const matches = await compare(password, passwordHash ?? DUMMY_HASH);
  return passwordHash !== null && matches;
}
