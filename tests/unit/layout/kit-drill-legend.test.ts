import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateDesign } from '../../../shared/design/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import { ownsHole } from '../../../shared/print/draw-kit.ts';
import { checkImposable, imposePieces } from '../../../shared/print/impose.ts';
import type { PrintOptions } from '../../../shared/print/paper.ts';

const templates = new URL('../../../templates/', import.meta.url);
const examples = readdirSync(templates)
  .filter((f) => f.endsWith('.json'))
  .map((file) => ({ file, design: validateDesign(JSON.parse(readFileSync(new URL(file, templates), 'utf8')))! }));

describe('the drill legends of a kit', () => {
  // ANSI Letter and ISO 216 A4, portrait: the papers most kits print on.
  const papers: PrintOptions[] = [
    { paper: 'letter', orientation: 'portrait', marginMm: 12.7 },
    { paper: 'a4', orientation: 'portrait', marginMm: 12.7 },
  ];

  it.each(examples.flatMap((e) => papers.map((p) => [e.file, p.paper, e, p] as const)))('%s on %s: every hole is counted on exactly one sheet', (_file, _paper, example, print) => {
    if (!example.design.ok) throw new Error(`${example.file} is not valid`);
    const layout = layoutDesign(example.design.design);
    if (checkImposable(layout.pieces, print).length) return;
    const counted = new Map<string, number>();
    for (const sheet of imposePieces(layout.pieces, print).sheets) {
      for (const placement of sheet.placements) {
        for (const hole of layout.holes) if (hole.pieceId === placement.pieceId && ownsHole(placement, hole.xMm)) counted.set(hole.id, (counted.get(hole.id) ?? 0) + 1);
      }
    }
    // Worked arithmetic: one count per hole, however many tiles draw it.
    expect([...counted.values()].every((n) => n === 1)).toBe(true);
    expect(counted.size).toBe(layout.holes.length);
  });
});
