import { useEffect, useId, useRef, useState } from 'react';
import type { AdminUser, AdminUserChange } from '../../../../shared/account/account.ts';
import { roleLabels, roles, type Role } from '../../../../shared/account/roles.ts';
import { Button } from '../../../components/button.tsx';
import { useChangeUser } from '../api/change-user.ts';
import { describeConfirm, describeOutcome } from '../describe-change.ts';

/** On a phone each cell is a line of the account's card, headed by this label. */
const cellLabel = 'mr-2 text-xs font-medium text-ink-soft md:hidden';
const cell = 'block px-4 py-1 md:table-cell md:py-3 md:align-top';

interface UserRowProps {
  user: AdminUser;
  isSelf: boolean;
}

/**
 * One account: its role and whether it may sign in. A role change or disabling waits for the
 * admin to confirm (Cancel puts everything back); enabling needs no second step. What happened
 * is said in the row, which is a polite live region.
 */
export function UserRow({ user, isSelf }: UserRowProps) {
  const nameId = useId();
  const change = useChangeUser();
  const [pending, setPending] = useState<AdminUserChange>();
  const [outcome, setOutcome] = useState<string>();
  const [problem, setProblem] = useState<string>();
  // Where the focus goes back to once a confirm step closes (its buttons vanish with it).
  const refocus = useRef<'role' | 'access'>(undefined);
  const roleSelect = useRef<HTMLSelectElement>(null);
  const actions = useRef<HTMLTableCellElement>(null);
  const focusAction = (name: 'access' | 'cancel') => actions.current?.querySelector<HTMLButtonElement>(`[data-action="${name}"]`)?.focus();

  useEffect(() => {
    if (!refocus.current || pending) return;
    if (refocus.current === 'role') roleSelect.current?.focus();
    else focusAction('access');
    refocus.current = undefined;
  }, [pending]);

  useEffect(() => {
    // The Disable button is replaced by the question, so the focus moves to its safe answer.
    if (pending?.disabled) focusAction('cancel');
  }, [pending?.disabled]);

  function ask(next: AdminUserChange) {
    setOutcome(undefined);
    setProblem(undefined);
    setPending(next);
  }

  function cancel() {
    refocus.current = pending?.role !== undefined ? 'role' : 'access';
    setPending(undefined);
  }

  async function apply(next: AdminUserChange) {
    setOutcome(undefined);
    setProblem(undefined);
    try {
      await change.mutateAsync({ id: user.id, change: next });
      setOutcome(describeOutcome(user, next));
    } catch (error) {
      setProblem(`${user.name} was not changed: ${(error as Error).message}`);
    }
    refocus.current = next.role !== undefined ? 'role' : 'access';
    setPending(undefined);
  }

  const confirm = pending && describeConfirm(user, pending);
  const shownRole = pending?.role ?? user.role;
  return (
    <tr className="block border-b border-rule py-2 last:border-b-0 md:table-row md:py-0">
      <th id={nameId} scope="row" className={`${cell} text-left font-semibold md:font-medium`}>
        {user.name}
      </th>
      <td className={`${cell} [overflow-wrap:anywhere]`}>
        <span className={cellLabel}>E-mail</span>
        {user.email}
        {!user.emailVerified && <span className="ml-2 text-xs text-ink-soft">(not confirmed)</span>}
      </td>
      <td className={cell}>
        <span aria-hidden="true" className={cellLabel}>
          Role
        </span>
        <select
          ref={roleSelect}
          aria-label={`Role of ${user.name}`}
          value={shownRole}
          disabled={isSelf || change.isPending}
          onChange={(event) => {
            const role = event.target.value as Role;
            if (role === user.role) setPending(undefined);
            else ask({ role });
          }}
          className="min-h-9 rounded-md border border-rule bg-white px-2"
        >
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </select>
      </td>
      <td className={cell}>
        <span className={cellLabel}>Status</span>
        {user.disabled ? <span className="text-danger">Disabled</span> : <span className="text-ok">Active</span>}
      </td>
      <td ref={actions} className={`${cell} md:w-80`}>
        {isSelf ? (
          <span className="text-xs text-ink-soft">This is you</span>
        ) : confirm && pending ? (
          <div role="group" aria-label={confirm.question} className="flex flex-col gap-2 rounded-md border border-ember-600/30 bg-ember-50 p-3">
            <p className="text-sm font-medium">{confirm.question}</p>
            <p className="text-xs text-ink-soft">{confirm.detail}</p>
            <div className="flex flex-wrap gap-2">
              <Button variant={pending.disabled ? 'danger' : 'primary'} disabled={change.isPending} onClick={() => void apply(pending)}>
                {change.isPending ? 'Saving…' : confirm.confirm}
              </Button>
              <Button data-action="cancel" variant="secondary" disabled={change.isPending} onClick={cancel}>
                Cancel
              </Button>
            </div>
          </div>
        ) : (
          <Button
            data-action="access"
            variant={user.disabled ? 'secondary' : 'danger'}
            disabled={change.isPending}
            onClick={() => (user.disabled ? void apply({ disabled: false }) : ask({ disabled: true }))}
            aria-label={`${user.disabled ? 'Enable' : 'Disable'} ${user.name}`}
          >
            {user.disabled ? 'Enable' : 'Disable'}
          </Button>
        )}
        <p role="status" className="mt-1 text-sm text-ok">
          {outcome}
        </p>
        {problem && (
          <p role="alert" className="mt-1 text-sm text-danger">
            {problem}
          </p>
        )}
      </td>
    </tr>
  );
}
