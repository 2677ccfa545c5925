import type { Metadata } from 'next';
import AuthShell from '@/components/signin/AuthShell';
import ForgotPasswordForm from '@/components/signin/ForgotPasswordForm';

export const metadata: Metadata = { title: 'Forgot password' };

export default function ForgotPasswordPage() {
  return (
    <AuthShell title="Forgot your password?" intro="Enter the e-mail address you sign in with. If it has an account, we send it a link to choose a new password.">
      <ForgotPasswordForm />
    </AuthShell>
  );
}
