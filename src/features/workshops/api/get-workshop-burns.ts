import { queryOptions, useQuery } from '@tanstack/react-query';
import { workshopBurnsSchema } from '../../../../shared/workshops/workshop-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from '../../burns/api/get-burns.ts';

/** Under the burn log's key: an entry changed on its own page refreshes the group's list too. */
export const workshopBurnsQueryOptions = (id: string) =>
  queryOptions({ queryKey: [...burnsQueryKey, 'workshop', id], queryFn: () => apiRequest(`/api/workshops/${encodeURIComponent(id)}/burns`, workshopBurnsSchema) });

export function useWorkshopBurns(id: string) {
  return useQuery(workshopBurnsQueryOptions(id));
}
