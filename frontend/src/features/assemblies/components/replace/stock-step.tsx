import { useDeferredValue, useId, useState } from 'react';
import type { AssemblyDto, AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth';
import { cn } from '@/lib/cn';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TextField } from '@/components/ui/field';
import { PlusIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssemblies } from '../../api/get-assemblies';
import { useAssembly } from '../../api/get-assembly';
import { usePosition } from '../../api/get-position';
import { INVALID_TAG_CODE, readTagSearch } from '../tag-search';

interface StockStepProps {
  old: AssemblyDto;
  chosenId: string | null;
  onChoose: (id: string) => void;
  onNext: () => void;
  /** The address of this step, for coming back after building a new assembly. */
  returnTo: string;
}

/** Step 2: an assembly in stock at the site, found by tag code or construction, or a link to build one. */
export function StockStep({ old, chosenId, onChoose, onNext, returnTo }: StockStepProps) {
  const me = useCurrentUser();
  const [typed, setTyped] = useState('');
  const [sameSize, setSameSize] = useState(true);
  const search = readTagSearch(useDeferredValue(typed));
  const position = usePosition(old.position?.id);
  const sizeCode = position.data?.sizeCode ?? old.construction.sizeCode;
  const q = search.kind === 'tag' ? search.code : search.kind === 'text' ? search.text : undefined;
  const stock = useAssemblies(
    { siteId: old.siteId, status: ['in_stock'], q, sizeCode: sameSize && search.kind !== 'tag' ? sizeCode : undefined, pageSize: 25 },
    { enabled: search.kind !== 'invalid-tag' },
  );
  const chosen = useAssembly(chosenId ?? '');
  const rows = (stock.data?.data ?? []).filter((a) => a.id !== old.id && (search.kind !== 'tag' || a.number === search.code));
  const groupId = useId();

  return (
    <div className="flex flex-col gap-4">
      <p className="text-ink-800">
        In stock at <span className="font-semibold">{old.siteName}</span>, to go into{' '}
        <span className="font-mono font-semibold">{old.position?.code ?? 'the position'}</span>.
      </p>
      <TextField
        label="Search by tag code or construction"
        type="search"
        value={typed}
        onChange={(event) => setTyped(event.target.value)}
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        className="min-h-14 font-mono text-xl"
        placeholder="3KQ-7VM-X"
        error={search.kind === 'invalid-tag' ? INVALID_TAG_CODE : undefined}
      />
      {search.kind !== 'tag' ? (
        <Checkbox label={`Only ${sizeLabel(sizeCode, me.preferences.lengthUnit)}, the position’s size`} checked={sameSize} onChange={(event) => setSameSize(event.target.checked)} />
      ) : null}

      {search.kind === 'invalid-tag' ? null : stock.isPending ? (
        <SkeletonBlock label="Loading the stock…" lines={3} />
      ) : stock.isError ? (
        <ErrorState title="The stock could not be loaded" error={stock.error} onRetry={() => void stock.refetch()} retrying={stock.isFetching} />
      ) : rows.length === 0 ? (
        <EmptyState title={search.kind === 'tag' ? `No assembly ${formatTagCode(search.code)} in stock here` : 'Nothing in stock matches'}>
          {search.kind === 'tag'
            ? 'It may be at another site, not proof-tested yet, or already installed. Check the tag, or build a new one.'
            : 'Build a new assembly for this position, or clear the search.'}
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-2" aria-label="Assemblies in stock">
          {rows.map((a) => (
            <StockTile key={a.id} assembly={a} groupId={groupId} checked={chosenId === a.id} onChoose={() => onChoose(a.id)} lengthUnit={me.preferences.lengthUnit} />
          ))}
        </ul>
      )}

      {chosenId && chosen.data && !rows.some((r) => r.id === chosenId) ? (
        <Alert tone="info" title={`Chosen: ${formatTagCode(chosen.data.assembly.number)}`}>
          {chosen.data.assembly.construction.code} {chosen.data.assembly.construction.name}
        </Alert>
      ) : null}

      <div className="flex flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
        <ButtonLink to={paths.assemblies.create.getHref({ siteId: old.siteId, constructionId: old.construction.id, next: returnTo })} size="lg" icon={<PlusIcon />}>
          Build a new one
        </ButtonLink>
        <Button size="lg" disabled={!chosenId} onClick={onNext}>
          Next: the cautions
        </Button>
      </div>
    </div>
  );
}

function StockTile({ assembly, groupId, checked, onChoose, lengthUnit }: { assembly: AssemblyListItemDto; groupId: string; checked: boolean; onChoose: () => void; lengthUnit: 'mm' | 'in' }) {
  const id = `${groupId}-${assembly.id}`;
  return (
    <li
      className={cn(
        'relative flex min-h-18 items-center gap-4 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3 hover:border-ink-600',
        'has-[:checked]:border-copper-700 has-[:checked]:bg-copper-50 has-[:checked]:ring-2 has-[:checked]:ring-copper-700',
      )}
    >
      <input id={id} type="radio" name={groupId} checked={checked} onChange={onChoose} className="relative z-10 size-7 shrink-0 accent-copper-700" />
      <label htmlFor={id} className="flex flex-col after:absolute after:inset-0 after:content-['']">
        <span className="font-mono text-xl font-bold tracking-wider text-ink-950">{formatTagCode(assembly.number)}</span>
        <span className="text-ink-800">
          <span className="font-mono font-semibold">{assembly.construction.code}</span> {assembly.construction.name}
        </span>
        <span className="text-sm text-ink-600">{sizeLabel(assembly.construction.sizeCode, lengthUnit)}</span>
      </label>
    </li>
  );
}
