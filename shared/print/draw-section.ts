import { estimateTextWidthMm, type DrawingContext, type Stroke } from '../drawing/drawing-context.ts';
import type { PlacedPart } from '../layout/assembly.ts';
import type { Hole, Layout } from '../layout/layout-types.ts';
import type { Rect } from './imposition-types.ts';
import { strokes, type } from './draw-style.ts';
import { describeLength, type KitText } from './kit-text.ts';

/**
 * The stove cut through its axis, every part at its place (shared/layout/assembly.ts), true to
 * scale in sheet mm: the walls with their rows of holes as gaps, the bottoms with theirs, a
 * concentrator's opening, and dimensions for the gap round the chamber, the jets' height and the
 * intake's height. Parts named by a finding are drawn heavier, and named "see the checks", so the
 * mark does not depend on colour.
 */
export interface SectionPlan {
  box: Rect;
  /** The axis and the ground line, in sheet mm. */
  axisX: number;
  groundY: number;
  /** What the dimensions say, for the screen reader's description. */
  dimensions: { gapMm?: number; jetsMm?: number; intakeMm?: number };
}

const TOP_MM = 9;
const FOOT_MM = 9;
const LEFT_MM = 34;
const RIGHT_MM = 6;
const LABEL_GAP_MM = 4;

interface WallRow {
  centreMm: number;
  diameterMm: number;
  group: Hole['group'];
}

/** The rows of one part's wall: one entry a row, its centre up from the ground. */
function wallRows(layout: Layout, part: PlacedPart): WallRow[] {
  const strips = new Set(layout.pieces.filter((p) => p.partId === part.partId && p.kind === 'wrap-strip').map((p) => p.id));
  const rows = new Map<string, WallRow>();
  for (const hole of layout.holes) {
    if (!strips.has(hole.pieceId) || rows.has(`${hole.pieceId}/${hole.sourceId}`)) continue;
    rows.set(`${hole.pieceId}/${hole.sourceId}`, { centreMm: part.bottomMm + hole.yMm, diameterMm: hole.diameterMm, group: hole.group });
  }
  return [...rows.values()];
}

/** Holes of a part's can end, as intervals across the section (their centres projected onto it). */
function endHoles(layout: Layout, part: PlacedPart, face: 'bottom' | 'lid'): { xMm: number; diameterMm: number }[] {
  const discs = new Set(layout.pieces.filter((p) => p.partId === part.partId && p.kind === 'disc' && p.face === face).map((p) => p.id));
  return layout.holes.filter((h) => discs.has(h.pieceId)).map((h) => ({ xMm: h.xMm, diameterMm: h.diameterMm }));
}

const hasEnd = (layout: Layout, part: PlacedPart, face: 'bottom' | 'lid') => layout.pieces.some((p) => p.partId === part.partId && p.kind === 'disc' && p.face === face);

/** A line from a to b with the intervals [from, to] left open (holes), along one axis. */
function brokenLine(ctx: DrawingContext, from: number, to: number, gaps: { from: number; to: number }[], draw: (a: number, b: number) => void): void {
  let at = from;
  for (const gap of [...gaps].sort((x, y) => x.from - y.from)) {
    const a = Math.max(from, gap.from);
    const b = Math.min(to, gap.to);
    if (b <= at) continue;
    if (a > at) draw(at, a);
    at = Math.max(at, b);
  }
  if (at < to) draw(at, to);
}

/** The stove's extent and where its axis and ground sit; room for the labels on the left. */
export function planSection(layout: Layout): SectionPlan {
  const parts = layout.assembly;
  const widest = Math.max(40, ...parts.map((p) => p.outerDiameterMm));
  const tallest = Math.max(20, ...parts.map((p) => p.topMm));
  const labels = Math.max(0, ...parts.map((p) => estimateTextWidthMm(`${p.name} (see the checks)`, type.small.sizeMm))) + LABEL_GAP_MM;
  const box = { x: 0, y: 0, width: LEFT_MM + widest + RIGHT_MM + labels, height: TOP_MM + tallest + FOOT_MM };
  const shell = parts.find((p) => p.role === 'shell');
  const chamber = parts.find((p) => p.role === 'burn-chamber');
  const jets = chamber ? wallRows(layout, chamber).filter((r) => r.group === 'secondary') : [];
  const intake = shell ? wallRows(layout, shell).filter((r) => r.group === 'intake') : [];
  return {
    box,
    axisX: LEFT_MM + widest / 2,
    groundY: TOP_MM + tallest,
    dimensions: {
      ...(shell && chamber ? { gapMm: (shell.insideDiameterMm - chamber.outerDiameterMm) / 2 } : {}),
      ...(jets.length ? { jetsMm: Math.max(...jets.map((r) => r.centreMm)) } : {}),
      ...(intake.length ? { intakeMm: Math.min(...intake.map((r) => r.centreMm)) } : {}),
    },
  };
}

