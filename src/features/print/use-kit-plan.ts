import { useMemo } from 'react';
import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../shared/design/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import { checkImposable } from '../../../shared/print/index.ts';
import type { PrintOptions } from '../../../shared/print/paper.ts';
import { planKit, type KitPlan } from '../../../shared/print/plan-kit.ts';

export type KitPlanResult = { ok: true; plan: KitPlan } | { ok: false; problem: string };

/**
 * The kit as it will print on this paper, planned in the browser by the same code as the PDF:
 * the sheet previews and the build sheet read it; the server plans it again for the file.
 */
export function useKitPlan(design: DesignInput, print: PrintOptions): KitPlanResult {
  return useMemo((): KitPlanResult => {
    const valid = validateDesign(design);
    if (!valid.ok) return { ok: false, problem: 'Fix the design to see its sheets.' };
    const layout = layoutDesign(valid.design);
    const problems = checkImposable(layout.pieces, print);
    if (problems.length) return { ok: false, problem: problems.join(' ') };
    return { ok: true, plan: planKit(valid.design, layout, print, { version: 'draft', date: new Date().toISOString().slice(0, 10) }) };
  }, [design, print]);
}
