import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Runs axe-core in the page (WCAG 2.1 A and AA rules) and returns its serious and critical violations. */
export async function seriousViolations(page: Page): Promise<AxeViolation[]> {
  // Evaluated through the debugging protocol: the app's Content-Security-Policy rightly refuses inline scripts.
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(context: Document, options: object): Promise<{ violations: AxeViolation[]; passes: unknown[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } });
    return { passes: result.passes.length, list: result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target })) })) };
  });
  // A run that checked nothing would pass anything: make sure rules ran.
  if (violations.passes === 0) throw new Error('axe-core ran no rule on this page');
  return violations.list.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}
