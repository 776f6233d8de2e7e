import { useSearchParams } from 'react-router-dom';
import { useCurrentUser } from '@/lib/auth';
import { cn } from '@/lib/cn';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { FindByPlace } from '@/features/assemblies/components/find/find-by-place';
import { FindByTag } from '@/features/assemblies/components/find/find-by-tag';
import { FindByText } from '@/features/assemblies/components/find/find-by-text';
import { PageHeader } from '../page-header';

const MODES = [
  { value: 'tag', label: 'By tag' },
  { value: 'place', label: 'By place' },
  { value: 'text', label: 'By text' },
] as const;
type Mode = (typeof MODES)[number]['value'];

/** Finding a hose in the field: by the code on its tag, by where it is, or by anything written about it. */
export function FindPage() {
  const me = useCurrentUser();
  const [params, setParams] = useSearchParams();
  const mode: Mode = MODES.some((m) => m.value === params.get('by')) ? (params.get('by') as Mode) : 'tag';

  return (
    <div className="mx-auto max-w-2xl">
      <PageHeader title="Find a hose" description="Type the code on its tag, choose where it is, or search." />
      <div role="group" aria-label="How to find it" className="mb-5 grid grid-cols-3 gap-1 rounded-[var(--radius-control)] bg-ink-200 p-1">
        {MODES.map((m) => (
          <button
            key={m.value}
            type="button"
            aria-pressed={mode === m.value}
            onClick={() => setParams(m.value === 'tag' ? {} : { by: m.value }, { replace: true })}
            className={cn(
              'min-h-13 rounded-[calc(var(--radius-control)-2px)] px-2 text-base font-bold',
              mode === m.value ? 'bg-white text-ink-950 shadow' : 'text-ink-800 hover:bg-ink-100',
            )}
          >
            {m.label}
          </button>
        ))}
      </div>
      <PanelBoundary title="This search could not be shown">
        {mode === 'tag' ? <FindByTag /> : mode === 'place' ? <FindByPlace sites={me.sites} /> : <FindByText />}
      </PanelBoundary>
    </div>
  );
}
