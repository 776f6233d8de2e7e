import { useMemo } from 'react';
import { useFieldArray, useForm, type FieldErrors } from 'react-hook-form';
import { FITTING_STYLE_LABELS, FITTING_STYLES, fittingTypeCreateSchema, fittingTypeUpdateSchema, type FittingTypeDto } from '@shared/schemas/register.schema';
import { SIZE_CLASSES, sizeLabel } from '@shared/sizes/nominal-sizes';
import { LENGTH_UNIT_SYMBOLS, PRESSURE_UNIT_SYMBOLS } from '@shared/units/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { DialogActions } from '@/components/ui/dialog';
import { FieldError, SelectField, TextField } from '@/components/ui/field';
import { CloseIcon, PlusIcon } from '@/components/ui/icons';
import { useCreateFittingType } from '../api/create-fitting-type';
import { useUpdateFittingType } from '../api/update-fitting-type';
import { useUnits } from '../hooks/use-units';
import {
  EMPTY_FITTING_TYPE,
  EMPTY_SIZE,
  FITTING_TYPE_FIELDS,
  FITTING_TYPE_LABELS,
  fittingTypeChange,
  fittingTypeFormValues,
  fittingTypeInput,
  fittingTypeUpdateCheckInput,
  type FittingTypeFormValues,
} from '../utils/fitting-type-form-values';
import { sizeOptionLabel } from '../utils/quantities';
import { applyServerFieldError, sharedSchemaResolver } from '../utils/shared-schema-resolver';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { TextareaField } from './textarea-field';

const STYLE_OPTIONS = FITTING_STYLES.map((code) => ({ value: code, label: FITTING_STYLE_LABELS[code] }));
/** The most sizes one fitting type lists (the shared schema's limit). */
const MAX_SIZES = 30;

interface FittingTypeFormProps {
  fittingType?: FittingTypeDto;
  onSaved: (fittingType: FittingTypeDto) => void;
  onCancel: () => void;
}

