import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import type { PositionDto } from '@shared/schemas/register.schema';
import { serviceByCode } from '@shared/services/service-catalogue';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SelectField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useEquipmentList } from '../../api/get-equipment-list';
import { usePositions } from '../../api/get-positions';
import type { AssemblyStatus } from '@shared/schemas/assemblies.schema';
import { OutcomeBadge, StatusBadge } from '../assembly-badges';

/** Site, then equipment, then the positions on it with the assembly in each. */
export function FindByPlace({ sites }: { sites: SiteSummary[] }) {
  const [siteId, setSiteId] = useState(sites.length === 1 ? sites[0]!.id : '');
  const [equipmentId, setEquipmentId] = useState('');
  const equipment = useEquipmentList(siteId || undefined);

  if (sites.length === 0) {
    return <EmptyState title="No sites to look in">Your account has no sites yet. Ask an administrator to give you access to your site.</EmptyState>;
  }

  return (
    <div className="flex flex-col gap-4">
      {sites.length === 1 ? (
        <p className="text-ink-800">
          At <span className="font-semibold">{sites[0]!.name}</span>
        </p>
      ) : null}
      {sites.length > 1 ? (
        <SelectField
          label="Site"
          placeholder="Choose the site"
          options={sites.map((s) => ({ value: s.id, label: s.name }))}
          value={siteId}
          onChange={(event) => {
            setSiteId(event.target.value);
            setEquipmentId('');
          }}
          className="min-h-14 text-lg"
        />
      ) : null}
      {!siteId ? null : equipment.isPending ? (
        <SkeletonBlock label="Loading equipment…" lines={2} />
      ) : equipment.isError ? (
        <ErrorState title="The equipment could not be loaded" error={equipment.error} onRetry={() => void equipment.refetch()} retrying={equipment.isFetching} />
      ) : equipment.data.data.length === 0 ? (
        <EmptyState title="No equipment at this site yet">Equipment and its hose positions are added under Sites and equipment.</EmptyState>
      ) : (
        <SelectField
          label="Equipment"
          placeholder="Choose the equipment"
          options={equipment.data.data.map((e) => ({ value: e.id, label: `${e.assetNumber} · ${e.name} (${e.areaName})` }))}
          value={equipmentId}
          onChange={(event) => setEquipmentId(event.target.value)}
          className="min-h-14 text-lg"
        />
      )}
      {equipmentId ? <PositionsOf equipmentId={equipmentId} /> : null}
    </div>
  );
}

function PositionsOf({ equipmentId }: { equipmentId: string }) {
  const positions = usePositions({ equipmentId, pageSize: 200 });
  if (positions.isPending) return <SkeletonBlock label="Loading positions…" lines={3} />;
  if (positions.isError) return <ErrorState title="The positions could not be loaded" error={positions.error} onRetry={() => void positions.refetch()} retrying={positions.isFetching} />;
  if (positions.data.data.length === 0) return <EmptyState title="No hose positions on this equipment">Positions are added by a reliability engineer.</EmptyState>;
  return (
    <ul className="flex flex-col gap-3" aria-label="Positions">
      {positions.data.data.map((p) => (
        <li key={p.id}>
          <PositionRow position={p} />
        </li>
      ))}
    </ul>
  );
}

function PositionRow({ position: p }: { position: PositionDto }) {
  const current = p.currentAssembly;
  return (
    <div className="flex flex-col gap-2 rounded-[var(--radius-card)] border-2 border-ink-300 bg-white px-4 py-3">
      <div className="flex flex-col">
        <Link
          to={paths.positions.detail.getHref(p.id)}
          className="flex min-h-11 items-center font-bold text-ink-950 underline decoration-ink-300 underline-offset-4 hover:decoration-copper-700"
        >
          <span className="font-mono">{p.code}</span> {p.name}
        </Link>
        <span className="text-sm text-ink-700">{serviceByCode(p.serviceCode)?.name ?? p.serviceCode}</span>
      </div>
      {current ? (
        <Link
          to={paths.assemblies.detail.getHref(current.id)}
          className="flex min-h-14 flex-wrap items-center justify-between gap-2 rounded-[var(--radius-control)] bg-ink-50 px-3 py-2 hover:bg-copper-50"
        >
          <span className="font-mono text-xl font-bold tracking-wider text-ink-950">{formatTagCode(current.number)}</span>
          <span className="flex flex-wrap gap-2">
            <StatusBadge status={current.status as AssemblyStatus} />
            <OutcomeBadge outcome={current.checkOutcome} />
          </span>
        </Link>
      ) : (
        <p className="text-ink-700">Empty: nothing installed.</p>
      )}
    </div>
  );
}
