import Link from 'next/link';
import AuthShell from '@/components/signin/AuthShell';
import ChoosePasswordForm from '@/components/signin/ChoosePasswordForm';
import { linkHolder, LINK_NOT_WORKING } from '@/lib/services/password-links';

/**
 * The page an e-mailed link opens (/invite/<token>, /reset/<token>): the form to choose a password
 * while the link works, else the one "used or expired" message with the way to a new link. Opening
 * the page does not use the link up; saving the password does.
 */
export default async function LinkPage({ purpose, token }: { purpose: 'invite' | 'reset'; token: string }) {
  const holder = await linkHolder(purpose, token);
  if (!holder) {
    return (
      <AuthShell title="This link does not work">
        <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {LINK_NOT_WORKING}
        </p>
        <p className="mt-4 text-sm text-concrete-600">
          {purpose === 'invite'
            ? 'An invite link works once, within 24 hours. Ask the administrator who invited you to send the invite again.'
            : 'A reset link works once, within an hour, and only the newest one works.'}
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          {purpose === 'reset' ? (
            <Link href="/forgot-password" className="btn-primary">
              Ask for a new link
            </Link>
          ) : null}
          <Link href="/signin" className="btn-secondary">
            Go to sign in
          </Link>
        </div>
      </AuthShell>
    );
  }
  return (
    <AuthShell
      title={purpose === 'invite' ? 'Welcome to Chordline' : 'Choose a new password'}
      intro={
        purpose === 'invite' ? (
          <>
            Hello {holder.name}. Choose the password you will sign in with as <strong className="break-words text-concrete-900">{holder.email}</strong>.
          </>
        ) : (
          <>
            For <strong className="break-words text-concrete-900">{holder.email}</strong>. Saving it signs the account out on every device.
          </>
        )
      }
    >
      <ChoosePasswordForm purpose={purpose} token={token} email={holder.email} />
    </AuthShell>
  );
}
