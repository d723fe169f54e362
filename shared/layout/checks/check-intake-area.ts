import { holeAreaMm2 } from '../../airflow/open-area.ts';
import { holesOfPart, mm, type Check } from './check-context.ts';

/**
 * All the air the stove burns comes in through the shell's intake, then splits into primary (under
 * and into the chamber) and secondary (up the gap to the jets). An intake smaller than the two
 * together becomes the choke and the primary : secondary ratio no longer sets the burn: a warning
 * below the design's rule (intake area / (primary + secondary) at least 1 by default: common
 * practice, no source).
 */
export const checkIntakeArea: Check = (context) => {
  const { design, assembly } = context;
  const { shell, chamber } = assembly;
  if (!shell || !chamber) return [];
  const area = (partIds: string[], groups: string[]) =>
    partIds.flatMap((id) => holesOfPart(context, id)).filter((h) => groups.includes(h.group)).reduce((sum, h) => sum + holeAreaMm2(h.diameterMm), 0);
  const intakeMm2 = area([shell.partId], ['intake']);
  const feedsMm2 = area([chamber.partId], ['primary', 'secondary']);
  if (feedsMm2 === 0) return [];
  const ratio = intakeMm2 / feedsMm2;
  const { minIntakeRatio } = design.rules;
  if (ratio >= minIntakeRatio) return [];
  const intakeIds = holesOfPart(context, shell.partId).filter((h) => h.group === 'intake').map((h) => h.id);
  return [
    {
      rule: 'intake-area',
      severity: 'warning',
      message:
        intakeMm2 === 0
          ? `The shell has no intake holes: no air reaches the ${mm(feedsMm2)} mm² of primary and secondary holes. Add a row of intake holes low on the shell.`
          : `The shell's intake is ${mm(intakeMm2)} mm², ${Math.round(ratio * 100)} % of the ${mm(feedsMm2)} mm² of primary and secondary holes it feeds (at least ${Math.round(minIntakeRatio * 100)} %): it chokes the stove. Add intake holes or use a larger drill.`,
      numbers: { intakeAreaMm2: mm(intakeMm2), feedAreaMm2: mm(feedsMm2), ratio: Math.round(ratio * 1000) / 1000, minIntakeRatio },
      holeIds: intakeIds,
      partIds: [shell.partId, chamber.partId],
    },
  ];
};
