import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { Layout } from '../../../../shared/layout/layout-types.ts';
import { PreviewController } from '../preview-controller.ts';
import { planScene, type PreviewView } from '../preview-scene.ts';
import { PreviewToolbar } from './preview-toolbar.tsx';

export interface LayoutPreviewProps {
  layout: Layout;
  units: 'in' | 'mm';
  view: PreviewView;
  pieceId?: string;
  /** Hole ids to emphasise, e.g. the holes of a finding the maker clicked. */
  highlight?: Set<string>;
  /** Part ids to emphasise in the section (the parts of a finding across parts). */
  highlightParts?: Set<string>;
}

/** Zoom per key press or button: two presses about double (common practice, no source). */
const STEP = 1.4;
/** Arrow keys move the drawing by this many CSS px. */
const NUDGE_PX = 40;

/**
 * A design's pieces drawn by the same code as the printed kit, on a canvas that fills its
 * container: drag to pan, wheel or pinch to zoom; with focus, + and - zoom and the arrows pan.
 */
export function LayoutPreview({ layout, units, view, pieceId, highlight, highlightParts }: LayoutPreviewProps) {
  const [controller] = useState(() => new PreviewController());
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const shown = useRef<{ size: string; view: PreviewView; pieceId: string | null } | null>(null);
  const helpId = useId();
  const scene = useMemo(() => planScene(layout, units, view, pieceId, highlight, highlightParts), [layout, units, view, pieceId, highlight, highlightParts]);

  useEffect(() => {
    const canvas = canvasRef.current;
    return canvas ? controller.attach(canvas) : undefined;
  }, [controller]);

  useEffect(() => {
    // Another view, piece or piece size starts fitted; edits that keep the drawing's size (a row
    // moved, a drill changed, a rename), new highlights or units keep the maker's zoom and pan.
    const last = shown.current;
    const { minX, minY, maxX, maxY } = scene.bounds;
    const size = `${Math.round(maxX - minX)}x${Math.round(maxY - minY)}`;
    const refit = !last || last.size !== size || last.view !== view || last.pieceId !== scene.pieceId;
    shown.current = { size, view, pieceId: scene.pieceId };
    controller.setScene(scene, refit);
  }, [controller, scene, view]);

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const moves: Record<string, () => void> = {
      '+': () => controller.zoom(STEP),
      '=': () => controller.zoom(STEP),
      '-': () => controller.zoom(1 / STEP),
      _: () => controller.zoom(1 / STEP),
      '0': () => controller.fit(),
      ArrowLeft: () => controller.pan(NUDGE_PX, 0),
      ArrowRight: () => controller.pan(-NUDGE_PX, 0),
      ArrowUp: () => controller.pan(0, NUDGE_PX),
      ArrowDown: () => controller.pan(0, -NUDGE_PX),
    };
    const move = event.ctrlKey || event.metaKey || event.altKey ? undefined : moves[event.key];
    if (!move) return;
    event.preventDefault();
    move();
  }

  return (
    <div className="relative h-full w-full overflow-hidden rounded-md border border-rule">
      <div
        role="img"
        aria-label={scene.label}
        aria-describedby={helpId}
        tabIndex={0}
        onKeyDown={onKeyDown}
        className="absolute inset-0 focus-visible:outline-offset-[-3px]"
      >
        <canvas
          ref={canvasRef}
          className="block h-full w-full cursor-grab touch-none select-none active:cursor-grabbing"
          onPointerDown={(event) => controller.pointerDown(event)}
          onPointerMove={(event) => controller.pointerMove(event)}
          onPointerUp={(event) => controller.pointerUp(event)}
          onPointerCancel={(event) => controller.pointerUp(event)}
        />
      </div>
      <span id={helpId} className="sr-only">
        Drag to move, use the wheel or pinch to zoom. With focus here, plus and minus zoom, the arrow keys move, and 0 fits the drawing.
      </span>
      {scene.calls.length === 0 && <p className="pointer-events-none absolute inset-x-0 top-1/2 -translate-y-1/2 px-4 text-center text-sm text-ink-soft">{scene.label}.</p>}
      <PreviewToolbar onFit={() => controller.fit()} onZoomIn={() => controller.zoom(STEP)} onZoomOut={() => controller.zoom(1 / STEP)} />
    </div>
  );
}
