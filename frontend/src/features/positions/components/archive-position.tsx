import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { PositionDto } from '@shared/schemas/register.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { describeError } from '@/lib/api-client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { useToast } from '@/components/ui/toast';
import { useArchivePosition } from '../api/archive-position';

/**
 * Archiving takes a position out of pickers and lists while keeping its history. The server
 * refuses while an assembly is in it; the reason is said before anyone presses anything.
 */
export function ArchivePosition({ position }: { position: PositionDto }) {
  const [open, setOpen] = useState(false);
  const toast = useToast();
  const archive = useArchivePosition({
    onSuccess: () => {
      setOpen(false);
      toast.show({ title: 'Position archived', description: `${position.code} is kept with its history but no longer offered for installs.` });
    },
  });
  const current = position.currentAssembly;

  if (position.archivedAt) return <p className="text-ink-700">This position is archived. Its history is kept.</p>;

  if (current) {
    return (
      <div className="flex flex-col items-start gap-3">
        <p className="text-ink-900">
          A position can't be archived while an assembly is in it. Assembly{' '}
          <Link to={paths.assemblies.detail.getHref(current.id)} className="font-mono font-semibold text-copper-700 underline decoration-2 underline-offset-4">
            {formatTagCode(current.number)}
          </Link>{' '}
          is {current.status === 'tagged_out' ? 'tagged out' : 'installed'} here: remove it first.
        </p>
        <Button variant="secondary" disabled>
          Archive position
        </Button>
      </div>
    );
  }

  return (
    <div className="flex flex-col items-start gap-3">
      <p className="text-ink-700">Archive a position the plant no longer uses. Its history stays and can still be read.</p>
      <Button variant="secondary" onClick={() => setOpen(true)} disabled={!position.abilities.archive}>
        Archive position
      </Button>
      <Dialog
        open={open}
        onClose={() => {
          setOpen(false);
          archive.reset();
        }}
        role="alertdialog"
        size="sm"
        title={`Archive ${position.code}?`}
        description="It will no longer be offered for installs. Its assemblies' history and events are kept."
      >
        {archive.isError ? <Alert tone="danger">{describeError(archive.error)}</Alert> : null}
        <DialogActions>
          <Button variant="secondary" onClick={() => setOpen(false)} disabled={archive.isPending}>
            Keep it
          </Button>
          <Button variant="danger" loading={archive.isPending} onClick={() => archive.mutate(position.id)}>
            Archive
          </Button>
        </DialogActions>
      </Dialog>
    </div>
  );
}
