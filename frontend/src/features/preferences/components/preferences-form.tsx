import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { preferencesSchema, type Preferences } from '@shared/schemas/auth.schema';
import { applyServerError } from '@/lib/form-errors';
import { LENGTH_UNIT_OPTIONS, PRESSURE_UNIT_OPTIONS, TEMPERATURE_UNIT_OPTIONS, type UnitOption } from '@/lib/units-display';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { RadioTiles } from '@/components/ui/radio-tiles';
import { useToast } from '@/components/ui/toast';
import { useUpdatePreferences } from '../api/update-preferences';

const tiles = <U extends string>(options: UnitOption<U>[]) => options.map((o) => ({ value: o.value, label: o.symbol, description: o.name }));

/** The units Ferrule shows values in. Values are stored in kPa, mm and °C whatever is chosen here. */
export function PreferencesForm({ preferences }: { preferences: Preferences }) {
  const toast = useToast();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm({ resolver: zodResolver(preferencesSchema), mode: 'onChange', defaultValues: preferences });
  const update = useUpdatePreferences({
    onSuccess: (me) => {
      reset(me.preferences);
      toast.show({ title: 'Preferences saved', description: 'Values are now shown in the units you chose.' });
    },
  });

  const onSubmit = handleSubmit((values) =>
    update.mutate(values, { onError: (error) => applyServerError(error, setError, ['pressureUnit', 'lengthUnit', 'temperatureUnit']) }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-7" aria-label="Units">
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <RadioTiles legend="Pressure" options={tiles(PRESSURE_UNIT_OPTIONS)} error={errors.pressureUnit?.message} {...register('pressureUnit')} />
      <RadioTiles legend="Length" options={tiles(LENGTH_UNIT_OPTIONS)} error={errors.lengthUnit?.message} {...register('lengthUnit')} />
      <RadioTiles legend="Temperature" options={tiles(TEMPERATURE_UNIT_OPTIONS)} error={errors.temperatureUnit?.message} {...register('temperatureUnit')} />
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" size="lg" loading={update.isPending} className="w-full sm:w-auto">
          Save preferences
        </Button>
        {isDirty ? <p className="text-sm text-ink-700">You have unsaved changes.</p> : null}
      </div>
    </form>
  );
}
