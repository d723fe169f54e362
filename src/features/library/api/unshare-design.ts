import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Turns the share link off; the old link answers 404 at once. */
export function unshareDesign(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/share`, designDetailSchema, { method: 'DELETE' });
}

export function useUnshareDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: unshareDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
