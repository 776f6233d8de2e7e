import { useDeferredValue, useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TextField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssemblies } from '../../api/get-assemblies';
import { AssemblyResultCard } from './assembly-result-card';

/** Anything written about the hose: construction, position, equipment, asset number, batch or note. */
export function FindByText() {
  const [typed, setTyped] = useState('');
  const q = useDeferredValue(typed.trim());
  const enabled = q.length >= 2;
  const results = useAssemblies({ q, pageSize: 20 }, { enabled });
  return (
    <div className="flex flex-col gap-4">
      <form role="search" aria-label="Find by text" onSubmit={(event) => event.preventDefault()}>
        <TextField
          label="Search"
          hint="Construction, position, equipment, asset number, batch or note."
          type="search"
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
          autoComplete="off"
          enterKeyHint="search"
          className="min-h-14 text-xl"
        />
      </form>
      {!enabled ? null : results.isPending ? (
        <SkeletonBlock label="Searching…" lines={3} />
      ) : results.isError ? (
        <ErrorState title="The search did not finish" error={results.error} onRetry={() => void results.refetch()} retrying={results.isFetching} />
      ) : results.data.data.length === 0 ? (
        <EmptyState title="Nothing matches">Try fewer letters, the equipment’s asset number, or find it by its place.</EmptyState>
      ) : (
        <>
          <ul className="flex flex-col gap-3" aria-label="Assemblies found">
            {results.data.data.map((a) => (
              <li key={a.id}>
                <AssemblyResultCard assembly={a} />
              </li>
            ))}
          </ul>
          {results.data.pagination.total > results.data.data.length ? (
            <p className="text-ink-700">
              Showing {results.data.data.length} of {results.data.pagination.total}. Add words to narrow it down.
            </p>
          ) : null}
        </>
      )}
    </div>
  );
}
