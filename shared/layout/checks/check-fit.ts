import { holeAreaMm2 } from '../../airflow/open-area.ts';
import { mm, wallHolesOfPart, type Check } from './check-context.ts';
import type { Finding } from '../layout-types.ts';

/**
 * The burn chamber in its shell. The gap all round is half the difference of the shell's inside
 * diameter (its outer diameter less two walls) and the chamber's diameter over its seam, the
 * widest place (worked geometry). Under nothing the chamber does not go in: an error. Narrower than
 * the design's rule, or a ring of air smaller than the jets it feeds (pi/4 x (Di^2 - Do^2) against
 * their open area), the air cannot pass; wider than the rule, it rises slow and cools before it
 * reaches the jets, which then run weak: warnings. Limits in the design's rules (defaults 3 mm and
 * 25 mm: common practice, no source).
 */
export const checkFit: Check = (context) => {
  const { design, assembly } = context;
  const { shell, chamber } = assembly;
  if (!shell || !chamber) return [];
  const { minGapMm, maxGapMm } = design.rules;
  const gapMm = (shell.insideDiameterMm - chamber.outerDiameterMm) / 2;
  const partIds = [chamber.partId, shell.partId];
  const numbers = { gapMm: mm(gapMm), shellInsideMm: mm(shell.insideDiameterMm), chamberOutsideMm: mm(chamber.outerDiameterMm), minGapMm, maxGapMm };
  const finding = (rule: string, severity: Finding['severity'], message: string, extra: Record<string, number> = {}): Finding => ({ rule, severity, message, numbers: { ...numbers, ...extra }, holeIds: [], partIds });

  if (gapMm < 0) {
    return [finding('chamber-fit', 'error', `The ${chamber.name.toLowerCase()} is ${mm(chamber.outerDiameterMm)} mm across its seam but the ${shell.name.toLowerCase()} is only ${mm(shell.insideDiameterMm)} mm inside: it does not fit. Choose a wider shell or a narrower chamber.`)];
  }
  const ringAreaMm2 = (Math.PI / 4) * (shell.insideDiameterMm ** 2 - chamber.outerDiameterMm ** 2);
  const jetAreaMm2 = wallHolesOfPart(context, chamber.partId)
    .filter((h) => h.group === 'secondary')
    .reduce((sum, h) => sum + holeAreaMm2(h.diameterMm), 0);
  const areas = { ringAreaMm2: mm(ringAreaMm2), jetAreaMm2: mm(jetAreaMm2) };
  if (gapMm < minGapMm) {
    return [finding('gap-narrow', 'warning', `The gap round the chamber is ${mm(gapMm)} mm (at least ${mm(minGapMm)} mm): the secondary air can hardly rise to the jets, and the cans may touch and bind when hot.`, areas)];
  }
  if (ringAreaMm2 < jetAreaMm2) {
    return [finding('gap-narrow', 'warning', `The ring of air round the chamber is ${mm(ringAreaMm2)} mm² across, less than the ${mm(jetAreaMm2)} mm² of jets it feeds: the gap chokes them. Choose a wider shell or fewer jets.`, areas)];
  }
  if (gapMm > maxGapMm) {
    return [finding('gap-wide', 'warning', `The gap round the chamber is ${mm(gapMm)} mm (at most ${mm(maxGapMm)} mm): the secondary air rises slowly and cools, and the jets run weak. Choose a narrower shell or a wider chamber.`, areas)];
  }
  return [finding('chamber-gap', 'note', `The chamber sits in the shell with ${mm(gapMm)} mm of gap all round.`, areas)];
};
