/**
 * Passwords are hashed and compared in a worker thread (lib/auth/password-worker.ts). Checked against
 * published bcrypt test vectors: the crypt_blowfish test suite's "$2a$05$CCCC…" hashes of "U*U",
 * "U*U*" and the empty password (Openwall crypt_blowfish, wrapper.c tests; quoted from memory and
 * confirmed with the bcryptjs package's own compareSync).
 */
import bcrypt from 'bcryptjs';
import { describe, expect, it } from 'vitest';
import { bcryptCompare, bcryptHash } from '@/lib/auth/password-worker';
import { hashPassword, verifyPassword } from '@/lib/auth/password';

const VECTORS: Array<[string, string]> = [
  ['U*U', '$2a$05$CCCCCCCCCCCCCCCCCCCCC.E5YPO9kmyuRGyh0XouQYb4YMJKvyOeW'],
  ['U*U*', '$2a$05$CCCCCCCCCCCCCCCCCCCCC.VGOzA784oUp/Z0DY336zx7pLYAy0lwK'],
  ['', '$2a$05$CCCCCCCCCCCCCCCCCCCCC.7uG0VCzI2bS7j6ymqJi9CdcdxiRTWNy'],
];

describe('password worker', () => {
  it('matches the published bcrypt vectors and refuses a changed password', async () => {
    for (const [password, hash] of VECTORS) {
      expect(await bcryptCompare(password, hash)).toBe(true);
      expect(await bcryptCompare(`${password}x`, hash)).toBe(false);
    }
  });

  it('makes cost-10 hashes that the bcrypt library itself accepts, each with its own salt', async () => {
    const [a, b] = await Promise.all([hashPassword('chordline-demo'), hashPassword('chordline-demo')]);
    expect(a).toMatch(/^\$2[aby]\$10\$[./A-Za-z0-9]{53}$/);
    expect(a).not.toBe(b);
    expect(bcrypt.compareSync('chordline-demo', a)).toBe(true);
    expect(await verifyPassword('chordline-demo', b)).toBe(true);
    expect(await verifyPassword('chordline-dem0', b)).toBe(false);
  });

  it('answers many waiting jobs each with its own result', async () => {
    const hash = await bcryptHash('right', 4);
    const answers = await Promise.all(Array.from({ length: 12 }, (_, i) => bcryptCompare(i % 3 ? 'wrong' : 'right', hash)));
    expect(answers).toEqual(Array.from({ length: 12 }, (_, i) => i % 3 === 0));
  });

  it('refuses a cost that would run for hours, reports a hash of the wrong kind as an error, and keeps working after it', async () => {
    await expect(bcryptHash('x', 31)).rejects.toThrow(/outside 4 to 15/);
    await expect(bcryptCompare('x', 123 as unknown as string)).rejects.toThrow();
    expect(await bcryptCompare('U*U', VECTORS[0][1])).toBe(true);
  });
});
