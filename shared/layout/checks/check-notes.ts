import type { Finding } from '../layout-types.ts';
import type { Check } from './check-context.ts';
import { nameSource } from '../../design/name-source.ts';

/** Side-row positions dropped because they fell in a keep-out: a note, so the count is not a surprise. */
export const checkDroppedHoles: Check = ({ design, dropped }) => {
  const findings: Finding[] = [];
  for (const part of design.parts) {
    for (const row of part.sideRows) {
      const count = dropped.get(`${part.id}/${row.id}`);
      if (!count) continue;
      findings.push({
        rule: 'dropped-in-keep-out',
        severity: row.count - row.skip.length - count === 0 ? 'error' : 'note',
        pieceId: `${part.id}:wall`,
        message: `${count} of the ${row.count} positions of "${nameSource(design, row.id)}" fall in a keep-out and are left out${row.count - row.skip.length - count === 0 ? ': the row has no holes left' : ''}.`,
        numbers: { dropped: count, positions: row.count },
        holeIds: [],
      });
    }
  }
  return findings;
};

/**
 * A flame concentrator's opening against the burn chamber's diameter: about 0.6 D is commonplace
 * (Aprovecho Research Center newsletter); far from it, a warning.
 */
export const checkConcentrator: Check = ({ design }) => {
  const chamber = design.parts.find((part) => part.role === 'burn-chamber');
  const findings: Finding[] = [];
  for (const part of design.parts) {
    if (part.role !== 'concentrator' || part.openingDiameterMm === undefined || !chamber) continue;
    const ratio = part.openingDiameterMm / chamber.vessel.outerDiameterMm;
    const usual = ratio >= 0.5 && ratio <= 0.7;
    findings.push({
      rule: 'concentrator-opening',
      severity: usual ? 'note' : 'warning',
      message: `The concentrator opening is ${Math.round(ratio * 100) / 100} of the chamber diameter; about 0.6 is commonplace${usual ? '.' : ': a much smaller opening chokes the flame, a much larger one does little.'}`,
      numbers: { ratio: Math.round(ratio * 1000) / 1000, openingMm: part.openingDiameterMm, chamberMm: chamber.vessel.outerDiameterMm },
      holeIds: [],
    });
  }
  return findings;
};
