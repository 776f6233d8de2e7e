import { useState } from 'react';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { ArchiveConfirmDialog } from '@/components/ui/archive-confirm-dialog';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import { useArchiveFittingType } from '../api/archive-fitting-type';
import { FittingTypeDialog } from './fitting-type-dialog';

/** Edit and archive, as the fitting type's abilities allow. */
export function FittingTypeActions({ fittingType }: { fittingType: FittingTypeDto }) {
  const toast = useToast();
  const [editing, setEditing] = useState(false);
  const [archiving, setArchiving] = useState(false);
  const archive = useArchiveFittingType({
    onSuccess: () => {
      setArchiving(false);
      toast.show({ title: `${fittingType.code} is archived`, description: 'It no longer appears when building assemblies.' });
    },
  });

  if (!fittingType.abilities.update && !fittingType.abilities.archive) return null;

  return (
    <>
      {fittingType.abilities.update ? <Button onClick={() => setEditing(true)}>Edit fitting type</Button> : null}
      {fittingType.abilities.archive ? (
        <Button
          variant="secondary"
          onClick={() => {
            archive.reset();
            setArchiving(true);
          }}
        >
          Archive
        </Button>
      ) : null}
      <FittingTypeDialog
        open={editing}
        onClose={() => setEditing(false)}
        fittingType={fittingType}
        onSaved={(saved) => {
          setEditing(false);
          toast.show({ title: 'Changes saved', description: `${saved.code} is up to date.` });
        }}
      />
      <ArchiveConfirmDialog
        open={archiving}
        onClose={() => setArchiving(false)}
        onConfirm={() => archive.mutate(fittingType.id)}
        title={`Archive ${fittingType.code}?`}
        description="It leaves the lists used to build new assemblies. Assemblies already fitted with it keep it, with all their history."
        confirmLabel="Archive fitting type"
        pending={archive.isPending}
        error={archive.error}
      />
    </>
  );
}
