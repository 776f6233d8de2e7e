import type { ReactNode } from 'react';
import { countOf } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { Spinner } from '@/components/ui/spinner';
import { useUsers } from '../api/get-users';
import { hasUserFilters, useUsersSearch } from '../hooks/use-users-search';
import { UsersFilters } from './users-filters';
import { UsersTable, useUsersTable } from './users-table';

/** Search, filters, the count, the table (cards on a phone) and paging of user administration. */
export function UsersPanel({ inviteAction }: { inviteAction?: ReactNode }) {
  const { query, setQuery, clearFilters } = useUsersSearch();
  const users = useUsers(query);
  const total = users.data?.pagination.total ?? 0;
  const table = useUsersTable({ users: users.data?.data ?? [], total, query, onQueryChange: setQuery });
  const filtered = hasUserFilters(query);

  let body: ReactNode;
  if (users.isPending) {
    body = <UsersSkeleton />;
  } else if (users.isError) {
    body = <ErrorState title="Users could not be loaded" error={users.error} onRetry={() => void users.refetch()} retrying={users.isFetching} />;
  } else if (users.data.data.length === 0) {
    body =
      total > 0 ? (
        <EmptyState title="No users on this page" action={<Button variant="secondary" onClick={() => setQuery({ page: 1 })}>Go to the first page</Button>}>
          The list is shorter than this page number.
        </EmptyState>
      ) : filtered ? (
        <EmptyState title="No users match" action={<Button variant="secondary" onClick={clearFilters}>Clear search and filters</Button>}>
          No user matches this search and these filters.
        </EmptyState>
      ) : (
        <EmptyState title="No users yet" action={inviteAction}>
          Invite the people who inspect, analyse and audit your plant's hoses.
        </EmptyState>
      );
  } else {
    body = (
      <div className="flex flex-col gap-4">
        <UsersTable table={table} busy={users.isPlaceholderData} />
        <Pagination
          page={query.page}
          pageCount={table.getPageCount()}
          canPrevious={table.getCanPreviousPage()}
          canNext={table.getCanNextPage()}
          onPrevious={() => table.previousPage()}
          onNext={() => table.nextPage()}
          first={(query.page - 1) * query.pageSize + 1}
          last={(query.page - 1) * query.pageSize + users.data.data.length}
          total={total}
        />
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <UsersFilters query={query} onChange={setQuery} />
      <div className="flex min-h-8 items-center gap-3">
        {users.data ? (
          <p className="text-lg font-semibold text-ink-950" aria-live="polite">
            {countOf(total, 'user')}
            {filtered ? <span className="font-normal text-ink-700"> match</span> : null}
          </p>
        ) : null}
        {users.isFetching && !users.isPending ? <Spinner label="Updating…" className="text-sm text-ink-700" /> : null}
      </div>
      {body}
    </div>
  );
}

function UsersSkeleton() {
  return (
    <div role="status" className="flex flex-col gap-3 rounded-[var(--radius-card)] border border-ink-200 bg-white p-4">
      <span className="sr-only">Loading users…</span>
      {Array.from({ length: 6 }, (_, i) => (
        <div key={i} className="grid grid-cols-2 gap-4 md:grid-cols-5">
          <Skeleton className="h-6" />
          <Skeleton className="h-6" />
          <Skeleton className="hidden h-6 md:block" />
          <Skeleton className="hidden h-6 md:block" />
          <Skeleton className="hidden h-6 md:block" />
        </div>
      ))}
    </div>
  );
}

interface PaginationProps {
  page: number;
  pageCount: number;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  first: number;
  last: number;
  total: number;
}

function Pagination({ page, pageCount, canPrevious, canNext, onPrevious, onNext, first, last, total }: PaginationProps) {
  if (pageCount <= 1) return null;
  return (
    <nav aria-label="Pages of users" className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-ink-700">
        Showing {first.toLocaleString()}–{last.toLocaleString()} of {total.toLocaleString()} · page {page} of {pageCount}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={onPrevious} disabled={!canPrevious}>
          Previous page
        </Button>
        <Button variant="secondary" onClick={onNext} disabled={!canNext}>
          Next page
        </Button>
      </div>
    </nav>
  );
}
