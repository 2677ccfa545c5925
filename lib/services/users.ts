import { z } from 'zod';
import { Op } from 'sequelize';
import { OneTimeToken, User } from '@/models';
import { db } from '@/lib/db/connection';
import { NotFoundError, ValidationError } from '@/lib/errors';
import { hashPassword } from '@/lib/auth/password';
import { ROLES } from '@/lib/auth/roles';
import { endSessions, forgetSessionUser, type SessionUser } from '@/lib/auth/session';
import { clearFailures } from '@/lib/auth/throttle';
import { cleanName } from '@/lib/text/clean';
import { audit } from './audit';

/** The password rules, the same wherever a password is chosen (admin, invite link, reset link). */
export const passwordSchema = z.string().min(10, 'Use at least 10 characters.').max(200, 'Keep the password under 200 characters.');
const role = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}.` });

export const createUserSchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  name: z.string().transform(cleanName).pipe(z.string().min(1, 'Enter a name.').max(120, 'Keep the name under 120 characters.')),
  role,
  password: passwordSchema,
});

export const updateUserSchema = z
  .object({
    name: z.string().transform(cleanName).pipe(z.string().min(1, 'Enter a name.').max(120)).optional(),
    role: role.optional(),
    password: passwordSchema.optional(),
    disabled: z.boolean({ error: 'disabled must be true or false.' }).optional(),
  })
  .refine((v) => v.name !== undefined || v.role !== undefined || v.password !== undefined || v.disabled !== undefined, {
    message: 'Change the name, the role, the password or whether the account is disabled.',
  });

/**
 * The only shape a user ever leaves the server in: no password hash. `invitePending` while an invited
 * person has not chosen a password; `inviteExpiresAt` is when their newest invite link stops working
 * (null when there is none).
 */
export type PublicUser = {
  id: number;
  email: string;
  name: string;
  role: string;
  createdAt: string;
  disabled: boolean;
  lastSeenAt: string | null;
  invitePending: boolean;
  inviteExpiresAt: string | null;
  /** True when the pending invite's link no longer works (re-send it). */
  inviteExpired: boolean;
};

export function publicUser(u: User, inviteExpiresAt: Date | null = null): PublicUser {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    createdAt: u.createdAt.toISOString(),
    disabled: u.disabledAt != null,
    lastSeenAt: u.lastSeenAt ? u.lastSeenAt.toISOString() : null,
    invitePending: u.invitedAt != null,
    inviteExpiresAt: u.invitedAt != null && inviteExpiresAt ? inviteExpiresAt.toISOString() : null,
    inviteExpired: u.invitedAt != null && (!inviteExpiresAt || inviteExpiresAt.getTime() <= Date.now()),
  };
}

/** Every account that has not been removed (removed ones stay only as the author of their work). */
export async function listUsers(): Promise<PublicUser[]> {
  await db();
  const users = await User.findAll({ where: { removedAt: null }, order: [['email', 'ASC']] });
  const pending = users.filter((u) => u.invitedAt != null).map((u) => u.id);
  const links = pending.length ? await OneTimeToken.findAll({ where: { userId: { [Op.in]: pending }, purpose: 'invite' }, attributes: ['userId', 'expiresAt', 'usedAt'] }) : [];
  // The newest invite link of each pending person (an earlier one is marked used when the invite is re-sent).
  const expires = new Map<number, Date>();
  for (const l of links) if (l.usedAt == null && (expires.get(l.userId)?.getTime() ?? 0) < l.expiresAt.getTime()) expires.set(l.userId, l.expiresAt);
  return users.map((u) => publicUser(u, expires.get(u.id) ?? null));
}

/** Refuses an e-mail address that a live or removed account already holds (addresses are never reused). */
export async function assertEmailFree(email: string): Promise<void> {
  const existing = await User.findOne({ where: { email } });
  if (!existing) return;
  const removed = existing.removedAt != null;
  throw new ValidationError(removed ? 'That e-mail address belonged to a removed account; use another address.' : 'A user with that e-mail address already exists.', {
    email: [removed ? 'Belonged to a removed account.' : 'Already in use.'],
  });
}

export async function createUser(actor: SessionUser | null, input: z.infer<typeof createUserSchema>): Promise<PublicUser> {
  await db();
  await assertEmailFree(input.email);
  const user = await User.create({ email: input.email, name: input.name, role: input.role, passwordHash: await hashPassword(input.password) });
  await audit(actor?.id ?? null, 'user.create', 'user', user.id, { email: user.email, role: user.role });
  return publicUser(user);
}

export async function updateUser(actor: SessionUser, id: string, input: z.infer<typeof updateUserSchema>): Promise<PublicUser> {
  await db();
  const user = await findLiveUser(id);
  if (user.id === actor.id && input.role && input.role !== 'admin') {
    throw new ValidationError('You cannot take the administrator role away from yourself; ask another administrator.', { role: ['Keep your own role.'] });
  }
  if (user.id === actor.id && input.disabled) {
    throw new ValidationError('You cannot disable your own account; ask another administrator.', { disabled: ['Keep your own account enabled.'] });
  }
  const changed: string[] = [];
  if (input.name !== undefined) {
    user.name = input.name;
    changed.push('name');
  }
  if (input.role !== undefined && input.role !== user.role) {
    user.role = input.role;
    changed.push('role');
  }
  if (input.password !== undefined) {
    user.passwordHash = await hashPassword(input.password);
    // A password set by an administrator ends a pending invite (its link is revoked below).
    user.invitedAt = null;
    changed.push('password');
  }
  if (input.disabled !== undefined && input.disabled !== (user.disabledAt != null)) {
    user.disabledAt = input.disabled ? new Date() : null;
    changed.push(input.disabled ? 'disabled' : 'enabled');
  }
  // A new password, a new role or disabling ends every session the account had.
  if (changed.some((c) => c === 'role' || c === 'password' || c === 'disabled')) user.sessionVersion += 1;
  await user.save();
  forgetSessionUser(user.id);
  // A reset password also lifts the sign-in slowdown on the account.
  if (changed.includes('password')) {
    await clearFailures(user.email);
    await OneTimeToken.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null } });
  }
  await audit(actor.id, 'user.update', 'user', user.id, { changed, role: user.role });
  return publicUser(user);
}

async function findLiveUser(id: string): Promise<User> {
  const n = Number(id);
  const user = Number.isInteger(n) && n > 0 ? await User.findByPk(n) : null;
  if (!user || user.removedAt) throw new NotFoundError('There is no user with that id.');
  return user;
}

/**
 * Removes an account: it can no longer sign in and every session ends, but its row stays (marked
 * removed, left out of the user list) so the checks, revisions, photos and audit entries it made keep
 * their author. Administrators cannot remove themselves.
 */
export async function removeUser(actor: SessionUser, id: string): Promise<{ removed: true; id: number }> {
  await db();
  const user = await findLiveUser(id);
  if (user.id === actor.id) throw new ValidationError('You cannot remove your own account; ask another administrator.');
  user.removedAt = new Date();
  await user.save();
  await endSessions(user.id);
  await OneTimeToken.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null } });
  await audit(actor.id, 'user.remove', 'user', user.id, { email: user.email });
  return { removed: true, id: user.id };
}
