import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { formatHoleCsv, HOLE_CSV_HEADER, layoutDocument } from '../../../shared/layout/index.ts';

const dir = new URL('../../../templates/', import.meta.url).pathname;
const files = readdirSync(dir).filter((file) => file.endsWith('.json'));

/** What each example is meant to show: only the first try carries error findings, on purpose. */
const expectedErrors: Record<string, string[]> = { 'first-try-too-sparse.json': ['jet-pitch'] };

describe('example designs in templates/', () => {
  it('there are at least four', () => expect(files.length).toBeGreaterThanOrEqual(4));

  it.each(files)('%s loads, lays out, and has only the errors it is meant to show', (file) => {
    const result = layoutDocument(JSON.parse(readFileSync(join(dir, file), 'utf8')));
    expect(result.ok, JSON.stringify(!result.ok && result.problems)).toBe(true);
    if (!result.ok) return;
    expect(result.layout.holes.length).toBeGreaterThan(0);
    expect(result.layout.findings.filter((f) => f.severity === 'error').map((f) => f.rule)).toEqual(expectedErrors[file] ?? []);
  });

  it('exports the hole table as CSV with one row per hole', () => {
    const result = layoutDocument(JSON.parse(readFileSync(join(dir, 'pint-can-stove.json'), 'utf8')));
    if (!result.ok) throw new Error('pint-can-stove should be valid');
    const lines = formatHoleCsv(result.layout).trimEnd().split('\r\n');
    expect(lines[0]).toBe(HOLE_CSV_HEADER);
    expect(HOLE_CSV_HEADER).toBe('number,piece,group,index,x_mm,y_mm,diameter_mm,drill,piece_name,row');
    expect(lines).toHaveLength(result.layout.holes.length + 1);
    // Hole 1 is the first jet of the burn chamber: inner parts first, the rows in the layout's order.
    expect(lines[1]).toMatch(/^1,chamber:wall,secondary,0,\d+\.\d{4},\d+\.\d{4},4\.7625,3\/16 in,"Burn chamber, wall",Secondary jets$/);
  });
});

describe('a flame concentrator', () => {
  it('gets a template of its can end with the opening to cut out (0.6 D of the chamber in the example)', () => {
    const result = layoutDocument(JSON.parse(readFileSync(join(dir, 'seam-keepout-concentrator.json'), 'utf8')));
    if (!result.ok) throw new Error('example should be valid');
    const piece = result.layout.pieces.find((p) => p.id === 'concentrator:lid');
    expect(piece).toMatchObject({ kind: 'disc', face: 'lid' });
    expect(result.layout.marks).toContainEqual({ kind: 'opening-circle', pieceId: 'concentrator:lid', radiusMm: 26 });
  });
});
