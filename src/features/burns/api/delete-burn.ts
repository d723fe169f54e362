import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

/** Deletes an entry with its photos (204, no body). */
export function deleteBurn(burnId: string) {
  return apiRequest(`/api/burns/${encodeURIComponent(burnId)}`, z.undefined(), { method: 'DELETE' });
}

export function useDeleteBurn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteBurn, onSettled: () => queryClient.invalidateQueries({ queryKey: burnsQueryKey }) });
}
