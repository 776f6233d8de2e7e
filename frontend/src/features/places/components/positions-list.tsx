import { Link } from 'react-router-dom';
import type { EquipmentDto } from '@shared/schemas/register.schema';
import { serviceByCode } from '@shared/services/service-catalogue';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { ButtonLink } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { PlusIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useEquipmentPositions } from '../api/get-equipment-positions';
import { BranchEmpty, ShowMore } from './tree-parts';

/** The hose positions on a piece of equipment, read-only here: each opens its own page. */
export function PositionsList({ equipment }: { equipment: EquipmentDto }) {
  const user = useCurrentUser();
  const positions = useEquipmentPositions(equipment.id);
  const canAdd = hasAbility(user, 'positions.edit') && !equipment.archivedAt;
  const addLink = canAdd ? (
    <ButtonLink variant="secondary" icon={<PlusIcon />} to={paths.positions.create.getHref({ equipmentId: equipment.id })}>
      Add position
    </ButtonLink>
  ) : null;

  if (positions.isPending) return <SkeletonBlock label={`Loading the positions on ${equipment.name}…`} lines={2} />;
  if (positions.isError) {
    return <ErrorState title="The positions could not be loaded" error={positions.error} onRetry={() => void positions.refetch()} retrying={positions.isFetching} />;
  }
  const rows = positions.data.pages.flatMap((page) => page.data);
  const total = positions.data.pages.at(-1)?.pagination.total ?? rows.length;

  return (
    <div className="flex flex-col gap-2">
      {rows.length === 0 ? (
        <BranchEmpty>No hose positions on {equipment.name} yet.{canAdd ? ' Add one for each hose point on it.' : ''}</BranchEmpty>
      ) : (
        <ul className="flex flex-col gap-1" aria-label={`Positions on ${equipment.name}`}>
          {rows.map((p) => (
            <li key={p.id}>
              <Link
                to={paths.positions.detail.getHref(p.id)}
                className="flex min-h-12 flex-wrap items-baseline gap-x-3 gap-y-0.5 rounded-[var(--radius-control)] px-2 py-2 hover:bg-copper-50"
              >
                <span className="font-mono text-sm font-semibold text-ink-700">{p.code}</span>
                <span className="font-semibold text-copper-700 underline decoration-2 underline-offset-4">{p.name}</span>
                <span className="text-sm text-ink-700">{serviceByCode(p.serviceCode)?.name ?? p.serviceCode}</span>
                <span className="text-sm text-ink-700">
                  {p.currentAssembly ? (
                    <>
                      Holds <span className="font-mono font-semibold text-ink-900">{formatTagCode(p.currentAssembly.number)}</span>
                    </>
                  ) : (
                    'No hose installed'
                  )}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      <ShowMore shown={rows.length} total={total} noun="positions" onMore={() => void positions.fetchNextPage()} loading={positions.isFetchingNextPage} />
      {addLink ? <div>{addLink}</div> : null}
    </div>
  );
}
