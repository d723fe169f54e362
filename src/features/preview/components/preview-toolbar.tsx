/** Fit and zoom buttons over a preview's corner; big enough to hit with a thumb (40 px). */
export function PreviewToolbar({ onFit, onZoomIn, onZoomOut }: { onFit: () => void; onZoomIn: () => void; onZoomOut: () => void }) {
  const button = 'inline-flex min-h-10 min-w-10 items-center justify-center px-3 text-base font-medium text-ink hover:bg-ember-50';
  return (
    <div role="toolbar" aria-label="Zoom" className="absolute right-2 top-2 flex divide-x divide-rule overflow-hidden rounded-md border border-rule bg-white/95 shadow-sm">
      <button type="button" className={`${button} text-sm`} aria-label="Fit to view" onClick={onFit}>
        Fit
      </button>
      <button type="button" className={button} aria-label="Zoom in" onClick={onZoomIn}>
        +
      </button>
      <button type="button" className={button} aria-label="Zoom out" onClick={onZoomOut}>
        −
      </button>
    </div>
  );
}
