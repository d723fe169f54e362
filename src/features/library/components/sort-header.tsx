import type { DesignSort } from '../../../../shared/library/library-schemas.ts';

export interface SortState {
  sort: DesignSort;
  /** Against the API's own direction: names A to Z, times newest first. */
  reversed: boolean;
}

/** The API's direction for each sort key. */
const natural: Record<DesignSort, 'ascending' | 'descending'> = { name: 'ascending', updated: 'descending', lastPrinted: 'descending' };

export function sortDirection(state: SortState): 'ascending' | 'descending' {
  const flip = { ascending: 'descending', descending: 'ascending' } as const;
  return state.reversed ? flip[natural[state.sort]] : natural[state.sort];
}

/** Clicking the sorted column again turns its order round; another column starts in its own order. */
export function nextSort(state: SortState, sort: DesignSort): SortState {
  return state.sort === sort ? { sort, reversed: !state.reversed } : { sort, reversed: false };
}

interface SortHeaderProps {
  label: string;
  sortKey: DesignSort;
  state: SortState;
  onSort(next: SortState): void;
}

/** A column header that sorts the table, announcing its order through aria-sort. */
export function SortHeader({ label, sortKey, state, onSort }: SortHeaderProps) {
  const active = state.sort === sortKey;
  const direction = sortDirection(state);
  return (
    <th scope="col" aria-sort={active ? direction : 'none'} className="px-3 py-2 text-left font-medium">
      <button type="button" onClick={() => onSort(nextSort(state, sortKey))} className="inline-flex items-center gap-1 whitespace-nowrap rounded px-1 py-0.5 hover:bg-ember-50">
        {label}
        <span aria-hidden="true" className={active ? 'text-ember-700' : 'text-ink-soft/40'}>
          {active && direction === 'ascending' ? '▲' : '▼'}
        </span>
      </button>
    </th>
  );
}
