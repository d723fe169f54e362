import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useRef, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { Link } from 'react-router';
import { designSchema, type Design, type DesignInput } from '../../../../shared/design/design-schema.ts';
import { layoutDocument, type Finding, type Layout } from '../../../../shared/layout/index.ts';
import { Page } from '../../../components/page.tsx';
import { safetyLine } from '../../../components/safety-note.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { SaveBar } from '../../library/components/save-bar.tsx';
import { LayoutPreview } from '../../preview/components/layout-preview.tsx';
import { describeProblem } from '../describe-problem.ts';
import { currentDocument, draftStore, useDraft, useReplacedDraft } from '../draft-store.ts';
import { examples } from '../examples.ts';
import { ExamplePicker } from './example-picker.tsx';
import { AirflowPanel } from './airflow-panel.tsx';
import { FindingsList } from './findings-list.tsx';
import { PartEditor } from './part-editor.tsx';

type View = 'wall' | 'bottom' | 'assembled';

/** The design screen: edit on the left, see the layout, the checks, the air and the print on the right. */
export function DesignerPage() {
  const draft = useDraft();
  const putAside = currentDocument(useReplacedDraft());
  const { data: account } = useAccount();
  // A signed-in maker's new designs and examples open in the units of their settings.
  const inPreferredUnits = (document: DesignInput): DesignInput => (account ? { ...document, units: account.units } : document);
  const start = currentDocument(draft) ?? inPreferredUnits(examples[0]!.document);
  useEffect(() => {
    if (!draftStore.get()) draftStore.start(start);
  }, [start]);

  const form = useForm<DesignInput, unknown, Design>({ resolver: zodResolver(designSchema), mode: 'onChange', defaultValues: start });
  const values = useWatch({ control: form.control }) as DesignInput;
  const result = useMemo(() => layoutDocument(values), [values]);
  const units = values.units ?? 'in';
  const [partIndex, setPartIndex] = useState(0);
  const [view, setView] = useState<View>('wall');
  const [finding, setFinding] = useState<Finding>();

  // Every valid change becomes an undo step (debounced so typing is one step).
  const timer = useRef<ReturnType<typeof setTimeout>>(undefined);
  useEffect(() => {
    clearTimeout(timer.current);
    if (result.ok) timer.current = setTimeout(() => draftStore.record(structuredClone(values)), 300);
    return () => clearTimeout(timer.current);
  }, [values, result.ok]);

  const restore = (move: () => void) => {
    move();
    const doc = currentDocument(draftStore.get());
    if (doc) form.reset(doc);
  };
  const replace = (next: Design) => {
    form.reset(next as DesignInput);
    draftStore.record(next as DesignInput);
  };

  const parts = values.parts ?? [];
  const part = parts[Math.min(partIndex, parts.length - 1)];
  // While a value is being fixed, the preview and checks keep the last layout that worked.
  const [lastGood, setLastGood] = useState<Layout>();
  if (result.ok && result.layout !== lastGood) setLastGood(result.layout);
  const layout = result.ok ? result.layout : lastGood;
  // The chosen finding as it stands after the latest edit (gone when the edit fixed it).
  const activeFinding = finding && layout?.findings.find((f) => f.rule === finding.rule && f.message === finding.message);
  const pieces = layout?.pieces.filter((p) => p.partId === part?.id) ?? [];
  // A part without a piece of this view's kind (a shell has no bottom disc) says so, rather than showing another part.
  const piece = view === 'assembled' ? pieces[0] : pieces.find((p) => (view === 'bottom' ? p.kind === 'disc' : p.kind === 'wrap-strip'));

  /** Choosing a finding shows the part and view its holes are on, so the highlight is in sight. */
  function selectFinding(next: Finding | undefined) {
    setFinding(next);
    const hole = next && layout?.holes.find((h) => h.id === next.holeIds[0]);
    const onPiece = hole && layout?.pieces.find((p) => p.id === hole.pieceId);
    if (!onPiece) return;
    const index = parts.findIndex((p) => p.id === onPiece.partId);
    if (index >= 0) setPartIndex(index);
    if (view !== 'assembled') setView(onPiece.kind === 'disc' ? 'bottom' : 'wall');
  }

  return (
    <Page title="Design a stove" width="wide">
      <FormProvider {...form}>
        <div className="mb-4 flex flex-wrap items-end gap-3">
          <label className="flex w-full min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft sm:w-auto sm:min-w-64 sm:flex-1">
            Design name
            <input {...form.register('name')} className="min-h-10 rounded-md border border-rule bg-white px-3 text-base text-ink" />
          </label>
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Units
            <select {...form.register('units')} className="min-h-10 rounded-md border border-rule bg-white px-2 text-sm text-ink">
              <option value="in">Inches</option>
              <option value="mm">Millimetres</option>
            </select>
          </label>
          <div className="flex gap-1">
            <button type="button" onClick={() => restore(draftStore.undo)} disabled={!draft || draft.index === 0} className="min-h-10 rounded-md border border-rule bg-white px-3 text-sm disabled:opacity-50">
              Undo
            </button>
            <button type="button" onClick={() => restore(draftStore.redo)} disabled={!draft || draft.index >= draft.history.length - 1} className="min-h-10 rounded-md border border-rule bg-white px-3 text-sm disabled:opacity-50">
              Redo
            </button>
          </div>
          <SaveBar document={values} />
          <ExamplePicker onLoad={(document) => replace(designSchema.parse(inPreferredUnits(document)))} />
        </div>

        {putAside && (
          <div role="status" className="mb-4 flex flex-wrap items-center gap-3 rounded-md border border-ember-600/30 bg-ember-50 px-3 py-2 text-sm">
            <span>
              Your earlier work, “{putAside.name}”, was put aside when you opened this design.
            </span>
            <button type="button" onClick={() => restore(draftStore.bringBack)} className="min-h-9 rounded-md border border-rule bg-white px-3 font-medium">
              Bring it back
            </button>
            <button type="button" onClick={draftStore.forgetReplaced} className="min-h-9 rounded-md px-2 text-ink-soft underline">
              Let it go
            </button>
          </div>
        )}
        {!result.ok && (
          <div role="alert" className="mb-4 rounded-md border border-danger/40 bg-danger/5 p-3 text-sm">
            <p className="font-medium">Some values need fixing; until then the preview and checks show the last layout that worked:</p>
            <ul className="mt-1 list-disc pl-5">
              {result.problems.slice(0, 8).map((p) => (
                <li key={p.path}>{describeProblem(values, p.path, p.message)}</li>
              ))}
            </ul>
          </div>
        )}
        <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)]">
          <div className="@container flex min-w-0 flex-col gap-3">
            <div role="tablist" aria-label="Parts" className="flex flex-wrap gap-1">
              {parts.map((p, i) => (
                <button key={p.id} role="tab" type="button" aria-selected={i === partIndex} onClick={() => setPartIndex(i)} className={`rounded-md px-3 py-2 text-sm ${i === partIndex ? 'bg-ember-600 text-white' : 'border border-rule bg-white'}`}>
                  {p.name ?? p.id}
                </button>
              ))}
            </div>
            {part && <PartEditor key={`${partIndex}-${part.id}`} partIndex={Math.min(partIndex, parts.length - 1)} units={units} />}
          </div>

          <div className="flex min-w-0 flex-col gap-5">
            <section aria-label="Preview" className="flex flex-col gap-2">
              <div role="tablist" aria-label="Preview view" className="flex gap-1">
                {(['wall', 'bottom', 'assembled'] as View[]).map((v) => (
                  <button key={v} role="tab" type="button" aria-selected={view === v} onClick={() => setView(v)} className={`rounded-md px-3 py-1.5 text-sm ${view === v ? 'bg-ink text-white' : 'border border-rule bg-white'}`}>
                    {v === 'wall' ? 'Wall strip' : v === 'bottom' ? 'Bottom disc' : 'Assembled'}
                  </button>
                ))}
              </div>
              <div className="h-80 overflow-hidden rounded-lg border border-rule bg-white sm:h-96">
                {layout && piece ? (
                  <LayoutPreview layout={layout} units={units} view={view} pieceId={piece.id} highlight={activeFinding ? new Set(activeFinding.holeIds) : undefined} />
                ) : (
                  <p className="p-4 text-sm text-ink-soft">
                    {!layout ? 'The preview comes back when the values marked on the left are fixed.' : `${part?.name ?? 'This part'} has no ${view === 'bottom' ? 'holes in its bottom' : 'holes in its wall'}.`}
                  </p>
                )}
              </div>
            </section>
            {layout && (
              <>
                <section aria-labelledby="findings-heading" className="flex flex-col gap-2">
                  <h2 id="findings-heading" className="font-semibold">
                    Checks
                  </h2>
                  <FindingsList findings={layout.findings} holeCount={layout.holes.length} selected={activeFinding} onSelect={selectFinding} />
                </section>
                {result.ok && <AirflowPanel design={designSchema.parse(values)} layout={layout} units={units} onTargetChange={(ratio) => form.setValue('airflow.targetRatio', ratio)} onApply={replace} />}
                {result.ok && <section aria-labelledby="print-heading" className="flex flex-col gap-2">
                  <h2 id="print-heading" className="font-semibold">
                    Print the kit
                  </h2>
                  <p className="text-sm text-ink-soft">Choose paper and printer, look over every sheet and the build sheet, then download the PDF kit, an SVG per sheet or the hole table.</p>
                  <div>
                    {/* The draft records edits after a pause; the print screen must see the latest. */}
                    <Link to="/design/print" onClick={() => result.ok && draftStore.record(structuredClone(values))} className="inline-flex min-h-10 items-center rounded-md bg-ember-600 px-4 py-2 text-sm font-medium text-white hover:bg-ember-700">
                      Print the kit
                    </Link>
                  </div>
                  <p className="rounded-md border border-ember-600/30 bg-ember-50 px-3 py-2 text-sm">{safetyLine}</p>
                </section>}
              </>
            )}
            <p className="text-sm text-ink-soft">Your design is kept in this browser as you work; the save bar above keeps it in your library.</p>
          </div>
        </div>
      </FormProvider>
    </Page>
  );
}
