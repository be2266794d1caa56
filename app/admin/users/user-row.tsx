'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import type { Role } from '@/lib/db/generated/enums';
import { ROLE_LABELS } from '@/lib/auth/permissions';
import { ROLES } from '@/lib/users/user-schema';
import { changeUser } from '@/lib/users/user-actions';
import { callAction } from '@/lib/errors/call-action';

interface Person {
  id: string;
  name: string;
  email: string;
  role: Role;
  active: boolean;
}

/** One person: role, active flag and an optional new password, saved together. */
export function UserRow({ user, self }: { user: Person; self: boolean }) {
  const router = useRouter();
  const [role, setRole] = useState<Role>(user.role);
  const [active, setActive] = useState(user.active);
  const [password, setPassword] = useState('');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();
  const id = `u-${user.id}`;
  const save = () =>
    startTransition(async () => {
      const result = await callAction(() => changeUser({ userId: user.id, role, active, newPassword: password }));
      setMessage(result.ok ? { ok: true, text: 'Saved.' } : { ok: false, text: result.fieldErrors?.newPassword?.[0] ?? result.message });
      if (result.ok) {
        setPassword('');
        router.refresh();
      }
    });
  return (
    <tr>
      <td>
        {user.name}
        {self ? ' (you)' : ''}
      </td>
      <td>{user.email}</td>
      <td>
        <label htmlFor={`${id}-role`} className="sr-only">
          Role of {user.name}
        </label>
        <select id={`${id}-role`} value={role} onChange={(e) => setRole(e.target.value as Role)}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </td>
      <td>
        <label className="row" style={{ fontWeight: 400 }}>
          <input type="checkbox" checked={active} onChange={(e) => setActive(e.target.checked)} style={{ width: 'auto' }} /> active
        </label>
      </td>
      <td>
        <label htmlFor={`${id}-pw`} className="sr-only">
          New password for {user.name}
        </label>
        <input
          id={`${id}-pw`}
          type="password"
          autoComplete="new-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          placeholder="unchanged"
        />
      </td>
      <td>
        <button type="button" className="btn quiet" onClick={save} disabled={pending}>
          Save
        </button>
        <div role="status" aria-live="polite" className={message && !message.ok ? 'field-error' : 'small muted'}>
          {message?.text}
        </div>
      </td>
    </tr>
  );
}
