import { queryOptions, useQuery } from '@tanstack/react-query';
import { printerProfileListSchema } from '../../../../shared/print/printer-profile.ts';
import { apiRequest } from '../../../lib/api-client.ts';

export const printerProfilesQueryKey = ['printer-profiles'] as const;

/** The signed-in maker's profiles, the default first (the API answers 401 to a visitor). */
export function getPrinterProfiles() {
  return apiRequest('/api/printer-profiles', printerProfileListSchema);
}

export const printerProfilesQueryOptions = () => queryOptions({ queryKey: printerProfilesQueryKey, queryFn: getPrinterProfiles });

/** Asks only when `signedIn`: a visitor's profile lives in the browser instead. */
export function usePrinterProfiles(signedIn: boolean) {
  return useQuery({ ...printerProfilesQueryOptions(), enabled: signedIn });
}
