import type { Metadata } from 'next';
import NewBridgeForm from '@/components/bridges/NewBridgeForm';
import PageHeader from '@/components/PageHeader';
import RoleNotice from '@/components/RoleNotice';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';

export const metadata: Metadata = { title: 'New bridge' };

export default async function NewBridgePage() {
  const user = await requireUser('/bridges/new');
  if (!roleAllows(user.role, ['engineer'])) {
    return <RoleNotice title="Your role cannot create bridges" message="Engineers and administrators create bridges. Ask an engineer on your project to add the bridge you need." />;
  }
  return (
    <>
      <PageHeader title="New bridge" subtitle="Choose where to start, then fill in the record and finish the geometry in the form editor." />
      <NewBridgeForm />
    </>
  );
}
