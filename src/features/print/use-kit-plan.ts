import { useMemo } from 'react';
import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../shared/design/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import { checkImposable } from '../../../shared/print/index.ts';
import type { PrintOptions } from '../../../shared/print/paper.ts';
import { planKit, type KitPlan } from '../../../shared/print/plan-kit.ts';

export type KitPlanResult = { ok: true; plan: KitPlan; errors: number; warnings: number } | { ok: false; problem: string };

/**
 * The kit as it will print on this paper, planned in the browser by the same code as the PDF:
 * the sheet previews and the build sheet read it; the server plans it again for the file.
 */
export function useKitPlan(design: DesignInput, print: PrintOptions, version: string): KitPlanResult {
  return useMemo((): KitPlanResult => {
    const valid = validateDesign(design);
    if (!valid.ok) return { ok: false, problem: 'Fix the design to see its sheets.' };
    const layout = layoutDesign(valid.design);
    // The same refusals as the server's (server/render/render-kit.ts), in the same words.
    const tooMany = layout.findings.find((f) => f.rule === 'too-many-holes');
    if (tooMany) return { ok: false, problem: tooMany.message };
    if (layout.holes.length === 0) return { ok: false, problem: 'This design has no holes to print yet: add a row round the wall or rings on the bottom.' };
    const problems = checkImposable(layout.pieces, print);
    if (problems.length) return { ok: false, problem: problems.join(' ') };
    const plan = planKit(valid.design, layout, print, { version, date: new Date().toISOString().slice(0, 10) });
    if (plan.imposition.sheets.length === 0) return { ok: false, problem: 'This design has nothing to print yet.' };
    const count = (severity: string) => layout.findings.filter((f) => f.severity === severity).length;
    return { ok: true, plan, errors: count('error'), warnings: count('warning') };
  }, [design, print, version]);
}
