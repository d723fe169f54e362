import { queryOptions, useQuery } from '@tanstack/react-query';
import { sharedDesignApiPath, sharedDesignSchema } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';

/** A design someone shared, read without a session; unknown and revoked links are both 404. */
export function getSharedDesign(token: string) {
  return apiRequest(sharedDesignApiPath(encodeURIComponent(token)), sharedDesignSchema);
}

// Never served from cache: a link the owner turned off should stop working at once here too.
export const sharedDesignQueryOptions = (token: string) => queryOptions({ queryKey: ['shared-design', token], queryFn: () => getSharedDesign(token), staleTime: 0 });

export function useSharedDesign(token: string) {
  return useQuery(sharedDesignQueryOptions(token));
}
