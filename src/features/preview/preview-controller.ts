import { FONT_FAMILY } from '../../../shared/drawing/drawing-context.ts';
import { replay } from '../../../shared/drawing/recording-context.ts';
import { CanvasDrawingContext } from './canvas-context.ts';
import { fitView } from './piece-view.ts';
import type { PreviewScene } from './preview-scene.ts';
import { panView, zoomAt, type ViewTransform } from './view-transform.ts';

/** Behind the white paper: a warm grey a shade darker than the app's page colour. */
export const PREVIEW_BACKGROUND = '#e9e4da';
const FIT_PADDING_PX = 12;
/** The fitted drawing stays below the zoom buttons (40 px tall, 8 px from the top). */
const TOOLBAR_BAND_PX = 44;
/** Wheel zoom: e^(-deltaY / 650), so one 100 px notch is about 1.17x (common practice, no source). */
const WHEEL_ZOOM_PER_PX = 1 / 650;
const LINE_PX = 16; // deltaMode 1 reports lines; about one line of text each
/** The User Timing mark set when the preview has painted (read by the design-screen typing bench). */
export const PAINTED_MARK = 'canwright:preview-painted';

type PointerLike = { pointerId: number; clientX: number; clientY: number };
type Point = { x: number; y: number };

/** Clears the canvas and paints a recorded scene through the view. */
export function paintScene(drawer: CanvasDrawingContext, scene: PreviewScene, view: ViewTransform, dpr: number): void {
  drawer.setView(view, dpr);
  drawer.clear(PREVIEW_BACKGROUND);
  replay(scene.calls, drawer);
  drawer.finish();
}

/**
 * Owns one preview canvas outside React: its size (device pixels follow the box it fills), the
 * view (fitted until the maker zooms or pans), gestures, and redraws on the next animation frame.
 */
export class PreviewController {
  private canvas: HTMLCanvasElement | null = null;
  private drawer: CanvasDrawingContext | null = null;
  private scene: PreviewScene | null = null;
  /** null while the view follows the fit. */
  private view: ViewTransform | null = null;
  private width = 0;
  private height = 0;
  private dpr = 1;
  private frame = 0;
  private readonly pointers = new Map<number, Point>();

