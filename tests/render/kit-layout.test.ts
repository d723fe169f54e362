import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { boundsOfCalls, type Bounds } from '../../shared/drawing/drawing-bounds.ts';
import { RecordingContext } from '../../shared/drawing/recording-context.ts';
import { layoutDocument } from '../../shared/layout/index.ts';
import { drawDisc } from '../../shared/print/draw-disc.ts';
import { drawStrip } from '../../shared/print/draw-strip.ts';
import { checkImposable, paperIds, type Orientation, type Rect } from '../../shared/print/index.ts';
import { listImpositionFaults } from '../../shared/print/imposition-faults.ts';
import { kitText } from '../../shared/print/kit-text.ts';
import { prepareKit, renderKitPdf, renderKitSvg } from '../../server/render/render-kit.ts';

const dir = new URL('../../templates/', import.meta.url).pathname;
const templates = readdirSync(dir).filter((file) => file.endsWith('.json'));
const load = (file: string) => JSON.parse(readFileSync(dir + file, 'utf8'));
const SLACK_MM = 0.5; // text widths are estimated from average glyph widths

const inside = (b: Bounds, r: Rect) => b.minX >= r.x - SLACK_MM && b.minY >= r.y - SLACK_MM && b.maxX <= r.x + r.width + SLACK_MM && b.maxY <= r.y + r.height + SLACK_MM;

describe('every example on every paper: nothing overlaps', () => {
  for (const file of templates) {
    for (const paper of paperIds) {
      for (const orientation of ['portrait', 'landscape'] as Orientation[]) {
        const design = load(file);
        const result = layoutDocument(design);
        if (!result.ok) throw new Error(`${file} should be valid`);
        const fits = checkImposable(result.layout.pieces, { paper, orientation, marginMm: 12.7 }).length === 0;
        // Every paper takes every example upright; a landscape sheet may be too short for a tall strip.
        if (orientation === 'landscape' && !fits) continue;
        it(`${file} on ${paper} ${orientation}`, async () => {
          expect(fits).toBe(true);
          const { layout, plan } = prepareKit({ design, print: { paper, orientation } });
          expect(listImpositionFaults(plan.imposition, layout.pieces)).toEqual([]);
          const text = kitText(design.units ?? 'in');
          for (const sheet of plan.imposition.sheets) {
            for (const placement of sheet.placements) {
              const piece = layout.pieces.find((p) => p.id === placement.pieceId)!;
              const recording = new RecordingContext();
              if (piece.kind === 'wrap-strip') drawStrip(recording, piece, placement, layout, text, new Set());
              else drawDisc(recording, piece, placement, layout, text, new Set());
              const drawn = boundsOfCalls(recording.calls)!;
              expect(inside(drawn, placement.rect), `${placement.pieceId} drawn at ${JSON.stringify(drawn)} outside ${JSON.stringify(placement.rect)} on sheet ${sheet.number}`).toBe(true);
            }
          }
          const pdf = await renderKitPdf({ design, print: { paper, orientation } });
          expect(pdf.sheets).toBe(plan.imposition.sheets.length);
          expect(renderKitSvg({ design, print: { paper, orientation } }).sheets).toHaveLength(pdf.sheets);
        });
      }
    }
  }
});
