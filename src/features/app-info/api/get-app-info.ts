import { queryOptions, useQuery } from '@tanstack/react-query';
import * as z from 'zod/mini';
import { apiRequest } from '../../../lib/api-client.ts';

const appInfoSchema = z.object({ name: z.string(), version: z.string(), devMailbox: z.boolean() });

export const appInfoQueryOptions = () =>
  queryOptions({ queryKey: ['app-info'], queryFn: () => apiRequest('/api/app-info', appInfoSchema), staleTime: Infinity });

export function useAppInfo() {
  return useQuery(appInfoQueryOptions());
}
