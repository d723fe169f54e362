import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { adminUserListSchema } from '../../../../shared/account/account.ts';
import { apiRequest } from '../../../lib/api-client.ts';

export const adminUsersQueryKey = ['admin', 'users'] as const;

export function getUsers(search: string) {
  const query = new URLSearchParams({ limit: '200' });
  if (search) query.set('search', search);
  return apiRequest(`/api/admin/users?${query}`, adminUserListSchema);
}

export const adminUsersQueryOptions = (search: string) =>
  queryOptions({ queryKey: [...adminUsersQueryKey, { search }], queryFn: () => getUsers(search), placeholderData: keepPreviousData });

export function useAdminUsers(search: string) {
  return useQuery(adminUsersQueryOptions(search));
}
