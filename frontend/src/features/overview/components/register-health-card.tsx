import { useId } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { COUNT_FILTERS, useRegisterCounts, type RegisterCounts } from '../api/get-register-counts';

interface Tile {
  key: keyof RegisterCounts;
  label: string;
  /** What a non-zero count asks of the reader. */
  hint: string;
  alarm?: boolean;
}

const ENGINEER_TILES: Tile[] = [
  { key: 'installed', label: 'In service', hint: 'installed or tagged out' },
  { key: 'failing', label: 'Failing a check', hint: 'review the selection checks', alarm: true },
  { key: 'warning', label: 'With warnings', hint: 'missing data or accepted fails' },
  { key: 'overdue', label: 'Inspection overdue', hint: 'past the due date', alarm: true },
];

const FIELD_TILES: Tile[] = [
  { key: 'overdue', label: 'Inspection overdue', hint: 'past the due date', alarm: true },
  { key: 'dueSoon', label: 'Due within 7 days', hint: 'plan the round' },
  { key: 'taggedOut', label: 'Tagged out', hint: 'awaiting replacement', alarm: true },
  { key: 'failing', label: 'Failing a check', hint: 'do not leave in service unchecked', alarm: true },
];

/** Counts from the register, each opening the register filtered to those assemblies. */
export function RegisterHealthCard({ variant }: { variant: 'engineer' | 'field' }) {
  const titleId = useId();
  const counts = useRegisterCounts();
  const tiles = variant === 'engineer' ? ENGINEER_TILES : FIELD_TILES;
  const title = variant === 'engineer' ? 'The register at a glance' : 'Hoses that need you';

  return (
    <Card labelledBy={titleId}>
      <CardHeader title={title} titleId={titleId} description="Across your sites. Open a count to see the assemblies." />
      <CardBody>
        {counts.isPending ? (
          <SkeletonBlock label="Counting assemblies…" lines={2} />
        ) : counts.isError ? (
          <ErrorState title="The counts could not be loaded" error={counts.error} onRetry={() => void counts.refetch()} retrying={counts.isFetching} />
        ) : counts.data.installed === 0 ? (
          <EmptyState title="No assemblies in service yet">Assemblies appear here once they are installed at positions.</EmptyState>
        ) : (
          <ul className="grid grid-cols-2 gap-3">
            {tiles.map((tile) => {
              const n = counts.data[tile.key];
              const urgent = tile.alarm && n > 0;
              return (
                <li key={tile.key}>
                  <Link
                    to={paths.register.getHref(new URLSearchParams(COUNT_FILTERS[tile.key]))}
                    className={cn(
                      'flex min-h-24 flex-col justify-between rounded-[var(--radius-control)] border-2 px-3 py-2.5 hover:border-ink-400',
                      urgent ? 'border-copper-500 bg-copper-50' : 'border-ink-100 bg-ink-50',
                    )}
                  >
                    <span className="text-sm font-semibold text-ink-800">{tile.label}</span>
                    <span className="text-3xl font-bold text-ink-950">{n.toLocaleString()}</span>
                    <span className="text-xs text-ink-700">{tile.hint}</span>
                  </Link>
                </li>
              );
            })}
          </ul>
        )}
      </CardBody>
    </Card>
  );
}
