import { useEffect, useMemo, useRef } from 'react';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../../shared/design/index.ts';
import { layoutDesign } from '../../../../shared/layout/index.ts';
import { checkImposable } from '../../../../shared/print/index.ts';
import type { PrintOptions } from '../../../../shared/print/paper.ts';
import { planKit, type KitPlan } from '../../../../shared/print/plan-kit.ts';
import { CanvasDrawingContext } from '../../preview/canvas-context.ts';

const THUMB_WIDTH_PX = 150;

/** Small pictures of the kit's sheets, drawn by the same code as the PDF, before downloading. */
export function SheetPreviews({ design, print }: { design: DesignInput; print: PrintOptions }) {
  const plan = useMemo((): { plan?: KitPlan; problem?: string } => {
    const valid = validateDesign(design);
    if (!valid.ok) return { problem: 'Fix the design to see its sheets.' };
    const layout = layoutDesign(valid.design);
    const problems = checkImposable(layout.pieces, print);
    if (problems.length) return { problem: problems.join(' ') };
    return { plan: planKit(valid.design, layout, print, { version: 'draft', date: new Date().toISOString().slice(0, 10) }) };
  }, [design, print]);

  if (plan.problem) return <p className="text-sm text-danger">{plan.problem}</p>;
  const sheets = plan.plan!.imposition.sheets;
  return (
    <div className="min-w-0">
      <p className="text-sm text-ink-soft">
        {sheets.length} sheet{sheets.length === 1 ? '' : 's'}, and a build sheet
      </p>
      {/* Focusable so the row of sheets can be scrolled from the keyboard. */}
      <ol tabIndex={0} className="mt-2 flex gap-2 overflow-x-auto pb-2" aria-label="Sheets of the kit">
        {sheets.map((sheet, i) => (
          <li key={sheet.number} className="shrink-0">
            <SheetThumb plan={plan.plan!} index={i} widthMm={sheet.widthMm} heightMm={sheet.heightMm} label={`Sheet ${sheet.number} of ${sheets.length}: ${sheet.placements.map((p) => p.pieceId).join(', ')}`} />
            <p className="mt-1 text-center text-xs text-ink-soft">Sheet {sheet.number}</p>
          </li>
        ))}
      </ol>
    </div>
  );
}

function SheetThumb({ plan, index, widthMm, heightMm, label }: { plan: KitPlan; index: number; widthMm: number; heightMm: number; label: string }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const heightPx = Math.round((THUMB_WIDTH_PX * heightMm) / widthMm);
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const dpr = window.devicePixelRatio || 1;
    canvas.width = Math.round(THUMB_WIDTH_PX * dpr);
    canvas.height = Math.round(heightPx * dpr);
    const drawer = new CanvasDrawingContext(context, { scale: THUMB_WIDTH_PX / widthMm, offsetX: 0, offsetY: 0 }, dpr);
    drawer.clear('#ffffff');
    plan.drawSheet(index, drawer);
    drawer.finish();
  }, [plan, index, widthMm, heightPx]);
  return <canvas ref={ref} role="img" aria-label={label} style={{ width: THUMB_WIDTH_PX, height: heightPx }} className="rounded border border-rule bg-white shadow-sm" />;
}
