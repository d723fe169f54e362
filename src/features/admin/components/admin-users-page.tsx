import { useDeferredValue, useId, useState } from 'react';
import { ADMIN_SEARCH_MAX } from '../../../../shared/account/account.ts';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { useAdminUsers } from '../api/get-users.ts';
import { describeCount } from '../describe-change.ts';
import { UserRow } from './user-row.tsx';

const head = 'px-4 py-2 text-left font-medium';

/** Every account: search, change a role, disable or enable. Below 768 px each account is a card. */
export function AdminUsersPage() {
  const searchId = useId();
  const [search, setSearch] = useState('');
  const typed = search.trim();
  const tooLong = typed.length > ADMIN_SEARCH_MAX;
  // A search past the server's limit is not sent; the list keeps the last one that was.
  const [sent, setSent] = useState('');
  if (!tooLong && typed !== sent) setSent(typed);
  const deferredSearch = useDeferredValue(sent);
  const users = useAdminUsers(deferredSearch);
  const { data: me } = useAccount();

  return (
    <Page title="Users" intro="Change what an account may do, or disable it. Disabling signs the person out everywhere." width="wide">
      <div className="mb-4 flex flex-wrap items-end gap-x-4 gap-y-2">
        <div className="flex w-full flex-col gap-1 sm:w-auto">
          <label htmlFor={searchId} className="text-sm font-medium">
            Search by name or e-mail
          </label>
          <input
            id={searchId}
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            aria-invalid={tooLong ? true : undefined}
            aria-describedby={tooLong ? `${searchId}-error` : undefined}
            className="min-h-10 w-full rounded-md border border-rule bg-white px-3 py-2 text-base font-normal aria-[invalid]:border-danger sm:w-72"
          />
          {tooLong && (
            <p id={`${searchId}-error`} className="text-sm text-danger">
              Use at most {ADMIN_SEARCH_MAX} characters.
            </p>
          )}
        </div>
        <p role="status" className="pb-2 text-sm text-ink-soft">
          {users.data && describeCount(users.data.users.length, users.data.total, Boolean(deferredSearch))}
        </p>
      </div>
      {users.isError && <Notice tone="error">The accounts could not be loaded: {users.error.message}</Notice>}
      <div className="rounded-lg border border-rule bg-white">
        <table className="block w-full text-sm md:table">
          <caption className="sr-only">Accounts, newest first</caption>
          <thead className="hidden border-b border-rule bg-paper text-ink-soft md:table-header-group">
            <tr>
              <th scope="col" className={head}>Name</th>
              <th scope="col" className={head}>E-mail</th>
              <th scope="col" className={head}>Role</th>
              <th scope="col" className={head}>Status</th>
              <th scope="col" className={head}>
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody className="block md:table-row-group">
            {users.data?.users.map((user) => <UserRow key={user.id} user={user} isSelf={user.id === me?.id} />)}
            {users.data?.users.length === 0 && (
              <tr className="block md:table-row">
                <td colSpan={5} className="block px-4 py-6 text-center text-ink-soft md:table-cell">
                  No account matches.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </Page>
  );
}
