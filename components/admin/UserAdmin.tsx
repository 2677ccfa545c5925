'use client';

import useSWR from 'swr';
import InviteUserForm from '@/components/admin/InviteUserForm';
import { fetcher, type ApiError } from '@/lib/client/api-client';
import { LoadFailed, Loading } from '@/components/LoadState';
import type { PublicUserRow } from '@/components/admin/public-user';
import UserRow from '@/components/admin/UserRow';

/** The administrator's user list (GET /api/admin/users) and the form to invite a person by e-mail. */
export default function UserAdmin({ selfId }: { selfId: number }) {
  const { data, error, isLoading, mutate } = useSWR<PublicUserRow[], ApiError>('/api/admin/users', fetcher);
  return (
    <div className="space-y-6">
      {error ? (
        <LoadFailed error={error} retry={() => void mutate()} />
      ) : isLoading || !data ? (
        <Loading>Loading users…</Loading>
      ) : (
        <div className="card overflow-x-auto">
          <table role="table" className="block w-full text-left text-sm md:table">
            <caption className="sr-only">Users</caption>
            <thead className="hidden border-b border-concrete-200 bg-concrete-100 text-concrete-700 md:table-header-group">
              <tr>
                <th scope="col" className="px-4 py-3 font-semibold">
                  User
                </th>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Role
                </th>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Sign-in
                </th>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Access
                </th>
              </tr>
            </thead>
            <tbody role="rowgroup" className="block md:table-row-group">
              {data.map((u) => (
                <UserRow key={u.id} user={u} isSelf={u.id === selfId} />
              ))}
            </tbody>
          </table>
        </div>
      )}
      <InviteUserForm />
    </div>
  );
}
