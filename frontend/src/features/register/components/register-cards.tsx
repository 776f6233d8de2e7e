import type { Table as TanStackTable } from '@tanstack/react-table';
import type { LengthUnit } from '@shared/schemas/auth.schema';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { AssemblyStatusBadge } from '@/components/ui/assembly-status-badge';
import { CheckOutcomeBadge } from '@/components/ui/check-outcome-badge';
import { SelectField } from '@/components/ui/field';
import { AssemblyNumberLink, DueDate, PositionCell, todayIso } from './register-cells';

const PHONE_SORTS: Array<{ value: string; label: string }> = [
  { value: 'nextInspectionDue:asc', label: 'Next inspection, soonest first' },
  { value: 'checkOutcome:asc', label: 'Checks, fails first' },
  { value: 'position:asc', label: 'Position code, A to Z' },
  { value: 'number:asc', label: 'Assembly number' },
  { value: 'status:asc', label: 'Status' },
  { value: 'installedAt:desc', label: 'Installed, latest first' },
  { value: 'installedAt:asc', label: 'Installed, earliest first' },
  { value: 'updatedAt:desc', label: 'Changed most recently' },
];

/**
 * The register on a phone: one card per assembly that reads at arm's length — the number, where
 * it is, its status and checks, and when it is due, large.
 */
export function RegisterCards({ table, busy, lengthUnit }: { table: TanStackTable<AssemblyListItemDto>; busy: boolean; lengthUnit: LengthUnit }) {
  const current = table.getState().sorting[0];
  const value = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : 'number:asc';
  const options = PHONE_SORTS.some((o) => o.value === value) ? PHONE_SORTS : [...PHONE_SORTS, { value, label: 'Current order' }];
  const today = todayIso();

  return (
    <div className="flex flex-col gap-3 md:hidden">
      <SelectField
        label="Sort by"
        options={options}
        value={value}
        onChange={(event) => {
          const [id = 'number', dir] = event.target.value.split(':');
          table.setSorting([{ id, desc: dir === 'desc' }]);
        }}
      />
      <ul className="flex flex-col gap-3" aria-label="Register of assemblies" aria-busy={busy || undefined}>
        {table.getRowModel().rows.map((row) => {
          const assembly = row.original;
          return (
            <li key={row.id} className="rounded-[var(--radius-card)] border-2 border-ink-200 bg-white p-4 shadow-sm">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <AssemblyNumberLink assembly={assembly} className="inline-flex min-h-11 items-center text-2xl" />
                <AssemblyStatusBadge status={assembly.status} className="text-base" />
              </div>
              <div className="mt-1">
                <PositionCell position={assembly.position} large />
                {assembly.position ? <p className="text-ink-700">{assembly.position.equipmentAssetNumber} · {assembly.position.equipmentName}</p> : null}
              </div>
              <dl className="mt-3 grid grid-cols-1 gap-3 border-t border-ink-100 pt-3 min-[360px]:grid-cols-2">
                <div className="flex flex-col gap-1">
                  <dt className="text-sm font-semibold text-ink-600">Checks</dt>
                  <dd>
                    <CheckOutcomeBadge outcome={assembly.checkOutcome} overridden={assembly.overridden} size="lg" />
                  </dd>
                </div>
                <div className="flex flex-col gap-1">
                  <dt className="text-sm font-semibold text-ink-600">Next inspection</dt>
                  <dd>
                    <DueDate due={assembly.nextInspectionDue} today={today} large />
                  </dd>
                </div>
              </dl>
              <p className="mt-3 text-sm text-ink-700">
                <span className="font-mono font-semibold text-ink-900">{assembly.construction.code}</span> · {sizeLabel(assembly.construction.sizeCode, lengthUnit)} · {assembly.siteName}
              </p>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
