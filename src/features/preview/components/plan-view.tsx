import { useRef, type KeyboardEvent, type PointerEvent } from 'react';
import type { Part } from '../../../../shared/design/design-schema.ts';
import { findDrill } from '../../../../shared/drills/index.ts';
import { normalizeDeg } from '../../../../shared/layout/angles.ts';
import { placeSideRow } from '../../../../shared/layout/side-row.ts';

/** The can wall's circle in view units; rows sit on rings inside it, outermost first. */
const WALL_R = 100;
const FIRST_ROW_R = 88;
const ROW_STEP = 13;
const MIN_ROW_R = 30;

interface PlanViewProps {
  part: Part;
  partName: string;
  onSeamChange(deg: number): void;
  onToggleSkip(rowIndex: number, position: number): void;
}

/** Angle (counter-clockwise seen from above, 0 deg to the right) to a point on a circle, in SVG coordinates (y down). */
function at(deg: number, r: number): [number, number] {
  const t = (deg * Math.PI) / 180;
  return [r * Math.cos(t), -r * Math.sin(t)];
}

function arcPath(startDeg: number, endDeg: number, r: number): string {
  const span = normalizeDeg(endDeg - startDeg) || 360;
  const [x0, y0] = at(startDeg, r);
  const [x1, y1] = at(startDeg + Math.min(span, 359.99), r);
  return `M ${x0} ${y0} A ${r} ${r} 0 ${span > 180 ? 1 : 0} 0 ${x1} ${y1}`;
}

/**
 * The can seen from above: the seam (drag it, or focus it and use the arrow keys), each row's
 * positions on a ring of its own (click one to leave it out or put it back), keep-outs as
 * shaded arcs. Drawn from the part's own numbers, not printed.
 */
export function PlanView({ part, partName, onSeamChange, onToggleSkip }: PlanViewProps) {
  const svg = useRef<SVGSVGElement>(null);
  const dragging = useRef(false);
  const seam = part.vessel.seamAngleDeg;

  function angleAt(event: PointerEvent): number | undefined {
    const box = svg.current?.getBoundingClientRect();
    if (!box) return undefined;
    const x = event.clientX - (box.left + box.width / 2);
    const y = event.clientY - (box.top + box.height / 2);
    return Math.round(normalizeDeg((Math.atan2(-y, x) * 180) / Math.PI));
  }
  function onSeamKey(event: KeyboardEvent) {
    const step = event.shiftKey ? 10 : 1;
    const moves: Record<string, number> = { ArrowUp: step, ArrowRight: -step, ArrowDown: -step, ArrowLeft: step };
    const move = moves[event.key];
    if (move === undefined) return;
    event.preventDefault();
    onSeamChange(normalizeDeg(Math.round(seam) + move));
  }

  const rows = part.sideRows.map((row, r) => {
    const drill = findDrill(row.drillId);
    const radius = Math.max(MIN_ROW_R, FIRST_ROW_R - r * ROW_STEP);
    const placed = drill ? placeSideRow({ ...row, skip: [] }, drill.diameterMm, part.vessel.outerDiameterMm) : { positions: [], dropped: [] };
    return { row, r, radius, placed, skipped: new Set(row.skip), dropped: new Set(placed.dropped.map((p) => p.index)) };
  });
  const [sx, sy] = at(seam, WALL_R);

  return (
    <div className="flex h-full flex-col items-center gap-2 p-2">
      <svg
        ref={svg}
        viewBox="-112 -112 224 224"
        className="h-full max-h-full w-auto max-w-full touch-none select-none"
        role="group"
        aria-label={`${partName} seen from above: the seam at ${Math.round(seam)}°, ${part.sideRows.length} row${part.sideRows.length === 1 ? '' : 's'} round the wall`}
        onPointerMove={(e) => {
          if (!dragging.current) return;
          const deg = angleAt(e);
          if (deg !== undefined && deg !== Math.round(seam)) onSeamChange(deg);
        }}
        onPointerUp={() => (dragging.current = false)}
        onPointerCancel={() => (dragging.current = false)}
      >
        <circle r={WALL_R} fill="#fffdf8" stroke="#3b3a36" strokeWidth={1.2} />
        <line x1={0} y1={0} x2={WALL_R + 6} y2={0} stroke="#8a857a" strokeWidth={0.6} strokeDasharray="3 2" />
        <text x={WALL_R + 2} y={-3} fontSize={7} fill="#6b675f">
          0°
        </text>
        {rows.map(({ row, r, radius, placed, skipped, dropped }) => (
          <g key={row.id} aria-hidden="true">
            <circle r={radius} fill="none" stroke="#d8d2c4" strokeWidth={0.5} />
            {row.keepOuts.map((k, i) => (
              <path key={i} d={arcPath(k.startDeg, k.endDeg, radius)} fill="none" stroke="#c2410c" strokeOpacity={0.25} strokeWidth={8} />
            ))}
            {[...placed.positions, ...placed.dropped].map((p) => {
              const [x, y] = at(p.angleDeg, radius);
              const out = skipped.has(p.index);
              if (dropped.has(p.index)) return <path key={p.index} d={`M ${x - 2} ${y - 2} L ${x + 2} ${y + 2} M ${x - 2} ${y + 2} L ${x + 2} ${y - 2}`} stroke="#8a857a" strokeWidth={0.8} />;
              return (
                <circle
                  key={p.index}
                  cx={x}
                  cy={y}
                  r={3.2}
                  className="cursor-pointer"
                  fill={out ? '#fffdf8' : row.group === 'secondary' ? '#c2410c' : '#3b3a36'}
                  stroke={out ? '#b91c1c' : 'none'}
                  strokeDasharray={out ? '1.5 1' : undefined}
                  strokeWidth={0.9}
                  onClick={() => onToggleSkip(r, p.index)}
                >
                  <title>{`${row.label ?? row.id}: position ${p.index + 1}${out ? ' (left out; click to put back)' : ' (click to leave out)'}`}</title>
                </circle>
              );
            })}
          </g>
        ))}
        <line x1={0} y1={0} x2={sx} y2={sy} stroke="#1f1e1b" strokeWidth={1.4} />
        <circle
          cx={sx}
          cy={sy}
          r={7}
          fill="#1f1e1b"
          tabIndex={0}
          role="slider"
          aria-label={`Seam of ${partName}`}
          aria-valuemin={0}
          aria-valuemax={359}
          aria-valuenow={Math.round(seam)}
          aria-valuetext={`${Math.round(seam)}°`}
          className="cursor-grab focus:outline-2 focus:outline-ember-600"
          onKeyDown={onSeamKey}
          onPointerDown={(e) => {
            dragging.current = true;
            (e.target as Element).setPointerCapture?.(e.pointerId);
          }}
        />
        <text x={sx} y={sy + 2.5} fontSize={6.5} textAnchor="middle" fill="#fff" pointerEvents="none">
          S
        </text>
      </svg>
      <p className="hidden text-center text-xs text-ink-soft sm:block">
        Seam at {Math.round(seam)}°: drag it, or focus it and use the arrow keys. Click a hole to leave it out or put it back; crosses fall in a keep-out.
      </p>
    </div>
  );
}
