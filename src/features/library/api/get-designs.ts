import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { designListSchema, type DesignListQuery } from '../../../../shared/library/library-schemas.ts';
import { apiRequest } from '../../../lib/api-client.ts';

/** Every library query starts with this key, so one invalidation refreshes lists, details and versions. */
export const designsQueryKey = ['designs'] as const;

/** The signed-in maker's designs; q matches a name or tag, tag is one exact tag. */
export function getDesigns(query: DesignListQuery = {}) {
  const params = new URLSearchParams();
  if (query.q?.trim()) params.set('q', query.q.trim());
  if (query.tag) params.set('tag', query.tag);
  if (query.sort) params.set('sort', query.sort);
  const search = params.toString();
  return apiRequest(`/api/designs${search ? `?${search}` : ''}`, designListSchema);
}

export const designsQueryOptions = (query: DesignListQuery = {}) =>
  queryOptions({ queryKey: [...designsQueryKey, 'list', query], queryFn: () => getDesigns(query) });

/** Keeps the last answer on screen while a new search loads, so the table does not blink. */
export function useDesigns(query: DesignListQuery = {}) {
  return useQuery({ ...designsQueryOptions(query), placeholderData: keepPreviousData });
}
