import { Notice } from '../../../components/notice.tsx';
import { useDeletePrinterProfile } from '../api/delete-printer-profile.ts';
import { usePrinterProfiles } from '../api/get-printer-profiles.ts';
import { useSetDefaultPrinterProfile } from '../api/set-default-printer-profile.ts';
import { AccountProfileItem } from './account-profile-item.tsx';

/** Step 3 for a signed-in maker: the profiles kept with the account, the default first. */
export function AccountProfileList() {
  const profiles = usePrinterProfiles(true);
  const makeDefault = useSetDefaultPrinterProfile();
  const remove = useDeletePrinterProfile();
  const busyId = makeDefault.isPending ? makeDefault.variables : remove.isPending ? remove.variables : undefined;
  const failure = makeDefault.error ?? remove.error ?? profiles.error;

  return (
    <div className="flex flex-col gap-3">
      {failure && <Notice tone="error">{failure.message}</Notice>}
      {profiles.isPending && <p className="text-sm text-ink-soft">Loading your printers…</p>}
      {profiles.data?.profiles.length === 0 && <p className="text-sm text-ink-soft">No printer profiles yet. Save one above; the first becomes your default.</p>}
      {profiles.data && profiles.data.profiles.length > 0 && (
        <ul aria-label="Your printer profiles" className="flex flex-col gap-3">
          {profiles.data.profiles.map((profile) => (
            <AccountProfileItem
              key={profile.id}
              profile={profile}
              busy={busyId === profile.id}
              onMakeDefault={() => {
                remove.reset();
                makeDefault.mutate(profile.id);
              }}
              onDelete={() => {
                makeDefault.reset();
                remove.mutate(profile.id);
              }}
            />
          ))}
        </ul>
      )}
    </div>
  );
}
