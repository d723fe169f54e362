import { vesselCatalogue, vesselFromCatalogue } from '../vessels/catalogue.ts';
import type { UnitSystem } from '../units/length.ts';
import { DESIGN_SCHEMA_VERSION, type DesignInput, type PartInput, type PartRole } from './design-schema.ts';

export const ROLE_NAMES: Record<PartRole, string> = { 'burn-chamber': 'Burn chamber', shell: 'Outer shell', concentrator: 'Concentrator', 'pot-stand': 'Pot stand', 'intake-collar': 'Intake collar' };

/** A No. 303 food can: the usual first burn chamber (common practice, no source). */
const FIRST_CHAMBER = 'food-303x406';
/** Room round a chamber for the secondary air to rise (common practice, no source). */
const SHELL_CLEARANCE_MM = 10;

/** An id not yet used in the list: "shell", then "shell-2", "shell-3"... */
export function freshId(base: string, taken: readonly { id?: string }[]): string {
  const used = new Set(taken.map((t) => t.id));
  if (!used.has(base)) return base;
  for (let n = 2; ; n++) if (!used.has(`${base}-${n}`)) return `${base}-${n}`;
}

/** One can, no holes yet: the start of any stove, a single-can one included. */
export function blankDesign(units: UnitSystem): DesignInput {
  return {
    schemaVersion: DESIGN_SCHEMA_VERSION,
    name: 'New stove',
    notes: '',
    units,
    parts: [{ id: 'chamber', role: 'burn-chamber', name: ROLE_NAMES['burn-chamber'], vessel: vesselFromCatalogue(FIRST_CHAMBER), sideRows: [], endPatterns: [] }],
  };
}

/**
 * A new part in a role, on a can that suits it: a shell, concentrator or pot stand gets the
 * smallest catalogue can at least 10 mm wider than the burn chamber; a chamber gets a No. 303.
 */
export function newPart(role: PartRole, design: DesignInput): PartInput {
  const parts = design.parts ?? [];
  if (role === 'intake-collar') return newCollar(parts);
  const chamber = parts.find((p) => p.role === 'burn-chamber');
  const wider = chamber ? [...vesselCatalogue].sort((a, b) => a.diameterMm - b.diameterMm).find((e) => e.diameterMm >= chamber.vessel.outerDiameterMm + SHELL_CLEARANCE_MM) : undefined;
  const canId = role === 'burn-chamber' || !wider ? FIRST_CHAMBER : wider.id;
  const base = role === 'burn-chamber' ? 'chamber' : role;
  const sameRole = parts.filter((p) => p.role === role).length;
  return { id: freshId(base, parts), role, name: sameRole ? `${ROLE_NAMES[role]} ${sameRole + 1}` : ROLE_NAMES[role], vessel: vesselFromCatalogue(canId), sideRows: [], endPatterns: [] };
}

/** Band metal for a collar: a strip cut from a can wall (typical tinplate, from memory). */
export const COLLAR_BAND_MM = { heightMm: 32, wallMm: 0.25 } as const;

/**
 * A collar is a band cut from another can's wall, wrapped round the shell over its intake row: its
 * inside is the shell's outside, so its outside is the shell's diameter plus two band thicknesses.
 */
function newCollar(parts: NonNullable<DesignInput['parts']>): PartInput {
  const shell = parts.find((p) => p.role === 'shell');
  const shellDiameterMm = shell?.vessel.outerDiameterMm ?? vesselFromCatalogue(FIRST_CHAMBER).outerDiameterMm + SHELL_CLEARANCE_MM;
  const sameRole = parts.filter((p) => p.role === 'intake-collar').length;
  return {
    id: freshId('collar', parts),
    role: 'intake-collar',
    name: sameRole ? `${ROLE_NAMES['intake-collar']} ${sameRole + 1}` : ROLE_NAMES['intake-collar'],
    vessel: {
      source: 'measured',
      name: 'Band cut from a can wall',
      outerDiameterMm: Math.ceil((shellDiameterMm + 2 * COLLAR_BAND_MM.wallMm) * 100) / 100,
      heightMm: COLLAR_BAND_MM.heightMm,
      wallThicknessMm: COLLAR_BAND_MM.wallMm,
      seamAngleDeg: shell?.vessel.seamAngleDeg ?? 0,
    },
    sideRows: [],
    endPatterns: [],
  };
}
