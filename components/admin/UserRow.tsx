'use client';

import { useId, useState } from 'react';
import { mutate } from 'swr';
import { ROLES, ROLE_LABELS, isRole } from '@/lib/auth/roles';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { PublicUserRow } from '@/components/admin/public-user';
import { dateTimeText } from '@/lib/units';
import UserAccessControls from '@/components/admin/UserAccessControls';

/** One user: change the role, set a new password (PATCH /api/admin/users/[id]), disable or remove the account. */
export default function UserRow({ user, isSelf }: { user: PublicUserRow; isSelf: boolean }) {
  const id = useId();
  const [role, setRole] = useState(user.role);
  const [password, setPassword] = useState('');
  const [resetting, setResetting] = useState(false);
  const [errors, setErrors] = useState<{ role?: string; password?: string }>({});
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function patch(body: { role: string } | { password: string }, key: 'role' | 'password', ok: string) {
    setBusy(true);
    setErrors({});
    setDone(null);
    try {
      await sendJson(`/api/admin/users/${user.id}`, 'PATCH', body);
      await mutate('/api/admin/users');
      setDone(ok);
      if (key === 'password') {
        setPassword('');
        setResetting(false);
      }
    } catch (err) {
      const e = err as ApiError;
      setErrors({ [key]: e.fields?.[key]?.join(' ') ?? e.message });
      if (key === 'role') setRole(user.role);
    }
    setBusy(false);
  }

  return (
    <tr className="border-t border-concrete-100 align-top">
      <td className="px-4 py-3">
        <div className="font-semibold text-concrete-900">
          {user.name}
          {isSelf ? <span className="ml-2 text-xs font-normal text-concrete-600">(you)</span> : null}
          {user.disabled ? <span className="ml-2 rounded bg-fail-100 px-1.5 py-0.5 text-xs font-semibold text-fail-600">Disabled</span> : null}
        </div>
        <div className="text-sm text-concrete-600">{user.email}</div>
        <div className="text-xs text-concrete-500">
          Added {dateTimeText(user.createdAt)}
          {user.lastSeenAt ? ` · last seen ${dateTimeText(user.lastSeenAt)}` : ''}
        </div>
      </td>
      <td className="px-4 py-3">
        <form
          className="flex flex-wrap items-start gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void patch({ role }, 'role', `Role changed to ${isRole(role) ? ROLE_LABELS[role] : role}.`);
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
            aria-invalid={errors.role ? true : undefined}
            aria-describedby={errors.role ? `${id}-role-error` : undefined}
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
          {errors.role ? (
            <p id={`${id}-role-error`} className="field-error w-full">
              {errors.role}
            </p>
          ) : null}
        </form>
      </td>
      <td className="px-4 py-3">
        {resetting ? (
          <form
            className="flex flex-wrap items-start gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (password.length < 10) {
                setErrors({ password: 'Use at least 10 characters.' });
                return;
              }
              void patch({ password }, 'password', 'New password set. Give it to the user by a separate, safe route.');
            }}
          >
            <label htmlFor={`${id}-password`} className="sr-only">
              New password for {user.name}
            </label>
            <input
              id={`${id}-password`}
              type="password"
              autoComplete="new-password"
              autoFocus
              placeholder="At least 10 characters"
              value={password}
              onChange={(e) => setPassword(e.target.value)}
              className="field-input mt-0 w-56"
              aria-invalid={errors.password ? true : undefined}
              aria-describedby={errors.password ? `${id}-password-error` : undefined}
            />
            <button type="submit" className="btn-primary" disabled={busy}>
              Set password
            </button>
            <button
              type="button"
              className="btn-secondary"
              onClick={() => {
                setResetting(false);
                setPassword('');
                setErrors({});
              }}
            >
              Cancel
            </button>
            {errors.password ? (
              <p id={`${id}-password-error`} className="field-error w-full">
                {errors.password}
              </p>
            ) : null}
          </form>
        ) : (
          <button
            type="button"
            className="btn-secondary"
            onClick={() => {
              setResetting(true);
              setDone(null);
            }}
          >
            Reset password
          </button>
        )}
        {done ? (
          <p role="status" className="mt-1 text-sm text-pass-700">
            {done}
          </p>
        ) : null}
      </td>
      <td className="px-4 py-3">
        <UserAccessControls user={user} isSelf={isSelf} />
      </td>
    </tr>
  );
}
