import { Link } from 'react-router';
import { Page } from '../../../components/page.tsx';
import { currentDocument, useDraft } from '../../designer/draft-store.ts';
import { PrintWorkspace } from './print-workspace.tsx';

/** The print screen for the design being edited (the draft kept in this browser). */
export function PrintPage() {
  const draft = useDraft();
  const design = currentDocument(draft);
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
      <PrintWorkspace design={design} savedId={draft?.savedId} />
    </Page>
  );
}
