import type { Metadata } from 'next';
import PageHeader from '@/components/PageHeader';
import RoleNotice from '@/components/RoleNotice';
import UserAdmin from '@/components/admin/UserAdmin';
import { requireUser } from '@/lib/auth/server-session';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  const user = await requireUser('/admin/users');
  if (user.role !== 'admin') {
    return <RoleNotice title="Administrators only (403)" message="Only an administrator can see and change user accounts. Ask an administrator if your role or password needs changing." />;
  }
  return (
    <>
      <PageHeader title="Users" subtitle="Engineers create and revise bridges, inspectors record field checks, crew members read. Administrators can do everything." />
      <UserAdmin selfId={user.id} />
    </>
  );
}
