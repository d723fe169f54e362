import { queryOptions, useQuery } from '@tanstack/react-query';
import { workshopSchema } from '../../../../shared/workshops/workshop-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { workshopsQueryKey } from './get-workshops.ts';

export const workshopQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...workshopsQueryKey, 'one', id], queryFn: () => apiRequest(`/api/workshops/${encodeURIComponent(id)}`, workshopSchema) });

export function useWorkshop(id: string) {
  return useQuery(workshopQueryOptions(id));
}
