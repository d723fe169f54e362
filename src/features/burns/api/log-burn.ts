import { useMutation, useQueryClient } from '@tanstack/react-query';
import { burnSchema, type CreateBurnInput } from '../../../../shared/burns/burn-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

/** Records a burn against the design's latest saved version (or `version`). */
export function logBurn({ designId, input }: { designId: string; input: CreateBurnInput }) {
  return apiRequest(`/api/designs/${encodeURIComponent(designId)}/burns`, burnSchema, { method: 'POST', body: input });
}

export function useLogBurn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: logBurn, onSettled: () => queryClient.invalidateQueries({ queryKey: burnsQueryKey }) });
}
