import { z } from 'zod';
import { User } from '@/models';
import { db } from '@/lib/db/connection';
import { HttpError } from '@/lib/api/errors';
import { hashPassword } from '@/lib/auth/password';
import { ROLES } from '@/lib/auth/roles';
import { forgetSessionUser, type SessionUser } from '@/lib/auth/session';
import { audit } from './audit';

const password = z.string().min(10, 'Use at least 10 characters.').max(200, 'Keep the password under 200 characters.');
const role = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}.` });

export const createUserSchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  name: z.string().trim().min(1, 'Enter a name.').max(120, 'Keep the name under 120 characters.'),
  role,
  password,
});

export const updateUserSchema = z
  .object({ name: z.string().trim().min(1, 'Enter a name.').max(120).optional(), role: role.optional(), password: password.optional() })
  .refine((v) => v.name !== undefined || v.role !== undefined || v.password !== undefined, { message: 'Change the name, the role or the password.' });

/** The only shape a user ever leaves the server in: no password hash. */
export type PublicUser = { id: number; email: string; name: string; role: string; createdAt: string };

function publicUser(u: User): PublicUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, createdAt: u.createdAt.toISOString() };
}

export async function listUsers(): Promise<PublicUser[]> {
  await db();
  return (await User.findAll({ order: [['email', 'ASC']] })).map(publicUser);
}

export async function createUser(actor: SessionUser | null, input: z.infer<typeof createUserSchema>): Promise<PublicUser> {
  await db();
  if (await User.findOne({ where: { email: input.email } })) {
    throw new HttpError(400, 'A user with that e-mail address already exists.', { email: ['Already in use.'] });
  }
  const user = await User.create({ email: input.email, name: input.name, role: input.role, passwordHash: await hashPassword(input.password) });
  await audit(actor?.id ?? null, 'user.create', 'user', user.id, { email: user.email, role: user.role });
  return publicUser(user);
}

export async function updateUser(actor: SessionUser, id: string, input: z.infer<typeof updateUserSchema>): Promise<PublicUser> {
  await db();
  const n = Number(id);
  const user = Number.isInteger(n) && n > 0 ? await User.findByPk(n) : null;
  if (!user) throw new HttpError(404, 'There is no user with that id.');
  if (user.id === actor.id && input.role && input.role !== 'admin') {
    throw new HttpError(400, 'You cannot take the administrator role away from yourself; ask another administrator.', { role: ['Keep your own role.'] });
  }
  const changed: string[] = [];
  if (input.name !== undefined) {
    user.name = input.name;
    changed.push('name');
  }
  if (input.role !== undefined) {
    user.role = input.role;
    changed.push('role');
  }
  if (input.password !== undefined) {
    user.passwordHash = await hashPassword(input.password);
    changed.push('password');
  }
  await user.save();
  forgetSessionUser(user.id);
  await audit(actor.id, 'user.update', 'user', user.id, { changed, role: user.role });
  return publicUser(user);
}
