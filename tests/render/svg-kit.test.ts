import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { prepareKit, renderKitSvg } from '../../server/render/render-kit.ts';

const design = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

/** Every <circle> of an SVG sheet, read with a plain pattern (the writer emits one form). */
function circlesOf(svg: string): { cx: number; cy: number; r: number }[] {
  return [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)" r="([\d.]+)"/g)].map((m) => ({ cx: Number(m[1]), cy: Number(m[2]), r: Number(m[3]) }));
}

describe('SVG kit sheets', () => {
  for (const paper of ['letter', 'a4'] as const) {
    it(`on ${paper}: sized in mm with a mm viewBox, and every hole is a circle where the layout says`, () => {
      const request = { design, print: { paper, orientation: 'portrait' as const } };
      const { layout, plan } = prepareKit(request);
      const { sheets } = renderKitSvg(request);
      // ANSI Letter 215.9 x 279.4 mm; ISO 216 A4 210 x 297 mm.
      const [w, h] = paper === 'letter' ? [215.9, 279.4] : [210, 297];
      let checked = 0;
      sheets.forEach((svg, i) => {
        expect(svg).toMatch(new RegExp(`<svg[^>]* width="${w}mm" height="${h}mm"`));
        expect(svg).toContain(`viewBox="0 0 ${w} ${h}"`);
        const circles = circlesOf(svg);
        for (const placement of plan.imposition.sheets[i]!.placements) {
          const piece = layout.pieces.find((p) => p.id === placement.pieceId)!;
          for (const hole of layout.holes.filter((candidate) => candidate.pieceId === piece.id)) {
            if (placement.tile && (hole.xMm < placement.tile.fromXMm || hole.xMm > placement.tile.toXMm)) continue;
            const cx = placement.originX + hole.xMm;
            const cy = piece.kind === 'wrap-strip' ? placement.originY - (hole.yMm - piece.fromYMm) : placement.originY - hole.yMm;
            const match = circles.find((c) => Math.abs(c.cx - cx) < 1e-3 && Math.abs(c.cy - cy) < 1e-3 && Math.abs(c.r - hole.diameterMm / 2) < 1e-3);
            expect(match, `${hole.id} at (${cx}, ${cy})`).toBeDefined();
            checked++;
          }
        }
      });
      expect(checked).toBeGreaterThanOrEqual(layout.holes.length);
    });
  }
});
