import { mm, wallHolesOfPart, type Check } from './check-context.ts';
import type { Finding } from '../layout-types.ts';

/**
 * Heights in the put-together stove (shared/layout/assembly.ts), measured up from the shell's
 * bottom: a hole's centre stands at its part's bottom plus its height on the wall, its edges half
 * a drill above and below.
 * - The chamber stands clear of the shell's bottom, so primary air reaches its bottom holes
 *   (at least the design's rule, 6 mm by default: common practice, no source); standing on it, the
 *   bottom holes are shut: an error.
 * - The jets' top edge stays below the shell's top, where the shell closes against the chamber
 *   (3 mm by default: common practice, no source): above it the jets draw cold outside air, not
 *   the air warmed in the gap.
 * - The jets sit above the shell's intake, so the secondary air rises through the gap to them.
 */
export const checkHeights: Check = (context) => {
  const { design, assembly, pieces, holesByPiece } = context;
  const { shell, chamber } = assembly;
  if (!shell || !chamber) return [];
  const { minClearanceBelowMm, jetsBelowShellTopMm } = design.rules;
  const findings: Finding[] = [];
  const partIds = [chamber.partId, shell.partId];

  const bottomHoles = pieces.filter((p) => p.partId === chamber.partId && p.kind === 'disc' && p.face === 'bottom').flatMap((p) => holesByPiece.get(p.id) ?? []);
  const clearanceMm = chamber.bottomMm - shell.bottomMm;
  if (bottomHoles.length > 0 && clearanceMm < minClearanceBelowMm) {
    const shut = clearanceMm <= 0;
    findings.push({
      rule: 'chamber-clearance',
      severity: shut ? 'error' : 'warning',
      message: shut
        ? `The chamber stands on the shell's bottom: its ${bottomHoles.length} bottom holes are shut. Raise it at least ${mm(minClearanceBelowMm)} mm (Bottom stands at) or choose a shorter chamber.`
        : `The chamber stands ${mm(clearanceMm)} mm above the shell's bottom (at least ${mm(minClearanceBelowMm)} mm): too little room for primary air to reach its bottom holes.`,
      numbers: { clearanceMm: mm(clearanceMm), minClearanceBelowMm },
      holeIds: bottomHoles.map((h) => h.id),
      partIds,
    });
  }

  const jets = wallHolesOfPart(context, chamber.partId).filter((h) => h.group === 'secondary');
  if (jets.length === 0) return findings;
  const jetTopMm = Math.max(...jets.map((h) => chamber.bottomMm + h.yMm + h.diameterMm / 2));
  const jetBottomMm = Math.min(...jets.map((h) => chamber.bottomMm + h.yMm - h.diameterMm / 2));
  const limitMm = shell.topMm - jetsBelowShellTopMm;
  if (jetTopMm > limitMm) {
    const above = jetTopMm > shell.topMm;
    findings.push({
      rule: 'jets-above-shell-top',
      severity: 'warning',
      message: above
        ? `The jets reach ${mm(jetTopMm - shell.topMm)} mm above the shell's top: they draw cold outside air, not the air warmed in the gap. Lower the jets or raise the shell.`
        : `The jets' top edge is ${mm(shell.topMm - jetTopMm)} mm below the shell's top (at least ${mm(jetsBelowShellTopMm)} mm): the shell's top closes over them. Lower the jets.`,
      numbers: { jetTopMm: mm(jetTopMm), shellTopMm: mm(shell.topMm), jetsBelowShellTopMm },
      holeIds: jets.filter((h) => chamber.bottomMm + h.yMm + h.diameterMm / 2 > limitMm).map((h) => h.id),
      partIds,
    });
  }

  const intake = wallHolesOfPart(context, shell.partId).filter((h) => h.group === 'intake');
  if (intake.length === 0) return findings;
  const intakeTopMm = Math.max(...intake.map((h) => shell.bottomMm + h.yMm + h.diameterMm / 2));
  if (jetBottomMm <= intakeTopMm) {
    findings.push({
      rule: 'jets-below-intake',
      severity: 'warning',
      message: `The jets come down to ${mm(jetBottomMm)} mm, level with or below the top of the shell's intake at ${mm(intakeTopMm)} mm: the air does not rise through the gap to them. Put the intake low and the jets high.`,
      numbers: { jetBottomMm: mm(jetBottomMm), intakeTopMm: mm(intakeTopMm) },
      holeIds: [...jets, ...intake].filter((h) => (h.group === 'intake' ? shell.bottomMm + h.yMm + h.diameterMm / 2 >= jetBottomMm : chamber.bottomMm + h.yMm - h.diameterMm / 2 <= intakeTopMm)).map((h) => h.id),
      partIds,
    });
  }
  return findings;
};
