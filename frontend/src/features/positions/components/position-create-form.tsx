import { useEffect, useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import type { Preferences, SiteSummary } from '@shared/schemas/auth.schema';
import { positionCreateSchema, type PositionDto, type ReferenceDto } from '@shared/schemas/register.schema';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { TextField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { useCreatePosition } from '../api/create-position';
import { useEquipment } from '../api/get-equipment';
import { DESIGN_FIELDS, DesignFields, designValuesOf, QUANTITY_FIELDS } from './design-fields';
import { PlaceSelects } from './place-selects';
import { withQuantityErrors } from './quantity-input';
import { applyPositionServerError } from './server-errors';
import { TextAreaField } from './text-area-field';

type CreateValues = z.input<typeof positionCreateSchema>;

const FIELDS = ['equipmentId', 'code', 'name', 'notes', ...DESIGN_FIELDS] as const;

interface PositionCreateFormProps {
  sites: SiteSummary[];
  reference: ReferenceDto;
  units: Preferences;
  /** The equipment the position goes on, when the page was opened from it. */
  initialEquipmentId?: string;
  onCreated: (position: PositionDto) => void;
  onCancel: () => void;
}

/** A new hose point: where it is, its code and name, and the conditions a hose there must meet. */
export function PositionCreateForm({ sites, reference, units, initialEquipmentId = '', onCreated, onCancel }: PositionCreateFormProps) {
  const toast = useToast();
  const preset = useEquipment(initialEquipmentId);
  const [place, setPlace] = useState<{ siteId?: string; areaId?: string }>(() => (sites.length === 1 ? { siteId: sites[0]!.id } : {}));
  const form = useForm<CreateValues>({
    resolver: withQuantityErrors(zodResolver(positionCreateSchema, undefined, { raw: true }), QUANTITY_FIELDS),
    mode: 'onChange',
    defaultValues: { equipmentId: '', code: '', name: '', notes: null, ...designValuesOf(null, units) },
  });
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    watch,
    formState: { errors, isSubmitted },
  } = form;
  const equipmentId = watch('equipmentId');
  const create = useCreatePosition();

  // Opened from a piece of equipment: start with it chosen.
  useEffect(() => {
    if (!preset.data) return;
    setPlace({ siteId: preset.data.siteId, areaId: preset.data.areaId });
    setValue('equipmentId', preset.data.id, { shouldDirty: true });
  }, [preset.data, setValue]);

  const onSubmit = handleSubmit((values) => {
    create.mutate(values, {
      onSuccess: (position) => {
        toast.show({ title: 'Position created', description: `${position.code} on ${position.equipmentAssetNumber} is in the register.` });
        onCreated(position);
      },
      onError: (error) => applyPositionServerError(error, setError, FIELDS),
    });
  });

  if (initialEquipmentId && preset.isPending) return <SkeletonBlock label="Loading the equipment…" lines={6} />;

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label="New position" className="flex flex-col gap-5">
        {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
        {initialEquipmentId && preset.isError ? <Alert tone="danger">The equipment in the link could not be loaded. Choose the equipment below.</Alert> : null}
        <Card>
          <CardHeader title="Where it is" level={2} description="The piece of equipment the hose point is on." />
          <CardBody className="grid grid-cols-1 gap-4 sm:grid-cols-3">
            <PlaceSelects
              mode="pick"
              sites={sites}
              siteId={place.siteId}
              areaId={place.areaId}
              equipmentId={equipmentId || undefined}
              errors={{ equipmentId: errors.equipmentId ? (errors.equipmentId.type === 'server' ? errors.equipmentId.message : 'Choose the equipment') : undefined }}
              onChange={(patch) => {
                const next = { siteId: 'siteId' in patch ? patch.siteId : place.siteId, areaId: 'areaId' in patch ? patch.areaId : place.areaId };
                setPlace(next);
                if ('equipmentId' in patch || 'areaId' in patch || 'siteId' in patch) {
                  setValue('equipmentId', patch.equipmentId ?? '', { shouldDirty: true, shouldValidate: isSubmitted });
                }
              }}
            />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="The position" level={2} description="Its code stays when the hose in it is replaced." />
          <CardBody className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField
              label="Position code"
              autoComplete="off"
              autoCapitalize="characters"
              spellCheck={false}
              hint="Unique at the site, e.g. DR03-AIR-MAIN."
              error={errors.code?.message}
              {...register('code')}
            />
            <TextField label="Position name" autoComplete="off" hint="What a fitter calls it, e.g. “Main air supply”." error={errors.name?.message} {...register('name')} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Design conditions" level={2} description={`In your units: ${units.pressureUnit}, ${units.lengthUnit}, °${units.temperatureUnit}. Leave empty what is not known yet; checks then warn.`} />
          <CardBody>
            <DesignFields reference={reference} units={units} siteId={place.siteId ?? ''} />
          </CardBody>
        </Card>
        <TextAreaField label="Notes" error={errors.notes?.message} {...register('notes')} />
        <div className="flex flex-col-reverse gap-3 sm:flex-row">
          <Button variant="secondary" onClick={onCancel} disabled={create.isPending}>
            Cancel
          </Button>
          <Button type="submit" size="lg" loading={create.isPending}>
            Create position
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
