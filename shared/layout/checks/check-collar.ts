import { mm, type Check } from './check-context.ts';
import type { Finding } from '../layout-types.ts';

/**
 * An intake collar has to follow an intake row and sit snug on the shell: tighter than the shell
 * it will not go on; more than 1.5 mm loose all round (3 mm on the diameter) and air leaks past its
 * holes, so the scale no longer tells the intake (common practice, no source). When it fits, a
 * note gives the range of intake it sets.
 */
export const COLLAR_MAX_LOOSENESS_MM = 3;
/** Sizes are typed to 0.01 mm: a band that tight still goes on. */
const FIT_TOLERANCE_MM = 0.01;

export const checkCollar: Check = ({ assembly, collars }) => {
  const findings: Finding[] = [];
  const shell = assembly.shell;
  for (const part of assembly.parts) {
    if (part.role !== 'intake-collar') continue;
    const range = collars?.find((c) => c.partId === part.partId);
    if (!shell || !range || range.fullAreaMm2 === 0) {
      findings.push({
        rule: 'collar-without-intake',
        severity: 'error',
        message: shell
          ? `${part.name} has no intake holes to follow: give ${shell.name} a row of holes in the shell intake group.`
          : `${part.name} has no shell to go round: add an outer shell with a row of holes in the shell intake group, or remove the collar.`,
        numbers: {},
        holeIds: [],
        partIds: [part.partId],
      });
      continue;
    }
    const looseMm = part.insideDiameterMm - shell.outerDiameterMm;
    if (looseMm < -FIT_TOLERANCE_MM) {
      findings.push({
        rule: 'collar-too-tight',
        severity: 'error',
        message: `${part.name} is ${mm(-looseMm)} mm too small across the inside to go round ${shell.name} (${mm(part.insideDiameterMm)} mm inside, ${mm(shell.outerDiameterMm)} mm shell). Make the band longer.`,
        numbers: { insideDiameterMm: mm(part.insideDiameterMm), shellDiameterMm: mm(shell.outerDiameterMm) },
        holeIds: [],
        partIds: [part.partId, shell.partId],
      });
    } else if (looseMm > COLLAR_MAX_LOOSENESS_MM) {
      findings.push({
        rule: 'collar-loose',
        severity: 'warning',
        message: `${part.name} is ${mm(looseMm)} mm wider across the inside than ${shell.name} (at most ${COLLAR_MAX_LOOSENESS_MM} mm): air leaks past its holes and the scale no longer tells the intake. Make the band shorter.`,
        numbers: { looseMm: mm(looseMm), maximumMm: COLLAR_MAX_LOOSENESS_MM },
        holeIds: [],
        partIds: [part.partId, shell.partId],
      });
    }
    const least = range.settings[range.settings.length - 1]!;
    const ends = range.closes ? 'closed' : `${mm(range.leastAreaMm2)} mm² (${Math.round(least.fraction * 100)} %) at its tightest, since neighbouring holes overlap again before it can close`;
    findings.push({
      rule: 'collar-range',
      severity: 'note',
      message: `${part.name} sets the intake from ${mm(range.fullAreaMm2)} mm² fully open to ${ends}, turned ${mm(least.offsetMm)} mm round the shell.`,
      numbers: { fullAreaMm2: mm(range.fullAreaMm2), leastAreaMm2: mm(range.leastAreaMm2), turnMm: mm(least.offsetMm) },
      holeIds: [],
      partIds: [part.partId, shell.partId],
    });
  }
  return findings;
};
