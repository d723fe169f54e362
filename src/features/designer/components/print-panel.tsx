import { useState } from 'react';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { PrintOptions } from '../../../../shared/print/paper.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { PaperOptions } from '../../../components/paper-options.tsx';
import { safetyLine } from '../../../components/safety-note.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { usePrinterProfiles } from '../../printer-profiles/api/get-printer-profiles.ts';
import { readBrowserProfile } from '../../printer-profiles/browser-profile.ts';
import { useMarkPrinted } from '../../library/api/mark-printed.ts';
import { downloadKit, type KitFormat } from '../api/download-kit.ts';
import { SheetPreviews } from './sheet-previews.tsx';

/** Paper, printer and the three downloads: the PDF kit, SVG sheets and the hole table. */
/** `savedId`: the library design this kit comes from, if any (its "last printed" is updated). */
export function PrintPanel({ design, savedId }: { design: DesignInput; savedId?: string }) {
  const { data: account } = useAccount();
  const profiles = usePrinterProfiles(Boolean(account));
  const accountDefault = profiles.data?.profiles.find((p) => p.isDefault);
  const browserProfile = account ? null : readBrowserProfile();
  const profile = accountDefault ?? browserProfile ?? undefined;
  const [print, setPrint] = useState<PrintOptions>({ paper: account?.defaultPaper ?? 'letter', orientation: 'portrait', marginMm: 12.7 });
  const [useProfile, setUseProfile] = useState(true);
  const [status, setStatus] = useState<{ tone: 'success' | 'error'; text: string }>();
  const [busy, setBusy] = useState(false);
  const markPrinted = useMarkPrinted();

  async function download(format: KitFormat) {
    setBusy(true);
    setStatus(undefined);
    try {
      const printer = useProfile && profile ? { measuredXMm: profile.measuredXMm, measuredYMm: profile.measuredYMm } : undefined;
      const { fileName, sheets } = await downloadKit(format, { design, print, printer });
      // A saved design remembers when its kit was last printed (the library's column).
      if (format === 'pdf' && savedId && account) markPrinted.mutate(savedId);
      setStatus({ tone: 'success', text: format === 'csv' ? `Saved ${fileName}.` : `Saved ${fileName} (${sheets} sheet${sheets === 1 ? '' : 's'}).` });
    } catch (error) {
      setStatus({ tone: 'error', text: (error as Error).message });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="print-heading" className="flex min-w-0 flex-col gap-3">
      <h2 id="print-heading" className="font-semibold">
        Print the kit
      </h2>
      <div className="grid grid-cols-2 gap-2">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Paper
          <select value={print.paper} onChange={(e) => setPrint({ ...print, paper: e.target.value as PrintOptions['paper'] })} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink">
            <PaperOptions />
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Orientation
          <select value={print.orientation} onChange={(e) => setPrint({ ...print, orientation: e.target.value as PrintOptions['orientation'] })} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink">
            <option value="portrait">Portrait</option>
            <option value="landscape">Landscape</option>
          </select>
        </label>
      </div>
      <SheetPreviews design={design} print={print} />
      {profile ? (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={useProfile} onChange={(e) => setUseProfile(e.target.checked)} /> Scale for my printer ({profile.name})
        </label>
      ) : (
        <p className="text-sm text-ink-soft">
          Printer not calibrated.{' '}
          <Link to="/printer" className="text-ember-700 underline">
            Calibrate it
          </Link>{' '}
          so the kit prints true to size.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button disabled={busy} onClick={() => void download('pdf')}>
          Download PDF kit
        </Button>
        <Button variant="secondary" disabled={busy} onClick={() => void download('svg')}>
          SVG (sheet 1)
        </Button>
        <Button variant="secondary" disabled={busy} onClick={() => void download('csv')}>
          Hole table (CSV)
        </Button>
      </div>
      {status && <Notice tone={status.tone}>{status.text}</Notice>}
      <p className="rounded-md border border-ember-600/30 bg-ember-50 px-3 py-2 text-sm">
        Print at 100 % / actual size and measure the ruler before drilling. {safetyLine}
      </p>
    </section>
  );
}
