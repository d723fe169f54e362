import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client.ts';

const mailListSchema = z.object({
  messages: z.array(z.object({ id: z.number(), receivedAt: z.string(), from: z.string(), to: z.array(z.string()), subject: z.string(), text: z.string() })),
});
export type CapturedMail = z.infer<typeof mailListSchema>['messages'][number];

export const devMailQueryOptions = () =>
  queryOptions({ queryKey: ['dev-mail'], queryFn: () => apiRequest('/api/dev/mail', mailListSchema), refetchInterval: 2000, staleTime: 0 });

export function useDevMail() {
  return useQuery(devMailQueryOptions());
}
