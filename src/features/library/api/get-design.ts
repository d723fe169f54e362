import { queryOptions, useQuery } from '@tanstack/react-query';
import { designDetailSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** One design with its current document; another maker's id answers 404 like a missing one. */
export function getDesign(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}`, designDetailSchema);
}

export const designQueryOptions = (id: string) => queryOptions({ queryKey: [...designsQueryKey, 'detail', id], queryFn: () => getDesign(id) });

export function useDesign(id: string) {
  return useQuery(designQueryOptions(id));
}
