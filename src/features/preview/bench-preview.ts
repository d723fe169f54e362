import { layoutDesign } from '../../../shared/layout/index.ts';
import { CanvasDrawingContext } from './canvas-context.ts';
import { buildBenchDesign } from './demo-designs.ts';
import { fitView } from './piece-view.ts';
import { paintScene } from './preview-controller.ts';
import { planScene } from './preview-scene.ts';

declare global {
  interface Window {
    /** Median ms of synchronous redraws of a 500-hole wall strip (set by the preview demo page). */
    __canwrightPreviewBench?: (runs?: number) => number;
  }
}

/**
 * Times `runs` full redraws of the 500-hole bench design's wall strip on a 1280 x 800 canvas, as
 * a pan or zoom repaints it, and returns the median in ms. Reading one pixel back after each
 * makes the browser finish rasterising inside the timing.
 */
export function benchPreview(runs = 50): number {
  const layout = layoutDesign(buildBenchDesign());
  const scene = planScene(layout, 'in', 'wall');
  const dpr = window.devicePixelRatio || 1;
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(1280 * dpr);
  canvas.height = Math.round(800 * dpr);
  const ctx = canvas.getContext('2d', { alpha: false, willReadFrequently: false });
  if (!ctx) throw new Error('No 2D canvas in this browser');
  const view = fitView(scene.bounds, 1280, 800, 12);
  const drawer = new CanvasDrawingContext(ctx, view, dpr);
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const started = performance.now();
    paintScene(drawer, scene, view, dpr);
    ctx.getImageData(0, 0, 1, 1);
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] ?? 0;
}
