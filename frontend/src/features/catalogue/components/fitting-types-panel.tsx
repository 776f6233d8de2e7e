import type { ReactNode } from 'react';
import { countOf } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Spinner } from '@/components/ui/spinner';
import { useFittingTypes } from '../api/get-fitting-types';
import { useFittingTypesSearch } from '../hooks/use-fitting-types-search';
import { FittingTypesFilters } from './fitting-types-filters';
import { FittingTypesTable, useFittingTypesTable } from './fitting-types-table';
import { ListPager } from './list-pager';
import { ListSkeleton } from './list-skeleton';

/** Search, filters, the count, the table (cards on a phone) and paging of the plant's end fitting types. */
export function FittingTypesPanel({ createAction }: { createAction?: ReactNode }) {
  const { query, setQuery, clearFilters, filtered } = useFittingTypesSearch();
  const fittings = useFittingTypes(query);
  const total = fittings.data?.pagination.total ?? 0;
  const table = useFittingTypesTable({ fittingTypes: fittings.data?.data ?? [], total, query, onQueryChange: setQuery });

  let body: ReactNode;
  if (fittings.isPending) {
    body = <ListSkeleton label="Loading fitting types…" />;
  } else if (fittings.isError) {
    body = <ErrorState title="Fitting types could not be loaded" error={fittings.error} onRetry={() => void fittings.refetch()} retrying={fittings.isFetching} />;
  } else if (fittings.data.data.length === 0) {
    body =
      total > 0 ? (
        <EmptyState title="No fitting types on this page" action={<Button variant="secondary" onClick={() => setQuery({ page: 1 })}>Go to the first page</Button>}>
          The list is shorter than this page number.
        </EmptyState>
      ) : filtered ? (
        <EmptyState title="No fitting types match" action={<Button variant="secondary" onClick={clearFilters}>Clear search and filters</Button>}>
          No fitting type matches this search and these filters.
        </EmptyState>
      ) : (
        <EmptyState title="No fitting types yet" action={createAction}>
          A fitting type is an end fitting your hose shop fits: its style, material and the sizes it comes in, each with its rating.
        </EmptyState>
      );
  } else {
    body = (
      <div className="flex flex-col gap-4">
        <FittingTypesTable table={table} busy={fittings.isPlaceholderData} />
        <ListPager
          noun="fitting types"
          page={query.page}
          pageCount={table.getPageCount()}
          canPrevious={table.getCanPreviousPage()}
          canNext={table.getCanNextPage()}
          onPrevious={() => table.previousPage()}
          onNext={() => table.nextPage()}
          first={(query.page - 1) * query.pageSize + 1}
          last={(query.page - 1) * query.pageSize + fittings.data.data.length}
          total={total}
        />
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <FittingTypesFilters query={query} onChange={setQuery} />
      <div className="flex min-h-8 items-center gap-3">
        {fittings.data ? (
          <p className="text-lg font-semibold text-ink-950" aria-live="polite">
            {countOf(total, 'fitting type')}
            {filtered ? <span className="font-normal text-ink-700"> match</span> : null}
          </p>
        ) : null}
        {fittings.isFetching && !fittings.isPending ? <Spinner label="Updating…" className="text-sm text-ink-700" /> : null}
      </div>
      {body}
    </div>
  );
}
