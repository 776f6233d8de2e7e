import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { equipmentCreateSchema, type EquipmentDto, type EquipmentUpdateInput } from '@shared/schemas/register.schema';
import type { z } from 'zod';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/field';
import { useCreateEquipment } from '../api/create-equipment';
import { useUpdateEquipment } from '../api/update-equipment';

const FIELDS = ['assetNumber', 'name', 'hasHourMeter'] as const;
type EquipmentFormValues = z.input<typeof equipmentCreateSchema>;

interface EquipmentFormDialogProps {
  open: boolean;
  onClose: () => void;
  areaId: string;
  areaName: string;
  /** The equipment to change; none to add one. */
  equipment?: EquipmentDto;
  onSaved: (equipment: EquipmentDto) => void;
}

export function EquipmentFormDialog({ open, onClose, equipment, areaName, ...props }: EquipmentFormDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      size="sm"
      title={equipment ? `Edit ${equipment.assetNumber}` : 'New equipment'}
      description={equipment ? equipment.name : `A machine or plant item in ${areaName} that has hose positions.`}
    >
      <EquipmentForm equipment={equipment} onCancel={onClose} {...props} />
    </Dialog>
  );
}

function EquipmentForm({ areaId, equipment, onSaved, onCancel }: Omit<EquipmentFormDialogProps, 'open' | 'onClose' | 'areaName'> & { onCancel: () => void }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, dirtyFields, isDirty },
  } = useForm<EquipmentFormValues, unknown, z.output<typeof equipmentCreateSchema>>({
    resolver: zodResolver(equipmentCreateSchema),
    mode: 'onChange',
    defaultValues: { areaId, assetNumber: equipment?.assetNumber ?? '', name: equipment?.name ?? '', hasHourMeter: equipment?.hasHourMeter ?? false },
  });
  const create = useCreateEquipment({ onSuccess: onSaved });
  const update = useUpdateEquipment({ onSuccess: onSaved });
  const onError = (error: unknown) => applyServerError(error, setError, FIELDS);

  const onSubmit = handleSubmit((values) => {
    if (!equipment) {
      create.mutate(values, { onError });
      return;
    }
    const input: EquipmentUpdateInput = {};
    if (dirtyFields.assetNumber) input.assetNumber = values.assetNumber;
    if (dirtyFields.name) input.name = values.name;
    if (dirtyFields.hasHourMeter) input.hasHourMeter = values.hasHourMeter;
    update.mutate({ id: equipment.id, input }, { onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={equipment ? 'Edit equipment' : 'New equipment'}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <TextField
        label="Asset number"
        hint="As painted on the machine or in the maintenance system; unique at this site."
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        error={errors.assetNumber?.message}
        data-autofocus
        {...register('assetNumber')}
      />
      <TextField label="Equipment name" hint="Such as “Drill rig 3” or “Dewatering pump 2”." autoComplete="off" error={errors.name?.message} {...register('name')} />
      <Checkbox
        label="Has an hour meter"
        hint="Hours are then recorded with inspections and events, so hose life can be counted in operating hours as well as days."
        error={errors.hasHourMeter?.message}
        {...register('hasHourMeter')}
      />
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={create.isPending || update.isPending} disabled={Boolean(equipment) && !isDirty}>
          {equipment ? 'Save' : 'Add equipment'}
        </Button>
      </DialogActions>
    </form>
  );
}
