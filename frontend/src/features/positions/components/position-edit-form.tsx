import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import type { Preferences } from '@shared/schemas/auth.schema';
import { positionUpdateSchema, type PositionDto, type ReferenceDto } from '@shared/schemas/register.schema';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { useToast } from '@/components/ui/toast';
import { useUpdatePosition, type PositionChange } from '../api/update-position';
import { DESIGN_FIELDS, DesignFields, designValuesOf, QUANTITY_FIELDS, type DesignValues } from './design-fields';
import { withQuantityErrors } from './quantity-input';
import { applyPositionServerError } from './server-errors';
import { TextAreaField } from './text-area-field';

type EditValues = DesignValues & { name: string; notes: string | null; reason: string | null };

const FIELDS = ['name', 'notes', 'reason', ...DESIGN_FIELDS] as const;

const valuesOf = (position: PositionDto, units: Preferences): EditValues => ({
  name: position.name,
  notes: position.notes,
  ...designValuesOf(position, units),
  reason: null,
});

interface PositionEditFormProps {
  position: PositionDto;
  reference: ReferenceDto;
  units: Preferences;
  /** `submittedAt` is when the change was sent: anything read after it reflects the change. */
  onSaved: (position: PositionDto, designChanged: boolean, submittedAt: number) => void;
  onCancel: () => void;
}

/**
 * The position's name and design conditions. Quantities are typed in the reader's units and sent
 * with them; only what changed is sent, with the reason, and the server audits the change.
 */
export function PositionEditForm({ position, reference, units, onSaved, onCancel }: PositionEditFormProps) {
  const toast = useToast();
  const form = useForm<z.input<typeof positionUpdateSchema>>({
    // The shared schema checks every keystroke; the values go to the server as typed, units and all.
    resolver: withQuantityErrors(zodResolver(positionUpdateSchema, undefined, { raw: true }), QUANTITY_FIELDS),
    mode: 'onChange',
    defaultValues: valuesOf(position, units),
  });
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, dirtyFields, isDirty },
  } = form;
  const update = useUpdatePosition();

  const onSubmit = handleSubmit((values) => {
    const input: Record<string, unknown> = {};
    for (const field of FIELDS) {
      if (field !== 'reason' && dirtyFields[field]) input[field] = values[field];
    }
    const designChanged = DESIGN_FIELDS.some((field) => field in input);
    const submittedAt = Date.now();
    const reason = values.reason?.trim();
    if (reason) input.reason = reason;
    update.mutate(
      { id: position.id, input: input as PositionChange },
      {
        onSuccess: (saved) => {
          toast.show({ title: 'Design conditions saved', description: `${saved.code} is up to date.` });
          onSaved(saved, designChanged, submittedAt);
        },
        onError: (error) => applyPositionServerError(error, setError, FIELDS),
      },
    );
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label="Edit design conditions" className="flex flex-col gap-5">
        {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
        <TextField label="Position name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <DesignFields reference={reference} units={units} siteId={position.siteId} />
        <TextAreaField label="Notes" error={errors.notes?.message} {...register('notes')} />
        <TextAreaField
          label="Reason for the change (optional)"
          hint="Kept with the change in the audit log, e.g. “Compressor set-point raised to 10 bar.”"
          rows={2}
          error={errors.reason?.message}
          {...register('reason')}
        />
        {position.currentAssembly ? (
          <Alert>A change of design conditions runs the checks of the installed assembly again.</Alert>
        ) : null}
        <div className="flex flex-col-reverse gap-3 sm:flex-row">
          <Button variant="secondary" onClick={onCancel} disabled={update.isPending}>
            Cancel
          </Button>
          <Button type="submit" size="lg" loading={update.isPending} disabled={!isDirty}>
            Save design conditions
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
