import type { Metadata } from 'next';
import Link from 'next/link';
import BridgeList from '@/components/bridges/BridgeList';
import PageHeader from '@/components/PageHeader';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';

export const metadata: Metadata = { title: 'Bridges' };

export default async function BridgesPage() {
  const user = await requireUser('/bridges');
  const canCreate = roleAllows(user.role, ['engineer']);
  return (
    <>
      <PageHeader
        title="Bridges"
        subtitle="Open a bridge to see its geometry, its revisions and the overhang offset table."
        actions={
          canCreate ? (
            <Link href="/bridges/new" className="btn-primary">
              New bridge
            </Link>
          ) : null
        }
      />
      <BridgeList canCreate={canCreate} />
    </>
  );
}
