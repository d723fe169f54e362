import { useMutation, useQueryClient } from '@tanstack/react-query';
import { accountSchema } from '../../../../shared/account/account.ts';
import type { ChangeNameInput } from '../../../../shared/account/account-changes.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { accountQueryKey } from './get-account.ts';

export function changeName(input: ChangeNameInput) {
  return apiRequest('/api/account', accountSchema, { method: 'PATCH', body: input });
}

export function useChangeName() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeName,
    onSuccess: (account) => queryClient.setQueryData(accountQueryKey, account),
  });
}
