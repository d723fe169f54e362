import { useMutation, useQueryClient } from '@tanstack/react-query';
import { accountSchema } from '../../../../shared/account/account.ts';
import type { Preferences } from '../../../../shared/account/preferences.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { accountQueryKey } from './get-account.ts';

export function updatePreferences(preferences: Preferences) {
  return apiRequest('/api/account/preferences', accountSchema, { method: 'PATCH', body: preferences });
}

export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (account) => queryClient.setQueryData(accountQueryKey, account),
  });
}
