import { useMutation, useQueryClient } from '@tanstack/react-query';
import { burnSchema, type UpdateBurnInput } from '../../../../shared/burns/burn-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

export function updateBurn({ burnId, change }: { burnId: string; change: UpdateBurnInput }) {
  return apiRequest(`/api/burns/${encodeURIComponent(burnId)}`, burnSchema, { method: 'PATCH', body: change });
}

export function useUpdateBurn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateBurn, onSettled: () => queryClient.invalidateQueries({ queryKey: burnsQueryKey }) });
}
