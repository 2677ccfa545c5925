import type { Metadata } from 'next';
import OutboxList from '@/components/admin/OutboxList';
import PageHeader from '@/components/PageHeader';
import RoleNotice from '@/components/RoleNotice';
import { requireUser } from '@/lib/auth/server-session';
import { listOutbox } from '@/lib/mail/outbox';
import { smtpUrl } from '@/lib/mail/send';

export const metadata: Metadata = { title: 'Outbox' };

export default async function OutboxPage() {
  const user = await requireUser('/admin/outbox');
  if (user.role !== 'admin') {
    return <RoleNotice title="Administrators only (403)" message="Only an administrator can read the local mail outbox." />;
  }
  const messages = await listOutbox();
  return (
    <>
      <PageHeader
        title="Outbox"
        subtitle={
          smtpUrl()
            ? 'A mail server is configured (SMTP_URL), so new messages go out through it. Messages captured before it was set are listed below.'
            : 'No mail server is configured (SMTP_URL is not set), so e-mails are kept here and under the data folder’s outbox/ instead of being sent.'
        }
      />
      <OutboxList messages={messages} />
    </>
  );
}
