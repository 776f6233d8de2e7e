import { useMemo } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { serviceSettingsSchema, type SiteServiceDto } from '@shared/schemas/register.schema';
import { CONDUCTIVITY_REQUIREMENTS, PERIODIC_TEST_KINDS } from '@shared/services/service-catalogue';
import { PRESSURE_UNIT_SYMBOLS } from '@shared/units/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { FieldError, SelectField } from '@/components/ui/field';
import { CloseIcon, PlusIcon } from '@/components/ui/icons';
import { useUpdateSiteService } from '../api/update-site-service';
import { useUnits } from '../hooks/use-units';
import { CONDUCTIVITY_LABELS, PERIODIC_TEST_LABELS } from '../utils/labels';
import {
  SERVICE_SETTINGS_FIELDS,
  SERVICE_SETTINGS_LABELS,
  SERVICE_SETTINGS_RENAMES,
  serviceSettingsFormValues,
  serviceSettingsInput,
  type ServiceSettingsFormValues,
} from '../utils/service-settings-form-values';
import { applyServerFieldError, sharedSchemaResolver } from '../utils/shared-schema-resolver';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { TextareaField } from './textarea-field';

const CONDUCTIVITY_OPTIONS = CONDUCTIVITY_REQUIREMENTS.map((code) => ({ value: code, label: CONDUCTIVITY_LABELS[code] }));
const TEST_OPTIONS = PERIODIC_TEST_KINDS.map((code) => ({ value: code, label: PERIODIC_TEST_LABELS[code] }));
/** The most bands a service may have (the shared schema's limit). */
const MAX_BANDS = 6;

interface ServiceSettingsFormProps {
  service: SiteServiceDto;
  onSaved: (service: SiteServiceDto) => void;
  onCancel: () => void;
}

