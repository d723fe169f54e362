import type { Design } from '../design/design-schema.ts';
import { describeNumberRange, numberHoles } from '../layout/hole-numbers.ts';
import type { Layout } from '../layout/layout-types.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';

/** The order of work for every hole (common practice, no source). */
export const ORDER_OF_WORK = [
  'Check the print: the rulers measure 100 mm and 4 in. If not, print again at 100 % or calibrate the printer.',
  'Cut out the strips and discs; join a strip printed in parts at its letters (see the sheet map). Tape each strip round its can, the edge marked on it level with the can bottom (or rim), starting at the seam; tape the tab over the start.',
  'Wrap check: pulled snug, the strip’s start edge meets the 0 tick at the end line. If it meets another tick, the can is that much wider (+) or narrower (−) across than the design says: measure the can and change the design before you drill.',
  'Centre-punch every hole through the dot in its crosshair. Take the paper off.',
  'Clamp the can (a wooden block or dowel inside stops the wall denting). Drill each pilot hole, then the final size.',
  'Deburr inside and out with a larger bit turned by hand or a file. Wash off oil and burn off any coating outdoors before first use.',
];

export const SAFETY_NOTES = [
  'Wear eye protection when drilling and cutting; clamp the work, never hold a can by hand under the drill.',
  'Cut metal edges are sharp: wear gloves and deburr every hole and edge.',
  'Burn off paint, lacquer and plastic linings outdoors before the first fire. Never heat galvanized (zinc-coated) metal: its fumes are poisonous.',
  'Never burn a stove indoors, in a tent or in any closed space: carbon monoxide kills without warning.',
  'Check fire restrictions and burn bans; keep water near, children and anything flammable clear. Coals stay hot for hours.',
  'These templates lay out holes; they do not make a fire safe. Follow local codes and regulations.',
];

export interface BuildSheetHoleGroup {
  /** The row or pattern the holes come from ("Secondary jets"). */
  label: string;
  count: number;
  /** The hole numbers on the templates and in the CSV: "25–48". */
  numbers: string;
  /** "3/16 in (4.76 mm)", in the design's units first. */
  drill: string;
  pilot?: string;
}

export interface BuildSheetContent {
  title: string;
  materials: { part: string; text: string }[];
  holes: { part: string; groups: BuildSheetHoleGroup[] }[];
  /** Primary : secondary open area against the target, in words. */
  airflow: string;
  /** Every error and warning still open, so a printed kit never hides one (empty: none). */
  openChecks: { severity: 'error' | 'warning'; message: string }[];
  orderOfWork: string[];
  safety: string[];
}

/**
 * What the build sheet says: materials, the holes of each part with drill and pilot, the order of
 * work and the safety notes. The PDF draws it; the print screen shows the same words as a page.
 */
export function buildSheetContent(design: Design, layout: Layout, pilots: ReadonlyMap<string, string>, text: Pick<KitText, 'units'>): BuildSheetContent {
  return {
    title: `${design.name}: build sheet`,
    materials: design.parts.map((part) => ({
      part: part.name ?? part.role,
      text: `${part.vessel.name}, ${describeLength(part.vessel.outerDiameterMm, text)} across, ${describeLength(part.vessel.heightMm, text)} tall`,
    })),
    holes: listHoleGroups(design, layout, pilots, text),
    airflow: describeAirflow(layout),
    openChecks: layout.findings.flatMap((f) => (f.severity === 'note' ? [] : [{ severity: f.severity, message: f.message }])),
    orderOfWork: ORDER_OF_WORK,
    safety: SAFETY_NOTES,
  };
}

/** "Primary : secondary open area 4.9 : 1 (target 5 : 1): 1,204 mm² : 246 mm²." */
export function describeAirflow(layout: Pick<Layout, 'airflow'>): string {
  const { primaryAreaMm2, secondaryAreaMm2, ratio, targetRatio } = layout.airflow;
  const areas = `${Math.round(primaryAreaMm2).toLocaleString('en-US')} mm² : ${Math.round(secondaryAreaMm2).toLocaleString('en-US')} mm²`;
  if (ratio === null) return `Primary : secondary open area: no secondary holes (target ${targetRatio} : 1); primary ${Math.round(primaryAreaMm2).toLocaleString('en-US')} mm².`;
  return `Primary : secondary open area ${Math.round(ratio * 10) / 10} : 1 (target ${targetRatio} : 1): ${areas}.`;
}

/**
 * The holes part by part in the order of work (inner parts first), a group per row of each piece,
 * with the hole numbers the templates and the CSV carry.
 */
function listHoleGroups(design: Design, layout: Layout, pilots: ReadonlyMap<string, string>, text: Pick<KitText, 'units'>): BuildSheetContent['holes'] {
  const partOf = new Map(layout.pieces.map((p) => [p.id, p.partId]));
  const parts = new Map<string, Map<string, { label: string; holes: Layout['holes']; numbers: number[] }>>();
  for (const { hole, number, rowName } of numberHoles(layout)) {
    const partId = partOf.get(hole.pieceId) ?? hole.pieceId;
    let groups = parts.get(partId);
    if (!groups) parts.set(partId, (groups = new Map()));
    const key = `${hole.pieceId}\u0000${hole.sourceId}`;
    let group = groups.get(key);
    if (!group) groups.set(key, (group = { label: rowName, holes: [], numbers: [] }));
    group.holes.push(hole);
    group.numbers.push(number);
  }
  return [...parts].map(([partId, groups]) => {
    const part = design.parts.find((p) => p.id === partId);
    return {
      part: part ? (part.name ?? part.role) : partId,
      groups: [...groups.values()].map(({ label, holes, numbers }): BuildSheetHoleGroup => {
        const first = holes[0]!;
        const pilot = pilots.get(first.drillId);
        return { label, count: holes.length, numbers: describeNumberRange(numbers), drill: describeDrill(first, text), ...(pilot ? { pilot } : {}) };
      }),
    };
  });
}
