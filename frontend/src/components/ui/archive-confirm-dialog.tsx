import type { ReactNode } from 'react';
import { describeError } from '@/lib/api-client';
import { Alert } from './alert';
import { Button } from './button';
import { Dialog, DialogActions } from './dialog';

interface ArchiveConfirmDialogProps {
  open: boolean;
  onClose: () => void;
  onConfirm: () => void;
  /** "Archive AIR-19-2W?" */
  title: string;
  /** What archiving does and what it keeps. */
  description: ReactNode;
  /** The button's words, "Archive construction". */
  confirmLabel: string;
  pending: boolean;
  error: unknown;
}

/** Asks before a record is archived: archiving hides it from new work, and keeps everything recorded against it. */
export function ArchiveConfirmDialog({ open, onClose, onConfirm, title, description, confirmLabel, pending, error }: ArchiveConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} role="alertdialog" size="sm" title={title} description={description}>
      {error ? <Alert tone="danger">{describeError(error)}</Alert> : null}
      <DialogActions>
        <Button variant="secondary" onClick={onClose} data-autofocus>
          Cancel
        </Button>
        <Button variant="danger" loading={pending} onClick={onConfirm}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
