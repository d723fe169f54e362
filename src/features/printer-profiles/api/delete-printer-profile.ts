import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client.ts';
import { printerProfilesQueryKey } from './get-printer-profiles.ts';

// The API answers 204 with no body.
const noContent = z.undefined();

/** Deletes a profile; when it was the default, the API makes the newest remaining one default. */
export function deletePrinterProfile(id: string) {
  return apiRequest(`/api/printer-profiles/${encodeURIComponent(id)}`, noContent, { method: 'DELETE' });
}

export function useDeletePrinterProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePrinterProfile,
    onSettled: () => queryClient.invalidateQueries({ queryKey: printerProfilesQueryKey }),
  });
}
