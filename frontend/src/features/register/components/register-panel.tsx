import { useCallback, useMemo, type ReactNode } from 'react';
import type { Preferences } from '@shared/schemas/auth.schema';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { countOf } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SelectField } from '@/components/ui/field';
import { Skeleton } from '@/components/ui/skeleton';
import { Spinner } from '@/components/ui/spinner';
import { useRegister } from '../api/get-register';
import { useRegisterCounts } from '../api/get-register-counts';
import { countFilters, FILTER_KEYS, useRegisterSearch, type RegisterFilters as Filters } from '../hooks/use-register-search';
import { ColumnChooser } from './column-chooser';
import { RegisterCards } from './register-cards';
import { RegisterFilters, type RenderPlaceFilters } from './register-filters';
import { RegisterTable, useRegisterTable } from './register-table';

const PAGE_SIZES = [25, 50, 100, 200];

interface RegisterPanelProps {
  units: Preferences;
  reference: ReferenceDto | undefined;
  referenceFailed?: boolean;
  renderPlaceFilters: RenderPlaceFilters;
  /** Shown when the register holds nothing yet, for those who may build assemblies. */
  emptyAction?: ReactNode;
  /** More tools for the current view, at the end of the toolbar. */
  toolbarActions?: ReactNode;
}

/** The register: search and filters, what the view holds, the table (cards on a phone) and its pages. */
export function RegisterPanel({ units, reference, referenceFailed, renderPlaceFilters, emptyAction, toolbarActions }: RegisterPanelProps) {
  const { query, columns, setQuery, setColumns, clearFilters } = useRegisterSearch();
  const register = useRegister(query);
  const filters = useMemo(() => Object.fromEntries(FILTER_KEYS.map((k) => [k, query[k]])) as Filters, [query]);
  const counts = useRegisterCounts(filters);
  const total = register.data?.pagination.total ?? 0;
  const services = reference?.services;
  const serviceName = useCallback((code: string) => services?.find((s) => s.code === code)?.name ?? code, [services]);
  const table = useRegisterTable({
    rows: register.data?.data ?? [],
    total,
    query,
    columns,
    lengthUnit: units.lengthUnit,
    serviceName,
    onQueryChange: setQuery,
  });
  const filtered = countFilters(query) > 0;

  let body: ReactNode;
  if (register.isPending) {
    body = <RegisterSkeleton />;
  } else if (register.isError) {
    body = <ErrorState title="The register could not be loaded" error={register.error} onRetry={() => void register.refetch()} retrying={register.isFetching} />;
  } else if (register.data.data.length === 0) {
    body =
      total > 0 ? (
        <EmptyState title="No assemblies on this page" action={<Button variant="secondary" onClick={() => setQuery({ page: 1 })}>Go to the first page</Button>}>
          The view holds fewer assemblies than this page number reaches.
        </EmptyState>
      ) : filtered ? (
        <EmptyState title="No assemblies match" action={<Button variant="secondary" onClick={clearFilters}>Clear search and filters</Button>}>
          Nothing in the register matches this search and these filters.
        </EmptyState>
      ) : (
        <EmptyState title="The register is empty" action={emptyAction}>
          Once assemblies are built and installed at their positions, each one shows here with its checks and its next inspection.
        </EmptyState>
      );
  } else {
    const first = (query.page - 1) * query.pageSize + 1;
    body = (
      <div className="flex flex-col gap-4">
        <RegisterTable table={table} busy={register.isPlaceholderData} />
        <RegisterCards table={table} busy={register.isPlaceholderData} lengthUnit={units.lengthUnit} />
        <nav aria-label="Pages of the register" className="flex flex-col gap-3 border-t border-ink-200 pt-4 sm:flex-row sm:flex-wrap sm:items-end sm:justify-between">
          <p className="text-ink-700">
            Showing {first.toLocaleString()}–{(first + register.data.data.length - 1).toLocaleString()} of {total.toLocaleString()}
            {table.getPageCount() > 1 ? ` · page ${query.page.toLocaleString()} of ${table.getPageCount().toLocaleString()}` : null}
          </p>
          <div className="flex flex-wrap items-end gap-3">
            <SelectField
              label="Rows per page"
              containerClassName="w-40"
              options={PAGE_SIZES.map((n) => ({ value: String(n), label: String(n) }))}
              value={String(query.pageSize)}
              onChange={(event) => setQuery({ pageSize: Number(event.target.value) })}
            />
            {table.getPageCount() > 1 ? (
              <div className="flex gap-2">
                <Button variant="secondary" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
                  Previous page
                </Button>
                <Button variant="secondary" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
                  Next page
                </Button>
              </div>
            ) : null}
          </div>
        </nav>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <RegisterFilters query={query} onChange={setQuery} onClear={clearFilters} reference={reference} referenceFailed={referenceFailed} lengthUnit={units.lengthUnit} renderPlaceFilters={renderPlaceFilters} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div className="flex min-h-11 flex-wrap items-center gap-x-4 gap-y-2" aria-live="polite">
          {register.data ? (
            <p className="text-xl font-bold text-ink-950">
              {countOf(total, 'assembly', 'assemblies')}
              {filtered ? <span className="font-normal text-ink-700"> in this view</span> : null}
            </p>
          ) : null}
          {register.data && counts.isError ? (
            <span className="flex flex-wrap items-center gap-2 text-ink-700">
              The counts of fails and overdue inspections could not be loaded.
              <Button variant="ghost" onClick={() => void counts.refetch()}>
                Try again
              </Button>
            </span>
          ) : null}
          {register.data && counts.data && total > 0 ? (
            <ViewCounts
              fail={counts.data.fail}
              overdue={counts.data.overdue}
              onFail={query.checkOutcome === 'fail' ? undefined : () => setQuery({ checkOutcome: 'fail' })}
              onOverdue={query.due === 'overdue' ? undefined : () => setQuery({ due: 'overdue' })}
            />
          ) : null}
          {register.isFetching && !register.isPending ? <Spinner label="Updating…" className="text-sm text-ink-700" /> : null}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <ColumnChooser columns={columns} onChange={setColumns} />
          {toolbarActions}
        </div>
      </div>
      {body}
    </div>
  );
}

/** How many of the view fail their checks or are overdue; each narrows the view to them when pressed. */
function ViewCounts({ fail, overdue, onFail, onOverdue }: { fail: number; overdue: number; onFail?: () => void; onOverdue?: () => void }) {
  const chip = 'inline-flex min-h-11 items-center gap-1.5 rounded-full border-2 px-3 font-semibold';
  const item = (count: number, label: string, onPress: (() => void) | undefined, tone: string) => {
    const content = (
      <>
        <span className="text-lg font-bold">{count.toLocaleString()}</span> {label}
      </>
    );
    if (!onPress || count === 0) return <span className={`${chip} border-transparent ${count ? tone : 'text-ink-700'}`}>{content}</span>;
    return (
      <button type="button" className={`${chip} ${tone} hover:bg-ink-50`} onClick={onPress} title={`Show only these ${count.toLocaleString()}`}>
        {content}
      </button>
    );
  };
  return (
    <p className="flex flex-wrap items-center gap-2">
      {item(fail, 'with failed checks', onFail, 'border-danger-700/50 text-danger-800')}
      {item(overdue, 'overdue', onOverdue, 'border-danger-700/50 text-danger-800')}
    </p>
  );
}

function RegisterSkeleton() {
  return (
    <div role="status" className="flex flex-col gap-3 rounded-[var(--radius-card)] border border-ink-200 bg-white p-4">
      <span className="sr-only">Loading the register…</span>
      {Array.from({ length: 8 }, (_, i) => (
        <div key={i} className="grid grid-cols-2 gap-4 md:grid-cols-6">
          <Skeleton className="h-7" />
          <Skeleton className="h-7" />
          <Skeleton className="hidden h-7 md:block" />
          <Skeleton className="hidden h-7 md:block" />
          <Skeleton className="hidden h-7 md:block" />
          <Skeleton className="hidden h-7 md:block" />
        </div>
      ))}
    </div>
  );
}
