import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { describeProblem } from '../../../../shared/design/describe-problem.ts';
import { validateDesign } from '../../../../shared/design/validate-design.ts';
import { currentDocument, useDraft } from '../../designer/draft-store.ts';
import { designQueryOptions } from '../../library/api/get-design.ts';
import { PrintWorkspace } from './print-workspace.tsx';

/** The print screen for the design being edited (the draft kept in this browser). */
export function PrintPage() {
  const draft = useDraft();
  const design = currentDocument(draft);
  const version = useVersionLabel(draft?.savedId, design);
  const working = draft?.working;
  const problems = working ? validateDesign(working) : undefined;
  if (working && problems && !problems.ok) {
    // A kit is printed from values that all check out, never from the last good step behind the maker's back.
    return (
      <Page title="Print the kit" width="wide" intro={<span className="font-medium text-ink">{working.name || 'Untitled design'}</span>}>
        <div role="alert" className="rounded-md border border-danger/40 bg-danger/5 p-4 text-sm">
          <p className="font-medium">This design has values to fix before it can print:</p>
          <ul className="mt-1 list-disc pl-5">
            {problems.problems.slice(0, 8).map((p) => (
              <li key={p.path}>{describeProblem(working, p)}</li>
            ))}
          </ul>
          <p className="mt-2">The kit would not match what is on the design screen, so nothing prints until they are fixed.</p>
        </div>
        <p className="mt-4">
          <Link to="/design" className="text-ember-700 underline">
            Back to the design to fix them
          </Link>
        </p>
      </Page>
    );
  }
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
