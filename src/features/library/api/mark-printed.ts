import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Records that the design's kit was printed now (the library's "last printed" column). */
export function markPrinted(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/printed`, designDetailSchema, { method: 'POST' });
}

export function useMarkPrinted() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markPrinted,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
