import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Turns the share link on; the answer carries shareUrlPath. */
export function shareDesign(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/share`, designDetailSchema, { method: 'POST' });
}

export function useShareDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
