import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ARCHIVE_FIELD, importSummarySchema } from '../../../../shared/archive/archive-format.ts';
import { apiUpload } from '../../../lib/api-client.ts';
import { burnsQueryKey } from '../../burns/api/get-burns.ts';
import { designsQueryKey } from '../../library/api/get-designs.ts';
import { printerProfilesQueryKey } from '../../printer-profiles/api/get-printer-profiles.ts';
import { accountQueryKey } from './get-account.ts';

/** The link that downloads the whole library as one ZIP (the server names the file). */
export const libraryExportPath = '/api/library/export';

export function importLibrary({ file, takePreferences }: { file: File; takePreferences: boolean }) {
  return apiUpload('/api/library/import', importSummarySchema, ARCHIVE_FIELD, file, file.name, { preferences: takePreferences ? 'take' : 'keep' });
}

/** Everything an import may have added is read again: designs (with their burns), printer profiles and the account's preferences. */
export function useImportLibrary() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importLibrary,
    onSuccess: () => Promise.all([designsQueryKey, printerProfilesQueryKey, accountQueryKey, burnsQueryKey].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
