import { useMutation, useQueryClient } from '@tanstack/react-query';
import { accountDeletedSchema, type DeleteAccountInput } from '../../../../shared/account/account-changes.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { accountQueryKey } from './get-account.ts';

export function deleteAccount(input: DeleteAccountInput) {
  return apiRequest('/api/account/delete', accountDeletedSchema, { method: 'POST', body: input });
}

/** Once the account is gone, nothing of it stays in the page's cache: the visitor is signed out. */
export function useDeleteAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAccount,
    onSuccess: () => {
      queryClient.setQueryData(accountQueryKey, null);
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'account' && query.queryKey[0] !== 'app-info' });
    },
  });
}
