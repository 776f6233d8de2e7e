import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { Dialog } from '@/components/ui/dialog';
import { FittingTypeForm } from './fitting-type-form';

interface FittingTypeDialogProps {
  open: boolean;
  onClose: () => void;
  fittingType?: FittingTypeDto;
  onSaved: (fittingType: FittingTypeDto) => void;
}

export function FittingTypeDialog({ open, onClose, fittingType, onSaved }: FittingTypeDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      size="lg"
      title={fittingType ? `Edit ${fittingType.code}` : 'New fitting type'}
      description={fittingType ? fittingType.name : 'An end fitting your hose shop fits, and the sizes it comes in.'}
    >
      <FittingTypeForm fittingType={fittingType} onSaved={onSaved} onCancel={onClose} />
    </Dialog>
  );
}
