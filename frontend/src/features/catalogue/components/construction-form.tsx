import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import { TUBE_COMPOUND_NAMES, TUBE_COMPOUNDS } from '@shared/checks/compatibility';
import { ELECTRICAL_PROPERTIES, REINFORCEMENTS } from '@shared/checks/types';
import { constructionCreateSchema, constructionUpdateSchema, type ConstructionDto } from '@shared/schemas/register.schema';
import { SIZE_CLASSES } from '@shared/sizes/nominal-sizes';
import { LENGTH_UNIT_SYMBOLS, PRESSURE_UNIT_SYMBOLS, TEMPERATURE_UNIT_SYMBOLS } from '@shared/units/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { DialogActions } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { useCreateConstruction } from '../api/create-construction';
import { useUpdateConstruction } from '../api/update-construction';
import { useUnits } from '../hooks/use-units';
import {
  CONSTRUCTION_FIELDS,
  CONSTRUCTION_LABELS,
  CONSTRUCTION_RENAMES,
  constructionChange,
  constructionFormValues,
  constructionInput,
  constructionUpdateCheckInput,
  EMPTY_CONSTRUCTION,
  type ConstructionFormValues,
} from '../utils/construction-form-values';
import { ELECTRICAL_LABELS, REINFORCEMENT_LABELS } from '../utils/labels';
import { sizeOptionLabel, weightUnitFor } from '../utils/quantities';
import { applyServerFieldError, sharedSchemaResolver } from '../utils/shared-schema-resolver';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { TextareaField } from './textarea-field';

const TUBE_OPTIONS = TUBE_COMPOUNDS.map((code) => ({ value: code, label: `${code} · ${TUBE_COMPOUND_NAMES[code]}` }));
const REINFORCEMENT_OPTIONS = REINFORCEMENTS.map((code) => ({ value: code, label: REINFORCEMENT_LABELS[code] }));
const ELECTRICAL_OPTIONS = ELECTRICAL_PROPERTIES.map((code) => ({ value: code, label: ELECTRICAL_LABELS[code] }));
const FOOD_OPTIONS = [
  { value: 'yes', label: 'Certified for food contact' },
  { value: 'no', label: 'Not certified for food contact' },
];

interface ConstructionFormProps {
  /** The construction to change; none to add a new one. */
  construction?: ConstructionDto;
  onSaved: (construction: ConstructionDto) => void;
  onCancel: () => void;
}

