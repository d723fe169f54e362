import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

export function deletePhoto(photoId: string) {
  return apiRequest(`/api/photos/${encodeURIComponent(photoId)}`, z.undefined(), { method: 'DELETE' });
}

export function useDeletePhoto() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deletePhoto, onSettled: () => queryClient.invalidateQueries({ queryKey: burnsQueryKey }) });
}
