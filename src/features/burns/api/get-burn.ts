import { queryOptions, useQuery } from '@tanstack/react-query';
import { burnSchema } from '../../../../shared/burns/burn-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

export function getBurn(burnId: string) {
  return apiRequest(`/api/burns/${encodeURIComponent(burnId)}`, burnSchema);
}

export const burnQueryOptions = (burnId: string) => queryOptions({ queryKey: [...burnsQueryKey, 'entry', burnId], queryFn: () => getBurn(burnId) });

/** One entry with its photos; `enabled` is false while a new entry has no id yet. */
export function useBurn(burnId: string | undefined) {
  return useQuery({ ...burnQueryOptions(burnId ?? ''), enabled: burnId !== undefined });
}
