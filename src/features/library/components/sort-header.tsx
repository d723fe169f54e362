import type { Header } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import type { designTableFeatures } from './library-columns.tsx';

const ariaSort = { asc: 'ascending', desc: 'descending' } as const;

interface SortHeaderProps {
  header: Header<typeof designTableFeatures, DesignListItem, unknown>;
  children: ReactNode;
}

/**
 * A column header. A sortable one is a button announcing its order through aria-sort; unsorted, its
 * faint arrow shows which way the first click will sort.
 */
export function SortHeader({ header, children }: SortHeaderProps) {
  const { column } = header;
  if (!column.getCanSort()) {
    return (
      <th scope="col" className="px-3 py-2 font-medium lg:px-2">
        {children}
      </th>
    );
  }
  const sorted = column.getIsSorted();
  const arrow = (sorted || column.getFirstSortDir()) === 'asc' ? '▲' : '▼';
  return (
    <th scope="col" aria-sort={sorted ? ariaSort[sorted] : 'none'} className="px-3 py-2 text-left font-medium lg:px-2">
      <button type="button" onClick={column.getToggleSortingHandler()} className="inline-flex items-center gap-1 whitespace-nowrap rounded px-1 py-0.5 hover:bg-ember-50">
        {children}
        <span aria-hidden="true" className={sorted ? 'text-ember-700' : 'text-ink-soft/40'}>
          {arrow}
        </span>
      </button>
    </th>
  );
}
