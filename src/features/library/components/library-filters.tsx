import type { SortState } from './sort-header.tsx';

interface LibraryFiltersProps {
  search: string;
  onSearch(text: string): void;
  tag: string;
  tags: string[];
  onTag(tag: string): void;
  sort: SortState;
  onSort(next: SortState): void;
}

const sortChoices: { value: string; label: string; state: SortState }[] = [
  { value: 'updated', label: 'Recently updated', state: { sort: 'updated', reversed: false } },
  { value: 'updated-old', label: 'Least recently updated', state: { sort: 'updated', reversed: true } },
  { value: 'name', label: 'Name, A to Z', state: { sort: 'name', reversed: false } },
  { value: 'name-z', label: 'Name, Z to A', state: { sort: 'name', reversed: true } },
  { value: 'lastPrinted', label: 'Recently printed', state: { sort: 'lastPrinted', reversed: false } },
  { value: 'lastPrinted-old', label: 'Never or long ago printed', state: { sort: 'lastPrinted', reversed: true } },
];

const valueOf = (state: SortState) => sortChoices.find((c) => c.state.sort === state.sort && c.state.reversed === state.reversed)?.value ?? 'updated';
const control = 'min-h-10 rounded-md border border-rule bg-white px-3 text-sm text-ink';

/** Search, tag filter and (on a phone, where the sortable header is hidden) a sort menu. */
export function LibraryFilters({ search, onSearch, tag, tags, onTag, sort, onSort }: LibraryFiltersProps) {
  return (
    <div className="mb-4 flex flex-wrap items-end gap-3">
      <label className="flex w-full min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft sm:w-auto sm:min-w-64 sm:flex-1">
        Search names and tags
        <input type="search" value={search} onChange={(e) => onSearch(e.target.value)} maxLength={100} className={control} />
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
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft sm:hidden">
        Sort
        <select value={valueOf(sort)} onChange={(e) => onSort(sortChoices.find((c) => c.value === e.target.value)?.state ?? sort)} className={control}>
          {sortChoices.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
