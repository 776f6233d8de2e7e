import { useDeferredValue, useId, useState } from 'react';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import type { PositionDto } from '@shared/schemas/register.schema';
import { serviceByCode } from '@shared/services/service-catalogue';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatPressure, type LengthUnit, type PressureUnit } from '@shared/units/units';
import { cn } from '@/lib/cn';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FieldError, SelectField, TextField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { usePositions } from '../api/get-positions';

interface PositionPickerProps {
  sites: SiteSummary[];
  defaultSiteId: string;
  value: string | null;
  onChange: (position: PositionDto) => void;
  units: { pressureUnit: PressureUnit; lengthUnit: LengthUnit };
  error?: string;
}

/** Empty positions of a site, searched by code or name, each a large tile. */
export function PositionPicker({ sites, defaultSiteId, value, onChange, units, error }: PositionPickerProps) {
  const [siteId, setSiteId] = useState(defaultSiteId);
  const [q, setQ] = useState('');
  const search = useDeferredValue(q.trim());
  const positions = usePositions({ siteId, q: search || undefined, occupied: 'no', pageSize: 30 });
  const groupId = useId();

  return (
    <fieldset className="flex flex-col gap-3" aria-describedby={error ? `${groupId}-error` : undefined}>
      <legend className="mb-1 text-lg font-semibold text-ink-900">Position</legend>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {sites.length > 1 ? (
          <SelectField label="Site" options={sites.map((s) => ({ value: s.id, label: s.name }))} value={siteId} onChange={(event) => setSiteId(event.target.value)} />
        ) : null}
        <TextField label="Search positions" type="search" placeholder="Code, name" value={q} onChange={(event) => setQ(event.target.value)} autoComplete="off" />
      </div>
      {positions.isPending ? (
        <SkeletonBlock label="Loading positions…" lines={3} />
      ) : positions.isError ? (
        <ErrorState title="Positions could not be loaded" error={positions.error} onRetry={() => void positions.refetch()} retrying={positions.isFetching} />
      ) : positions.data.data.length === 0 ? (
        <EmptyState title={search ? 'No empty position matches' : 'No empty position at this site'}>
          Only positions with nothing installed are listed. To put this assembly where another one is, open that assembly and replace it.
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-2" aria-label="Empty positions">
          {positions.data.data.map((p) => {
            const id = `${groupId}-${p.id}`;
            return (
              <li
                key={p.id}
                className={cn(
                  'relative flex min-h-16 items-center gap-3 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3 hover:border-ink-600',
                  'has-[:checked]:border-copper-700 has-[:checked]:bg-copper-50',
                )}
              >
                <input id={id} type="radio" name={groupId} checked={value === p.id} onChange={() => onChange(p)} className="relative z-10 size-6 shrink-0 accent-copper-700" />
                <label htmlFor={id} className="flex flex-col after:absolute after:inset-0 after:content-['']">
                  <span className="font-bold text-ink-950">
                    <span className="font-mono">{p.code}</span> {p.name}
                  </span>
                  <span className="text-sm text-ink-700">
                    {p.equipmentName} · {serviceByCode(p.serviceCode)?.name ?? p.serviceCode} · {sizeLabel(p.sizeCode, units.lengthUnit)} · up to{' '}
                    {formatPressure(p.maxOperatingPressureKpa, units.pressureUnit)}
                  </span>
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
