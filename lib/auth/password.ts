import bcrypt from 'bcryptjs';

const COST = 10;

/** How many password hashes this process has compared (the sign-in tests check unknown addresses cost one too). */
export const passwordChecks = { count: 0 };

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  passwordChecks.count += 1;
  return bcrypt.compare(password, hash);
}