/** The settings of one service at one site: design factor bands by pressure, inspection, conductivity, tests, suction, food contact. */
export function ServiceSettingsForm({ service, onSaved, onCancel }: ServiceSettingsFormProps) {
  const units = useUnits();
  const resolver = useMemo(
    () =>
      sharedSchemaResolver<ServiceSettingsFormValues>({
        toInput: (values) => serviceSettingsInput(values, units, service.settings),
        schema: serviceSettingsSchema,
        renames: SERVICE_SETTINGS_RENAMES,
        labels: SERVICE_SETTINGS_LABELS,
      }),
    [units, service.settings],
  );
  const {
    control,
    register,
    handleSubmit,
    setError,
    watch,
    getValues,
    setValue,
    formState: { errors, isDirty },
  } = useForm<ServiceSettingsFormValues>({ resolver, mode: 'onChange', defaultValues: serviceSettingsFormValues(service.settings, units) });
  const bands = useFieldArray({ control, name: 'designFactorBands' });
  const save = useUpdateSiteService({ onSuccess: onSaved });
  const testKind = watch('periodicTest.kind');
  const pressure = PRESSURE_UNIT_SYMBOLS[units.pressureUnit];

  const onSubmit = handleSubmit((values) =>
    save.mutate(
      { siteId: service.siteId, serviceCode: service.serviceCode, settings: serviceSettingsInput(values, units, service.settings) },
      { onError: (error) => applyServerFieldError(error, setError, SERVICE_SETTINGS_FIELDS, SERVICE_SETTINGS_RENAMES) },
    ),
  );
  const bandsError = (errors.designFactorBands as { root?: { message?: string }; message?: string } | undefined)?.root?.message ?? errors.designFactorBands?.message;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={`Settings of ${service.name}`}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <Alert>
        A lower design factor leaves less margin between working and burst pressure. Change a published factor only on the word of the site's
        competent person and within local codes. Saving re-checks the assemblies in this service at this site.
      </Alert>

      <FormSection legend="Design factor by pressure" description={`Minimum burst ÷ maximum working pressure, band by band (${pressure}). The last band covers every higher pressure. Each factor names its source: a published text, or the site's own decision.`}>
        {bandsError ? <FieldError message={bandsError} /> : null}
        <ol className="flex flex-col gap-3" aria-label="Design factor bands">
          {bands.fields.map((field, index) => {
            const last = index === bands.fields.length - 1;
            const rowErrors = errors.designFactorBands?.[index];
            return (
              <li key={field.id} aria-label={`Band ${index + 1}`} className="flex flex-col gap-2 rounded-[var(--radius-control)] border-2 border-ink-200 bg-ink-50 p-3">
                <div className="flex min-h-11 items-center justify-between gap-3">
                  <span className="font-bold text-ink-900">Band {index + 1}</span>
                  {bands.fields.length > 1 ? (
                    <Button variant="ghost" icon={<CloseIcon />} onClick={() => bands.remove(index)} aria-label={`Remove band ${index + 1}`}>
                      Remove
                    </Button>
                  ) : null}
                </div>
                <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
                  {last ? (
                    <div className="flex flex-col gap-1.5">
                      <span className="font-semibold text-ink-900">Up to</span>
                      <span className="flex min-h-12 items-center rounded-[var(--radius-control)] border-2 border-dashed border-ink-300 bg-white px-3 text-ink-700">
                        {bands.fields.length === 1 ? 'Any pressure' : 'Any higher pressure'}
                      </span>
                    </div>
                  ) : (
                    <QuantityField label="Up to" unit={pressure} error={rowErrors?.upTo?.message} {...register(`designFactorBands.${index}.upTo`)} />
                  )}
                  <QuantityField label="Design factor" unit=": 1" error={rowErrors?.factor?.message} {...register(`designFactorBands.${index}.factor`)} />
                  <TextareaField
                    label="Source"
                    rows={2}
                    containerClassName="sm:col-span-2"
                    error={rowErrors?.source?.message}
                    {...register(`designFactorBands.${index}.source`)}
                  />
                </div>
              </li>
            );
          })}
        </ol>
        <div>
          <Button
            variant="secondary"
            icon={<PlusIcon />}
            disabled={bands.fields.length >= MAX_BANDS}
            // A new band goes before the open-ended one, which stays last; it starts from that band's factor.
            onClick={() => bands.insert(bands.fields.length - 1, { upTo: '', factor: getValues(`designFactorBands.${bands.fields.length - 1}.factor`), source: '' })}
          >
            Add a pressure band
          </Button>
        </div>
      </FormSection>

      <FormSection legend="Inspection and tests">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <QuantityField
            label="Inspection interval"
            unit="days"
            inputMode="numeric"
            hint="The default for positions in this service; criticality and a position's own interval can change it."
            error={errors.defaultInspectionIntervalDays?.message}
            {...register('defaultInspectionIntervalDays')}
          />
          <SelectField label="Conductivity" options={CONDUCTIVITY_OPTIONS} error={errors.conductivityRequired?.message} {...register('conductivityRequired')} />
          <SelectField label="Periodic test" placeholder="No periodic test" options={TEST_OPTIONS} error={errors.periodicTest?.kind?.message} {...register('periodicTest.kind', {
              deps: ['periodicTest.intervalDays'],
              // A year is the usual interval; it is there to change, not to be typed from nothing.
              onChange: (event: { target: { value: string } }) => {
                if (event.target.value && !getValues('periodicTest.intervalDays')) setValue('periodicTest.intervalDays', '365', { shouldDirty: true });
              },
            })} />
          {testKind ? (
            <QuantityField label="Test interval" unit="days" inputMode="numeric" error={errors.periodicTest?.intervalDays?.message} {...register('periodicTest.intervalDays')} />
          ) : null}
        </div>
      </FormSection>

      <FormSection legend="Duty">
        <Checkbox label="Suction duty" hint="The hose works under vacuum and must be rated for it." error={errors.suctionDuty?.message} {...register('suctionDuty')} />
        <Checkbox label="Food contact" hint="The tube must be certified for food contact." error={errors.foodContactRequired?.message} {...register('foodContactRequired')} />
      </FormSection>

      <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={save.isPending} disabled={!isDirty}>
          Save settings
        </Button>
      </div>
    </form>
  );
}
