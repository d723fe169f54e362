import type { AdminUser, AdminUserChange } from '../../../shared/account/account.ts';
import type { Role } from '../../../shared/account/roles.ts';
import { countOf } from './plural.ts';

/** A role as the end of "is now ...". */
const asRole: Record<Role, string> = { maker: 'a maker', instructor: 'an instructor', admin: 'an admin' };

/** What a role change gives or takes away, said before the admin confirms (only admins differ yet). */
function describeRoleChange(from: Role, to: Role): string {
  if (to === 'admin') return 'Admins can change anyone’s role and disable accounts, on this page.';
  if (from === 'admin') return 'They lose this page and can no longer change other accounts.';
  return 'Their designs, versions and printer profiles stay as they are.';
}

/** The question asked before a change, and the words of the button that makes it. */
export function describeConfirm(user: AdminUser, change: AdminUserChange): { question: string; detail: string; confirm: string } {
  if (change.role !== undefined) {
    return { question: `Make ${user.name} ${asRole[change.role]}?`, detail: describeRoleChange(user.role, change.role), confirm: `Make ${asRole[change.role].replace(/^an? /, '')}` };
  }
  return {
    question: `Disable ${user.name}?`,
    detail: 'They are signed out everywhere at once and cannot sign in until an admin enables the account again. Their designs are kept.',
    confirm: 'Disable account',
  };
}

/** What happened, once the server has done it. */
export function describeOutcome(user: Pick<AdminUser, 'name'>, change: AdminUserChange): string {
  if (change.role !== undefined) return `${user.name} is now ${asRole[change.role]}.`;
  return change.disabled ? `Account disabled: ${user.name} is signed out and cannot sign in.` : `Account enabled: ${user.name} can sign in again.`;
}

/** The count above the list: all accounts, the ones a search found, or the first page of many. */
export function describeCount(shown: number, total: number, searching: boolean): string {
  if (shown < total) return `Showing ${shown} of ${countOf(total, { one: 'account', other: 'accounts' })}${searching ? ' that match' : ''}. Search to find the others.`;
  if (searching) return `${countOf(total, { one: 'account matches', other: 'accounts match' })}.`;
  return `${countOf(total, { one: 'account', other: 'accounts' })}.`;
}
