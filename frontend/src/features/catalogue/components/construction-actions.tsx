import { useState } from 'react';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { Button } from '@/components/ui/button';
import { ArchiveConfirmDialog } from '@/components/ui/archive-confirm-dialog';
import { useToast } from '@/components/ui/toast';
import { useArchiveConstruction } from '../api/archive-construction';
import { ConstructionDialog } from './construction-dialog';

/** Edit and archive, as the construction's abilities allow. */
export function ConstructionActions({ construction }: { construction: ConstructionDto }) {
  const toast = useToast();
  const [editing, setEditing] = useState(false);
  const [archiving, setArchiving] = useState(false);
  const archive = useArchiveConstruction({
    onSuccess: () => {
      setArchiving(false);
      toast.show({ title: `${construction.code} is archived`, description: 'It no longer appears when building assemblies.' });
    },
  });

  if (!construction.abilities.update && !construction.abilities.archive) return null;

  return (
    <>
      {construction.abilities.update ? (
        <Button variant="primary" onClick={() => setEditing(true)}>
          Edit construction
        </Button>
      ) : null}
      {construction.abilities.archive ? (
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
      <ConstructionDialog
        open={editing}
        onClose={() => setEditing(false)}
        construction={construction}
        onSaved={(saved) => {
          setEditing(false);
          toast.show({ title: 'Changes saved', description: `${saved.code} is up to date; the checks of its assemblies are recomputed.` });
        }}
      />
      <ArchiveConfirmDialog
        open={archiving}
        onClose={() => setArchiving(false)}
        onConfirm={() => archive.mutate(construction.id)}
        title={`Archive ${construction.code}?`}
        description="It leaves the lists used to build new assemblies. Assemblies already built from it keep it, with all their history."
        confirmLabel="Archive construction"
        pending={archive.isPending}
        error={archive.error}
      />
    </>
  );
}
