import { useId, useState } from 'react';
import type { AreaDto } from '@shared/schemas/register.schema';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { ArchiveConfirmDialog } from '@/components/ui/archive-confirm-dialog';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { PlusIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { useArchiveArea } from '../api/archive-area';
import { useEquipmentList } from '../api/get-equipment-list';
import { AreaFormDialog } from './area-form-dialog';
import { EquipmentBranch } from './equipment-branch';
import { EquipmentFormDialog } from './equipment-form-dialog';
import { BranchBody, BranchEmpty, BranchToggle, RowActionButton, RowActions, ShowMore, useTree } from './tree-parts';

/** One area of a site: open it to see its equipment; rename or archive it as its abilities allow. */
export function AreaBranch({ area, siteName }: { area: AreaDto; siteName: string }) {
  const tree = useTree();
  const toast = useToast();
  const bodyId = useId();
  const key = `area:${area.id}`;
  const open = tree.isOpen(key);
  const [renaming, setRenaming] = useState(false);
  const [archiving, setArchiving] = useState(false);
  const archive = useArchiveArea({
    onSuccess: () => {
      setArchiving(false);
      toast.show({ title: `${area.name} is archived` });
    },
  });

  return (
    <li className="flex flex-col">
      <div className="flex flex-col gap-1 sm:flex-row sm:items-center">
        <BranchToggle
          level="area"
          open={open}
          onToggle={() => tree.toggle(key)}
          controls={bodyId}
          code={area.code}
          name={area.name}
          extra={area.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
        />
        {area.abilities.update || area.abilities.archive ? (
          <RowActions>
            {area.abilities.update ? (
              <RowActionButton onClick={() => setRenaming(true)} aria-label={`Rename ${area.name}`}>
                Rename
              </RowActionButton>
            ) : null}
            {area.abilities.archive ? (
              <RowActionButton
                onClick={() => {
                  archive.reset();
                  setArchiving(true);
                }}
                aria-label={`Archive ${area.name}`}
              >
                Archive
              </RowActionButton>
            ) : null}
          </RowActions>
        ) : null}
      </div>
      {open ? (
        <BranchBody id={bodyId}>
          <PanelBoundary title="The equipment could not be shown">
            <AreaEquipment area={area} />
          </PanelBoundary>
        </BranchBody>
      ) : null}
      {renaming ? (
        <AreaFormDialog
          open
          onClose={() => setRenaming(false)}
          siteId={area.siteId}
          siteName={siteName}
          area={area}
          onSaved={(saved) => {
            setRenaming(false);
            toast.show({ title: `${saved.name} saved` });
          }}
        />
      ) : null}
      <ArchiveConfirmDialog
        open={archiving}
        onClose={() => setArchiving(false)}
        onConfirm={() => archive.mutate(area.id)}
        title={`Archive ${area.name}?`}
        description="It leaves the lists used for new work. Its equipment must be archived first; everything recorded there stays."
        confirmLabel="Archive area"
        pending={archive.isPending}
        error={archive.error}
      />
    </li>
  );
}

function AreaEquipment({ area }: { area: AreaDto }) {
  const user = useCurrentUser();
  const tree = useTree();
  const toast = useToast();
  const equipment = useEquipmentList(area.id, tree.archived);
  const [adding, setAdding] = useState(false);
  const canAdd = hasAbility(user, 'equipment.edit') && !area.archivedAt;
  const addButton = canAdd ? (
    <Button variant="secondary" icon={<PlusIcon />} onClick={() => setAdding(true)}>
      Add equipment
    </Button>
  ) : null;

  let list;
  if (equipment.isPending) list = <SkeletonBlock label={`Loading the equipment in ${area.name}…`} lines={2} />;
  else if (equipment.isError) {
    list = <ErrorState title="The equipment could not be loaded" error={equipment.error} onRetry={() => void equipment.refetch()} retrying={equipment.isFetching} />;
  } else {
    const rows = equipment.data.pages.flatMap((page) => page.data);
    const total = equipment.data.pages.at(-1)?.pagination.total ?? rows.length;
    list =
      rows.length === 0 ? (
        <BranchEmpty>No equipment in {area.name} yet.{canAdd ? ' Add the machines and plant items that carry hoses.' : ''}</BranchEmpty>
      ) : (
        <>
          <ul className="flex flex-col gap-1" aria-label={`Equipment in ${area.name}`}>
            {rows.map((e) => (
              <EquipmentBranch key={e.id} equipment={e} />
            ))}
          </ul>
          <ShowMore shown={rows.length} total={total} noun="pieces of equipment" onMore={() => void equipment.fetchNextPage()} loading={equipment.isFetchingNextPage} />
        </>
      );
  }

  return (
    <div className="flex flex-col gap-2">
      {list}
      {addButton ? <div>{addButton}</div> : null}
      {adding ? (
        <EquipmentFormDialog
          open
          onClose={() => setAdding(false)}
          areaId={area.id}
          areaName={area.name}
          onSaved={(saved) => {
            setAdding(false);
            toast.show({ title: `${saved.assetNumber} ${saved.name} added` });
            tree.expand(`equipment:${saved.id}`);
          }}
        />
      ) : null}
    </div>
  );
}
