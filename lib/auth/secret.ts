import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { dataDir } from '@/lib/config';

/**
 * The key that signs session tokens. NEXTAUTH_SECRET wins; otherwise a random key is generated once
 * into DATA_DIR so sessions survive restarts without anyone having to invent a secret.
 */
export function authSecret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const dir = dataDir();
  const file = path.join(dir, 'nextauth-secret');
  fs.mkdirSync(dir, { recursive: true });
  if (!fs.existsSync(file)) {
    try {
      fs.writeFileSync(file, crypto.randomBytes(32).toString('base64url'), { mode: 0o600, flag: 'wx' });
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
    }
  }
  const secret = fs.readFileSync(file, 'utf8').trim();
  process.env.NEXTAUTH_SECRET = secret;
  return secret;
}
