import { useId, useState } from 'react';
import { MAX_TAGS } from '../../../../shared/library/library-schemas.ts';
import { Button } from '../../../components/button.tsx';
import { useUpdateDesign } from '../api/update-design.ts';
import { checkNewTag, normalizeTag } from '../field-limits.ts';

/**
 * Adds and removes a design's tags; each change is saved at once (tags are not versioned). A tag
 * that cannot be added says why beside the field and stays as typed.
 */
export function TagsEditor({ id, tags }: { id: string; tags: string[] }) {
  const inputId = useId();
  const update = useUpdateDesign();
  const [text, setText] = useState('');
  const [tried, setTried] = useState(false);
  const [problem, setProblem] = useState<string>();

  async function saveTags(next: string[]) {
    setProblem(undefined);
    try {
      await update.mutateAsync({ id, change: { tags: next } });
      setText('');
      setTried(false);
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  // Said as soon as it is true (a repeat, too long, no room left); "type a tag" only after a try.
  const fieldError = text.trim() || tried ? checkNewTag(text, tags) : undefined;
  const full = tags.length >= MAX_TAGS;

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
        noValidate
        className="flex flex-col gap-1"
        onSubmit={(event) => {
          event.preventDefault();
          setTried(true);
          if (!checkNewTag(text, tags)) void saveTags([...tags, normalizeTag(text)]);
        }}
      >
        <label htmlFor={inputId} className="text-xs font-medium text-ink-soft">
          New tag {full ? `(${MAX_TAGS} of ${MAX_TAGS} used)` : ''}
        </label>
        <div className="flex flex-wrap items-start gap-2">
          <input
            id={inputId}
            value={text}
            onChange={(e) => setText(e.target.value)}
            aria-invalid={fieldError ? true : undefined}
            aria-describedby={fieldError ? `${inputId}-error` : undefined}
            className="min-h-10 min-w-0 flex-1 rounded-md border border-rule bg-white px-3 text-sm aria-[invalid]:border-danger sm:max-w-56"
          />
          <Button type="submit" variant="secondary" disabled={update.isPending}>
            Add tag
          </Button>
        </div>
        {fieldError && (
          <p id={`${inputId}-error`} className="text-sm text-danger">
            {fieldError}
          </p>
        )}
      </form>
      {problem && (
        <p role="alert" className="text-sm text-danger">
          The tags could not be saved: {problem}
        </p>
      )}
    </section>
  );
}
