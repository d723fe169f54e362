import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { burnSchema, type CreateBurnInput } from '../../../../shared/burns/burn-schema.ts';
import {
  invitationResultSchema,
  workshopSchema,
  type CreateWorkshopInput,
  type InvitationsInput,
  type JoinWorkshopInput,
  type UpdateWorkshopInput,
} from '../../../../shared/workshops/workshop-schema.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from '../../burns/api/get-burns.ts';
import { workshopsQueryKey } from './get-workshops.ts';

const path = (id: string) => `/api/workshops/${encodeURIComponent(id)}`;

/** One hook per workshop operation; each refreshes the workshop queries when it settles. */
function useWorkshopMutation<A, R>(fn: (args: A) => Promise<R>, alsoBurns = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: workshopsQueryKey });
      if (alsoBurns) await queryClient.invalidateQueries({ queryKey: burnsQueryKey });
    },
  });
}

export const useCreateWorkshop = () => useWorkshopMutation((input: CreateWorkshopInput) => apiRequest('/api/workshops', workshopSchema, { method: 'POST', body: input }));
export const useUpdateWorkshop = () => useWorkshopMutation(({ id, change }: { id: string; change: UpdateWorkshopInput }) => apiRequest(path(id), workshopSchema, { method: 'PATCH', body: change }));
export const useDeleteWorkshop = () => useWorkshopMutation((id: string) => apiRequest(path(id), z.undefined(), { method: 'DELETE' }));
export const useInvite = () => useWorkshopMutation(({ id, input }: { id: string; input: InvitationsInput }) => apiRequest(`${path(id)}/invitations`, invitationResultSchema, { method: 'POST', body: input }));
export const useJoinWorkshop = () => useWorkshopMutation((input: JoinWorkshopInput) => apiRequest('/api/workshops/join', workshopSchema, { method: 'POST', body: input }));
export const useRemoveMember = () => useWorkshopMutation(({ id, userId }: { id: string; userId: string }) => apiRequest(`${path(id)}/members/${encodeURIComponent(userId)}`, z.undefined(), { method: 'DELETE' }));
export const useSendKit = () => useWorkshopMutation((id: string) => apiRequest(`${path(id)}/send-kit`, z.object({ sent: z.number() }), { method: 'POST', body: {} }));
export const useLogWorkshopBurn = () =>
  useWorkshopMutation(({ id, input }: { id: string; input: Omit<CreateBurnInput, 'version'> }) => apiRequest(`${path(id)}/burns`, burnSchema, { method: 'POST', body: input }), true);
