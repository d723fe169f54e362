import { useEffect, useMemo, useState } from 'react';
import { Link } from 'react-router';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useDesigns } from '../api/get-designs.ts';
import { DesignTable } from './design-table.tsx';
import { LibraryFilters } from './library-filters.tsx';
import type { SortState } from './sort-header.tsx';

/** Typing pauses this long before the search is sent (common practice, no source). */
const SEARCH_DELAY_MS = 250;

/** The signed-in maker's saved designs: search, filter by tag, sort, and act on each. */
export function LibraryPage() {
  const [search, setSearch] = useState('');
  const [sentSearch, setSentSearch] = useState('');
  const [tag, setTag] = useState('');
  const [sort, setSort] = useState<SortState>({ sort: 'updated', reversed: false });

  useEffect(() => {
    const timer = setTimeout(() => setSentSearch(search.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [search]);

  const query = useMemo(() => ({ sort: sort.sort, ...(sentSearch ? { q: sentSearch } : {}), ...(tag ? { tag } : {}) }), [sort.sort, sentSearch, tag]);
  const list = useDesigns(query);
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
          <LibraryFilters search={search} onSearch={setSearch} tag={tag} tags={tags} onTag={setTag} sort={sort} onSort={setSort} />
          {list.isError && <Notice tone="error">The library could not be loaded: {list.error.message}</Notice>}
          {list.isPending && <p className="text-ink-soft">Loading…</p>}
          {list.data && list.data.designs.length > 0 && (
            <div className="overflow-x-auto rounded-lg border border-rule bg-white">
              <DesignTable designs={list.data.designs} sort={sort} onSort={setSort} />
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
