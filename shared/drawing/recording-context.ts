import type { DrawingContext, ShapeStyle, Stroke, TextStyle } from './drawing-context.ts';

/** Every call, kept as data: for tests, bounding boxes, and replaying into another context. */
export type DrawCall =
  | { op: 'line'; x1: number; y1: number; x2: number; y2: number; stroke: Stroke }
  | { op: 'polyline'; points: (readonly [number, number])[]; style: ShapeStyle & { closed?: boolean } }
  | { op: 'rect'; x: number; y: number; width: number; height: number; style: ShapeStyle }
  | { op: 'circle'; cx: number; cy: number; r: number; style: ShapeStyle }
  | { op: 'text'; x: number; y: number; text: string; style: TextStyle };

export class RecordingContext implements DrawingContext {
  readonly calls: DrawCall[] = [];
  line(x1: number, y1: number, x2: number, y2: number, stroke: Stroke): void {
    this.calls.push({ op: 'line', x1, y1, x2, y2, stroke });
  }
  polyline(points: readonly (readonly [number, number])[], style: ShapeStyle & { closed?: boolean }): void {
    this.calls.push({ op: 'polyline', points: [...points], style });
  }
  rect(x: number, y: number, width: number, height: number, style: ShapeStyle): void {
    this.calls.push({ op: 'rect', x, y, width, height, style });
  }
  circle(cx: number, cy: number, r: number, style: ShapeStyle): void {
    this.calls.push({ op: 'circle', cx, cy, r, style });
  }
  text(x: number, y: number, text: string, style: TextStyle): void {
    this.calls.push({ op: 'text', x, y, text, style });
  }
}

/** Replays recorded calls into any context (e.g. a PDF page). */
export function replay(calls: readonly DrawCall[], into: DrawingContext): void {
  for (const call of calls) {
    switch (call.op) {
      case 'line':
        into.line(call.x1, call.y1, call.x2, call.y2, call.stroke);
        break;
      case 'polyline':
        into.polyline(call.points, call.style);
        break;
      case 'rect':
        into.rect(call.x, call.y, call.width, call.height, call.style);
        break;
      case 'circle':
        into.circle(call.cx, call.cy, call.r, call.style);
        break;
      case 'text':
        into.text(call.x, call.y, call.text, call.style);
        break;
    }
  }
}
