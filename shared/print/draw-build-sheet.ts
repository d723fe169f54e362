import type { Design } from '../design/design-schema.ts';
import type { DrawingContext, TextStyle } from '../drawing/drawing-context.ts';
import type { Layout } from '../layout/layout-types.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';
import { strokes, type } from './draw-style.ts';

/** The order of work for every hole (common practice, no source). */
export const ORDER_OF_WORK = [
  'Check the print: the rulers measure 100 mm and 4 in. If not, print again at 100 % or calibrate the printer.',
  'Cut out the strips and discs. Tape each strip round its can, its edge level with the can bottom (or rim), starting at the seam; tape the tab over the start.',
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

/**
 * The build sheet: materials, the holes of each part with drill and pilot, the order of work and
 * the safety notes. Printed after the template sheets; plain text drawn through the same interface.
 */
export function drawBuildSheet(ctx: DrawingContext, design: Design, layout: Layout, pilots: Map<string, string>, text: KitText, page: { widthMm: number; marginMm: number }): void {
  const left = page.marginMm;
  const width = page.widthMm - 2 * page.marginMm;
  let y = page.marginMm + 6;
  const line = (content: string, style: TextStyle = type.label, indent = 0, gap = 4.6) => {
    for (const part of wrapText(content, width - indent, style.sizeMm)) {
      ctx.text(left + indent, y, part, style);
      y += gap;
    }
  };
  const heading = (content: string) => {
    y += 2;
    line(content, { ...type.title, sizeMm: 4 }, 0, 6);
  };

  line(`${design.name}: build sheet`, { ...type.title, sizeMm: 5.2 }, 0, 8);
  heading('Materials');
  for (const part of design.parts) line(`• ${part.name ?? part.role}: ${part.vessel.name}, ${describeLength(part.vessel.outerDiameterMm, text)} across, ${describeLength(part.vessel.heightMm, text)} tall`);

  heading('Holes');
  for (const part of design.parts) {
    const holes = layout.holes.filter((h) => layout.pieces.find((p) => p.id === h.pieceId)?.partId === part.id);
    if (holes.length === 0) continue;
    line(part.name ?? part.role, { ...type.label, weight: 'bold' });
    const bySource = new Map<string, typeof holes>();
    for (const hole of holes) bySource.set(hole.sourceId, [...(bySource.get(hole.sourceId) ?? []), hole]);
    for (const [sourceId, group] of bySource) {
      const first = group[0]!;
      const pilot = pilots.get(first.drillId);
      const row = [...part.sideRows, ...part.endPatterns].find((r) => r.id === sourceId);
      line(`• ${row?.label ?? sourceId}: ${group.length} × ${describeDrill(first, text)}${pilot ? `, pilot ${pilot}` : ''}`, type.label, 3);
    }
  }

  heading('Order of work');
  ORDER_OF_WORK.forEach((step, i) => line(`${i + 1}. ${step}`, type.label, 0));

  heading('Safety');
  for (const note of SAFETY_NOTES) line(`• ${note}`, type.label, 0);
  ctx.line(left, y, left + width, y, strokes.frame);
}

/** Splits text at spaces into lines that fit a width (at about 0.55 em a character). */
export function wrapText(content: string, widthMm: number, sizeMm: number): string[] {
  const max = Math.max(10, Math.floor(widthMm / (sizeMm * 0.55)));
  const lines: string[] = [];
  let current = '';
  for (const word of content.split(' ')) {
    if (current && current.length + 1 + word.length > max) {
      lines.push(current);
      current = word;
    } else current = current ? `${current} ${word}` : word;
  }
  if (current) lines.push(current);
  return lines;
}
