import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import type { LengthUnit } from '@shared/schemas/auth.schema';
import { ASSEMBLY_STATUSES, ASSEMBLY_STATUS_LABELS, DUE_FILTERS, type AssemblyStatus } from '@shared/schemas/assemblies.schema';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { cn } from '@/lib/cn';
import { Button } from '@/components/ui/button';
import { CHECK_OUTCOME_LABELS } from '@/components/ui/check-outcome-badge';
import { SelectField, TextField } from '@/components/ui/field';
import { SlidersIcon } from '@/components/ui/icons';
import { useConstructionOptions, CONSTRUCTION_OPTIONS_LIMIT } from '../api/get-construction-options';
import { countFilters, type RegisterQuery } from '../hooks/use-register-search';

const SEARCH_DELAY_MS = 300;

/** What the register hands to the site, area and equipment pickers the page gives it. */
export interface PlaceFilterProps {
  siteId: string | undefined;
  areaId: string | undefined;
  equipmentId: string | undefined;
  onChange: (patch: { siteId?: string; areaId?: string; equipmentId?: string }) => void;
}
export type RenderPlaceFilters = (props: PlaceFilterProps) => ReactNode;

export const DUE_LABELS: Record<(typeof DUE_FILTERS)[number], string> = {
  overdue: 'Overdue',
  'within-7-days': 'Due within 7 days',
  'within-30-days': 'Due within 30 days',
};

const OUTCOME_OPTIONS = (['fail', 'warn', 'pass'] as const).map((value) => ({ value, label: CHECK_OUTCOME_LABELS[value] }));
const DUE_OPTIONS = DUE_FILTERS.map((value) => ({ value, label: DUE_LABELS[value] }));

const isOneOf = <T extends string>(values: readonly T[], value: string): value is T => (values as readonly string[]).includes(value);

interface RegisterFiltersProps {
  query: RegisterQuery;
  onChange: (patch: Partial<RegisterQuery>, options?: { replace?: boolean }) => void;
  onClear: () => void;
  reference: ReferenceDto | undefined;
  /** The reference lists could not be loaded: the service and size filters say so. */
  referenceFailed?: boolean;
  lengthUnit: LengthUnit;
  renderPlaceFilters: RenderPlaceFilters;
}

/** Search and every filter of the register; on a phone the filters fold away under one button. */
export function RegisterFilters({ query, onChange, onClear, reference, referenceFailed = false, lengthUnit, renderPlaceFilters }: RegisterFiltersProps) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const active = countFilters({ ...query, q: undefined });
  const constructions = useConstructionOptions();

  const serviceOptions = (reference?.services ?? []).map((s) => ({ value: s.code, label: s.name }));
  const sizeOptions = (reference?.sizeClasses ?? []).map((s) => ({ value: s.code, label: sizeLabel(s.code, lengthUnit) }));
  const listPlaceholder = (what: string, all: string) => (reference ? all : referenceFailed ? `The ${what} could not be loaded` : `Loading ${what}…`);
  const constructionOptions = (constructions.data?.data ?? []).map((c) => ({ value: c.id, label: `${c.code} — ${c.name}` }));

  return (
    <div role="search" aria-label="Search and filter the register" className="flex flex-col gap-3">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <SearchBox value={query.q} onChange={onChange} />
        <Button
          variant="secondary"
          className="md:hidden"
          icon={<SlidersIcon />}
          aria-expanded={open}
          aria-controls={panelId}
          onClick={() => setOpen((v) => !v)}
        >
          {open ? 'Hide filters' : 'Filters'}
          {active ? <span className="rounded-full bg-copper-700 px-2 text-sm text-white">{active}</span> : null}
        </Button>
      </div>
      <div id={panelId} className={cn('flex-col gap-4 rounded-[var(--radius-card)] border border-ink-200 bg-white p-4', open ? 'flex' : 'hidden md:flex')}>
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3 xl:grid-cols-4">
          {renderPlaceFilters({
            siteId: query.siteId,
            areaId: query.areaId,
            equipmentId: query.equipmentId,
            onChange: (patch) => onChange(patch),
          })}
          <SelectField
            label="Service"
            placeholder={listPlaceholder('services', 'All services')}
            options={serviceOptions}
            value={query.serviceCode ?? ''}
            onChange={(event) => onChange({ serviceCode: event.target.value || undefined })}
          />
          <SelectField
            label="Construction"
            placeholder={constructions.isPending ? 'Loading constructions…' : constructions.isError ? 'Constructions could not be loaded' : 'All constructions'}
            hint={constructions.data && constructions.data.pagination.total > CONSTRUCTION_OPTIONS_LIMIT ? `The first ${CONSTRUCTION_OPTIONS_LIMIT} by code; search finds the rest.` : undefined}
            options={constructionOptions}
            value={query.constructionId ?? ''}
            onChange={(event) => onChange({ constructionId: event.target.value || undefined })}
          />
          <SelectField
            label="Size"
            placeholder={listPlaceholder('sizes', 'All sizes')}
            options={sizeOptions}
            value={query.sizeCode ?? ''}
            onChange={(event) => onChange({ sizeCode: event.target.value || undefined })}
          />
          <SelectField
            label="Checks"
            placeholder="Any outcome"
            options={OUTCOME_OPTIONS}
            value={query.checkOutcome ?? ''}
            onChange={(event) => {
              const value = event.target.value;
              onChange({ checkOutcome: isOneOf(['pass', 'warn', 'fail'] as const, value) ? value : undefined });
            }}
          />
          <SelectField
            label="Inspection due"
            placeholder="Any date"
            options={DUE_OPTIONS}
            value={query.due ?? ''}
            onChange={(event) => {
              const value = event.target.value;
              onChange({ due: isOneOf(DUE_FILTERS, value) ? value : undefined });
            }}
          />
        </div>
        <StatusFilter value={query.status ?? []} onChange={(status) => onChange({ status: status.length ? status : undefined })} />
        {active || query.q ? (
          <div>
            <Button variant="ghost" onClick={onClear}>
              Clear search and filters
            </Button>
          </div>
        ) : null}
      </div>
    </div>
  );
}

