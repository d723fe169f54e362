import { useEffect, useRef, useState } from 'react';
import type { Sheet } from '../../../../shared/print/imposition-types.ts';
import type { KitPlan } from '../../../../shared/print/plan-kit.ts';
import { CanvasDrawingContext } from '../../preview/canvas-context.ts';

const THUMB_WIDTH_PX = 120;
const LARGE_WIDTH_PX = 640;

interface SheetPreviewsProps {
  plan: KitPlan;
  busy: boolean;
  /** Downloads one sheet as SVG (sheet numbers start at 1). */
  onDownloadSvg(sheet: number): void;
}

/** The kit's sheets, drawn by the same code as the PDF: a row of small ones and the chosen one large. */
export function SheetPreviews({ plan, busy, onDownloadSvg }: SheetPreviewsProps) {
  const sheets = plan.imposition.sheets;
  const [chosen, setChosen] = useState(0);
  const index = Math.min(chosen, sheets.length - 1);
  const sheet = sheets[index]!;
  return (
    <div className="flex min-w-0 flex-col gap-3">
      {/* Focusable so the row of sheets can be scrolled from the keyboard. */}
      <ol tabIndex={0} className="flex gap-2 overflow-x-auto pb-2" aria-label="Sheets of the kit">
        {sheets.map((s, i) => (
          <li key={s.number} className="shrink-0">
            <button type="button" aria-pressed={i === index} onClick={() => setChosen(i)} className={`flex flex-col items-center gap-1 rounded-md p-1 ${i === index ? 'bg-ember-100 ring-2 ring-ember-600' : 'hover:bg-ember-50'}`}>
              <SheetCanvas plan={plan} index={i} sheet={s} widthPx={THUMB_WIDTH_PX} label={describe(plan, s)} />
              <span className="text-xs text-ink-soft">Sheet {s.number}</span>
            </button>
          </li>
        ))}
      </ol>
      <figure className="flex min-w-0 flex-col items-start gap-2">
        <SheetCanvas plan={plan} index={index} sheet={sheet} widthPx={LARGE_WIDTH_PX} label={describe(plan, sheet)} />
        <figcaption className="flex flex-wrap items-center gap-3 text-sm text-ink-soft">
          {describe(plan, sheet)}
          <button type="button" disabled={busy} onClick={() => onDownloadSvg(sheet.number)} className="min-h-9 rounded-md border border-rule bg-white px-2.5 text-sm font-medium text-ink hover:bg-ember-50 disabled:opacity-50">
            Download sheet {sheet.number} as SVG
          </button>
        </figcaption>
      </figure>
    </div>
  );
}

function describe(plan: KitPlan, sheet: Sheet): string {
  return `Sheet ${sheet.number} of ${plan.imposition.sheets.length}: ${plan.sheetContents[sheet.number - 1] ?? ''}`;
}

/** One sheet drawn at `widthPx` CSS pixels (sharp on high-density screens); shrinks to fit narrow ones. */
function SheetCanvas({ plan, index, sheet, widthPx, label }: { plan: KitPlan; index: number; sheet: Sheet; widthPx: number; label: string }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const heightPx = Math.round((widthPx * sheet.heightMm) / sheet.widthMm);
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const dpr = window.devicePixelRatio || 1;
    canvas.width = Math.round(widthPx * dpr);
    canvas.height = Math.round(heightPx * dpr);
    const drawer = new CanvasDrawingContext(context, { scale: widthPx / sheet.widthMm, offsetX: 0, offsetY: 0 }, dpr);
    drawer.clear('#ffffff');
    plan.drawSheet(index, drawer);
    drawer.finish();
  }, [plan, index, sheet.widthMm, widthPx, heightPx]);
  return <canvas ref={ref} role="img" aria-label={label} style={{ width: widthPx, aspectRatio: `${widthPx} / ${heightPx}` }} className="h-auto max-w-full rounded border border-rule bg-white shadow-sm" />;
}
