import { DesignRow } from './design-row.tsx';
import type { DesignTableInstance } from './library-columns.tsx';
import { SortHeader } from './sort-header.tsx';

/** The library as a table; below 1024 px (phones, tablets) the rows become cards and the header gives way to a sort menu. */
export function DesignTable({ table }: { table: DesignTableInstance }) {
  return (
    <table className="block w-full text-left lg:table">
      <caption className="sr-only">Your saved designs</caption>
      <thead className="hidden border-b border-rule text-sm lg:table-header-group">
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((header) => (
              <SortHeader key={header.id} header={header}>
                <table.FlexRender header={header} />
              </SortHeader>
            ))}
          </tr>
        ))}
      </thead>
      <tbody className="block lg:table-row-group">
        {table.getRowModel().rows.map((row) => (
          <DesignRow key={row.id} row={row} />
        ))}
      </tbody>
    </table>
  );
}
