/**
 * Inviting people by e-mail (administrators): the account is made without a usable password and the
 * person gets a one-time link (24 h) to choose their own. A pending invite can be re-sent (the old
 * link stops working) or withdrawn (the account, which never signed in, is deleted). Administrators
 * can also send an existing person a password-reset link instead of typing a password for them.
 */
import crypto from 'node:crypto';
import { z } from 'zod';
import { OneTimeToken, User, type TokenPurpose } from '@/models';
import { db } from '@/lib/db/connection';
import { ValidationError, NotFoundError, UpstreamError } from '@/lib/errors';
import { hashPassword } from '@/lib/auth/password';
import { ROLES, ROLE_LABELS, type Role } from '@/lib/auth/roles';
import type { SessionUser } from '@/lib/auth/session';
import { issueToken } from '@/lib/auth/one-time-token';
import { sendMail, type MailResult } from '@/lib/mail/send';
import { inviteMail, linkFor, resetMail } from '@/lib/mail/account-mail';
import { cleanName } from '@/lib/text/clean';
import { audit } from './audit';
import { assertEmailFree, publicUser, type PublicUser } from './users';

export const inviteUserSchema = z.object({
  email: z.email('Enter a valid e-mail address.').max(254, 'Keep the e-mail address under 254 characters.').trim().toLowerCase(),
  name: z.string().max(400).transform(cleanName).pipe(z.string().min(1, 'Enter a name.').max(120, 'Keep the name under 120 characters.')),
  role: z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}.` }),
});

export type InviteAnswer = { user: PublicUser; via: MailResult['via']; outbox_id: number | null };

/** A password hash nobody can match: bcrypt of 32 random bytes that are then forgotten. */
async function unusablePasswordHash(): Promise<string> {
  return hashPassword(crypto.randomBytes(32).toString('base64url'));
}

async function findLive(id: string): Promise<User> {
  const n = Number(id);
  const user = Number.isInteger(n) && n > 0 ? await User.findByPk(n) : null;
  if (!user || user.removedAt) throw new NotFoundError('There is no user with that id.');
  return user;
}

/** Makes a new link and mails it; a mail failure says what was kept and what to do next. */
async function mailLink(actor: SessionUser, user: User, purpose: TokenPurpose): Promise<{ result: MailResult; expiresAt: Date }> {
  const sequelize = await db();
  const { token, expiresAt } = await sequelize.transaction((transaction) => issueToken(user.id, purpose, transaction));
  const link = linkFor(purpose, token);
  const mail =
    purpose === 'invite' ? inviteMail({ name: user.name, inviter: actor.name, role: ROLE_LABELS[user.role as Role] ?? user.role, link, expiresAt }) : resetMail({ name: user.name, link, expiresAt });
  try {
    return { result: await sendMail({ to: [user.email], subject: mail.subject, text: mail.text, attachments: [] }, actor.id), expiresAt };
  } catch (err) {
    if (!(err instanceof UpstreamError)) throw err;
    const again = purpose === 'invite' ? 'Use "Re-send invite" to try again.' : 'Try again later.';
    throw new UpstreamError(`The mail server did not accept the message, so ${user.email} has no link yet. ${again}`);
  }
}

/** Creates the account without a usable password and mails the invite link (valid 24 hours). */
export async function inviteUser(actor: SessionUser, input: z.infer<typeof inviteUserSchema>): Promise<InviteAnswer> {
  await db();
  await assertEmailFree(input.email);
  const user = await User.create({ email: input.email, name: input.name, role: input.role, passwordHash: await unusablePasswordHash(), invitedAt: new Date() });
  await audit(actor.id, 'user.invite', 'user', user.id, { email: user.email, role: user.role });
  const { result, expiresAt } = await mailLink(actor, user, 'invite');
  return { user: publicUser(user, expiresAt), via: result.via, outbox_id: result.outboxId };
}

/** Sends a pending invite again with a new link; the earlier link stops working. */
export async function resendInvite(actor: SessionUser, id: string): Promise<InviteAnswer> {
  await db();
  const user = await findLive(id);
  if (user.invitedAt == null) throw new ValidationError(`${user.name} has already chosen a password; send a password-reset link instead.`);
  const { result, expiresAt } = await mailLink(actor, user, 'invite');
  await audit(actor.id, 'user.invite.resend', 'user', user.id, { email: user.email });
  return { user: publicUser(user, expiresAt), via: result.via, outbox_id: result.outboxId };
}

/**
 * Withdraws a pending invite: the link stops working and the account, which has never signed in and
 * so has no work to its name, is deleted, so the address can be invited again later.
 */
export async function withdrawInvite(actor: SessionUser, id: string): Promise<{ withdrawn: true; id: number }> {
  const sequelize = await db();
  const user = await findLive(id);
  if (user.invitedAt == null) throw new ValidationError(`${user.name} has already chosen a password; disable or remove the account instead.`);
  await sequelize.transaction(async (transaction) => {
    await OneTimeToken.destroy({ where: { userId: user.id }, transaction });
    await user.destroy({ transaction });
  });
  await audit(actor.id, 'user.invite.withdraw', 'user', user.id, { email: user.email });
  return { withdrawn: true, id: user.id };
}

/** Mails an existing person a password-reset link (valid 1 hour), so no administrator types a password. */
export async function sendResetLink(actor: SessionUser, id: string): Promise<{ via: MailResult['via']; outbox_id: number | null; expires_at: string }> {
  await db();
  const user = await findLive(id);
  if (user.invitedAt != null) throw new ValidationError(`${user.name} has not accepted the invite yet; re-send the invite instead.`);
  if (user.disabledAt) throw new ValidationError(`${user.name}'s account is disabled; enable it first.`);
  const { result, expiresAt } = await mailLink(actor, user, 'reset');
  await audit(actor.id, 'user.reset.send', 'user', user.id, { email: user.email });
  return { via: result.via, outbox_id: result.outboxId, expires_at: expiresAt.toISOString() };
}
