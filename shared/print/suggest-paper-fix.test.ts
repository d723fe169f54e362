import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { DiscPiece, Piece, WrapStripPiece } from '../layout/layout-types.ts';
import { checkImposable, MAX_SHEETS } from './impose.ts';
import { paperIds, paperSizes, type PrintOptions } from './paper.ts';
import { suggestPaperFix } from './suggest-paper-fix.ts';

const seed = process.env.FC_SEED ? Number(process.env.FC_SEED) : process.env.CI === 'true' ? 20261201 : undefined;
if (seed !== undefined) fc.configureGlobal({ seed });

function makeStrip(overrides: Partial<WrapStripPiece> = {}): WrapStripPiece {
  const heightMm = overrides.heightMm ?? 100;
  return { kind: 'wrap-strip', id: 'strip', partId: 'p', role: 'burn-chamber', name: 'Burn chamber, wall', lengthMm: 200, heightMm, fromYMm: 0, toYMm: heightMm, reference: 'bottom', vesselHeightMm: heightMm, vesselDiameterMm: 63.6, overlapTabMm: 15, seamAngleDeg: 0, markReachMm: 5, ...overrides };
}

function makeDisc(overrides: Partial<DiscPiece> = {}): DiscPiece {
  return { kind: 'disc', id: 'disc', partId: 'p', role: 'burn-chamber', name: 'Burn chamber, bottom', face: 'bottom', diameterMm: 73, vesselDiameterMm: 80, indexAngleDeg: 0, ...overrides };
}

const on = (paper: PrintOptions['paper'], orientation: PrintOptions['orientation'] = 'portrait'): PrintOptions => ({ paper, orientation, marginMm: 12.7 });

// Pint can, 303 x 406: 4 6/16 in = 111.1 mm tall (can codes: whole inches, then sixteenths; from memory);
// pi x (80.96 + 0.1) mm = 254.7 mm round (worked arithmetic).
const pintWall = makeStrip({ name: 'Pint wall', lengthMm: 254.7, heightMm: 111.1 });
// US gallon paint can, 610x708: 7 1/2 in = 190.5 mm tall, 6 5/8 in = 168.3 mm across (can code, from
// memory); its whole wall as one strip, as when its rows leave no gap to cut it into bands.
const gallonWall = makeStrip({ name: 'Gallon wall', lengthMm: Math.PI * 168.4, heightMm: 190.5 });

describe('suggestPaperFix', () => {
  it('suggests nothing when the kit already prints', () => {
    // 111.1 + 8 + 5 mm of label bands = 124.1 mm, well inside an 11 in (279.4 mm) tall Letter
    // sheet (ANSI/ASME Y14.1 size A) less two 12.7 mm margins and the furniture.
    expect(checkImposable([pintWall], on('letter'))).toEqual([]);
    expect(suggestPaperFix([pintWall], on('letter'))).toBeNull();
  });

  it('turns Letter back to portrait when a pint wall is too tall for landscape', () => {
    // Landscape, Letter is only 8.5 in = 215.9 mm tall (ANSI/ASME Y14.1 size A); less two 12.7 mm
    // margins that leaves 190.5 mm, and the notes, title block and ruler take more than the
    // 66.4 mm the 124.1 mm strip would leave them (worked arithmetic).
    expect(checkImposable([pintWall], on('letter', 'landscape'))).not.toEqual([]);
    expect(suggestPaperFix([pintWall], on('letter', 'landscape'))).toEqual({
      kind: 'turn',
      paper: 'letter',
      orientation: 'portrait',
      advice: 'Turn the paper to portrait: every piece fits on Letter portrait.',
      action: 'Turn to portrait',
    });
  });

  it('turns to landscape when portrait would need more than the sheet cap', () => {
    // A 7 m strip, 100 mm tall: one tile per sheet either way (113 mm with its bands; two would
    // need 230 mm). Portrait Letter leaves 175.5 mm for pieces, landscape 239 mm (8.5 and 11 in,
    // ANSI/ASME Y14.1, less margins and the ruler column); less 2 x 5.5 mm of mark room and the
    // 12 mm tile overlap, 40 tiles reach 12 + 40 x 152.5 = 6112 mm portrait but
    // 12 + 40 x 216 = 8652 mm landscape, and the strip with its tab is 7015 mm (worked arithmetic).
    const longWall = makeStrip({ name: 'Long wall', lengthMm: 7000, heightMm: 100 });
    expect(checkImposable([longWall], on('letter'))[0]).toContain(`more than ${MAX_SHEETS} sheets`);
    expect(suggestPaperFix([longWall], on('letter'))).toMatchObject({ kind: 'turn', paper: 'letter', orientation: 'landscape', action: 'Turn to landscape' });
  });

  it('offers Legal for a gallon-can wall on Letter, the next size up of the same family', () => {
    // 190.5 + 13 = 203.5 mm with its bands. Letter (11 in = 279.4 mm, ANSI/ASME Y14.1 size A)
    // cannot hold it in either direction; Legal is 14 in = 355.6 mm tall (from memory).
    expect(suggestPaperFix([gallonWall], on('letter'))).toEqual({
      kind: 'larger-paper',
      paper: 'legal',
      orientation: 'portrait',
      advice: 'Use larger paper: every piece fits on Legal portrait.',
      action: 'Use Legal portrait',
    });
  });

  it('keeps an A4 maker on ISO paper: A3 rather than Legal, though Legal is the smaller step', () => {
    // ISO 216: A4 is 210 x 297 mm (62,370 mm²), A3 297 x 420 mm (124,740 mm²); Legal, 8.5 x 14 in
    // (from memory), is 76,774 mm² and would hold the wall too.
    expect(paperSizes.legal.widthMm * paperSizes.legal.heightMm).toBeGreaterThan(210 * 297);
    expect(checkImposable([gallonWall], on('legal'))).toEqual([]);
    expect(suggestPaperFix([gallonWall], on('a4'))).toMatchObject({ kind: 'larger-paper', paper: 'a3', orientation: 'portrait', action: 'Use A3 portrait' });
  });

  it('skips Legal for a disc wider than 8.5 in, and suggests Tabloid', () => {
    // A 200 mm disc takes a 212 mm square with its labels: wider than Letter and Legal allow
    // (8.5 in = 215.9 mm less two 12.7 mm margins is 190.5 mm). Tabloid is 11 x 17 in (ANSI/ASME Y14.1 size B).
    const bigEnd = makeDisc({ name: 'Big end', diameterMm: 200 });
    expect(suggestPaperFix([bigEnd], on('letter'))).toMatchObject({ kind: 'larger-paper', paper: 'tabloid', orientation: 'portrait' });
    // On A4 (ISO 216: 210 mm wide, less than the 212 mm square even before margins): A3, and
    // turned to portrait, since A3 landscape is 297 mm tall (ISO 216) and its margins (2 x 12.7 mm)
    // and furniture (about 71 mm: notes, title block and ruler, furniture.ts) leave under 212 mm.
    expect(suggestPaperFix([bigEnd], on('a4', 'landscape'))).toMatchObject({ kind: 'larger-paper', paper: 'a3', orientation: 'portrait', action: 'Use A3 portrait' });
  });

  it('has nothing to offer for a disc larger than any paper', () => {
    // 300 mm + 12 mm of labels = 312 mm, past the short side of the largest papers offered:
    // A3 is 297 mm wide (ISO 216) and Tabloid 11 in = 279.4 mm (ANSI/ASME Y14.1 size B).
    const hugeEnd = makeDisc({ name: 'Drum end', diameterMm: 300 });
    expect(checkImposable([hugeEnd], on('a3'))).not.toEqual([]);
    expect(suggestPaperFix([hugeEnd], on('letter'))).toBeNull();
    expect(suggestPaperFix([hugeEnd], on('a3', 'landscape'))).toBeNull();
  });
});

