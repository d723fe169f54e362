import { useDeferredValue, useState } from 'react';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { useChangeUser } from '../api/change-user.ts';
import { useAdminUsers } from '../api/get-users.ts';
import { UserRow } from './user-row.tsx';

export function AdminUsersPage() {
  const [search, setSearch] = useState('');
  const deferredSearch = useDeferredValue(search.trim());
  const users = useAdminUsers(deferredSearch);
  const change = useChangeUser();
  const { data: me } = useAccount();

  return (
    <Page title="Users" intro="Change what an account may do, or disable it. Disabling signs the person out everywhere." width="wide">
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Search by name or e-mail
          <input type="search" value={search} onChange={(event) => setSearch(event.target.value)} className="min-h-10 w-72 max-w-full rounded-md border border-rule bg-white px-3 py-2 text-base font-normal" />
        </label>
        {users.data && <p className="pb-2 text-sm text-ink-soft">{users.data.total} accounts</p>}
      </div>
      {change.isError && <Notice tone="error">{change.error.message}</Notice>}
      {users.isError && <Notice tone="error">{users.error.message}</Notice>}
      <div className="overflow-x-auto rounded-lg border border-rule bg-white">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <thead className="border-b border-rule bg-paper text-ink-soft">
            <tr>
              <th scope="col" className="px-4 py-2 font-medium">Name</th>
              <th scope="col" className="px-4 py-2 font-medium">E-mail</th>
              <th scope="col" className="px-4 py-2 font-medium">Role</th>
              <th scope="col" className="px-4 py-2 font-medium">Status</th>
              <th scope="col" className="px-4 py-2 font-medium"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {users.data?.users.map((user) => (
              <UserRow key={user.id} user={user} isSelf={user.id === me?.id} busy={change.isPending && change.variables?.id === user.id} onChange={(c) => change.mutate({ id: user.id, change: c })} />
            ))}
            {users.data?.users.length === 0 && (
              <tr>
                <td colSpan={5} className="px-4 py-6 text-center text-ink-soft">No account matches.</td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </Page>
  );
}
