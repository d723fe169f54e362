/** Flat path ops: each call is a code and its numbers in mm, so batching allocates nothing per call. */
export const LINE = 0;
export const CIRCLE = 1;
export const POLY = 2;
export const RECT = 3;

/** The part of CanvasRenderingContext2D this writer uses (tests pass a recording fake). */
export type Canvas2D = Pick<
  CanvasRenderingContext2D,
  'setTransform' | 'beginPath' | 'moveTo' | 'lineTo' | 'arc' | 'rect' | 'closePath' | 'stroke' | 'fill' | 'fillRect' | 'fillText' | 'setLineDash'
> & {
  strokeStyle: CanvasRenderingContext2D['strokeStyle'];
  fillStyle: CanvasRenderingContext2D['fillStyle'];
  lineWidth: number;
  font: string;
  textAlign: CanvasTextAlign;
  readonly canvas: { width: number; height: number };
};

/** Calls of one paint (one stroke or fill style), kept as flat numbers and replayed into one path. */
export interface Batch {
  fill: boolean;
  color: string;
  widthMm: number;
  dash: number[];
  ops: number[];
}

/** Traces flat ops (see the LINE, CIRCLE, POLY, RECT codes) into the current path, in mm. */
export function replayOps(ctx: Canvas2D, ops: readonly number[]): void {
  let i = 0;
  const at = (n: number) => ops[i + n] ?? 0;
  while (i < ops.length) {
    const op = at(0);
    if (op === LINE) {
      ctx.moveTo(at(1), at(2));
      ctx.lineTo(at(3), at(4));
      i += 5;
    } else if (op === CIRCLE) {
      // A new subpath at the circle's right-hand point, so no joining line is drawn.
      ctx.moveTo(at(1) + at(3), at(2));
      ctx.arc(at(1), at(2), at(3), 0, Math.PI * 2);
      i += 4;
    } else if (op === POLY) {
      const count = at(1);
      const closed = at(2) === 1;
      ctx.moveTo(at(3), at(4));
      for (let p = 1; p < count; p++) ctx.lineTo(at(3 + 2 * p), at(4 + 2 * p));
      if (closed) ctx.closePath();
      i += 3 + 2 * count;
    } else {
      ctx.rect(at(1), at(2), at(3), at(4));
      i += 5;
    }
  }
}
