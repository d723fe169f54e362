import { useMutation, useQueryClient } from '@tanstack/react-query';
import { burnPhotoSchema } from '../../../../shared/burns/burn-schema.ts';
import { apiUpload } from '../../../lib/api-client.ts';
import { burnsQueryKey } from './get-burns.ts';

/** Uploads one picture to an entry; the server checks and re-encodes it. */
export function addPhoto({ burnId, file }: { burnId: string; file: File }) {
  return apiUpload(`/api/burns/${encodeURIComponent(burnId)}/photos`, burnPhotoSchema, 'photo', file, file.name);
}

export function useAddPhoto() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addPhoto, onSettled: () => queryClient.invalidateQueries({ queryKey: burnsQueryKey }) });
}
