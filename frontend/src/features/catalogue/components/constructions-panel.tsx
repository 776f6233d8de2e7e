import type { ReactNode } from 'react';
import { countOf } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Spinner } from '@/components/ui/spinner';
import { useConstructions } from '../api/get-constructions';
import { useConstructionsSearch } from '../hooks/use-constructions-search';
import { ConstructionsFilters } from './constructions-filters';
import { ConstructionsTable, useConstructionsTable } from './constructions-table';
import { ListPager } from './list-pager';
import { ListSkeleton } from './list-skeleton';

/** Search, filters, the count, the table (cards on a phone) and paging of the plant's hose constructions. */
export function ConstructionsPanel({ createAction }: { createAction?: ReactNode }) {
  const { query, setQuery, clearFilters, filtered } = useConstructionsSearch();
  const constructions = useConstructions(query);
  const total = constructions.data?.pagination.total ?? 0;
  const table = useConstructionsTable({ constructions: constructions.data?.data ?? [], total, query, onQueryChange: setQuery });

  let body: ReactNode;
  if (constructions.isPending) {
    body = <ListSkeleton label="Loading constructions…" />;
  } else if (constructions.isError) {
    body = (
      <ErrorState
        title="Constructions could not be loaded"
        error={constructions.error}
        onRetry={() => void constructions.refetch()}
        retrying={constructions.isFetching}
      />
    );
  } else if (constructions.data.data.length === 0) {
    body =
      total > 0 ? (
        <EmptyState title="No constructions on this page" action={<Button variant="secondary" onClick={() => setQuery({ page: 1 })}>Go to the first page</Button>}>
          The list is shorter than this page number.
        </EmptyState>
      ) : filtered ? (
        <EmptyState title="No constructions match" action={<Button variant="secondary" onClick={clearFilters}>Clear search and filters</Button>}>
          No construction matches this search and these filters.
        </EmptyState>
      ) : (
        <EmptyState title="No constructions yet" action={createAction}>
          A construction is a hose build your plant buys: tube, reinforcement, bore and ratings, under your own code. Add the first
          one to start building assemblies from it.
        </EmptyState>
      );
  } else {
    body = (
      <div className="flex flex-col gap-4">
        <ConstructionsTable table={table} busy={constructions.isPlaceholderData} />
        <ListPager
          noun="constructions"
          page={query.page}
          pageCount={table.getPageCount()}
          canPrevious={table.getCanPreviousPage()}
          canNext={table.getCanNextPage()}
          onPrevious={() => table.previousPage()}
          onNext={() => table.nextPage()}
          first={(query.page - 1) * query.pageSize + 1}
          last={(query.page - 1) * query.pageSize + constructions.data.data.length}
          total={total}
        />
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <ConstructionsFilters query={query} onChange={setQuery} />
      <div className="flex min-h-8 items-center gap-3">
        {constructions.data ? (
          <p className="text-lg font-semibold text-ink-950" aria-live="polite">
            {countOf(total, 'construction')}
            {filtered ? <span className="font-normal text-ink-700"> match</span> : null}
          </p>
        ) : null}
        {constructions.isFetching && !constructions.isPending ? <Spinner label="Updating…" className="text-sm text-ink-700" /> : null}
      </div>
      {body}
    </div>
  );
}
