import { holeAreaMm2 } from '../../airflow/open-area.ts';
import type { Finding } from '../layout-types.ts';
import { mm, wallHolesOfPart, type Check } from './check-context.ts';

const round = (value: number, digits = 2) => Math.round(value * 10 ** digits) / 10 ** digits;

/**
 * What sits on top of the stove.
 * - A flame concentrator's opening against the burn chamber's diameter: 0.5 to 0.7 of it by
 *   default (common practice, no source; about 0.6 is usual); outside, a warning: much smaller
 *   chokes the flame, much larger does little.
 * - A pot stand: the pot sits on its top, so the room for the flame is its top less the highest
 *   top of the rest of the stove (25 mm by default: common practice, no source); its wall
 *   openings let the exhaust out, and together should be at least as large as the opening the flame
 *   leaves by (the concentrator's opening, else the chamber's mouth: pi/4 x d^2).
 */
export const checkTopParts: Check = (context) => {
  const { design, assembly } = context;
  const { chamber, concentrator, potStand } = assembly;
  const rules = design.rules;
  const findings: Finding[] = [];
  const concentratorPart = concentrator && design.parts.find((p) => p.id === concentrator.partId);
  const openingMm = concentratorPart?.openingDiameterMm;

  if (concentrator && chamber && openingMm !== undefined) {
    const ratio = openingMm / chamber.outerDiameterMm;
    const usual = ratio >= rules.concentratorMinRatio && ratio <= rules.concentratorMaxRatio;
    findings.push({
      rule: 'concentrator-opening',
      severity: usual ? 'note' : 'warning',
      message: `The concentrator opening is ${round(ratio)} of the chamber diameter (${round(rules.concentratorMinRatio)} to ${round(rules.concentratorMaxRatio)})${usual ? '.' : ratio < rules.concentratorMinRatio ? ': so small an opening chokes the flame.' : ': so large an opening does little.'}`,
      numbers: { ratio: round(ratio, 3), openingMm, chamberMm: chamber.outerDiameterMm, minRatio: rules.concentratorMinRatio, maxRatio: rules.concentratorMaxRatio },
      holeIds: [],
      partIds: [concentrator.partId, chamber.partId],
    });
  }

  if (potStand) {
    const below = assembly.parts.filter((p) => p.partId !== potStand.partId);
    const stoveTopMm = Math.max(0, ...below.map((p) => p.topMm));
    const roomMm = potStand.topMm - stoveTopMm;
    if (below.length > 0 && roomMm < rules.minFlameRoomMm) {
      findings.push({
        rule: 'flame-room',
        severity: 'warning',
        message: `The pot sits ${mm(roomMm)} mm above the top of the stove (at least ${mm(rules.minFlameRoomMm)} mm): the flame is smothered against the pot and smokes. Use a taller pot stand.`,
        numbers: { roomMm: mm(roomMm), minFlameRoomMm: rules.minFlameRoomMm },
        holeIds: [],
        partIds: [potStand.partId],
      });
    }
    const openings = wallHolesOfPart(context, potStand.partId);
    const exhaustMm2 = openings.reduce((sum, h) => sum + holeAreaMm2(h.diameterMm), 0);
    const flameMm2 = openingMm !== undefined ? holeAreaMm2(openingMm) : chamber ? holeAreaMm2(chamber.insideDiameterMm) : 0;
    if (flameMm2 > 0 && exhaustMm2 < flameMm2 * rules.minExhaustRatio) {
      const what = openingMm !== undefined ? 'the concentrator opening' : 'the chamber mouth';
      findings.push({
        rule: 'pot-stand-exhaust',
        severity: 'warning',
        message:
          exhaustMm2 === 0
            ? `The pot stand has no openings in its wall: with the pot on it the exhaust cannot get out. Add a row of large holes round it.`
            : `The pot stand's openings are ${mm(exhaustMm2)} mm², ${Math.round((exhaustMm2 / flameMm2) * 100)} % of ${what} (${mm(flameMm2)} mm², at least ${Math.round(rules.minExhaustRatio * 100)} %): the exhaust backs up under the pot. Add or enlarge the openings.`,
        numbers: { exhaustAreaMm2: mm(exhaustMm2), flameAreaMm2: mm(flameMm2), minExhaustRatio: rules.minExhaustRatio },
        holeIds: openings.map((h) => h.id),
        partIds: [potStand.partId],
      });
    }
  }
  return findings;
};
