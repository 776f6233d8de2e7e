import type { ConstructionDto } from '@shared/schemas/register.schema';
import { Dialog } from '@/components/ui/dialog';
import { ConstructionForm } from './construction-form';

interface ConstructionDialogProps {
  open: boolean;
  onClose: () => void;
  /** The construction to change; none to add one. */
  construction?: ConstructionDto;
  onSaved: (construction: ConstructionDto) => void;
}

export function ConstructionDialog({ open, onClose, construction, onSaved }: ConstructionDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      size="lg"
      title={construction ? `Edit ${construction.code}` : 'New construction'}
      description={construction ? construction.name : 'A hose build your plant buys, under your own code.'}
    >
      <ConstructionForm key={construction?.updatedAt ?? 'new'} construction={construction} onSaved={onSaved} onCancel={onClose} />
    </Dialog>
  );
}
