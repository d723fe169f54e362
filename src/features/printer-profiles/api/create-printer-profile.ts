import { useMutation, useQueryClient } from '@tanstack/react-query';
import { printerProfileSchema, type PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { apiRequest } from '../../../lib/api-client.ts';
import { printerProfilesQueryKey } from './get-printer-profiles.ts';

export function createPrinterProfile(input: PrinterProfileInput) {
  return apiRequest('/api/printer-profiles', printerProfileSchema, { method: 'POST', body: input });
}

export function useCreatePrinterProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPrinterProfile,
    onSettled: () => queryClient.invalidateQueries({ queryKey: printerProfilesQueryKey }),
  });
}
