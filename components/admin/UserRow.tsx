'use client';

import { useId, useState } from 'react';
import { mutate } from 'swr';
import { ROLES, ROLE_LABELS, isRole } from '@/lib/auth/roles';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { PublicUserRow } from '@/components/admin/public-user';
import { dateTimeText } from '@/lib/units';
import UserAccessControls from '@/components/admin/UserAccessControls';
import UserPasswordCell from '@/components/admin/UserPasswordCell';

/** One user: change the role (PATCH /api/admin/users/[id]), the invite or reset link, disable or remove the account. */
export default function UserRow({ user, isSelf }: { user: PublicUserRow; isSelf: boolean }) {
  const id = useId();
  const [role, setRole] = useState(user.role);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function saveRole() {
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      await sendJson(`/api/admin/users/${user.id}`, 'PATCH', { role });
      await mutate('/api/admin/users');
      setDone(`Role changed to ${isRole(role) ? ROLE_LABELS[role] : role}.`);
    } catch (err) {
      const e = err as ApiError;
      setError(e.fields?.role?.join(' ') ?? e.message);
      setRole(user.role);
    }
    setBusy(false);
  }

  return (
    <tr role="row" className="block border-t border-concrete-100 py-2 align-top md:table-row md:py-0">
      <td role="cell" className="block px-4 py-2 md:table-cell md:py-3">
        <div className="font-semibold text-concrete-900">
          {user.name}
          {isSelf ? <span className="ml-2 text-xs font-normal text-concrete-600">(you)</span> : null}
          {user.disabled ? <span className="ml-2 rounded bg-fail-100 px-1.5 py-0.5 text-xs font-semibold text-fail-600">Disabled</span> : null}
        </div>
        <div className="text-sm text-concrete-600">{user.email}</div>
        <div className="text-xs text-concrete-500">
          {user.invitePending ? 'Invited' : 'Added'} {dateTimeText(user.createdAt)}
          {user.lastSeenAt ? ` · last seen ${dateTimeText(user.lastSeenAt)}` : ''}
        </div>
      </td>
      <td role="cell" className="block px-4 py-2 md:table-cell md:py-3">
        <CellLabel>Role</CellLabel>
        <form
          className="flex flex-wrap items-start gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void saveRole();
          }}
        >
          <label htmlFor={`${id}-role`} className="sr-only">
            Role of {user.name}
          </label>
          <select
            id={`${id}-role`}
            value={role}
            onChange={(e) => setRole(e.target.value)}
            className="field-input mt-0 w-auto"
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-role-error` : undefined}
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
          <button type="submit" className="btn-secondary" disabled={busy || role === user.role}>
            Save role
          </button>
          {error ? (
            <p id={`${id}-role-error`} className="field-error w-full">
              {error}
            </p>
          ) : null}
          {done ? (
            <p role="status" className="w-full text-sm text-pass-700">
              {done}
            </p>
          ) : null}
        </form>
      </td>
      <td role="cell" className="block px-4 py-2 md:table-cell md:py-3">
        <CellLabel>Sign-in</CellLabel>
        <UserPasswordCell user={user} />
      </td>
      <td role="cell" className="block px-4 py-2 md:table-cell md:py-3">
        <CellLabel>Access</CellLabel>
        {user.invitePending ? <p className="text-sm text-concrete-600">Not signed in yet.</p> : <UserAccessControls user={user} isSelf={isSelf} />}
      </td>
    </tr>
  );
}

/** A column's name above its cell on phones, where the table's header row is hidden. */
function CellLabel({ children }: { children: string }) {
  return <div className="mb-1 text-xs font-semibold uppercase tracking-wide text-concrete-500 md:hidden">{children}</div>;
}
