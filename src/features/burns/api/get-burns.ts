import { queryOptions, useQuery } from '@tanstack/react-query';
import { burnListSchema } from '../../../../shared/burns/burn-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';

/** Every query of the burn log starts with this key, so one invalidation refreshes them all. */
export const burnsQueryKey = ['burns'] as const;

/** A design's burns, newest first. */
export function getBurns(designId: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(designId)}/burns`, burnListSchema);
}

export const burnsQueryOptions = (designId: string) => queryOptions({ queryKey: [...burnsQueryKey, 'design', designId], queryFn: () => getBurns(designId) });

export function useBurns(designId: string) {
  return useQuery(burnsQueryOptions(designId));
}
