import { useEffect, useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { Design, DesignInput } from '../../../shared/design/design-schema.ts';
import { describeFieldProblem } from '../../../shared/design/describe-problem.ts';
import { validateDesign, type DesignProblem } from '../../../shared/design/validate-design.ts';
import { layoutDesign, type Layout } from '../../../shared/layout/index.ts';
import { currentDocument, draftStore, shownDocument, type Draft } from './draft-store.ts';

/** Typing is one undo step: values are kept this long after the last keystroke (common practice, no source). */
const SETTLE_MS = 300;

export interface GoodLayout {
  design: Design;
  layout: Layout;
}

export interface DesignFormState {
  form: ReturnType<typeof useForm<DesignInput>>;
  values: DesignInput;
  /** Problems of the values on screen; empty when they validate. */
  problems: DesignProblem[];
  /** Each field path's problem in words. */
  fieldProblems: ReadonlyMap<string, string>;
  /** The latest values that validated, laid out: shown (marked stale) while a value is being fixed. */
  good: GoodLayout | undefined;
  stale: boolean;
  /** Keeps what is on screen in the draft now, not after the pause (before leaving for the print screen). */
  flush(): void;
}

function layOut(document: DesignInput | undefined): GoodLayout | undefined {
  const valid = document && validateDesign(document);
  return valid && valid.ok ? { design: valid.design, layout: layoutDesign(valid.design) } : undefined;
}

/**
 * The design form over the draft: values are validated once per change (the same validation the
 * server and the kit use), laid out when they validate, and kept in the draft after a pause,
 * as an undo step when valid and as work in progress when not. A replaced draft (open, undo,
 * bring back) reloads the form.
 */
export function useDesignForm(draft: Draft): DesignFormState {
  const form = useForm<DesignInput>({ defaultValues: shownDocument(draft) });
  const values = useWatch({ control: form.control }) as DesignInput;
  const validation = useMemo(() => validateDesign(values), [values]);
  const units = values.units ?? 'in';
  const fieldProblems = useMemo(() => {
    const map = new Map<string, string>();
    if (!validation.ok) for (const p of validation.problems) if (!map.has(p.path)) map.set(p.path, describeFieldProblem(p, units));
    return map;
  }, [validation, units]);

  const [good, setGood] = useState<GoodLayout | undefined>(() => layOut(shownDocument(draft)) ?? layOut(currentDocument(draft)));
  const [goodFor, setGoodFor] = useState<unknown>(validation);
  if (validation !== goodFor) {
    // Adjusting state to a new validation while rendering (React's documented pattern), so the
    // preview and checks follow the same render as the form.
    setGoodFor(validation);
    if (validation.ok) setGood({ design: validation.design, layout: layoutDesign(validation.design) });
  }

  const pending = useRef<{ timer: ReturnType<typeof setTimeout>; key: number | undefined; save(): void } | null>(null);
  const flush = () => {
    if (!pending.current) return;
    clearTimeout(pending.current.timer);
    const { key, save } = pending.current;
    pending.current = null;
    if (draftStore.get()?.key === key) save();
  };
  useEffect(() => {
    if (pending.current) clearTimeout(pending.current.timer);
    const snapshot = structuredClone(values);
    const save = validation.ok ? () => draftStore.record(snapshot) : () => draftStore.keepWorking(snapshot);
    pending.current = { timer: setTimeout(flush, SETTLE_MS), key: draftStore.get()?.key, save };
  }, [values, validation]);
  useEffect(() => flush, []); // keep the last keystrokes when the page closes

  // A replaced draft reloads the form; pending keystrokes belonged to the old one.
  const shownKey = useRef(draft.key);
  useEffect(() => {
    if (draft.key === shownKey.current) return;
    if (pending.current) clearTimeout(pending.current.timer);
    pending.current = null;
    shownKey.current = draft.key;
    form.reset(shownDocument(draft));
  }, [draft, form]);

  const problems = validation.ok ? [] : validation.problems;
  return { form, values, problems, fieldProblems, good, stale: !validation.ok, flush };
}
