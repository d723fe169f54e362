import type { DrawingContext, TextStyle } from '../drawing/drawing-context.ts';
import type { BuildSheetContent } from './build-sheet.ts';
import { strokes, type } from './draw-style.ts';

/** Draws the build sheet's words down a page, after the template sheets, through the same interface. */
export function drawBuildSheet(ctx: DrawingContext, content: BuildSheetContent, page: { widthMm: number; marginMm: number }): void {
  const left = page.marginMm;
  const width = page.widthMm - 2 * page.marginMm;
  let y = page.marginMm + 6;
  const line = (words: string, style: TextStyle = type.label, indent = 0, gap = 4.6) => {
    for (const part of wrapText(words, width - indent, style.sizeMm)) {
      ctx.text(left + indent, y, part, style);
      y += gap;
    }
  };
  const heading = (words: string) => {
    y += 2;
    line(words, { ...type.title, sizeMm: 4 }, 0, 6);
  };

  line(content.title, { ...type.title, sizeMm: 5.2 }, 0, 8);
  heading('Materials');
  for (const m of content.materials) line(`• ${m.part}: ${m.text}`);

  heading('Holes');
  for (const part of content.holes) {
    line(part.part, { ...type.label, weight: 'bold' });
    for (const g of part.groups) line(`• ${g.label}: ${g.count} × ${g.drill}${g.pilot ? `, pilot ${g.pilot}` : ''}`, type.label, 3);
  }

  heading('Order of work');
  content.orderOfWork.forEach((step, i) => line(`${i + 1}. ${step}`));

  heading('Safety');
  for (const note of content.safety) line(`• ${note}`);
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
