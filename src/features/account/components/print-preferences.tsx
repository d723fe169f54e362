import { useState } from 'react';
import type { Account } from '../../../../shared/account/account.ts';
import { commonDrillSets } from '../../../../shared/drills/index.ts';
import { Notice } from '../../../components/notice.tsx';
import { PaperOptions } from '../../../components/paper-options.tsx';
import { useUpdatePreferences } from '../api/update-preferences.ts';

/** The paper a maker's printer takes and the drills they own: used for new kits and drill choices. */
export function PrintPreferences({ account }: { account: Account }) {
  const update = useUpdatePreferences();
  const [paper, setPaper] = useState(account.defaultPaper);
  const currentSet = commonDrillSets.find((set) => set.drillIds.length === account.drillSetIds.length && set.drillIds.every((id) => account.drillSetIds.includes(id)));
  const [setName, setSetName] = useState(account.drillSetIds.length === 0 ? '' : (currentSet?.name ?? 'custom'));

  return (
    <section aria-labelledby="print-prefs-heading" className="min-w-0 rounded-lg border border-rule bg-white p-5">
      <h2 id="print-prefs-heading" className="text-lg font-semibold">
        Paper and drills
      </h2>
      <div className="mt-3 flex flex-col gap-3">
        <label className="flex min-w-0 flex-col gap-1 text-sm font-medium">
          My printer's paper
          <select
            value={paper}
            onChange={(e) => {
              const value = e.target.value as Account['defaultPaper'];
              setPaper(value);
              update.mutate({ defaultPaper: value });
            }}
            className="min-h-10 w-full min-w-0 rounded-md border border-rule bg-white px-2 font-normal"
          >
            <PaperOptions />
          </select>
        </label>
        <label className="flex min-w-0 flex-col gap-1 text-sm font-medium">
          My drills
          <select
            value={setName}
            onChange={(e) => {
              setSetName(e.target.value);
              const chosen = commonDrillSets.find((set) => set.name === e.target.value);
              update.mutate({ drillSetIds: chosen && chosen.drillIds.length < 400 ? chosen.drillIds : [] });
            }}
            className="min-h-10 w-full min-w-0 rounded-md border border-rule bg-white px-2 font-normal"
          >
            <option value="">The usual drills of my units</option>
            {commonDrillSets
              .filter((set) => set.drillIds.length < 400)
              .map((set) => (
                <option key={set.name} value={set.name}>
                  {set.name} ({set.drillIds.length} drills)
                </option>
              ))}
            {setName === 'custom' && <option value="custom">My own set ({account.drillSetIds.length} drills)</option>}
          </select>
        </label>
        <p className="text-sm text-ink-soft">The design screen offers these drills when a design has no drill set of its own; new kits print on this paper.</p>
      </div>
      <div className="mt-2" aria-live="polite">
        {update.isSuccess && <p className="text-sm text-ok">Saved.</p>}
        {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      </div>
    </section>
  );
}