type PieceSpec = { kind: 'wrap-strip'; lengthMm: number; heightMm: number } | { kind: 'disc'; diameterMm: number };

const pieceArbitrary: fc.Arbitrary<PieceSpec> = fc.oneof(
  fc.record({ kind: fc.constant('wrap-strip' as const), lengthMm: fc.double({ min: 20, max: 9000, noNaN: true }), heightMm: fc.double({ min: 10, max: 340, noNaN: true }) }),
  fc.record({ kind: fc.constant('disc' as const), diameterMm: fc.double({ min: 5, max: 320, noNaN: true }) }),
);

function buildPieces(specs: PieceSpec[]): Piece[] {
  return specs.map((spec, i) => (spec.kind === 'disc' ? makeDisc({ id: `d${i}`, diameterMm: spec.diameterMm }) : makeStrip({ id: `s${i}`, lengthMm: spec.lengthMm, heightMm: spec.heightMm })));
}

describe('suggestPaperFix properties', () => {
  it('offers a fix exactly when the kit does not print but some paper would, and the fix prints it', () => {
    fc.assert(
      fc.property(fc.array(pieceArbitrary, { minLength: 1, maxLength: 4 }), fc.constantFrom(...paperIds), fc.constantFrom('portrait' as const, 'landscape' as const), (specs, paper, orientation) => {
        const pieces = buildPieces(specs);
        const current = on(paper, orientation);
        const fix = suggestPaperFix(pieces, current);
        const prints = (options: PrintOptions) => checkImposable(pieces, options).length === 0;
        const anywhere = paperIds.some((id) => prints(on(id, 'portrait')) || prints(on(id, 'landscape')));
        if (prints(current)) {
          expect(fix).toBeNull();
          return;
        }
        if (!fix) {
          // Nothing offered: no paper at all holds it, or only papers smaller than the one chosen.
          const area = (id: PrintOptions['paper']) => paperSizes[id].widthMm * paperSizes[id].heightMm;
          const largerPrints = paperIds.some((id) => area(id) > area(paper) && (prints(on(id, 'portrait')) || prints(on(id, 'landscape'))));
          expect(largerPrints || prints(on(paper, orientation === 'portrait' ? 'landscape' : 'portrait'))).toBe(false);
          return;
        }
        expect(anywhere).toBe(true);
        expect(prints(on(fix.paper, fix.orientation))).toBe(true);
        expect(fix.kind === 'turn').toBe(fix.paper === paper);
      }),
      { numRuns: 150 },
    );
  });
});
