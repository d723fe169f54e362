import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { DesignRow } from './design-row.tsx';
import { SortHeader, type SortState } from './sort-header.tsx';

interface DesignTableProps {
  designs: DesignListItem[];
  sort: SortState;
  onSort(next: SortState): void;
}

/** The library as a table; on a phone the rows become cards and the header gives way to a sort menu. */
export function DesignTable({ designs, sort, onSort }: DesignTableProps) {
  const ordered = sort.reversed ? [...designs].reverse() : designs;
  return (
    <table className="block w-full text-left sm:table">
      <caption className="sr-only">Your saved designs</caption>
      <thead className="hidden border-b border-rule text-sm sm:table-header-group">
        <tr>
          <SortHeader label="Name" sortKey="name" state={sort} onSort={onSort} />
          <th scope="col" className="px-3 py-2 font-medium">
            Tags
          </th>
          <SortHeader label="Updated" sortKey="updated" state={sort} onSort={onSort} />
          <SortHeader label="Last printed" sortKey="lastPrinted" state={sort} onSort={onSort} />
          <th scope="col" className="px-3 py-2 font-medium">
            Version
          </th>
          <th scope="col" className="px-3 py-2 font-medium">
            <span className="sr-only">Sharing</span>
          </th>
          <th scope="col" className="px-3 py-2 font-medium">
            <span className="sr-only">Actions</span>
          </th>
        </tr>
      </thead>
      <tbody className="block sm:table-row-group">
        {ordered.map((design) => (
          <DesignRow key={design.id} design={design} />
        ))}
      </tbody>
    </table>
  );
}
