/** What the sign-in page says for each result or `?error=` code next-auth can hand back. */
export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';
export const LOCKED = 'Too many failed sign-ins: attempts for this account or from this device are slowed down. Wait a minute and try again, or ask an administrator to reset the password.';

export function signInErrorText(code: string | null | undefined): string | null {
  if (!code) return null;
  switch (code) {
    case 'CredentialsSignin':
      return WRONG_CREDENTIALS;
    case 'locked':
      return LOCKED;
    case 'SessionRequired':
      return 'Sign in to see that page.';
    case 'AccessDenied':
      return 'This account may not sign in. Ask an administrator.';
    case 'Configuration':
      return 'Sign-in is not set up correctly on this server. Tell your administrator.';
    case 'Verification':
      return 'That sign-in link has expired or was already used. Sign in with your e-mail and password.';
    default:
      return 'Sign-in did not work. Try again; if it keeps happening, tell your administrator.';
  }
}
