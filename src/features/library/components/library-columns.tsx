import {
  createColumnHelper,
  createSortedRowModel,
  metaHelper,
  rowSortingFeature,
  sortFn_basic,
  sortFn_datetime,
  sortFn_text,
  tableFeatures,
  tableOptions,
  type ReactTable,
  type SortingState,
} from '@tanstack/react-table';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { formatWhen } from '../format-when.ts';
import { ActionsCell, NameCell } from './design-cells.tsx';
import { TagChips } from './tag-chips.tsx';

/** How a column's cells look: on a phone each cell is a line of a card, headed by phoneLabel. */
export interface DesignColumnLook {
  phoneLabel?: string;
  cellClass?: string;
  /** An empty cell takes no line on a phone card. */
  emptyOnPhone?: (design: DesignListItem) => boolean;
}

/** Client-side sorting of the loaded list, with only the comparators the columns name. */
export const designTableFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { text: sortFn_text, datetime: sortFn_datetime, basic: sortFn_basic },
  columnMeta: metaHelper<DesignColumnLook>(),
});

export type DesignTableInstance = ReactTable<typeof designTableFeatures, DesignListItem>;

/** The sortable columns' ids, which the phone sort menu names too. */
export type DesignSortColumn = 'name' | 'updated' | 'lastPrinted' | 'version';

/** Recently updated first, as the library has always opened. */
export const defaultDesignSorting: SortingState = [{ id: 'updated' satisfies DesignSortColumn, desc: true }];

const helper = createColumnHelper<typeof designTableFeatures, DesignListItem>();
const timeCell = 'whitespace-nowrap text-sm';
const srOnly = (text: string) => () => <span className="sr-only">{text}</span>;

export const designColumns = helper.columns([
  // sortFn_text lower-cases both names first, so "alder" and "Birch" sort A to Z.
  helper.accessor('name', { id: 'name' satisfies DesignSortColumn, header: 'Name', sortFn: 'text', sortDescFirst: false, cell: NameCell, meta: { cellClass: 'lg:min-w-52' } }),
  helper.accessor('tags', {
    header: 'Tags',
    enableSorting: false,
    cell: (info) => <TagChips tags={info.getValue()} />,
    meta: { phoneLabel: 'Tags' },
  }),
  helper.accessor((design) => new Date(design.updatedAt), {
    id: 'updated' satisfies DesignSortColumn,
    header: 'Updated',
    sortFn: 'datetime',
    sortDescFirst: true,
    cell: (info) => <time dateTime={info.row.original.updatedAt}>{formatWhen(info.row.original.updatedAt)}</time>,
    meta: { phoneLabel: 'Updated', cellClass: timeCell },
  }),
  // Never printed is undefined, which sortUndefined keeps below every printed design both ways round.
  helper.accessor((design) => (design.lastPrintedAt === null ? undefined : new Date(design.lastPrintedAt)), {
    id: 'lastPrinted' satisfies DesignSortColumn,
    header: 'Last printed',
    sortFn: 'datetime',
    sortDescFirst: true,
    sortUndefined: 'last',
    cell: ({ row: { original } }) =>
      original.lastPrintedAt ? <time dateTime={original.lastPrintedAt}>{formatWhen(original.lastPrintedAt)}</time> : <span className="text-ink-soft">Never</span>,
    meta: { phoneLabel: 'Last printed', cellClass: timeCell },
  }),
  helper.accessor('currentVersion', {
    id: 'version' satisfies DesignSortColumn,
    header: 'Version',
    sortFn: 'basic',
    sortDescFirst: true,
    cell: (info) => info.getValue(),
    meta: { phoneLabel: 'Version', cellClass: 'text-sm' },
  }),
  helper.display({
    id: 'sharing',
    header: srOnly('Sharing'),
    cell: ({ row: { original } }) => (original.shared ? <span className="rounded-full bg-ok/10 px-2 py-0.5 text-xs font-medium text-ok">Shared</span> : null),
    meta: { emptyOnPhone: (design) => !design.shared },
  }),
  helper.display({ id: 'actions', header: srOnly('Actions'), cell: ActionsCell, meta: { cellClass: 'pt-2' } }),
]);

/** Everything about the table but its data and sorting state, which the page owns. */
export const designTableOptions = tableOptions<typeof designTableFeatures, DesignListItem>({
  features: designTableFeatures,
  columns: designColumns,
  // Rows keep their design's id, so a row being renamed stays that row when the order changes.
  getRowId: (design) => design.id,
  // There is always an order; one at a time, since the phone menu can only show one.
  enableSortingRemoval: false,
  enableMultiSort: false,
});
