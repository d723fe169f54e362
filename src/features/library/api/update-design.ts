import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema, type UpdateDesignInput } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Renames or retags a design; neither makes a new version. */
export function updateDesign({ id, change }: { id: string; change: UpdateDesignInput }) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}`, designDetailSchema, { method: 'PATCH', body: change });
}

export function useUpdateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