/** Every property of a construction, typed in the reader's units; checked as it is typed with the shared schema. */
export function ConstructionForm({ construction, onSaved, onCancel }: ConstructionFormProps) {
  const units = useUnits();
  const editing = Boolean(construction);
  const resolver = useMemo(
    () =>
      editing
        ? sharedSchemaResolver<ConstructionFormValues>({
            toInput: (values) => constructionUpdateCheckInput(values, units),
            schema: constructionUpdateSchema,
            renames: CONSTRUCTION_RENAMES,
            labels: CONSTRUCTION_LABELS,
          })
        : sharedSchemaResolver<ConstructionFormValues>({
            toInput: (values) => constructionInput(values, units),
            schema: constructionCreateSchema,
            renames: CONSTRUCTION_RENAMES,
            labels: CONSTRUCTION_LABELS,
          }),
    [editing, units],
  );
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, dirtyFields, isDirty },
  } = useForm<ConstructionFormValues>({
    resolver,
    mode: 'onChange',
    defaultValues: construction ? constructionFormValues(construction, units) : EMPTY_CONSTRUCTION,
  });

  const create = useCreateConstruction({ onSuccess: onSaved });
  const update = useUpdateConstruction({ onSuccess: onSaved });
  const saving = create.isPending || update.isPending;
  const onServerError = (error: unknown) => applyServerFieldError(error, setError, CONSTRUCTION_FIELDS, CONSTRUCTION_RENAMES);

  const onSubmit = handleSubmit((values) => {
    if (construction) {
      update.mutate({ id: construction.id, input: constructionChange(values, units, dirtyFields) }, { onError: onServerError });
    } else {
      create.mutate(constructionInput(values, units), { onError: onServerError });
    }
  });

  const pressure = PRESSURE_UNIT_SYMBOLS[units.pressureUnit];
  const temperature = TEMPERATURE_UNIT_SYMBOLS[units.temperatureUnit];
  const length = LENGTH_UNIT_SYMBOLS[units.lengthUnit];
  const sizeOptions = SIZE_CLASSES.map((size) => ({ value: size.code, label: sizeOptionLabel(size, units.lengthUnit) }));
  const error = (field: keyof ConstructionFormValues) => errors[field]?.message;
  const months = { inputMode: 'numeric' as const, autoComplete: 'off' };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label={editing ? 'Edit construction' : 'New construction'}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <p className="text-sm text-ink-700">
        Numbers are in your units ({pressure}, {length}, {temperature}); Ferrule stores them exactly and converts them for everyone else. Leave
        a field empty when the maker does not state it.
      </p>

      <FormSection legend="What it is">
        {editing ? (
          <div className="flex flex-col gap-1">
            <span className="font-semibold text-ink-900">Construction code</span>
            <span className="font-mono text-lg text-ink-950">{construction?.code}</span>
            <span className="text-sm text-ink-600">A code stays with the construction for good; assemblies are recorded against it.</span>
          </div>
        ) : (
          <TextField
            label="Construction code"
            hint="Your plant's own code, such as AIR-19-2W. Letters, digits, dots, dashes, underscores and slashes only."
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            error={error('code')}
            data-autofocus
            {...register('code')}
          />
        )}
        <TextField label="Name" hint="What a fitter calls it: “Air hose, 2-wire braid”." autoComplete="off" error={error('name')} {...register('name')} />
        <SelectField label="Nominal size" placeholder="Choose a size" options={sizeOptions} error={error('sizeCode')} {...register('sizeCode')} />
      </FormSection>

      <FormSection legend="Build">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <SelectField label="Tube compound" placeholder="Not recorded" options={TUBE_OPTIONS} error={error('tubeCompound')} {...register('tubeCompound')} />
          <SelectField label="Reinforcement" placeholder="Not recorded" options={REINFORCEMENT_OPTIONS} error={error('reinforcement')} {...register('reinforcement')} />
        </div>
        <TextField label="Cover compound" hint="As the maker names it, such as CR or SBR." autoComplete="off" error={error('coverCompound')} {...register('coverCompound')} />
      </FormSection>

      <FormSection legend="Ratings" description="From the maker's data sheet. Never use a hose above its rating.">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <QuantityField label="Working pressure" unit={pressure} error={error('workingPressure')} {...register('workingPressure', { deps: ['burstPressure'] })} />
          <QuantityField label="Burst pressure" unit={pressure} error={error('burstPressure')} {...register('burstPressure')} />
          <QuantityField label="Lowest temperature" unit={temperature} error={error('minTemp')} {...register('minTemp', { deps: ['maxTemp'] })} />
          <QuantityField label="Highest temperature" unit={temperature} error={error('maxTemp')} {...register('maxTemp')} />
          <QuantityField label="Minimum bend radius" unit={length} error={error('minBendRadius')} {...register('minBendRadius')} />
          <QuantityField label="Weight" unit={weightUnitFor(units.lengthUnit)} error={error('weight')} {...register('weight')} />
        </div>
        <QuantityField
          label="Vacuum rating"
          unit={pressure}
          hint="How far below atmospheric the hose holds without collapsing. Leave empty when it is not rated for suction."
          containerClassName="sm:max-w-[calc(50%-0.5rem)]"
          error={error('vacuumRating')}
          {...register('vacuumRating')}
        />
      </FormSection>

      <FormSection legend="Electrical and food contact">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <SelectField label="Electrical property" placeholder="Not recorded" options={ELECTRICAL_OPTIONS} error={error('electrical')} {...register('electrical')} />
          <SelectField label="Food contact" placeholder="Not recorded" options={FOOD_OPTIONS} error={error('foodContactCertified')} {...register('foodContactCertified')} />
        </div>
      </FormSection>

      <FormSection legend="Life limits" description="Whole months. Leave empty when the plant sets no limit.">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">
          <QuantityField label="Service life" unit="months" hint="From the build date, storage included." error={error('serviceLifeMonths')} {...months} {...register('serviceLifeMonths')} />
          <QuantityField label="Shelf life" unit="months" hint="Oldest the bulk hose may be when assembled." error={error('shelfLifeMonths')} {...months} {...register('shelfLifeMonths')} />
          <QuantityField label="Storage life" unit="months" hint="Longest in stock between build and install." error={error('storageLifeMonths')} {...months} {...register('storageLifeMonths')} />
        </div>
      </FormSection>

      <FormSection legend="Maker">
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <TextField label="Maker" hint="Free text, as on the invoice." autoComplete="off" error={error('maker')} {...register('maker')} />
          <TextField label="Part number" hint="The maker's own number, as written." autoComplete="off" spellCheck={false} error={error('partNumber')} {...register('partNumber')} />
        </div>
        <TextareaField label="Notes" error={error('notes')} {...register('notes')} />
      </FormSection>

      {editing ? (
        <Alert>Saving a change re-checks every assembly built from this construction against its position.</Alert>
      ) : null}
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={saving} disabled={editing && !isDirty}>
          {editing ? 'Save changes' : 'Add construction'}
        </Button>
      </DialogActions>
    </form>
  );
}
