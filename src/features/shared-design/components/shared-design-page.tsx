import { useMemo, useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { layoutDocument } from '../../../../shared/layout/index.ts';
import { Button } from '../../../components/button.tsx';
import { Page } from '../../../components/page.tsx';
import { Tabs, tabPanelProps, useTabPanel } from '../../../components/tabs.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { PrintWorkspace } from '../../print/components/print-workspace.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { openDesign } from '../../designer/open-design.ts';
import { formatRatio } from '../../designer/components/airflow-panel.tsx';
import { LayoutPreview } from '../../preview/components/layout-preview.tsx';
import type { PreviewView } from '../../preview/preview-scene.ts';
import { useSharedDesign } from '../api/get-shared-design.ts';

const views: { id: PreviewView; label: string }[] = [
  { id: 'wall', label: 'Wall strip' },
  { id: 'bottom', label: 'Bottom disc' },
  { id: 'assembled', label: 'Section' },
];

/** A design someone shared: anyone with the link can look at it, print its kit or copy it. */
export function SharedDesignPage() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  const { data: account } = useAccount();
  const shared = useSharedDesign(token);
  const [view, setView] = useState<PreviewView>('wall');
  const panelId = useTabPanel();
  const document = shared.data?.document as DesignInput | undefined;
  const result = useMemo(() => (document ? layoutDocument(document) : undefined), [document]);

  if (shared.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (shared.isError || !document) {
    const gone = shared.error instanceof ApiError && shared.error.status === 404;
    return (
      <Page title={gone ? 'This link does not work any more' : 'This design could not be loaded'}>
        <p>{gone ? 'Whoever shared it may have turned sharing off, or deleted the design. Ask them for a new link.' : 'Try again in a moment.'}</p>
        <p className="mt-4">
          <Link to="/design" className="text-ember-700 underline">
            Design your own stove
          </Link>
        </p>
      </Page>
    );
  }

  async function openCopy(copy: DesignInput) {
    // Not bound to the owner's library: saving it makes a design of the visitor's own.
    openDesign(copy, { accountId: account?.id, reason: `opened a copy of the shared design “${copy.name}”` });
    await navigate('/design');
  }

  const layout = result?.ok ? result.layout : undefined;
  return (
    <Page title={shared.data.name} width="wide" intro="A stove design shared with you. Print its drilling templates, or open a copy to change it.">
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)]">
        <section aria-label="Preview" className="flex flex-col gap-2">
          <Tabs<PreviewView> label="Preview view" tabs={views} selected={view} onSelect={setView} panelId={panelId} tone="ink" />
          <div {...tabPanelProps(panelId, view)} className="h-80 overflow-hidden rounded-lg border border-rule bg-white sm:h-96">
            {layout ? <LayoutPreview layout={layout} units={document.units ?? 'in'} view={view} /> : <p className="p-4 text-sm text-ink-soft">This design cannot be laid out.</p>}
          </div>
        </section>
        <div className="flex flex-col gap-5">
          {layout && (
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
              {document.parts.map((part) => (
                <div key={part.id} className="contents">
                  <dt className="font-medium">{part.name ?? part.role}</dt>
                  <dd>{part.vessel.name}</dd>
                </div>
              ))}
              <dt className="font-medium">Holes</dt>
              <dd>{layout.holes.length}</dd>
              <dt className="font-medium">Primary : secondary</dt>
              <dd>{formatRatio(layout.airflow.ratio)}</dd>
            </dl>
          )}
          <div>
            <Button variant="secondary" onClick={() => void openCopy(document)}>
              Open a copy in the designer
            </Button>
          </div>
        </div>
      </div>
      <div className="mt-8">
        <PrintWorkspace design={document} version={String(shared.data.version)} />
      </div>
    </Page>
  );
}
