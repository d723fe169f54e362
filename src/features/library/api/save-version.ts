import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema, type SaveVersionInput } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Saves the document as the design's next version, with an optional note. */
export function saveVersion({ id, input }: { id: string; input: SaveVersionInput }) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/versions`, designDetailSchema, { method: 'POST', body: input });
}

export function useSaveVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveVersion,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
