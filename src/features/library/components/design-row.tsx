import { FlexRender, type Row } from '@tanstack/react-table';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { DesignRowContext, useDesignRowActions } from './design-row-actions.ts';
import type { designTableFeatures } from './library-columns.tsx';

/** On a phone each cell is a line of a card, headed by this label. */
const cellLabel = 'mr-2 text-xs font-medium text-ink-soft lg:hidden';
const cell = 'block px-3 py-1 lg:table-cell lg:py-3 lg:align-top lg:px-2';
const emptyCell = 'hidden px-3 lg:table-cell lg:py-3 lg:px-2';

/** One design in the library table; its cells, drawn from the column definitions, share its state. */
export function DesignRow({ row }: { row: Row<typeof designTableFeatures, DesignListItem> }) {
  const actions = useDesignRowActions(row.original);
  return (
    <DesignRowContext value={actions}>
      <tr className="block border-b border-rule py-2 last:border-b-0 lg:table-row lg:py-0">
        {row.getAllCells().map((item) => {
          const look = item.column.columnDef.meta;
          const empty = look?.emptyOnPhone?.(row.original) ?? false;
          return (
            <td key={item.id} className={empty ? emptyCell : `${cell} ${look?.cellClass ?? ''}`}>
              {look?.phoneLabel && <span className={cellLabel}>{look.phoneLabel}</span>}
              <FlexRender cell={item} />
            </td>
          );
        })}
      </tr>
    </DesignRowContext>
  );
}
