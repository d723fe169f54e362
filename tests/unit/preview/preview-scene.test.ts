import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { layoutDocument, type Layout } from '../../../shared/layout/index.ts';
import { nameOfPart, pickPiece, planScene } from '../../../src/features/preview/preview-scene.ts';
import { panView, screenToMm, zoomAt } from '../../../src/features/preview/view-transform.ts';

function loadTemplate(name: string): Layout {
  const result = layoutDocument(JSON.parse(readFileSync(new URL(`../../../templates/${name}.json`, import.meta.url), 'utf8')));
  if (!result.ok) throw new Error(`${name} should lay out`);
  return result.layout;
}

const pint = loadTemplate('pint-can-stove');

describe('preview scenes', () => {
  it('picks a piece of the view kind, from the same part when it can', () => {
    expect(pickPiece(pint, 'wall')?.id).toBe('chamber:wall');
    expect(pickPiece(pint, 'wall', 'shell:wall')?.id).toBe('shell:wall');
    expect(pickPiece(pint, 'bottom', 'chamber:wall')?.id).toBe('chamber:bottom');
    // The shell has no end pattern: the first disc stands in.
    expect(pickPiece(pint, 'bottom', 'shell:wall')?.id).toBe('chamber:bottom');
    expect(pickPiece(pint, 'assembled', 'chamber:bottom')?.id).toBe('chamber:wall');
  });

  it('names what it shows for screen readers', () => {
    // pint-can-stove.json: two rows of 16 on the chamber wall; 1 + 4 + 8 + 16 holes in the bottom (divider rings from 4).
    // The jet-pitch warning (16 jets 15.897 mm apart, limit 15.875 mm) flags the two holes of the widest gap.
    expect(planScene(pint, 'in', 'wall').label).toBe('Wall strip of Burn chamber, 32 holes, 2 flagged by the checks');
    expect(planScene(pint, 'in', 'bottom').label).toBe('Bottom disc of Burn chamber, 29 holes');
    expect(planScene(pint, 'in', 'assembled').label).toMatch(/^Section through the stove: Burn chamber from 5\/16 in \(7.94 mm\) to 4 11\/16 in \(119.06 mm\); Outer shell from 0 in/);
  });

  it('takes the part name off piece names', () => {
    const no10 = loadTemplate('no10-can-stove');
    expect(no10.pieces.map(nameOfPart)).toContain('Burn chamber');
    expect(planScene(no10, 'in', 'wall', 'chamber:wall-bottom').label).toMatch(/^Wall strip \(bottom band\) of Burn chamber, \d+ holes$/);
  });

  it('rings the highlighted holes, on screen only', () => {
    const hole = pint.holes.find((h) => h.pieceId === 'chamber:wall')!;
    const plain = planScene(pint, 'in', 'wall');
    const lit = planScene(pint, 'in', 'wall', undefined, new Set([hole.id]));
    const halos = lit.calls.filter((c) => c.op === 'circle' && c.style.stroke?.widthMm === 0.6);
    expect(lit.calls.length - plain.calls.length).toBe(1);
    // Halo 1.5 mm clear of the hole's edge (preview-scene.ts HALO_GAP_MM).
    expect(halos[0]).toMatchObject({ r: hole.diameterMm / 2 + 1.5 });
  });

  it('draws nothing, and says so, when the view has no piece', () => {
    const wallOnly: Layout = { ...pint, pieces: pint.pieces.filter((p) => p.kind === 'wrap-strip') };
    const scene = planScene(wallOnly, 'mm', 'bottom');
    expect(scene.calls).toEqual([]);
    expect(scene.label).toMatch(/^Nothing to show/);
  });
});

describe('view transform', () => {
  it('zooms about a point, keeping the mm under it', () => {
    const view = { scale: 2, offsetX: 30, offsetY: -10 };
    const before = screenToMm(view, 200, 150);
    const after = screenToMm(zoomAt(view, 1.4, 200, 150), 200, 150);
    expect(after[0]).toBeCloseTo(before[0], 9);
    expect(after[1]).toBeCloseTo(before[1], 9);
  });

  it('pans in screen pixels', () => {
    // Worked arithmetic: 100 px at 4 px/mm moves the drawing 25 mm.
    const [x] = screenToMm(panView({ scale: 4, offsetX: 0, offsetY: 0 }, 100, 0), 0, 0);
    expect(x).toBe(-25);
  });
});
