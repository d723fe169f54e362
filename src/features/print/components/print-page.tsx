import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { currentDocument, useDraft } from '../../designer/draft-store.ts';
import { designQueryOptions } from '../../library/api/get-design.ts';
import { PrintWorkspace } from './print-workspace.tsx';

/** The print screen for the design being edited (the draft kept in this browser). */
export function PrintPage() {
  const draft = useDraft();
  const design = currentDocument(draft);
  const version = useVersionLabel(draft?.savedId, design);
  if (!design) {
    return (
      <Page title="Print the kit">
        <p>There is no design to print yet.</p>
        <p className="mt-4">
          <Link to="/design" className="text-ember-700 underline">
            Start a design
          </Link>
        </p>
      </Page>
    );
  }
  return (
    <Page
      title="Print the kit"
      width="wide"
      intro={
        <>
          <span className="font-medium text-ink">{design.name}</span>.{' '}
          <Link to="/design" className="text-ember-700 underline">
            Back to the design
          </Link>
        </>
      }
    >
      <PrintWorkspace design={design} savedId={draft?.savedId} version={version} checksLink="/design" />
    </Page>
  );
}

/**
 * What the title block calls this kit: the library version when the draft is that version
 * unchanged, "N, changed" when edited since, and "draft" for a design never saved.
 */
function useVersionLabel(savedId: string | undefined, design: DesignInput | undefined): string {
  const { data: account } = useAccount();
  const saved = useQuery({ ...designQueryOptions(savedId ?? ''), enabled: Boolean(savedId && account) });
  if (!saved.data || !design) return 'draft';
  const same = JSON.stringify(saved.data.document) === JSON.stringify(design);
  return same ? String(saved.data.currentVersion) : `${saved.data.currentVersion}, changed`;
}
