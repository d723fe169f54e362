import { queryOptions, useQuery } from '@tanstack/react-query';
import { accountSchema, type Account } from '../../../../shared/account/account-wire.ts';
import { ApiError, apiRequest } from '../../../lib/api-client.ts';

export const accountQueryKey = ['account'] as const;

/** The signed-in account, or null when nobody is signed in. */
export async function getAccount(): Promise<Account | null> {
  try {
    return await apiRequest('/api/account', accountSchema);
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const accountQueryOptions = () => queryOptions({ queryKey: accountQueryKey, queryFn: getAccount });

export function useAccount() {
  return useQuery(accountQueryOptions());
}
