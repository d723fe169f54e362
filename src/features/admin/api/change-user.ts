import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserSchema, type AdminUserChange } from '../../../../shared/account/account.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { adminUsersQueryKey } from './get-users.ts';

export function changeUser({ id, change }: { id: string; change: AdminUserChange }) {
  return apiRequest(`/api/admin/users/${encodeURIComponent(id)}`, adminUserSchema, { method: 'PATCH', body: change });
}

export function useChangeUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: adminUsersQueryKey }),
  });
}
