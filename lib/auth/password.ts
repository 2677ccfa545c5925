import { bcryptCompare, bcryptHash } from './password-worker';

const COST = 10;

/** How many password hashes this process has compared (the sign-in tests check unknown addresses cost one too). */
export const passwordChecks = { count: 0 };

/** A bcrypt hash (cost 10) of a new password, made in the password worker. */
export function hashPassword(password: string): Promise<string> {
  return bcryptHash(password, COST);
}

/** Whether a password matches a stored bcrypt hash, compared in the password worker. */
export function verifyPassword(password: string, hash: string): Promise<boolean> {
  passwordChecks.count += 1;
  return bcryptCompare(password, hash);
}