/** Draws the section with its box at (0, 0): see planSection. */
export function drawSection(ctx: DrawingContext, layout: Layout, text: KitText, lit: ReadonlySet<string>): SectionPlan {
  const plan = planSection(layout);
  const { box, axisX, groundY } = plan;
  const y = (heightMm: number) => groundY - heightMm;
  ctx.rect(box.x, box.y, box.width, box.height, { fill: 'paper' });
  ctx.text(1, 5, `${layout.designName}: section through the stove`, type.title);
  ctx.line(LEFT_MM - 4, groundY, box.width - 1, groundY, strokes.frame);
  ctx.line(axisX, TOP_MM - 2, axisX, groundY, { ...strokes.guide, dashMm: [4, 1, 1, 1] });

  // Wider parts first, so a nested part's lines lie on top.
  const parts = [...layout.assembly].sort((a, b) => b.outerDiameterMm - a.outerDiameterMm);
  const labelYs: number[] = [];
  for (const part of parts) {
    const flagged = lit.has(part.partId);
    const stroke: Stroke = flagged ? { widthMm: 0.9, color: 'accent' } : strokes.edge;
    const r = part.outerDiameterMm / 2;
    const rows = wallRows(layout, part).map((row) => ({ from: y(row.centreMm + row.diameterMm / 2), to: y(row.centreMm - row.diameterMm / 2) }));
    for (const side of [-1, 1]) {
      const x = axisX + side * r;
      brokenLine(ctx, y(part.topMm), y(part.bottomMm), rows, (a, b) => ctx.line(x, a, x, b, stroke));
    }
    const across = (face: 'bottom' | 'lid', atY: number) => {
      const holes = endHoles(layout, part, face).map((h) => ({ from: axisX + h.xMm - h.diameterMm / 2, to: axisX + h.xMm + h.diameterMm / 2 }));
      brokenLine(ctx, axisX - r, axisX + r, holes, (a, b) => ctx.line(a, atY, b, atY, stroke));
    };
    if (part.role === 'shell' || part.role === 'burn-chamber' || hasEnd(layout, part, 'bottom')) across('bottom', y(part.bottomMm));
    if (part.openingDiameterMm !== undefined) {
      const o = part.openingDiameterMm / 2;
      ctx.line(axisX - r, y(part.topMm), axisX - o, y(part.topMm), stroke);
      ctx.line(axisX + o, y(part.topMm), axisX + r, y(part.topMm), stroke);
    } else if (hasEnd(layout, part, 'lid')) across('lid', y(part.topMm));
    if (part.role === 'pot-stand') {
      ctx.line(axisX - r - 4, y(part.topMm) - 0.6, axisX + r + 4, y(part.topMm) - 0.6, { ...strokes.frame, dashMm: [2, 1] });
      ctx.text(axisX + r + 5, y(part.topMm) - 0.2, 'pot', type.tiny);
    }

    // A label at the right of the part's top, moved down past any label already there.
    let labelY = y(part.topMm) + 3;
    while (labelYs.some((other) => Math.abs(other - labelY) < 3.4)) labelY += 3.4;
    labelYs.push(labelY);
    const labelX = axisX + parts[0]!.outerDiameterMm / 2 + LABEL_GAP_MM;
    ctx.line(axisX + r, labelY - 0.8, labelX - 0.8, labelY - 0.8, { ...strokes.frame, widthMm: 0.1 });
    ctx.text(labelX, labelY, flagged ? `${part.name} (see the checks)` : part.name, flagged ? { ...type.small, weight: 'bold', color: 'ink' } : type.small);
  }

  const { gapMm, jetsMm, intakeMm } = plan.dimensions;
  const shell = layout.assembly.find((p) => p.role === 'shell');
  const chamber = layout.assembly.find((p) => p.role === 'burn-chamber');
  if (gapMm !== undefined && shell && chamber) {
    const at = y(chamber.bottomMm + (chamber.topMm - chamber.bottomMm) * 0.45);
    const x1 = axisX - chamber.outerDiameterMm / 2;
    const x2 = axisX - shell.insideDiameterMm / 2;
    dimension(ctx, [x1, at], [x2, at]);
    ctx.text(Math.min(x1, x2) - 1, at - 1.2, `gap ${describeLength(gapMm, text)}`, { ...type.tiny, anchor: 'end' });
  }
  const left = axisX - Math.max(...layout.assembly.map((p) => p.outerDiameterMm)) / 2;
  if (jetsMm !== undefined) {
    const x = left - 5;
    dimension(ctx, [x, groundY], [x, y(jetsMm)]);
    ctx.line(x, y(jetsMm), axisX - (chamber?.outerDiameterMm ?? 0) / 2, y(jetsMm), { ...strokes.frame, widthMm: 0.1, dashMm: [1, 1] });
    ctx.text(x - 1, y(jetsMm) + 1, `jets ${describeLength(jetsMm, text)}`, { ...type.tiny, anchor: 'end' });
  }
  if (intakeMm !== undefined) {
    const x = left - 2;
    dimension(ctx, [x, groundY], [x, y(intakeMm)]);
    ctx.text(x - 1, y(intakeMm) + 1, `intake ${describeLength(intakeMm, text)}`, { ...type.tiny, anchor: 'end' });
  }
  ctx.text(LEFT_MM - 4, groundY + 4.5, 'Heights up from the bottom of the shell; cut through the axis.', type.tiny);
  return plan;
}

/** A dimension line with a short tick across each end. */
function dimension(ctx: DrawingContext, [x1, y1]: [number, number], [x2, y2]: [number, number]): void {
  ctx.line(x1, y1, x2, y2, strokes.tick);
  const length = Math.hypot(x2 - x1, y2 - y1) || 1;
  const [nx, ny] = [-(y2 - y1) / length, (x2 - x1) / length];
  for (const [x, y] of [
    [x1, y1],
    [x2, y2],
  ] as const) {
    ctx.line(x - nx * 1.2, y - ny * 1.2, x + nx * 1.2, y + ny * 1.2, strokes.tick);
  }
}
