import type { SortingState } from '@tanstack/react-table';
import { useId } from 'react';
import { checkLibrarySearch } from '../field-limits.ts';
import type { DesignSortColumn } from './library-columns.tsx';

interface LibraryFiltersProps {
  search: string;
  onSearch(text: string): void;
  tag: string;
  tags: string[];
  onTag(tag: string): void;
  sorting: SortingState;
  onSorting(next: SortingState): void;
}

/** Every order the column headers can give, one line each; never-printed designs stay last both ways. */
const sortChoices: { label: string; id: DesignSortColumn; desc: boolean }[] = [
  { label: 'Recently updated', id: 'updated', desc: true },
  { label: 'Least recently updated', id: 'updated', desc: false },
  { label: 'Name, A to Z', id: 'name', desc: false },
  { label: 'Name, Z to A', id: 'name', desc: true },
  { label: 'Recently printed', id: 'lastPrinted', desc: true },
  { label: 'Least recently printed', id: 'lastPrinted', desc: false },
  { label: 'Highest version first', id: 'version', desc: true },
  { label: 'Lowest version first', id: 'version', desc: false },
];

const valueOf = (sort: { id: string; desc: boolean }) => `${sort.id}-${sort.desc ? 'desc' : 'asc'}`;
const control = 'min-h-10 rounded-md border border-rule bg-white px-3 text-sm text-ink';

/** Search, tag filter and (on a phone, where the sortable header is hidden) a sort menu sharing the table's sorting. */
export function LibraryFilters({ search, onSearch, tag, tags, onTag, sorting, onSorting }: LibraryFiltersProps) {
  const current = sorting[0];
  const errorId = useId();
  const searchError = checkLibrarySearch(search);
  return (
    <div className="mb-4 flex flex-wrap items-end gap-3">
      <label className="flex w-full min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft sm:w-auto sm:min-w-64 sm:flex-1">
        Search names and tags
        <input
          type="search"
          value={search}
          onChange={(e) => onSearch(e.target.value)}
          aria-invalid={searchError ? true : undefined}
          aria-describedby={searchError ? errorId : undefined}
          className={`${control} aria-[invalid]:border-danger`}
        />
        {searchError && (
          <span id={errorId} className="text-sm font-normal text-danger">
            {searchError} The list shows the last search that fitted.
          </span>
        )}
      </label>
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        Tag
        <select value={tag} onChange={(e) => onTag(e.target.value)} className={control}>
          <option value="">All tags</option>
          {tags.map((t) => (
            <option key={t} value={t}>
              {t}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft lg:hidden">
        Sort
        <select
          value={current ? valueOf(current) : ''}
          onChange={(e) => {
            const choice = sortChoices.find((c) => valueOf(c) === e.target.value);
            if (choice) onSorting([{ id: choice.id, desc: choice.desc }]);
          }}
          className={control}
        >
          {sortChoices.map((c) => (
            <option key={valueOf(c)} value={valueOf(c)}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
