import type { AdminUser, AdminUserChange } from '../../../../shared/account/account.ts';
import { roleLabels, roles, type Role } from '../../../../shared/account/roles.ts';
import { Button } from '../../../components/button.tsx';

interface UserRowProps {
  user: AdminUser;
  isSelf: boolean;
  busy: boolean;
  onChange(change: AdminUserChange): void;
}

export function UserRow({ user, isSelf, busy, onChange }: UserRowProps) {
  return (
    <tr className="border-b border-rule last:border-0">
      <td className="px-4 py-2">{user.name}</td>
      <td className="px-4 py-2 break-all">
        {user.email}
        {!user.emailVerified && <span className="ml-2 text-xs text-ink-soft">(not confirmed)</span>}
      </td>
      <td className="px-4 py-2">
        <select
          aria-label={`Role of ${user.name}`}
          value={user.role}
          disabled={isSelf || busy}
          onChange={(event) => onChange({ role: event.target.value as Role })}
          className="min-h-9 rounded-md border border-rule bg-white px-2"
        >
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-4 py-2">{user.disabled ? <span className="text-danger">Disabled</span> : <span className="text-ok">Active</span>}</td>
      <td className="px-4 py-2 text-right">
        {isSelf ? (
          <span className="text-xs text-ink-soft">This is you</span>
        ) : (
          <Button variant={user.disabled ? 'secondary' : 'danger'} disabled={busy} onClick={() => onChange({ disabled: !user.disabled })} aria-label={`${user.disabled ? 'Enable' : 'Disable'} ${user.name}`}>
            {user.disabled ? 'Enable' : 'Disable'}
          </Button>
        )}
      </td>
    </tr>
  );
}
