/**
 * The signed-out side of the e-mailed links: asking for a password-reset link, and choosing a
 * password from an invite or reset link. The reset request answers the same words whether or not the
 * address has an account, and does the same database reads either way; the token and the e-mail are
 * made and sent after the answer, so its timing does not tell either.
 */
import { z } from 'zod';
import { User } from '@/models';
import { db } from '@/lib/db/connection';
import { ValidationError } from '@/lib/errors';
import { hashPassword } from '@/lib/auth/password';
import { endSessions, forgetSessionUser } from '@/lib/auth/accounts';
import { clearFailures } from '@/lib/auth/throttle';
import { consumeToken, findLiveToken, issueToken, revokeTokens, RESET_TTL_MS } from '@/lib/auth/one-time-token';
import { countForAccount, pruneAuthRequests, recordAuthRequest, RESET_MAILS_PER_ACCOUNT, RESET_MAIL_WINDOW_MS } from '@/lib/auth/request-throttle';
import { sendMail } from '@/lib/mail/send';
import { linkFor, resetMail } from '@/lib/mail/account-mail';
import type { TokenPurpose } from '@/models';
import { audit } from './audit';
import { passwordSchema } from './users';

export const resetRequestSchema = z.object({
  email: z.email('Enter a valid e-mail address.').max(254, 'Keep the e-mail address under 254 characters.').trim().toLowerCase(),
});

export const setPasswordSchema = z.object({
  purpose: z.enum(['invite', 'reset'], { error: 'purpose must be invite or reset.' }),
  token: z.string({ error: 'Give the token from the link.' }).max(200, 'That is not a token from a Chordline link.'),
  password: passwordSchema,
});

/** The one answer to every reset request that is accepted, whatever the address. */
export const RESET_REQUEST_ANSWER = `If an account uses that address, a link to choose a new password is on its way. It works once, within ${RESET_TTL_MS / 60000} minutes. Check your inbox and spam folder; if nothing comes, ask your administrator.`;

/** The answer when a link does not work, whatever the reason (used, expired, replaced, unknown). */
export const LINK_NOT_WORKING = 'This link has been used or has expired. Ask for a new one.';

/** Mail work started after an answer was sent; tests wait for it with {@link settleAccountMail}. */
const pending = new Set<Promise<void>>();

function inBackground(work: () => Promise<void>): void {
  const p: Promise<void> = work()
    .catch((err) => console.error('[chordline] could not send a password-reset e-mail:', err instanceof Error ? err.message : err))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Waits until every background account e-mail of this process has been sent or has failed. */
export async function settleAccountMail(): Promise<void> {
  while (pending.size) await Promise.all([...pending]);
}

/**
 * Takes a reset request: counts it, and when the address belongs to an enabled account that has not
 * had {@link RESET_MAILS_PER_ACCOUNT} links in the last hour, mails a 1-hour link in the background.
 * The answer is always {@link RESET_REQUEST_ANSWER}.
 */
export async function requestPasswordReset(input: z.infer<typeof resetRequestSchema>, client: string | null): Promise<{ message: string }> {
  await db();
  await recordAuthRequest('reset-request', client, input.email);
  const [user, recent] = await Promise.all([User.findOne({ where: { email: input.email } }), countForAccount('reset-mail', input.email, RESET_MAIL_WINDOW_MS)]);
  if (user && !user.removedAt && !user.disabledAt && recent < RESET_MAILS_PER_ACCOUNT) {
    const found = user;
    inBackground(async () => {
      await recordAuthRequest('reset-mail', client, found.email);
      const sequelize = await db();
      const { token, expiresAt } = await sequelize.transaction((transaction) => issueToken(found.id, 'reset', transaction));
      const mail = resetMail({ name: found.name, link: linkFor('reset', token), expiresAt });
      await sendMail({ to: [found.email], subject: mail.subject, text: mail.text, attachments: [] }, null);
      await audit(null, 'user.reset.request', 'user', found.id, {});
    });
  }
  if (Math.random() < 0.02) inBackground(() => pruneAuthRequests());
  return { message: RESET_REQUEST_ANSWER };
}

/** Who a live link belongs to (for the page that opens it), or null when it does not work. */
export async function linkHolder(purpose: TokenPurpose, token: string): Promise<{ name: string; email: string } | null> {
  await db();
  const row = await findLiveToken(purpose, token);
  if (!row) return null;
  const user = await User.findByPk(row.userId);
  if (!user || user.removedAt || user.disabledAt) return null;
  return { name: user.name, email: user.email };
}

/**
 * Sets the password from a link: the link is used up in the same transaction that stores the new
 * password, so it works exactly once; every other link of the account stops working, every session
 * of the account ends (as a password change does), and the sign-in slowdown on it is lifted. A link
 * that does not work records a failure against the client (see request-throttle.ts).
 */
export async function setPasswordWithLink(input: z.infer<typeof setPasswordSchema>, client: string | null): Promise<{ email: string }> {
  const sequelize = await db();
  // Hashed first, outside the write transaction (bcrypt takes a while and the same time either way).
  const passwordHash = await hashPassword(input.password);
  const user = await sequelize.transaction(async (transaction) => {
    const userId = await consumeToken(input.purpose, input.token, transaction);
    if (userId === null) return null;
    const row = await User.findByPk(userId, { transaction });
    if (!row || row.removedAt || row.disabledAt) return null;
    row.passwordHash = passwordHash;
    row.invitedAt = null;
    await row.save({ transaction });
    await revokeTokens(row.id, null, transaction);
    await endSessions(row.id, { transaction });
    return row;
  });
  if (!user) {
    await recordAuthRequest('link-failure', client);
    throw new ValidationError(LINK_NOT_WORKING, { token: [LINK_NOT_WORKING] });
  }
  forgetSessionUser(user.id);
  await clearFailures(user.email);
  await audit(user.id, input.purpose === 'invite' ? 'user.invite.accept' : 'user.reset.done', 'user', user.id, {});
  return { email: user.email };
}
