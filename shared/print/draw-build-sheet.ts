import type { DrawingContext, TextStyle } from '../drawing/drawing-context.ts';
import type { BuildSheetContent } from './build-sheet.ts';
import { strokes, type } from './draw-style.ts';

/** Draws the build sheet's words down a page, after the template sheets, through the same interface. */
export function drawBuildSheet(ctx: DrawingContext, content: BuildSheetContent, page: { widthMm: number; marginMm: number }): void {
  const write = pageWriter(ctx, page);
  write.line(content.title, { ...type.title, sizeMm: 5.2 }, 0, 8);
  write.heading('Materials');
  for (const m of content.materials) write.line(`• ${m.part}: ${m.text}`);

  write.heading('Holes');
  for (const part of content.holes) {
    write.line(part.part, { ...type.label, weight: 'bold' });
    for (const g of part.groups) write.line(`• ${g.label} (holes ${g.numbers}): ${g.count} × ${g.drill}${g.pilot ? `, pilot ${g.pilot}` : ''}`, type.label, 3);
  }

  write.heading('Air and checks');
  write.line(content.airflow);
  if (content.openChecks.length === 0) write.line('Checks still open: none, every check passed.');
  else write.line(`Checks still open: ${content.openChecks.length}`, { ...type.label, weight: 'bold' });
  for (const check of content.openChecks) write.line(`${check.severity === 'error' ? 'Error' : 'Warning'}: ${check.message}`, check.severity === 'error' ? { ...type.label, weight: 'bold' } : type.label, 3);
  if (content.openChecks.length > 0) write.line('Holes a check flagged carry a black triangle on the templates.', type.small);

  write.heading('Order of work');
  content.orderOfWork.forEach((step, i) => write.line(`${i + 1}. ${step}`));

  write.heading('Safety');
  for (const note of content.safety) write.line(`• ${note}`);
  write.rule();
}

/** Writes wrapped lines and headings down a page from the top margin; `y` is where the next line goes. */
export function pageWriter(ctx: DrawingContext, page: { widthMm: number; marginMm: number }) {
  const left = page.marginMm;
  const width = page.widthMm - 2 * page.marginMm;
  const state = {
    y: page.marginMm + 6,
    line(words: string, style: TextStyle = type.label, indent = 0, gap = 4.6) {
      for (const part of wrapText(words, width - indent, style.sizeMm)) {
        ctx.text(left + indent, state.y, part, style);
        state.y += gap;
      }
    },
    heading(words: string) {
      state.y += 2;
      state.line(words, { ...type.title, sizeMm: 4 }, 0, 6);
    },
    rule() {
      ctx.line(left, state.y, left + width, state.y, strokes.frame);
    },
  };
  return state;
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
