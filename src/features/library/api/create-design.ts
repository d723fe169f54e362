import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designDetailSchema, type CreateDesignInput } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** Saves a document as a new design (version 1); without a name the document's own name is used. */
export function createDesign(input: CreateDesignInput) {
  return apiRequest('/api/designs', designDetailSchema, { method: 'POST', body: input });
}

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designsQueryKey }),
  });
}
