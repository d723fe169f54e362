import { queryOptions, useQuery } from '@tanstack/react-query';
import { versionListSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { designsQueryKey } from './get-designs.ts';

/** A design's versions, newest first, each with what changed against the one before. */
export function getVersions(id: string) {
  return apiRequest(`/api/designs/${encodeURIComponent(id)}/versions`, versionListSchema);
}

export const versionsQueryOptions = (id: string) => queryOptions({ queryKey: [...designsQueryKey, 'versions', id], queryFn: () => getVersions(id) });

export function useVersions(id: string) {
  return useQuery(versionsQueryOptions(id));
}
