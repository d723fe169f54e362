import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Copies a design's current version into a new design of its own. */
export function duplicateDesign(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/duplicate`, designDetailSchema, { method: 'POST' });
}

export function useDuplicateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
