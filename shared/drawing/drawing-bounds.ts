import { estimateTextWidthMm } from './drawing-context.ts';
import type { DrawCall } from './recording-context.ts';

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** The box each recorded call covers (text by its estimated width; rotated text turned). */
export function boundsOfCall(call: DrawCall): Bounds {
  switch (call.op) {
    case 'line': {
      const h = call.stroke.widthMm / 2;
      return { minX: Math.min(call.x1, call.x2) - h, minY: Math.min(call.y1, call.y2) - h, maxX: Math.max(call.x1, call.x2) + h, maxY: Math.max(call.y1, call.y2) + h };
    }
    case 'polyline': {
      const xs = call.points.map(([x]) => x);
      const ys = call.points.map(([, y]) => y);
      return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
    }
    case 'rect':
      return { minX: call.x, minY: call.y, maxX: call.x + call.width, maxY: call.y + call.height };
    case 'circle':
      return { minX: call.cx - call.r, minY: call.cy - call.r, maxX: call.cx + call.r, maxY: call.cy + call.r };
    case 'text': {
      const w = estimateTextWidthMm(call.text, call.style.sizeMm, call.style.weight);
      const start = call.style.anchor === 'middle' ? -w / 2 : call.style.anchor === 'end' ? -w : 0;
      const ascent = call.style.sizeMm * 0.75;
      const descent = call.style.sizeMm * 0.25;
      const turned = Math.abs((call.style.rotateDeg ?? 0) % 180) === 90;
      return turned
        ? { minX: call.x - descent, minY: call.y - start - w, maxX: call.x + ascent, maxY: call.y - start }
        : { minX: call.x + start, minY: call.y - ascent, maxX: call.x + start + w, maxY: call.y + descent };
    }
  }
}

/** The box around all calls, or undefined for none. */
export function boundsOfCalls(calls: readonly DrawCall[]): Bounds | undefined {
  if (calls.length === 0) return undefined;
  return calls.map(boundsOfCall).reduce((a, b) => ({ minX: Math.min(a.minX, b.minX), minY: Math.min(a.minY, b.minY), maxX: Math.max(a.maxX, b.maxX), maxY: Math.max(a.maxY, b.maxY) }));
}
