import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Copies an old version forward as the newest one; history is never rewritten. */
export function restoreVersion({ id, number }: { id: string; number: number }) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/versions/${number}/restore`, designDetailSchema, { method: 'POST' });
}

export function useRestoreVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreVersion,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
