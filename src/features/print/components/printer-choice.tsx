import { Link } from 'react-router';
import type { PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { usePrinterProfiles } from '../../printer-profiles/api/get-printer-profiles.ts';
import { useBrowserProfile } from '../../printer-profiles/browser-profile.ts';

export type PrinterCorrection = Pick<PrinterProfileInput, 'name' | 'measuredXMm' | 'measuredYMm'>;

interface Choice {
  value: string;
  label: string;
  profile?: PrinterCorrection;
}

/** The printers this maker has measured: the account's, and the one kept in this browser. */
export function usePrinterChoices(): { choices: Choice[]; preferred: string } {
  const { data: account } = useAccount();
  const accountProfiles = usePrinterProfiles(Boolean(account)).data?.profiles ?? [];
  const browserProfile = useBrowserProfile();
  const choices: Choice[] = [
    ...accountProfiles.map((p) => ({ value: `account:${p.id}`, label: `${p.name}${p.isDefault ? ' (default)' : ''}`, profile: p })),
    ...(browserProfile ? [{ value: 'browser', label: `${browserProfile.name} (this browser)`, profile: browserProfile }] : []),
    { value: 'none', label: 'No correction: print as drawn' },
  ];
  // The account's default printer, else the first measured one, else no correction.
  const accountDefault = accountProfiles.find((p) => p.isDefault);
  const preferred = accountDefault ? `account:${accountDefault.id}` : choices[0]!.value;
  return { choices, preferred };
}

interface PrinterChoiceProps {
  choices: Choice[];
  value: string;
  onChange(value: string): void;
}

/** Which measured printer to scale the kit for; a link to measure one when there is none. */
export function PrinterChoice({ choices, value, onChange }: PrinterChoiceProps) {
  const measured = choices.length > 1;
  return (
    <div className="flex flex-col gap-1">
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        Printer
        <select value={value} onChange={(e) => onChange(e.target.value)} className="min-h-10 rounded-md border border-rule bg-white px-2 text-sm text-ink">
          {choices.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
      <p className="text-xs text-ink-soft">
        {measured ? 'The kit is scaled so this printer prints it true to size. ' : 'No printer measured yet. '}
        <Link to="/printer" className="text-ember-700 underline">
          {measured ? 'Measure another printer' : 'Calibrate your printer'}
        </Link>
      </p>
    </div>
  );
}
