import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import type { DesignDetail } from '../../../../shared/library/library-schemas.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { BurnLogSection } from '../../burns/components/burn-log-section.tsx';
import { openDesign } from '../../designer/open-design.ts';
import { useDesign } from '../api/get-design.ts';
import { useVersions } from '../api/get-versions.ts';
import { useRestoreVersion } from '../api/restore-version.ts';
import { formatWhen } from '../format-when.ts';
import { SharePanel } from './share-panel.tsx';
import { TagsEditor } from './tags-editor.tsx';
import { VersionList } from './version-list.tsx';

const backLink = (
  <Link to="/library" className="text-ember-700 underline">
    Back to your library
  </Link>
);

/** One saved design: its burn log, tags, share link and versions, any of which can be restored. */
export function DesignHistoryPage() {
  const id = useParams().id ?? '';
  const navigate = useNavigate();
  const { data: account } = useAccount();
  const design = useDesign(id);
  const versions = useVersions(id);
  const restore = useRestoreVersion();
  const [restored, setRestored] = useState<{ from: number; detail: DesignDetail }>();
  const [problem, setProblem] = useState<string>();

  if (design.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (design.isError) {
    // Another maker's design answers 404 like a missing one, so both read the same here.
    const missing = design.error instanceof ApiError && design.error.status === 404;
    return (
      <Page title={missing ? 'Design not found' : 'Design not available'}>
        <p>{missing ? 'There is no such design in your library. It may have been deleted.' : `The design could not be loaded: ${design.error.message}`}</p>
        <p className="mt-4">{backLink}</p>
      </Page>
    );
  }
  const detail = design.data;

  async function restoreVersion(number: number) {
    setProblem(undefined);
    setRestored(undefined);
    try {
      setRestored({ from: number, detail: await restore.mutateAsync({ id, number }) });
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  async function openInDesigner(current: DesignDetail) {
    openDesign(current.document, { savedId: current.id, accountId: account?.id, reason: `opened “${current.name}” from your library` });
    await navigate('/design');
  }

  return (
    <Page
      title={detail.name}
      width="wide"
      intro={
        <p>
          Version {detail.currentVersion} · updated <time dateTime={detail.updatedAt}>{formatWhen(detail.updatedAt)}</time> · {detail.holeCount} holes · {backLink}
        </p>
      }
    >
      <div className="mb-10">
        <BurnLogSection designId={detail.id} document={detail.document} versions={versions.data?.versions ?? []} lengthUnits={account?.units ?? detail.document.units} />
      </div>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1.4fr)_minmax(0,1fr)]">
        <section aria-labelledby="versions-heading" className="order-2 flex flex-col gap-3 lg:order-1">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h2 id="versions-heading" className="font-semibold">
              Versions
            </h2>
            <Button variant="secondary" onClick={() => void openInDesigner(detail)}>
              Open version {detail.currentVersion} in the designer
            </Button>
          </div>
          {restored && (
            <Notice tone="success">
              <span className="mr-3">
                Version {restored.from} restored as version {restored.detail.currentVersion}.
              </span>
              <button type="button" onClick={() => void openInDesigner(restored.detail)} className="font-medium text-ember-700 underline">
                Open in the designer
              </button>
            </Notice>
          )}
          {problem && <Notice tone="error">{problem}</Notice>}
          {versions.isError && <Notice tone="error">The versions could not be loaded: {versions.error.message}</Notice>}
          {versions.isPending && <p className="text-ink-soft">Loading versions…</p>}
          {versions.data && <VersionList versions={versions.data.versions} currentVersion={detail.currentVersion} busy={restore.isPending} onRestore={(n) => void restoreVersion(n)} />}
        </section>
        <div className="order-1 flex flex-col gap-8 lg:order-2">
          <TagsEditor id={detail.id} tags={detail.tags} />
          <SharePanel design={detail} />
        </div>
      </div>
    </Page>
  );
}