  /** Starts drawing into a canvas that fills its parent; returns the cleanup. */
  attach(canvas: HTMLCanvasElement): () => void {
    this.canvas = canvas;
    const box = canvas.parentElement ?? canvas;
    const observer = new ResizeObserver(() => this.resize(box));
    observer.observe(box);
    // Added by hand: React's wheel listeners are passive, and the page must not scroll as it zooms.
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const at = this.toLocal(event);
      this.zoom(Math.exp(-event.deltaY * (event.deltaMode === 1 ? LINE_PX : 1) * WHEEL_ZOOM_PER_PX), at.x, at.y);
    };
    canvas.addEventListener('wheel', onWheel, { passive: false });
    // Text drawn before IBM Plex Sans has loaded falls back to another face: draw again once it is in.
    const onFonts = () => this.schedule();
    document.fonts.addEventListener('loadingdone', onFonts);
    void document.fonts.ready.then(onFonts);
    for (const weight of [400, 600]) void document.fonts.load(`${weight} 16px '${FONT_FAMILY}'`).catch(() => undefined);
    this.resize(box);
    return () => {
      observer.disconnect();
      canvas.removeEventListener('wheel', onWheel);
      document.fonts.removeEventListener('loadingdone', onFonts);
      cancelAnimationFrame(this.frame);
      this.frame = 0;
      this.canvas = null;
      this.drawer = null;
    };
  }

  /** Shows a scene; `refit` goes back to the fitted view (a new piece), else the view is kept. */
  setScene(scene: PreviewScene, refit: boolean): void {
    this.scene = scene;
    if (refit) this.view = null;
    this.schedule();
  }

  fit(): void {
    this.view = null;
    this.schedule();
  }

  /** Zooms about a point in CSS px from the canvas's top-left, by default its middle. */
  zoom(factor: number, x = this.width / 2, y = this.height / 2): void {
    this.view = zoomAt(this.currentView(), factor, x, y);
    this.schedule();
  }

  pan(dx: number, dy: number): void {
    this.view = panView(this.currentView(), dx, dy);
    this.schedule();
  }

  pointerDown(event: PointerLike): void {
    // Keeps a drag going when the pointer leaves the canvas; a pointer the browser no longer tracks cannot be captured.
    try {
      this.canvas?.setPointerCapture(event.pointerId);
    } catch {
      // Dragging still works while the pointer stays over the canvas.
    }
    this.pointers.set(event.pointerId, this.toLocal(event));
  }

  /** One pointer drags the drawing; two pinch: zoom by their spread, pan by their midpoint. */
  pointerMove(event: PointerLike): void {
    const before = this.pointers.get(event.pointerId);
    if (!before) return;
    const now = this.toLocal(event);
    this.pointers.set(event.pointerId, now);
    if (this.pointers.size === 1) return this.pan(now.x - before.x, now.y - before.y);
    const other = [...this.pointers.entries()].find(([id]) => id !== event.pointerId)?.[1];
    if (!other) return;
    const spread0 = Math.hypot(before.x - other.x, before.y - other.y);
    const spread1 = Math.hypot(now.x - other.x, now.y - other.y);
    const mid = { x: (now.x + other.x) / 2, y: (now.y + other.y) / 2 };
    let view = panView(this.currentView(), (now.x - before.x) / 2, (now.y - before.y) / 2);
    if (spread0 > 0) view = zoomAt(view, spread1 / spread0, mid.x, mid.y);
    this.view = view;
    this.schedule();
  }

  pointerUp(event: PointerLike): void {
    this.pointers.delete(event.pointerId);
  }

  /** Paints now, synchronously; returns the milliseconds it took. */
  redrawNow(): number {
    const started = performance.now();
    const canvas = this.canvas;
    if (!canvas || !this.scene || this.width === 0 || this.height === 0) return 0;
    const view = this.currentView();
    if (!this.drawer) {
      const ctx = canvas.getContext('2d', { alpha: false });
      if (!ctx) return 0;
      this.drawer = new CanvasDrawingContext(ctx, view, this.dpr);
    }
    paintScene(this.drawer, this.scene, view, this.dpr);
    // A User Timing mark per paint, for the keystroke-to-preview bench; only the latest is kept.
    performance.clearMarks(PAINTED_MARK);
    performance.mark(PAINTED_MARK);
    return performance.now() - started;
  }

  private currentView(): ViewTransform {
    if (this.view) return this.view;
    const fitted = fitView(this.scene?.bounds ?? { minX: 0, minY: 0, maxX: 1, maxY: 1 }, this.width, this.height - TOOLBAR_BAND_PX, FIT_PADDING_PX);
    return { ...fitted, offsetY: fitted.offsetY + TOOLBAR_BAND_PX };
  }

  private schedule(): void {
    if (this.frame || !this.canvas) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.redrawNow();
    });
  }

  /** Follows the box's size in device pixels and repaints at once, as resizing clears the canvas. */
  private resize(box: HTMLElement): void {
    const canvas = this.canvas;
    if (!canvas) return;
    this.width = box.clientWidth;
    this.height = box.clientHeight;
    this.dpr = window.devicePixelRatio || 1;
    canvas.width = Math.max(1, Math.round(this.width * this.dpr));
    canvas.height = Math.max(1, Math.round(this.height * this.dpr));
    this.redrawNow();
  }

  private toLocal(event: { clientX: number; clientY: number }): Point {
    const rect = this.canvas?.getBoundingClientRect();
    return { x: event.clientX - (rect?.left ?? 0), y: event.clientY - (rect?.top ?? 0) };
  }
}
