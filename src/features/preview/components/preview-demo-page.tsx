import { useEffect, useId, useMemo, useState } from 'react';
import { layoutDesign } from '../../../../shared/layout/index.ts';
import { Page } from '../../../components/page.tsx';
import { benchPreview } from '../bench-preview.ts';
import { loadDemoDesigns } from '../demo-designs.ts';
import type { PreviewView } from '../preview-scene.ts';
import { FindingList } from './finding-list.tsx';
import { LayoutPreview } from './layout-preview.tsx';

const designs = loadDemoDesigns();
const views: [PreviewView, string][] = [
  ['wall', 'Wall strip'],
  ['bottom', 'Bottom'],
  ['assembled', 'Section'],
];
const select = 'min-h-10 w-full rounded-md border border-rule bg-white px-3 py-2 text-base';

/** /preview-demo: a place to look at the live preview with the example designs (development aid). */
export function PreviewDemoPage() {
  const designId = useId();
  const pieceSelectId = useId();
  const [index, setIndex] = useState(0);
  const [view, setView] = useState<PreviewView>('wall');
  const [pieceId, setPieceId] = useState<string | undefined>();
  const [highlight, setHighlight] = useState<Set<string> | undefined>();
  const demo = designs[index] ?? designs[0]!;
  const layout = useMemo(() => layoutDesign(demo.design), [demo]);
  const pieces = layout.pieces.filter((p) => (view === 'bottom' ? p.kind === 'disc' : p.kind === 'wrap-strip'));
  const piece = pieces.find((p) => p.id === pieceId) ?? pieces[0];

  useEffect(() => {
    window.__canwrightPreviewBench = benchPreview;
    return () => {
      delete window.__canwrightPreviewBench;
    };
  }, []);

  function chooseDesign(next: number) {
    setIndex(next);
    setPieceId(undefined);
    setHighlight(undefined);
  }

  return (
    <Page title="Preview demo" width="wide" intro="The live preview draws each piece with the same code as the printed templates. Pick an example design, a view and a piece.">
      <div className="grid gap-4 sm:grid-cols-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={designId} className="text-sm font-medium">
            Design
          </label>
          <select id={designId} className={select} value={index} onChange={(event) => chooseDesign(Number(event.target.value))}>
            {designs.map((d, i) => (
              <option key={d.id} value={i}>
                {d.design.name}
              </option>
            ))}
          </select>
        </div>
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-medium">View</legend>
          <div className="mt-1 flex overflow-hidden rounded-md border border-rule bg-white">
            {views.map(([id, name]) => (
              <label key={id} className={`relative flex min-h-10 flex-1 cursor-pointer items-center justify-center px-2 text-sm font-medium has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-ember-600 ${view === id ? 'bg-ember-600 text-white' : 'hover:bg-ember-50'}`}>
                <input type="radio" name="preview-view" value={id} checked={view === id} onChange={() => setView(id)} className="absolute inset-0 cursor-pointer opacity-0" />
                {name}
              </label>
            ))}
          </div>
        </fieldset>
        <div className="flex flex-col gap-1">
          <label htmlFor={pieceSelectId} className="text-sm font-medium">
            Piece
          </label>
          <select id={pieceSelectId} className={select} value={piece?.id ?? ''} disabled={pieces.length === 0} onChange={(event) => setPieceId(event.target.value)}>
            {pieces.length === 0 && <option value="">None in this view</option>}
            {pieces.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </div>
      </div>
      <div className="mt-4 h-[60vh] min-h-72">
        <LayoutPreview layout={layout} units={demo.design.units} view={view} pieceId={piece?.id} highlight={highlight} />
      </div>
      <FindingList findings={layout.findings} onShow={(ids) => setHighlight(new Set(ids))} />
    </Page>
  );
}
