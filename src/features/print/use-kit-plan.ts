import { useMemo } from 'react';
import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../shared/design/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import type { PrintOptions } from '../../../shared/print/paper.ts';
import { planPrintableKit, type KitPlan } from '../../../shared/print/plan-kit.ts';
import { suggestPaperFix, type PaperFix } from '../../../shared/print/suggest-paper-fix.ts';

/** Not printable: why, and for a piece that does not fit, the paper choice that would print it (if any). */
export type KitPlanResult = { ok: true; plan: KitPlan; errors: number; warnings: number } | { ok: false; problem: string; fix?: PaperFix };

/**
 * The kit as it will print on this paper, planned in the browser by the same code (and refusals) as the PDF:
 * the sheet previews and the build sheet read it; the server plans it again for the file.
 */
export function useKitPlan(design: DesignInput, print: PrintOptions, version: string): KitPlanResult {
  return useMemo((): KitPlanResult => {
    const valid = validateDesign(design);
    if (!valid.ok) return { ok: false, problem: 'Fix the design to see its sheets.' };
    const layout = layoutDesign(valid.design);
    const kit = planPrintableKit(valid.design, layout, print, { version, date: new Date().toISOString().slice(0, 10) });
    if (!kit.ok) return { ok: false, problem: kit.message, fix: kit.code === 'DOES_NOT_FIT' ? (suggestPaperFix(layout.pieces, print) ?? undefined) : undefined };
    const count = (severity: string) => layout.findings.filter((f) => f.severity === severity).length;
    return { ok: true, plan: kit.plan, errors: count('error'), warnings: count('warning') };
  }, [design, print, version]);
}
