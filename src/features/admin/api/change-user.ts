import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserSchema, type AdminUserChange, type AdminUserList } from '../../../../shared/account/account.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { adminUsersQueryKey } from './get-users.ts';

export function changeUser({ id, change }: { id: string; change: AdminUserChange }) {
  return apiRequest(`/api/admin/users/${encodeURIComponent(id)}`, adminUserSchema, { method: 'PATCH', body: change });
}

export function useChangeUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeUser,
    // The changed account shows its new role and status at once, before the lists are read again.
    onSuccess: (changed) =>
      queryClient.setQueriesData<AdminUserList>({ queryKey: adminUsersQueryKey }, (list) => list && { ...list, users: list.users.map((u) => (u.id === changed.id ? changed : u)) }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: adminUsersQueryKey }),
  });
}
