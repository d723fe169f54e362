import type { Design } from '../design/design-schema.ts';
import type { Layout } from '../layout/layout-types.ts';
import type { DrawingContext } from '../drawing/drawing-context.ts';
import { SAFETY_NOTES } from './build-sheet.ts';
import { pageWriter } from './draw-build-sheet.ts';
import { strokes, type } from './draw-style.ts';
import { printableOrReplaced } from './printable-text.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';

/** What a workshop's class pack says about the session and the group. */
export interface ClassPackMeta {
  title: string;
  /** "Thursday 10 December 2026, 18:30 UTC", already in words. */
  when: string;
  place: string;
  instructor: string;
  /** Stoves the group builds: the members, or the places when nobody has joined yet. */
  builds: number;
  /** Names for the safety sign-off, in roster order. */
  names: string[];
}

export interface ClassPackContent {
  title: string;
  lines: string[];
  builds: number;
  cans: { text: string; perBuild: number; total: number }[];
  drills: { drillId: string; drill: string; pilot?: string; perBuild: number; total: number }[];
  safety: string[];
  names: string[];
}

/**
 * The instructor's shopping and tool list for N builds of one kit: cans by size, each drill with
 * the holes it makes per stove and for the group, and its pilot, counted from the same layout the
 * kit prints.
 */
export function classPackContent(design: Design, layout: Layout, pilots: ReadonlyMap<string, string>, text: Pick<KitText, 'units'>, meta: ClassPackMeta): ClassPackContent {
  const cans = new Map<string, number>();
  for (const part of design.parts) {
    const words = `${part.vessel.name}, ${describeLength(part.vessel.outerDiameterMm, text)} across, ${describeLength(part.vessel.heightMm, text)} tall`;
    cans.set(words, (cans.get(words) ?? 0) + 1);
  }
  const drills = new Map<string, { drill: string; diameterMm: number; count: number }>();
  for (const hole of layout.holes) {
    const entry = drills.get(hole.drillId) ?? { drill: describeDrill(hole, text), diameterMm: hole.diameterMm, count: 0 };
    entry.count += 1;
    drills.set(hole.drillId, entry);
  }
  return {
    title: `${meta.title}: class pack`,
    // Account names are the people's own and were never checked against the fonts: any character
    // the fonts lack prints as "?" rather than as nothing.
    lines: [`${meta.when}${meta.place ? `, ${meta.place}` : ''}`, `Instructor: ${printableOrReplaced(meta.instructor)}`, `Kit: ${design.name}, for ${meta.builds} build${meta.builds === 1 ? '' : 's'}`],
    builds: meta.builds,
    cans: [...cans].map(([words, perBuild]) => ({ text: words, perBuild, total: perBuild * meta.builds })),
    drills: [...drills]
      .sort(([, a], [, b]) => a.diameterMm - b.diameterMm)
      .map(([drillId, d]) => ({ drillId, drill: d.drill, ...(pilots.get(drillId) ? { pilot: pilots.get(drillId) } : {}), perBuild: d.count, total: d.count * meta.builds })),
    safety: SAFETY_NOTES,
    names: meta.names.map((name) => printableOrReplaced(name)),
  };
}

/** The cover page: the session, the materials and tools for N builds. */
export function drawClassPackCover(ctx: DrawingContext, content: ClassPackContent, page: { widthMm: number; marginMm: number }): void {
  const write = pageWriter(ctx, page);
  write.line(content.title, { ...type.title, sizeMm: 5.2 }, 0, 8);
  for (const l of content.lines) write.line(l);
  write.heading(`Cans for ${content.builds} build${content.builds === 1 ? '' : 's'}`);
  for (const can of content.cans) write.line(`• ${can.total} × ${can.text} (${can.perBuild} a stove)`);
  write.heading('Drills');
  for (const d of content.drills) write.line(`• ${d.drill}: ${d.total} holes (${d.perBuild} a stove)${d.pilot ? `; pilot ${d.pilot}` : ''}`);
  const pilots = [...new Set(content.drills.flatMap((d) => (d.pilot ? [d.pilot] : [])))];
  if (pilots.length > 0) write.line(`Pilot drills: ${pilots.join(', ')}`, { ...type.label, weight: 'bold' });
  write.heading('Tools for the bench');
  for (const tool of ['Centre punch and hammer', 'Clamps and a wooden block or dowel for inside the can', 'Drill with the bits above', 'Deburring tool or a larger bit, a file', 'Tape and scissors', 'Eye protection and gloves for everyone', 'A bucket of water or sand where the stoves are lit']) write.line(`• ${tool}`);
  write.rule();
}

/** The names to sign, or ten blank lines when there are none yet. */
export const signOffRows = (content: ClassPackContent): string[] => (content.names.length > 0 ? content.names : Array.from({ length: 10 }, () => ''));

/**
 * The safety briefing with a line for each person on the roster to sign, from row `from` on; a
 * page after the first carries on the list under its heading. Answers the first row that did not
 * fit (the rows' length when all did), for the next page.
 */
export function drawClassPackSignOff(ctx: DrawingContext, content: ClassPackContent, page: { widthMm: number; marginMm: number; heightMm: number }, from = 0): number {
  const write = pageWriter(ctx, page);
  if (from === 0) {
    write.line('Safety briefing', { ...type.title, sizeMm: 5.2 }, 0, 8);
    for (const note of content.safety) write.line(`• ${note}`);
    write.heading('Signed: I was at the briefing');
  } else {
    write.line('Signed: I was at the briefing (continued)', { ...type.title, sizeMm: 4 }, 0, 6);
  }
  const left = page.marginMm;
  const right = page.widthMm - page.marginMm;
  const rows = signOffRows(content);
  const signatureX = left + (right - left) * 0.45;
  write.y += 2;
  for (const [x, words] of [[left, 'Name'], [signatureX, 'Signature'], [right - 25, 'Date']] as const) ctx.text(x, write.y, words, { ...type.label, weight: 'bold' });
  let row = from;
  for (; row < rows.length; row++) {
    if (write.y + 8 > page.heightMm - page.marginMm - 2) break;
    write.y += 6;
    ctx.text(left, write.y, rows[row] || ' ', type.label);
    ctx.line(signatureX, write.y + 0.8, right - 30, write.y + 0.8, strokes.frame);
    ctx.line(right - 25, write.y + 0.8, right, write.y + 0.8, strokes.frame);
    write.y += 2;
  }
  return row;
}
