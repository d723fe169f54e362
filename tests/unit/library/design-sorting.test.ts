import { constructTable, type SortingState } from '@tanstack/react-table';
import { storeReactivityBindings } from '@tanstack/table-core/store-reactivity-bindings';
import { describe, expect, it } from 'vitest';
import type { DesignListItem } from '../../../shared/library/library-schemas.ts';
import { defaultDesignSorting, designTableOptions } from '../../../src/features/library/components/library-columns.tsx';

/** A library row with only the fields sorting reads set apart. */
function design(id: string, name: string, updatedAt: string, lastPrintedAt: string | null, currentVersion: number): DesignListItem {
  return { id, name, tags: [], updatedAt, lastPrintedAt, currentVersion, shared: false, holeCount: 0, parts: 1 };
}

// Given in the server's own order (updated, newest first), as GET /api/designs?sort=updated returns them.
const designs = [
  design('b', 'Birch', '2026-03-04T10:00:00.000Z', null, 2),
  design('c', 'cedar', '2026-03-03T10:00:00.000Z', '2026-03-01T09:00:00.000Z', 10),
  design('a', 'alder', '2026-03-02T10:00:00.000Z', '2026-03-02T09:00:00.000Z', 1),
  design('d', 'Damson', '2026-03-01T10:00:00.000Z', null, 3),
];

/** The library's table outside React (the page holds sorting in React state; here the table holds it). */
function makeTable(initial: SortingState = defaultDesignSorting) {
  const table = constructTable({
    ...designTableOptions,
    // useTable adds React's reactivity the same way, out of sight of the feature types.
    features: { ...designTableOptions.features, coreReactivityFeature: storeReactivityBindings() } as typeof designTableOptions.features,
    data: designs,
    initialState: { sorting: initial },
  });
  const ids = () => table.getRowModel().rows.map((row) => row.id).join('');
  // What a header button does: toggle its column's sorting, as one click.
  const click = (columnId: string) => table.getColumn(columnId)?.getToggleSortingHandler()?.({});
  return { table, ids, click, sorting: () => table.atoms.sorting.get() };
}

describe('library table sorting', () => {
  it('opens on Updated, newest first', () => {
    // Worked arithmetic: 4 Mar > 3 Mar > 2 Mar > 1 Mar.
    expect(makeTable().ids()).toBe('bcad');
  });

  it('sorts names A to Z on the first click, ignoring case, then Z to A', () => {
    const t = makeTable();
    t.click('name');
    // Case-insensitive: alder, Birch, cedar, Damson. By code point "B" and "D" (66, 68) would come before "a" (97): ASCII / Unicode Basic Latin.
    expect(t.ids()).toBe('abcd');
    t.click('name');
    expect(t.ids()).toBe('dcba');
  });

  it('sorts Last printed newest first, with Never last both ways round', () => {
    const t = makeTable();
    t.click('lastPrinted');
    expect(t.sorting()).toEqual([{ id: 'lastPrinted', desc: true }]);
    // Worked arithmetic: alder printed 2 Mar, cedar 1 Mar; Birch and Damson never, left in updated order.
    expect(t.ids()).toBe('acbd');
    t.click('lastPrinted');
    expect(t.ids()).toBe('cabd');
  });

  it('sorts Version as numbers, highest first on the first click', () => {
    const t = makeTable();
    t.click('version');
    // Worked arithmetic: 10 > 3 > 2 > 1 (as text "10" would sort before "2").
    expect(t.ids()).toBe('cdba');
    t.click('version');
    expect(t.ids()).toBe('abdc');
  });

  it('never drops the sort: Updated turns round and back, and stays one column', () => {
    const t = makeTable();
    t.click('updated');
    expect(t.sorting()).toEqual([{ id: 'updated', desc: false }]);
    expect(t.ids()).toBe('dacb');
    t.click('updated');
    expect(t.sorting()).toEqual([{ id: 'updated', desc: true }]);
    t.table.getColumn('name')?.getToggleSortingHandler()?.({ shiftKey: true }); // a multi-sort click
    expect(t.sorting()).toEqual([{ id: 'name', desc: false }]);
  });

  it('offers no sorting on Tags, sharing or actions', () => {
    const { table } = makeTable();
    const sortable = table.getAllLeafColumns().filter((column) => column.getCanSort()).map((column) => column.id);
    expect(sortable).toEqual(['name', 'updated', 'lastPrinted', 'version']);
  });
});
