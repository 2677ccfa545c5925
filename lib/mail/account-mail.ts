/**
 * The two account e-mails: an invite to choose a first password, and a password-reset link. Links are
 * built from NEXTAUTH_URL only, never from the request's Host or X-Forwarded-Host headers, so nobody
 * can make the app mail a link to their own site (host-header injection).
 */
import type { TokenPurpose } from '@/models';
import { dateTimeText } from '@/lib/units';

/** The app's public address (NEXTAUTH_URL's origin and path, no trailing slash), as next-auth uses it. */
export function appBaseUrl(): string {
  const configured = process.env.NEXTAUTH_URL || `http://localhost:${process.env.PORT ?? 3000}`;
  const url = new URL(configured);
  return `${url.origin}${url.pathname.replace(/\/+$/, '')}`;
}

/** The page a link opens: /invite/<token> or /reset/<token> under the app's public address. */
export function linkFor(purpose: TokenPurpose, token: string): string {
  return `${appBaseUrl()}/${purpose}/${token}`;
}

const oneLine = (text: string) => text.replace(/[\r\n]+/g, ' ');

/** Subject and body of the invite sent to a new person. */
export function inviteMail(input: { name: string; inviter: string; role: string; link: string; expiresAt: Date }): { subject: string; text: string } {
  return {
    subject: 'You are invited to Chordline',
    text: [
      `Hello ${oneLine(input.name)},`,
      '',
      `${oneLine(input.inviter)} has invited you to Chordline as ${input.role}. Open this link to choose your password:`,
      '',
      input.link,
      '',
      `The link works once, until ${dateTimeText(input.expiresAt.toISOString())}. Then sign in with this e-mail address and the password you chose.`,
      'If you did not expect this invite, ignore this message; nothing happens unless the link is opened.',
      '',
    ].join('\n'),
  };
}

/** Subject and body of a password-reset link. */
export function resetMail(input: { name: string; link: string; expiresAt: Date }): { subject: string; text: string } {
  return {
    subject: 'Choose a new Chordline password',
    text: [
      `Hello ${oneLine(input.name)},`,
      '',
      'Someone (we hope you) asked for a new password for the Chordline account with this e-mail address. Open this link to choose one:',
      '',
      input.link,
      '',
      `The link works once, until ${dateTimeText(input.expiresAt.toISOString())}. Choosing a new password signs the account out everywhere.`,
      'If you did not ask, ignore this message: your password stays as it is.',
      '',
    ].join('\n'),
  };
}
