import { useId, useState } from 'react';
import type { EquipmentDto } from '@shared/schemas/register.schema';
import { ArchiveConfirmDialog } from '@/components/ui/archive-confirm-dialog';
import { Badge } from '@/components/ui/badge';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { useToast } from '@/components/ui/toast';
import { useArchiveEquipment } from '../api/archive-equipment';
import { EquipmentFormDialog } from './equipment-form-dialog';
import { PositionsList } from './positions-list';
import { BranchBody, BranchToggle, RowActionButton, RowActions, useTree } from './tree-parts';

/** One piece of equipment: open it to see its positions; edit or archive it as its abilities allow. */
export function EquipmentBranch({ equipment }: { equipment: EquipmentDto }) {
  const tree = useTree();
  const toast = useToast();
  const bodyId = useId();
  const key = `equipment:${equipment.id}`;
  const open = tree.isOpen(key);
  const [editing, setEditing] = useState(false);
  const [archiving, setArchiving] = useState(false);
  const archive = useArchiveEquipment({
    onSuccess: () => {
      setArchiving(false);
      toast.show({ title: `${equipment.assetNumber} is archived` });
    },
  });

  return (
    <li className="flex flex-col">
      <div className="flex flex-col gap-1 sm:flex-row sm:items-center">
        <BranchToggle
          level="equipment"
          open={open}
          onToggle={() => tree.toggle(key)}
          controls={bodyId}
          code={equipment.assetNumber}
          name={equipment.name}
          extra={
            <>
              {equipment.hasHourMeter ? <Badge tone="neutral">Hour meter</Badge> : null}
              {equipment.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
            </>
          }
        />
        {equipment.abilities.update || equipment.abilities.archive ? (
          <RowActions>
            {equipment.abilities.update ? (
              <RowActionButton onClick={() => setEditing(true)} aria-label={`Edit ${equipment.assetNumber} ${equipment.name}`}>
                Edit
              </RowActionButton>
            ) : null}
            {equipment.abilities.archive ? (
              <RowActionButton
                onClick={() => {
                  archive.reset();
                  setArchiving(true);
                }}
                aria-label={`Archive ${equipment.assetNumber} ${equipment.name}`}
              >
                Archive
              </RowActionButton>
            ) : null}
          </RowActions>
        ) : null}
      </div>
      {open ? (
        <BranchBody id={bodyId}>
          <PanelBoundary title="The positions could not be shown">
            <PositionsList equipment={equipment} />
          </PanelBoundary>
        </BranchBody>
      ) : null}
      {editing ? (
        <EquipmentFormDialog
          open
          onClose={() => setEditing(false)}
          areaId={equipment.areaId}
          areaName={equipment.areaName}
          equipment={equipment}
          onSaved={(saved) => {
            setEditing(false);
            toast.show({ title: `${saved.assetNumber} saved` });
          }}
        />
      ) : null}
      <ArchiveConfirmDialog
        open={archiving}
        onClose={() => setArchiving(false)}
        onConfirm={() => archive.mutate(equipment.id)}
        title={`Archive ${equipment.assetNumber} ${equipment.name}?`}
        description="It leaves the lists used for new work. Its positions must be archived first; their hoses and history stay on record."
        confirmLabel="Archive equipment"
        pending={archive.isPending}
        error={archive.error}
      />
    </li>
  );
}
