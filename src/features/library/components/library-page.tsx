import { useTable, type SortingState } from '@tanstack/react-table';
import { useEffect, useMemo, useState } from 'react';
import { Link } from 'react-router';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useDesigns } from '../api/get-designs.ts';
import { DesignTable } from './design-table.tsx';
import { defaultDesignSorting, designTableOptions } from './library-columns.tsx';
import { checkLibrarySearch } from '../field-limits.ts';
import { LibraryFilters } from './library-filters.tsx';

/** Typing pauses this long before the search is sent (common practice, no source). */
const SEARCH_DELAY_MS = 250;

/** One stable empty list while loading, so the table's row models are not rebuilt every render. */
const noDesigns: DesignListItem[] = [];

/** The signed-in maker's saved designs: search, filter by tag, sort, and act on each. */
export function LibraryPage() {
  const [search, setSearch] = useState('');
  const [sentSearch, setSentSearch] = useState('');
  const [tag, setTag] = useState('');
  const [sorting, setSorting] = useState<SortingState>(defaultDesignSorting);

  useEffect(() => {
    // A search longer than the server takes is not sent; its field says so and the list stays.
    if (checkLibrarySearch(search)) return;
    const timer = setTimeout(() => setSentSearch(search.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [search]);

  // The server filters; the table sorts what came back. A personal library is small enough to sort
  // here, and the server's own "updated" order (ties by id) settles any ties the columns leave.
  const query = useMemo(() => ({ sort: 'updated' as const, ...(sentSearch ? { q: sentSearch } : {}), ...(tag ? { tag } : {}) }), [sentSearch, tag]);
  const list = useDesigns(query);
  const table = useTable({ ...designTableOptions, data: list.data?.designs ?? noDesigns, state: { sorting }, onSortingChange: setSorting });
  // Every tag the maker uses, from the unfiltered list (the same request as the first page view).
  const everything = useDesigns({ sort: 'updated' });
  const tags = useMemo(() => [...new Set(everything.data?.designs.flatMap((d) => d.tags) ?? [])].sort(), [everything.data]);
  const filtered = Boolean(sentSearch || tag);
  const total = everything.data?.designs.length;

  return (
    <Page title="Your library" width="wide" intro="Designs you saved, with every version. Open one to keep working on it.">
      {total === 0 ? (
        <Notice>
          Nothing saved yet.{' '}
          <Link to="/design" className="text-ember-700 underline">
            Design a stove
          </Link>{' '}
          and choose “Save to library”.
        </Notice>
      ) : (
        <>
          <LibraryFilters search={search} onSearch={setSearch} tag={tag} tags={tags} onTag={setTag} sorting={sorting} onSorting={setSorting} />
          {list.isError && <Notice tone="error">The library could not be loaded: {list.error.message}</Notice>}
          {list.isPending && <p className="text-ink-soft">Loading…</p>}
          {list.data && list.data.designs.length > 0 && (
            // relative: the headers' screen-reader-only labels are positioned absolutely, and would
            // otherwise widen the page past a narrow table's scroll box.
            <div className="relative overflow-x-auto rounded-lg border border-rule bg-white">
              <DesignTable table={table} />
            </div>
          )}
          {list.data?.designs.length === 0 && filtered && <Notice>No design matches that search.</Notice>}
          {list.data && (
            <p role="status" className="mt-2 text-sm text-ink-soft">
              {list.data.designs.length} {list.data.designs.length === 1 ? 'design' : 'designs'}
              {filtered && total !== undefined ? ` of ${total}` : ''}
            </p>
          )}
        </>
      )}
    </Page>
  );
}
