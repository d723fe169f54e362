import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

// The API answers 204 with no body.
const noContent = z.undefined();

/** Deletes a design with all its versions; its share link stops working. */
export function deleteDesign(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}`, noContent, { method: 'DELETE' });
}

export function useDeleteDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