/** A fitting type and its list of sizes, each with its rating and crimp diameter, typed in the reader's units. */
export function FittingTypeForm({ fittingType, onSaved, onCancel }: FittingTypeFormProps) {
  const units = useUnits();
  const resolver = useMemo(
    () =>
      fittingType
        ? sharedSchemaResolver<FittingTypeFormValues>({
            toInput: (values) => fittingTypeUpdateCheckInput(values, units, fittingType),
            schema: fittingTypeUpdateSchema,
            labels: FITTING_TYPE_LABELS,
          })
        : sharedSchemaResolver<FittingTypeFormValues>({ toInput: (values) => fittingTypeInput(values, units), schema: fittingTypeCreateSchema, labels: FITTING_TYPE_LABELS }),
    [fittingType, units],
  );
  const {
    control,
    register,
    handleSubmit,
    setError,
    watch,
    formState: { errors, isDirty },
  } = useForm<FittingTypeFormValues>({
    resolver,
    mode: 'onChange',
    defaultValues: fittingType ? fittingTypeFormValues(fittingType, units) : EMPTY_FITTING_TYPE,
  });
  const sizes = useFieldArray({ control, name: 'sizes' });
  const create = useCreateFittingType({ onSuccess: onSaved });
  const update = useUpdateFittingType({ onSuccess: onSaved });
  const onServerError = (error: unknown) => applyServerFieldError(error, setError, FITTING_TYPE_FIELDS);

  const onSubmit = handleSubmit((values) => {
    if (fittingType) update.mutate({ id: fittingType.id, input: fittingTypeChange(values, units, fittingType) }, { onError: onServerError });
    else create.mutate(fittingTypeInput(values, units), { onError: onServerError });
  });

  const pressure = PRESSURE_UNIT_SYMBOLS[units.pressureUnit];
  const length = LENGTH_UNIT_SYMBOLS[units.lengthUnit];
  const sizeOptions = SIZE_CLASSES.map((size) => ({ value: size.code, label: sizeOptionLabel(size, units.lengthUnit) }));
  const rows = watch('sizes');
  const sizesError = (errors.sizes as FieldErrors<FittingTypeFormValues>['sizes'] & { root?: { message?: string } })?.root?.message ?? errors.sizes?.message;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={fittingType ? 'Edit fitting type' : 'New fitting type'}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}

      <FormSection legend="What it is">
        {fittingType ? (
          <div className="flex flex-col gap-1">
            <span className="font-semibold text-ink-900">Fitting code</span>
            <span className="font-mono text-lg text-ink-950">{fittingType.code}</span>
          </div>
        ) : (
          <TextField
            label="Fitting code"
            hint="Your plant's own code, such as CRIMP-JIC. Letters, digits, dots, dashes, underscores and slashes only."
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            error={errors.code?.message}
            data-autofocus
            {...register('code')}
          />
        )}
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <SelectField label="Style" placeholder="Choose the style" options={STYLE_OPTIONS} error={errors.style?.message} {...register('style')} />
          <TextField label="Material" hint="Such as zinc-plated steel or 316 stainless." autoComplete="off" error={errors.material?.message} {...register('material')} />
        </div>
      </FormSection>

      <FormSection
        legend="Sizes"
        description={`Each size the fitting is made in, with the rating the fitting maker gives it (${pressure}) and, for crimped fittings, the crimp diameter and its tolerance (${length}).`}
      >
        {sizesError ? <FieldError message={sizesError} /> : null}
        {sizes.fields.length === 0 ? <p className="text-ink-700">No sizes listed. Add the sizes this fitting is made in.</p> : null}
        <ol className="flex flex-col gap-3" aria-label="Sizes">
          {sizes.fields.map((field, index) => {
            const rowErrors = errors.sizes?.[index];
            const code = rows[index]?.sizeCode;
            const rowName = code ? sizeLabel(code, units.lengthUnit) : `size ${index + 1}`;
            return (
              <li key={field.id} className="flex flex-col gap-2 rounded-[var(--radius-control)] border-2 border-ink-200 bg-ink-50 p-3" aria-label={`Size ${index + 1}`}>
                <div className="flex items-center justify-between gap-3">
                  <span className="font-bold text-ink-900">
                    Size {index + 1}
                    {code ? <span className="font-normal text-ink-700"> · {rowName}</span> : null}
                  </span>
                  <Button variant="ghost" icon={<CloseIcon />} onClick={() => sizes.remove(index)} aria-label={`Remove ${rowName}`}>
                    Remove
                  </Button>
                </div>
                <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
                  <SelectField label="Size" placeholder="Choose a size" options={sizeOptions} error={rowErrors?.sizeCode?.message} {...register(`sizes.${index}.sizeCode`)} />
                  <QuantityField label="Rating" unit={pressure} error={rowErrors?.rating?.message} {...register(`sizes.${index}.rating`)} />
                  <QuantityField label="Crimp diameter" unit={length} error={rowErrors?.crimpDiameter?.message} {...register(`sizes.${index}.crimpDiameter`)} />
                  <QuantityField label="Crimp tolerance, ±" unit={length} error={rowErrors?.crimpTolerance?.message} {...register(`sizes.${index}.crimpTolerance`)} />
                </div>
              </li>
            );
          })}
        </ol>
        <div>
          <Button variant="secondary" icon={<PlusIcon />} onClick={() => sizes.append({ ...EMPTY_SIZE })} disabled={sizes.fields.length >= MAX_SIZES}>
            Add a size
          </Button>
        </div>
      </FormSection>

      <TextareaField label="Notes" error={errors.notes?.message} {...register('notes')} />

      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={create.isPending || update.isPending} disabled={Boolean(fittingType) && !isDirty}>
          {fittingType ? 'Save changes' : 'Add fitting type'}
        </Button>
      </DialogActions>
    </form>
  );
}
