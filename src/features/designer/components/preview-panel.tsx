import { useMemo, useState } from 'react';
import type { Design } from '../../../../shared/design/design-schema.ts';
import type { Finding, Layout } from '../../../../shared/layout/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { Tabs, tabPanelProps, useTabPanel } from '../../../components/tabs.tsx';
import { LayoutPreview } from '../../preview/components/layout-preview.tsx';
import { PlanView } from '../../preview/components/plan-view.tsx';
import { StaleMark } from './stale-mark.tsx';

export type DesignView = 'wall' | 'bottom' | 'assembled' | 'above';

const views: { id: DesignView; label: string }[] = [
  { id: 'wall', label: 'Wall strip' },
  { id: 'bottom', label: 'Bottom disc' },
  { id: 'assembled', label: 'Section' },
  { id: 'above', label: 'From above' },
];

interface PreviewPanelProps {
  design: Design;
  layout: Layout;
  units: UnitSystem;
  partIndex: number;
  view: DesignView;
  onView(view: DesignView): void;
  finding?: Finding;
  stale?: string;
  onSeamChange(deg: number): void;
  onToggleSkip(rowIndex: number, position: number): void;
  className?: string;
}

/** The preview of the part being edited: its pieces as they print, or the can from above to set the seam and pick holes. */
export function PreviewPanel({ design, layout, units, partIndex, view, onView, finding, stale, onSeamChange, onToggleSkip, className = '' }: PreviewPanelProps) {
  const panelId = useTabPanel();
  const [hidden, setHidden] = useState(false);
  const part = design.parts[Math.min(partIndex, design.parts.length - 1)]!;
  const partName = part.name?.trim() || part.id;
  const pieces = layout.pieces.filter((p) => p.partId === part.id);
  // A part without a piece of this view's kind (a shell has no bottom disc) says so, rather than showing another part.
  const piece = pieces.find((p) => (view === 'bottom' ? p.kind === 'disc' : p.kind === 'wrap-strip'));
  const highlight = useMemo(() => (finding ? new Set(finding.holeIds) : undefined), [finding]);
  const highlightParts = useMemo(() => (finding?.partIds ? new Set(finding.partIds) : undefined), [finding]);

  return (
    <section aria-label="Preview" className={`flex flex-col gap-2 bg-paper ${className}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Tabs label="Preview view" tabs={views} selected={view} onSelect={onView} panelId={panelId} tone="ink" className="gap-0.5 sm:gap-1" />
        <button type="button" onClick={() => setHidden(!hidden)} aria-expanded={!hidden} aria-controls={panelId} className="min-h-9 rounded-md px-1 text-xs text-ink-soft underline lg:hidden">
          {hidden ? 'Show the preview' : 'Hide the preview'}
        </button>
      </div>
      {stale && <StaleMark what="The preview" problem={stale} compact />}
      <div {...tabPanelProps(panelId, view)} hidden={hidden} className={`h-44 overflow-hidden rounded-lg border border-rule bg-white sm:h-80 lg:h-96 ${stale ? '[&_canvas]:opacity-60 [&_svg]:opacity-60' : ''}`}>
        {view === 'above' && part.role === 'intake-collar' ? (
          <p className="p-4 text-sm text-ink-soft">{`${partName} takes its holes from the shell’s intake row, so it has none of its own to place here: its band, holes and scale are in the wall view.`}</p>
        ) : view === 'above' ? (
          <PlanView part={part} partName={partName} onSeamChange={onSeamChange} onToggleSkip={onToggleSkip} />
        ) : view === 'assembled' ? (
          <LayoutPreview layout={layout} units={units} view={view} pieceId={pieces[0]?.id} highlight={highlight} highlightParts={highlightParts} />
        ) : piece ? (
          <LayoutPreview layout={layout} units={units} view={view} pieceId={piece.id} highlight={highlight} />
        ) : (
          <p className="p-4 text-sm text-ink-soft">{`${partName} has no ${view === 'bottom' ? 'holes in its bottom' : 'holes in its wall'} yet.`}</p>
        )}
      </div>
    </section>
  );
}
