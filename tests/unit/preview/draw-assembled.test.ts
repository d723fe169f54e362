import { describe, expect, it } from 'vitest';
import { RecordingContext } from '../../../shared/drawing/recording-context.ts';
import type { Hole } from '../../../shared/layout/layout-types.ts';
import { kitText } from '../../../shared/print/kit-text.ts';
import { assembledBox, drawAssembled, projectHole, type AssembledCan } from '../../../src/features/preview/draw-assembled.ts';

function hole(angleDeg: number, yMm = 50, diameterMm = 6): Hole {
  return { id: `h${angleDeg}`, pieceId: 'can:wall', group: 'primary', sourceId: 'row', index: 0, xMm: 0, yMm, diameterMm, drillId: 'mm:6', drillLabel: '6 mm', angleDeg };
}

// A 100 x 120 mm can, seam at 0 degrees.
const can: AssembledCan = { partId: 'can', name: 'Test can', diameterMm: 100, heightMm: 120, seamAngleDeg: 0, holes: [0, 30, 60, 90, 120, 180, 270, 330].map((a) => hole(a)), rowYs: [50] };

describe('assembled side view', () => {
  it('puts a hole facing the viewer on the axis, full width', () => {
    const box = assembledBox(can, 0, kitText('mm'));
    const at = projectHole(can, hole(0), 0)!;
    expect(at.squash).toBeCloseTo(1, 12);
    // The can's axis is mid-way across its outline; hole y 50 mm up from a 120 mm can's bottom.
    const rect = drawn(0).find((c) => c.op === 'rect' && c.width === 100)!;
    expect(rect).toMatchObject({ op: 'rect', width: 100, height: 120 });
    if (rect.op !== 'rect') throw new Error('rect');
    expect(at.x).toBeCloseTo(rect.x + 50, 12);
    expect(at.y).toBeCloseTo(rect.y + 120 - 50, 12);
    expect(box.width).toBeGreaterThanOrEqual(100);
  });

  it('foreshortens by cos(angle) and moves right by R sin(angle), counter-clockwise seen from above', () => {
    const front = projectHole(can, hole(0), 0)!;
    const at = projectHole(can, hole(60), 0)!;
    // Worked arithmetic: cos 60 deg = 0.5; R sin 60 deg = 50 x 0.8660254 = 43.30127 mm.
    expect(at.squash).toBeCloseTo(0.5, 12);
    expect(at.x - front.x).toBeCloseTo(43.30127, 5);
    expect(projectHole(can, hole(330), 0)!.x - front.x).toBeCloseTo(-25, 9); // 50 x sin(-30 deg) = -25
  });

  it('leaves out the back half', () => {
    for (const a of [90, 120, 180, 270]) expect(projectHole(can, hole(a), 0)).toBeNull();
  });

  it('draws the front holes as ellipses as wide as cos(angle) of the hole', () => {
    const calls = drawn(0);
    const outlines = calls.filter((c) => c.op === 'polyline' && c.style.stroke);
    // Front half of 0, 30, 60, 90, 120, 180, 270, 330: 0, 30, 60 and 330 (90 is edge-on).
    expect(outlines).toHaveLength(4);
    const widths = outlines.map((c) => (c.op === 'polyline' ? Math.max(...c.points.map((p) => p[0])) - Math.min(...c.points.map((p) => p[0])) : 0)).sort((a, b) => a - b);
    // Worked arithmetic: 6 mm x cos 60 = 3; x cos 30 = 5.196 (twice, at 30 and 330); x cos 0 = 6.
    expect(widths[0]).toBeCloseTo(3, 6);
    expect(widths[3]).toBeCloseTo(6, 6);
  });

  it('shows the seam only when it faces the viewer', () => {
    const seamLine = (frontDeg: number) => drawn(frontDeg).filter((c) => c.op === 'line' && c.x1 === c.x2);
    expect(seamLine(180)).toHaveLength(0);
    expect(seamLine(0)).toHaveLength(1);
  });
});

function drawn(frontDeg: number) {
  const rec = new RecordingContext();
  drawAssembled(rec, can, frontDeg, kitText('mm'), new Set());
  return rec.calls;
}
