import { useEffect, useState } from 'react';
import { FormProvider, useFieldArray } from 'react-hook-form';
import { blankDesign } from '../../../../shared/design/new-design.ts';
import type { Design, DesignInput } from '../../../../shared/design/design-schema.ts';
import { describeProblem } from '../../../../shared/design/describe-problem.ts';
import type { Finding } from '../../../../shared/layout/index.ts';
import { Page } from '../../../components/page.tsx';
import { tabPanelProps, useTabPanel } from '../../../components/tabs.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { SaveBar } from '../../library/components/save-bar.tsx';
import { ProblemsContext } from '../design-problems.tsx';
import { draftStore, useAsideDrafts, useDraft, type Draft } from '../draft-store.ts';
import { examples } from '../examples.ts';
import { openDesign } from '../open-design.ts';
import { useDesignForm } from '../use-design-form.ts';
import { AsideNotice } from './aside-notice.tsx';
import { DesignFiles } from './design-files.tsx';
import { DesignSettings } from './design-settings.tsx';
import { DesignToolbar } from './design-toolbar.tsx';
import { PartEditor } from './part-editor.tsx';
import { PartTabs } from './part-tabs.tsx';
import { PreviewPanel, type DesignView } from './preview-panel.tsx';
import { focusField, ProblemsNotice } from './problems-notice.tsx';
import { ResultsPanel } from './results-panel.tsx';

/** The design screen: a draft is always open (the first example for a first visit). */
export function DesignerPage() {
  const draft = useDraft();
  const { data: account } = useAccount();
  useEffect(() => {
    if (draft) return;
    const first = examples[0]!.document;
    openDesign(account ? { ...first, units: account.units } : first, { accountId: account?.id, reason: 'opened the design screen' });
  }, [draft, account]);
  if (!draft) return <p className="p-8 text-ink-soft">Loading…</p>;
  return <DesignerScreen draft={draft} />;
}

