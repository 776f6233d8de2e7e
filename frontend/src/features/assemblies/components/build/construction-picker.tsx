import { useDeferredValue, useId, useState } from 'react';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatPressure } from '@shared/units/units';
import type { Preferences } from '@shared/schemas/auth.schema';
import { cn } from '@/lib/cn';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FieldError, TextField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useConstructions } from '../../api/get-constructions';

export function constructionSummary(c: ConstructionDto, units: Preferences): string {
  return [
    sizeLabel(c.sizeCode, units.lengthUnit),
    c.workingPressureKpa != null ? `${formatPressure(c.workingPressureKpa, units.pressureUnit)} working` : null,
    c.burstPressureKpa != null ? `${formatPressure(c.burstPressureKpa, units.pressureUnit)} burst` : null,
    c.tubeCompound ? `${c.tubeCompound} tube` : null,
  ]
    .filter(Boolean)
    .join(' · ');
}

interface ConstructionPickerProps {
  value: ConstructionDto | null;
  onChange: (construction: ConstructionDto | null) => void;
  units: Preferences;
  error?: string;
}

/** The hose build, searched by code or name in the catalogue. */
export function ConstructionPicker({ value, onChange, units, error }: ConstructionPickerProps) {
  const [q, setQ] = useState('');
  const search = useDeferredValue(q.trim());
  const list = useConstructions(search);
  const groupId = useId();

  if (value) {
    return (
      <div className="flex flex-col gap-1.5">
        <p className="font-semibold text-ink-900">Construction</p>
        <div className="flex flex-wrap items-center justify-between gap-3 rounded-[var(--radius-control)] border-2 border-copper-700 bg-copper-50 px-4 py-3">
          <div className="flex flex-col">
            <span className="font-bold text-ink-950">
              <span className="font-mono">{value.code}</span> {value.name}
            </span>
            <span className="text-sm text-ink-700">{constructionSummary(value, units)}</span>
          </div>
          <Button variant="secondary" onClick={() => onChange(null)}>
            Change
          </Button>
        </div>
        <FieldError message={error} />
      </div>
    );
  }

  return (
    <fieldset className="flex flex-col gap-3" aria-describedby={error ? `${groupId}-error` : undefined}>
      <legend className="mb-1 font-semibold text-ink-900">Construction</legend>
      <TextField label="Search the catalogue" hideLabel type="search" placeholder="Search constructions by code or name" value={q} onChange={(event) => setQ(event.target.value)} autoComplete="off" />
      {list.isPending ? (
        <SkeletonBlock label="Loading constructions…" lines={3} />
      ) : list.isError ? (
        <ErrorState title="The catalogue could not be loaded" error={list.error} onRetry={() => void list.refetch()} retrying={list.isFetching} />
      ) : list.data.data.length === 0 ? (
        <EmptyState title={search ? 'No construction matches' : 'The catalogue has no constructions yet'}>
          {search ? 'Try the code printed on the hose’s layline.' : 'A reliability engineer adds the plant’s constructions to the catalogue.'}
        </EmptyState>
      ) : (
        <ul className="flex max-h-96 flex-col gap-2 overflow-y-auto" aria-label="Constructions">
          {list.data.data.map((c) => {
            const id = `${groupId}-${c.id}`;
            return (
              <li key={c.id} className={cn('relative flex min-h-14 items-center gap-3 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-2 hover:border-ink-600')}>
                <input id={id} type="radio" name={groupId} onChange={() => onChange(c)} className="relative z-10 size-6 shrink-0 accent-copper-700" />
                <label htmlFor={id} className="flex flex-col after:absolute after:inset-0 after:content-['']">
                  <span className="font-bold text-ink-950">
                    <span className="font-mono">{c.code}</span> {c.name}
                  </span>
                  <span className="text-sm text-ink-700">{constructionSummary(c, units)}</span>
                </label>
              </li>
            );
          })}
        </ul>
      )}
      <FieldError id={`${groupId}-error`} message={error} />
    </fieldset>
  );
}
