import { queryOptions, useQuery } from '@tanstack/react-query';
import { workshopListSchema } from '../../../../shared/workshops/workshop-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';

export const workshopsQueryKey = ['workshops'] as const;

/** Workshops the signed-in person runs or is in. */
export const workshopsQueryOptions = () => queryOptions({ queryKey: [...workshopsQueryKey, 'list'], queryFn: () => apiRequest('/api/workshops', workshopListSchema) });

export function useWorkshops() {
  return useQuery(workshopsQueryOptions());
}
