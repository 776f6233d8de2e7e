import { useState } from 'react';
import { normaliseTag, TAG_DATA_LENGTH } from '@shared/tags/tag-code';
import { formatTagCode } from '@shared/tags/tag-code';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FieldError } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssemblies } from '../../api/get-assemblies';
import { INVALID_TAG_CODE, readTagSearch } from '../tag-search';
import { AssemblyResultCard } from './assembly-result-card';

/** The code on the label, typed however it comes: lower case, without hyphens, with I, L or O for 1, 1, 0. */
export function FindByTag() {
  const [typed, setTyped] = useState('');
  const normal = normaliseTag(typed);
  const search = readTagSearch(typed);
  const complete = normal.length >= TAG_DATA_LENGTH + 1;
  const invalid = complete && search.kind !== 'tag';
  const code = search.kind === 'tag' ? search.code : undefined;
  const found = useAssemblies({ q: code, pageSize: 5 }, { enabled: Boolean(code) });
  const match = code ? found.data?.data.find((a) => a.number === code) : undefined;

  return (
    <div className="flex flex-col gap-4">
      <form role="search" aria-label="Find by tag code" onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-1.5">
        <label htmlFor="tag-code" className="text-lg font-semibold text-ink-900">
          Tag code
        </label>
        <p id="tag-code-hint" className="text-sm text-ink-600">
          Seven symbols from the label, like 3KQ-7VM-X. Hyphens and capitals are optional.
        </p>
        <input
          id="tag-code"
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
          autoComplete="off"
          autoCorrect="off"
          autoCapitalize="characters"
          spellCheck={false}
          enterKeyHint="search"
          aria-invalid={invalid || undefined}
          aria-describedby={invalid ? 'tag-code-hint tag-code-error' : 'tag-code-hint'}
          className="block min-h-16 w-full rounded-[var(--radius-control)] border-2 border-ink-500 bg-white px-4 font-mono text-3xl tracking-widest text-ink-950 uppercase placeholder:text-ink-400 aria-invalid:border-danger-700 aria-invalid:bg-danger-50"
          placeholder="3KQ-7VM-X"
        />
        <FieldError id="tag-code-error" message={invalid ? INVALID_TAG_CODE : undefined} />
      </form>
      {code ? (
        found.isPending ? (
          <SkeletonBlock label="Looking for the assembly…" lines={2} />
        ) : found.isError ? (
          <ErrorState title="The search did not finish" error={found.error} onRetry={() => void found.refetch()} retrying={found.isFetching} />
        ) : match ? (
          <AssemblyResultCard assembly={match} />
        ) : (
          <EmptyState title={`No assembly ${formatTagCode(code)} at your sites`}>
            The code is valid, but no assembly at the sites you can see carries it. It may belong to another site; check with the hose shop.
          </EmptyState>
        )
      ) : null}
    </div>
  );
}
