import { useMutation, useQueryClient } from '@tanstack/react-query';
import { printerProfileSchema } from '../../../../shared/print/printer-profile.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { printerProfilesQueryKey } from './get-printer-profiles.ts';

/** Makes this profile the one prints use; the API clears the old default. */
export function setDefaultPrinterProfile(id: string) {
  return apiRequest(`/api/printer-profiles/${encodeURIComponent(id)}/default`, printerProfileSchema, { method: 'POST' });
}

export function useSetDefaultPrinterProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setDefaultPrinterProfile,
    onSettled: () => queryClient.invalidateQueries({ queryKey: printerProfilesQueryKey }),
  });
}
