import type { Design, Part, PartRole } from '../design/design-schema.ts';
import { ROLE_NAMES } from '../design/new-design.ts';
import { usualCollarBottomMm } from './collar.ts';

/**
 * The stove put together: where each part stands, in mm up from the bottom of the shell (or of the
 * lowest part when there is no shell). A part placed by the design (`bottomAtMm`) stands where it
 * says; otherwise where such a part usually sits:
 * - the shell on the ground;
 * - the burn chamber hanging in the shell with its top level with the shell's top, or standing on
 *   the shell's bottom when it is the taller can;
 * - a concentrator on the highest top below it, and a pot stand on the concentrator (or on the
 *   stove when there is none).
 */
export interface PlacedPart {
  partId: string;
  role: PartRole;
  name: string;
  bottomMm: number;
  topMm: number;
  outerDiameterMm: number;
  /** Inside the wall: outer diameter less two wall thicknesses. */
  insideDiameterMm: number;
  wallMm: number;
  /** True when the design gives the height, false when it is the usual place. */
  given: boolean;
  /** A concentrator's opening, when it has one. */
  openingDiameterMm?: number;
}

export interface Assembly {
  parts: PlacedPart[];
  shell?: PlacedPart;
  chamber?: PlacedPart;
  concentrator?: PlacedPart;
  potStand?: PlacedPart;
}

/** Places every part, in the order each rests on the one below. */
export function assemble(design: Pick<Design, 'parts'>): Assembly {
  const placed = new Map<string, PlacedPart>();
  const first = (role: PartRole) => design.parts.find((p) => p.role === role);
  const place = (part: Part, usual: () => number) => {
    const bottomMm = part.bottomAtMm ?? usual();
    const wallMm = part.vessel.wallThicknessMm;
    const at: PlacedPart = {
      partId: part.id,
      role: part.role,
      name: part.name?.trim() || ROLE_NAMES[part.role],
      bottomMm,
      topMm: bottomMm + part.vessel.heightMm,
      outerDiameterMm: part.vessel.outerDiameterMm,
      insideDiameterMm: Math.max(0, part.vessel.outerDiameterMm - 2 * wallMm),
      wallMm,
      given: part.bottomAtMm !== undefined,
      ...(part.openingDiameterMm !== undefined ? { openingDiameterMm: part.openingDiameterMm } : {}),
    };
    placed.set(part.id, at);
    return at;
  };
  const highestTop = () => Math.max(0, ...[...placed.values()].filter((p) => p.role !== 'intake-collar').map((p) => p.topMm));

  const shellPart = first('shell');
  const shell = shellPart ? place(shellPart, () => 0) : undefined;
  const chamberPart = first('burn-chamber');
  const chamber = chamberPart ? place(chamberPart, () => (shell ? Math.max(shell.bottomMm, shell.topMm - chamberPart.vessel.heightMm) : 0)) : undefined;
  // Other shells and chambers (a design may hold spares) stand on the ground beside the stove.
  for (const part of design.parts) if ((part.role === 'shell' || part.role === 'burn-chamber') && !placed.has(part.id)) place(part, () => 0);
  // A collar is round the shell, not on top of anything: placed before the parts that stand on the stove.
  for (const part of design.parts) if (part.role === 'intake-collar') place(part, () => (shell?.bottomMm ?? 0) + usualCollarBottomMm(design, part));
  const concentratorPart = first('concentrator');
  const concentrator = concentratorPart ? place(concentratorPart, highestTop) : undefined;
  const potStandPart = first('pot-stand');
  const potStand = potStandPart ? place(potStandPart, () => (concentrator ? concentrator.topMm : highestTop())) : undefined;
  for (const part of design.parts) if (!placed.has(part.id)) place(part, highestTop);

  return { parts: design.parts.map((p) => placed.get(p.id)!), shell, chamber, concentrator, potStand };
}