/** Edit on the left; on the right the preview, the checks, the air and the way to print. */
function DesignerScreen({ draft }: { draft: Draft }) {
  const { data: account } = useAccount();
  const aside = useAsideDrafts();
  const state = useDesignForm(draft);
  const { form, values, good, problems } = state;
  const parts = useFieldArray({ control: form.control, name: 'parts' });
  const units = values.units ?? 'in';
  const [partIndex, setPartIndex] = useState(0);
  const [view, setView] = useState<DesignView>('wall');
  const [finding, setFinding] = useState<Finding>();
  const partPanel = useTabPanel();
  const shownPart = Math.min(partIndex, Math.max(0, parts.fields.length - 1));
  const staleText = problems[0] && describeProblem(values, problems[0]);
  const inUnits = (document: DesignInput): DesignInput => (account ? { ...document, units: account.units } : document);
  const open = (document: DesignInput, reason: string) => {
    state.flush();
    openDesign(document, { accountId: account?.id, reason });
    setPartIndex(0);
    setFinding(undefined);
  };
  const replaceWith = (next: Design) => form.reset(next as DesignInput, { keepDefaultValues: true });

  function goToProblem(path: string) {
    const keys = path.split('.');
    if (keys[0] === 'parts' && keys[1] !== undefined) setPartIndex(Number(keys[1]));
    // After the part's fields are on screen.
    requestAnimationFrame(() => focusField(path));
  }

  /** Choosing a finding shows the part and view its holes are on, so the highlight is in sight. */
  function selectFinding(next: Finding | undefined) {
    setFinding(next);
    const layout = good?.layout;
    const hole = next && layout?.holes.find((h) => h.id === next.holeIds[0]);
    const onPiece = hole && layout?.pieces.find((p) => p.id === hole.pieceId);
    // A finding across parts is seen best in the section, where its parts are drawn heavier.
    if (next?.partIds?.length && !onPiece) {
      setView('assembled');
      return;
    }
    if (!onPiece) return;
    const index = (values.parts ?? []).findIndex((p) => p.id === onPiece.partId);
    if (index >= 0) setPartIndex(index);
    if (view !== 'assembled') setView(onPiece.kind === 'disc' ? 'bottom' : 'wall');
  }

  function toggleSkip(rowIndex: number, position: number) {
    const path = `parts.${shownPart}.sideRows.${rowIndex}.skip` as const;
    const skip = form.getValues(path) ?? [];
    form.setValue(path, skip.includes(position) ? skip.filter((s) => s !== position) : [...skip, position].sort((a, b) => a - b), { shouldDirty: true });
  }

  return (
    <Page title="Design a stove" width="wide">
      <FormProvider {...form}>
        <ProblemsContext.Provider value={state.fieldProblems}>
          <div className="designer-screen flex flex-col gap-4">
            <DesignToolbar draft={draft} onUndo={() => (state.flush(), draftStore.undo())} onRedo={() => (state.flush(), draftStore.redo())} />
            <DesignFiles document={values} stale={state.stale} onNew={() => open(blankDesign(account?.units ?? units), 'started a new design')} onOpen={open} onExample={(document) => open(inUnits(document), `opened the example “${document.name}”`)} />
            <SaveBar document={values} valid={!state.stale} />
            <AsideNotice aside={aside} accountId={account?.id ?? null} onBringBack={(at) => (state.flush(), draftStore.bringBack(at))} onLetGo={draftStore.letGo} />
            <ProblemsNotice problems={problems} values={values} onGo={goToProblem} />
            <div className="flex flex-col gap-6 lg:grid lg:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)]">
              <div className="@container flex min-w-0 flex-col gap-3">
                <PartTabs fields={parts.fields} values={values} selected={shownPart} onSelect={setPartIndex} panelId={partPanel} onAdd={(part) => (parts.append(part), setPartIndex(parts.fields.length))} />
                <div {...tabPanelProps(partPanel, parts.fields[shownPart]?.id ?? '')}>
                  {parts.fields[shownPart] && (
                    <PartEditor
                      key={parts.fields[shownPart].id}
                      partIndex={shownPart}
                      partCount={parts.fields.length}
                      units={units}
                      onMove={(to) => (parts.move(shownPart, to), setPartIndex(to))}
                      onRemove={() => (parts.remove(shownPart), setPartIndex(Math.max(0, shownPart - 1)))}
                    />
                  )}
                </div>
                <DesignSettings units={units} />
              </div>
              {/* Phone: the preview alone sticks above the form. Desktop: the whole column (preview,
                  checks, air, print) stays in view, scrolling on its own when taller than the window. */}
              <div className="contents lg:sticky lg:top-2 lg:flex lg:max-h-[calc(100dvh-1rem)] lg:min-w-0 lg:flex-col lg:gap-5 lg:self-start lg:overflow-y-auto lg:pb-2">
                {good && (
                  <PreviewPanel
                    className="sticky top-0 z-10 order-first -mx-4 border-b border-rule px-4 pb-2 pt-1 shadow-sm lg:static lg:order-none lg:mx-0 lg:border-0 lg:px-0 lg:pt-0 lg:shadow-none"
                    design={good.design}
                    layout={good.layout}
                    units={units}
                    partIndex={shownPart}
                    view={view}
                    onView={setView}
                    finding={finding}
                    stale={staleText}
                    onSeamChange={(deg) => form.setValue(`parts.${shownPart}.vessel.seamAngleDeg`, deg, { shouldDirty: true })}
                    onToggleSkip={toggleSkip}
                  />
                )}
                {good ? (
                  <ResultsPanel good={good} units={units} stale={staleText} finding={finding} onSelectFinding={selectFinding} onApply={replaceWith} onLeave={state.flush} />
                ) : (
                  <p className="text-sm text-ink-soft">The preview, checks and air figures appear once the values marked on the left check out.</p>
                )}
              </div>
            </div>
            <p className="text-sm text-ink-soft">Your design is kept in this browser as you work; the save bar above keeps it in your library.</p>
          </div>
        </ProblemsContext.Provider>
      </FormProvider>
    </Page>
  );
}