function SearchBox({ value, onChange }: { value: string | undefined; onChange: RegisterFiltersProps['onChange'] }) {
  const [text, setText] = useState(value ?? '');
  const lastSent = useRef(value ?? '');

  // The address changed from elsewhere (back button, "clear filters"): show what it says.
  useEffect(() => {
    const q = value ?? '';
    if (q !== lastSent.current) {
      lastSent.current = q;
      setText(q);
    }
  }, [value]);

  useEffect(() => {
    const q = text.trim();
    if (q === lastSent.current) return;
    const timer = window.setTimeout(() => {
      lastSent.current = q;
      onChange({ q: q || undefined }, { replace: true });
    }, SEARCH_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [text, onChange]);

  return (
    <TextField
      label="Search the register"
      type="search"
      placeholder="Tag code, position, equipment, batch…"
      containerClassName="flex-1"
      value={text}
      onChange={(event) => setText(event.target.value)}
      onKeyDown={(event) => {
        if (event.key === 'Enter') {
          event.preventDefault();
          const q = text.trim();
          lastSent.current = q;
          onChange({ q: q || undefined });
        }
      }}
      autoComplete="off"
      autoCapitalize="off"
      spellCheck={false}
      maxLength={100}
    />
  );
}

/** Statuses as large toggles: none chosen means every status. */
function StatusFilter({ value, onChange }: { value: AssemblyStatus[]; onChange: (status: AssemblyStatus[]) => void }) {
  const groupId = useId();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-semibold text-ink-900">
        Status <span className="font-normal text-ink-600">{value.length ? `· ${value.length} chosen` : '· all'}</span>
      </legend>
      <div className="flex flex-wrap gap-2">
        {ASSEMBLY_STATUSES.map((status) => {
          const id = `${groupId}-${status}`;
          const checked = value.includes(status);
          return (
            <label
              key={status}
              htmlFor={id}
              className={cn(
                'flex min-h-11 cursor-pointer items-center gap-2 rounded-full border-2 px-3 font-semibold',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-copper-500',
                checked ? 'border-copper-700 bg-copper-50 text-ink-950' : 'border-ink-300 bg-white text-ink-800 hover:border-ink-600',
              )}
            >
              <input
                id={id}
                type="checkbox"
                className="size-5 accent-copper-700 focus-visible:outline-none"
                checked={checked}
                onChange={(event) => onChange(event.target.checked ? ASSEMBLY_STATUSES.filter((s) => s === status || value.includes(s)) : value.filter((s) => s !== status))}
              />
              {ASSEMBLY_STATUS_LABELS[status]}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
