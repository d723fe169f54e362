import { useMemo, useRef, useState } from 'react';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { describeSheet, type PrintOptions } from '../../../../shared/print/paper.ts';
import type { PaperFix } from '../../../../shared/print/suggest-paper-fix.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { PaperOptions } from '../../../components/paper-options.tsx';
import { safetyLine } from '../../../components/safety-note.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { useMarkPrinted } from '../../library/api/mark-printed.ts';
import { guessPaper } from '../../printer-profiles/guess-paper.ts';
import { downloadKit, type KitFormat } from '../api/download-kit.ts';
import { useKitPlan } from '../use-kit-plan.ts';
import { BuildSheetView } from './build-sheet-view.tsx';
import { PrinterChoice, usePrinterChoices } from './printer-choice.tsx';
import { SheetPreviews } from './sheet-previews.tsx';
import { SheetRefusal } from './sheet-refusal.tsx';

const select = 'min-h-10 rounded-md border border-rule bg-white px-2 text-sm text-ink';
const MARGIN_MM = 12.7; // 1/2 in: inside what common desktop printers can reach (common practice, no source)

/**
 * Paper, printer, the sheets as they will print, the downloads (PDF kit, SVG per sheet, hole
 * table), the calibration sheet and the build sheet. `savedId`: the library design the kit comes
 * from, whose "last printed" a PDF download updates.
 */
export function PrintWorkspace({ design, savedId, version, checksLink }: { design: DesignInput; savedId?: string; version: string; checksLink?: string }) {
  const { data: account } = useAccount();
  const [paper, setPaper] = useState<PrintOptions['paper']>();
  // A visitor's first guess is the paper of their region; the account's setting wins.
  const [guessedPaper] = useState(guessPaper);
  const [orientation, setOrientation] = useState<PrintOptions['orientation']>('portrait');
  const chosenPaper = paper ?? account?.defaultPaper ?? guessedPaper;
  const print = useMemo((): PrintOptions => ({ paper: chosenPaper, orientation, marginMm: MARGIN_MM }), [chosenPaper, orientation]);
  const kit = useKitPlan(design, print, version);
  const printers = usePrinterChoices();
  const [printerValue, setPrinterValue] = useState<string>();
  const printer = printers.choices.find((c) => c.value === (printerValue ?? printers.preferred)) ?? printers.choices.at(-1)!;
  const [status, setStatus] = useState<{ tone: 'success' | 'error'; text: string }>();
  const [busy, setBusy] = useState(false);
  const markPrinted = useMarkPrinted();
  // The paper choice a "does not fit" button made, said once the sheets are drawn on it.
  const [applied, setApplied] = useState<string>();
  const paperSelect = useRef<HTMLSelectElement>(null);
  const orientationSelect = useRef<HTMLSelectElement>(null);

  function applyFix(fix: PaperFix) {
    setPaper(fix.paper);
    setOrientation(fix.orientation);
    setApplied(`Paper changed to ${describeSheet(fix.paper, fix.orientation)}.`);
    // The button goes once the kit fits; the control it changed takes the focus instead.
    (fix.paper === print.paper ? orientationSelect : paperSelect).current?.focus();
  }

  async function download(format: KitFormat, sheet?: number) {
    setBusy(true);
    setStatus(undefined);
    try {
      const correction = printer.profile ? { name: printer.profile.name, measuredXMm: printer.profile.measuredXMm, measuredYMm: printer.profile.measuredYMm } : undefined;
      const { fileName, sheets } = await downloadKit(format, { design, print, printer: correction, sheet, version });
      if (format === 'pdf' && savedId && account) markPrinted.mutate(savedId);
      setStatus({ tone: 'success', text: format === 'pdf' ? `Saved ${fileName} (${sheets} sheet${sheets === 1 ? '' : 's'}, the sheet map and the build sheet).` : `Saved ${fileName}.` });
    } catch (error) {
      setStatus({ tone: 'error', text: (error as Error).message });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex min-w-0 flex-col gap-6">
      <section aria-labelledby="print-setup-heading" className="flex flex-col gap-3">
        <h2 id="print-setup-heading" className="font-semibold">
          Paper and printer
        </h2>
        <div className="grid gap-3 sm:grid-cols-[1fr_1fr_2fr]">
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Paper
            <select
              ref={paperSelect}
              value={print.paper}
              onChange={(e) => {
                setPaper(e.target.value as PrintOptions['paper']);
                setApplied(undefined);
              }}
              className={select}
            >
              <PaperOptions />
            </select>
          </label>
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Orientation
            <select
              ref={orientationSelect}
              value={orientation}
              onChange={(e) => {
                setOrientation(e.target.value as PrintOptions['orientation']);
                setApplied(undefined);
              }}
              className={select}
            >
              <option value="portrait">Portrait</option>
              <option value="landscape">Landscape</option>
            </select>
          </label>
          <PrinterChoice choices={printers.choices} value={printer.value} onChange={setPrinterValue} />
        </div>
        <p className="text-sm">
          <a href={`/api/render/calibration.pdf?${new URLSearchParams({ paper: print.paper })}`} download="canwright-calibration.pdf" className="text-ember-700 underline">
            Calibration sheet for this paper (PDF)
          </a>
          <span className="text-ink-soft"> — print it first if you have not measured this printer.</span>
        </p>
      </section>

      <section aria-labelledby="print-sheets-heading" className="flex min-w-0 flex-col gap-3">
        <h2 id="print-sheets-heading" className="font-semibold">
          Sheets
        </h2>
        {kit.ok && kit.errors + kit.warnings > 0 && (
          <Notice tone={kit.errors ? 'error' : 'info'}>
            The checks found {describeFindings(kit.errors, kit.warnings)} in this layout. Print it if you mean to
            {checksLink ? (
              <>
                , or{' '}
                <Link to={checksLink} className="underline">
                  go back to the checks
                </Link>
              </>
            ) : null}
            .
          </Notice>
        )}
        {/* Always there, so a change of paper is announced: the sheet count, or why it does not print. */}
        <div aria-live="polite" className="flex flex-col gap-2">
          {applied && kit.ok && <p className="text-sm font-medium text-ok">{applied}</p>}
          {kit.ok ? (
            <p className="text-sm text-ink-soft">
              {kit.plan.imposition.sheets.length} template sheet{kit.plan.imposition.sheets.length === 1 ? '' : 's'}, then the build sheet.
            </p>
          ) : (
            <SheetRefusal problem={kit.problem} fix={kit.fix} onApply={applyFix} />
          )}
        </div>
        {kit.ok && <SheetPreviews plan={kit.plan} busy={busy} onDownloadSvg={(sheet) => void download('svg', sheet)} />}
        <div className="flex flex-wrap gap-2">
          <Button disabled={busy || !kit.ok} onClick={() => void download('pdf')}>
            Download PDF kit
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

      {kit.ok && <BuildSheetView content={kit.plan.buildSheet} />}
    </div>
  );
}

/** "1 error and 2 warnings" */
function describeFindings(errors: number, warnings: number): string {
  const part = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return [errors ? part(errors, 'error') : '', warnings ? part(warnings, 'warning') : ''].filter(Boolean).join(' and ');
}
