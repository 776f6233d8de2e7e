import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { areaCreateSchema, type AreaCreateInput, type AreaDto, type AreaUpdateInput } from '@shared/schemas/register.schema';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/field';
import { useCreateArea } from '../api/create-area';
import { useUpdateArea } from '../api/update-area';

const FIELDS = ['code', 'name'] as const;

interface AreaFormDialogProps {
  open: boolean;
  onClose: () => void;
  siteId: string;
  siteName: string;
  /** The area to rename; none to add one. */
  area?: AreaDto;
  onSaved: (area: AreaDto) => void;
}

export function AreaFormDialog({ open, onClose, area, siteName, ...props }: AreaFormDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} size="sm" title={area ? `Rename ${area.name}` : 'New area'} description={area ? undefined : `A part of ${siteName}, such as a pit, a plant or a workshop.`}>
      <AreaForm area={area} onCancel={onClose} {...props} />
    </Dialog>
  );
}

function AreaForm({ siteId, area, onSaved, onCancel }: Omit<AreaFormDialogProps, 'open' | 'onClose' | 'siteName'> & { onCancel: () => void }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, dirtyFields, isDirty },
  } = useForm<AreaCreateInput>({
    resolver: zodResolver(areaCreateSchema),
    mode: 'onChange',
    defaultValues: { siteId, code: area?.code ?? '', name: area?.name ?? '' },
  });
  const create = useCreateArea({ onSuccess: onSaved });
  const update = useUpdateArea({ onSuccess: onSaved });
  const onError = (error: unknown) => applyServerError(error, setError, FIELDS);

  const onSubmit = handleSubmit((values) => {
    if (!area) {
      create.mutate(values, { onError });
      return;
    }
    const input: AreaUpdateInput = {};
    if (dirtyFields.code) input.code = values.code;
    if (dirtyFields.name) input.name = values.name;
    update.mutate({ id: area.id, input }, { onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={area ? 'Rename area' : 'New area'}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <TextField
        label="Area code"
        hint="Unique at this site. Letters, digits, dots, dashes, underscores and slashes only."
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        error={errors.code?.message}
        data-autofocus
        {...register('code')}
      />
      <TextField label="Area name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={create.isPending || update.isPending} disabled={Boolean(area) && !isDirty}>
          {area ? 'Save' : 'Add area'}
        </Button>
      </DialogActions>
    </form>
  );
}
