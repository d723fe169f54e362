import { useId, useState } from 'react';
import { MAX_TAGS } from '../../../../shared/library/library-schemas.ts';
import { Button } from '../../../components/button.tsx';
import { useUpdateDesign } from '../api/update-design.ts';

/** Adds and removes a design's tags; each change is saved at once (tags are not versioned). */
export function TagsEditor({ id, tags }: { id: string; tags: string[] }) {
  const inputId = useId();
  const update = useUpdateDesign();
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string>();

  async function saveTags(next: string[]) {
    setProblem(undefined);
    try {
      await update.mutateAsync({ id, change: { tags: next } });
      setText('');
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  // The API lower-cases and trims tags; doing it here too keeps "Pint" from looking new.
  const typed = text.trim().toLowerCase();
  const canAdd = typed.length > 0 && !tags.includes(typed) && tags.length < MAX_TAGS;

  return (
    <section aria-labelledby={`${inputId}-heading`} className="flex flex-col gap-2">
      <h2 id={`${inputId}-heading`} className="font-semibold">
        Tags
      </h2>
      {tags.length > 0 ? (
        <ul className="flex flex-wrap gap-2">
          {tags.map((tag) => (
            <li key={tag} className="inline-flex items-center gap-1 rounded-full border border-rule bg-white py-0.5 pl-3 pr-1 text-sm">
              {tag}
              <button type="button" disabled={update.isPending} onClick={() => void saveTags(tags.filter((t) => t !== tag))} aria-label={`Remove tag ${tag}`} className="inline-flex h-7 w-7 items-center justify-center rounded-full hover:bg-ember-50">
                <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-soft">No tags yet. Tags help you find designs later, e.g. “pint” or “build night”.</p>
      )}
      <form
        className="flex flex-wrap items-end gap-2"
        onSubmit={(event) => {
          event.preventDefault();
          if (canAdd) void saveTags([...tags, typed]);
        }}
      >
        <label htmlFor={inputId} className="sr-only">
          New tag
        </label>
        <input id={inputId} value={text} onChange={(e) => setText(e.target.value)} maxLength={40} placeholder="New tag" className="min-h-10 min-w-0 flex-1 rounded-md border border-rule bg-white px-3 text-sm sm:max-w-56" />
        <Button type="submit" variant="secondary" disabled={!canAdd || update.isPending}>
          Add tag
        </Button>
      </form>
      {problem && (
        <p role="alert" className="text-sm text-danger">
          {problem}
        </p>
      )}
    </section>
  );
}
