import { useFormContext } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { useProblem } from '../design-problems.tsx';
import type { Draft } from '../draft-store.ts';
import { Labelled } from './field.tsx';

const control = 'min-h-10 rounded-md border border-rule bg-white px-3 text-ink aria-[invalid]:border-danger';
const small = 'min-h-10 rounded-md border border-rule bg-white px-3 text-sm disabled:opacity-50';

/** The design's name and units, and undo/redo through the draft's steps. */
export function DesignToolbar({ draft, onUndo, onRedo }: { draft: Draft; onUndo(): void; onRedo(): void }) {
  const { register } = useFormContext<DesignInput>();
  const nameProblem = useProblem('name');
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="w-full min-w-0 sm:w-auto sm:min-w-64 sm:flex-1">
        <Labelled label="Design name" error={nameProblem}>
          {(id, describedBy) => <input id={id} {...register('name')} aria-invalid={nameProblem ? true : undefined} aria-describedby={describedBy} className={`${control} text-base`} />}
        </Labelled>
      </div>
      <Labelled label="Units">
        {(id) => (
          <select id={id} {...register('units')} className={`${control} px-2 text-sm`}>
            <option value="in">Inches</option>
            <option value="mm">Millimetres</option>
          </select>
        )}
      </Labelled>
      <div className="flex gap-1">
        <button type="button" onClick={onUndo} disabled={!draft.working && draft.index === 0} className={small}>
          Undo
        </button>
        <button type="button" onClick={onRedo} disabled={Boolean(draft.working) || draft.index >= draft.history.length - 1} className={small}>
          Redo
        </button>
      </div>
    </div>
  );
}
