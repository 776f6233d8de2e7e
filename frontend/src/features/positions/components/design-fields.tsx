import { useFormContext, useWatch } from 'react-hook-form';
import type { Criticality } from '@shared/services/criticality';
import { inspectionIntervalDays } from '@shared/services/criticality';
import type { LengthUnit, Preferences, PressureUnit, TemperatureUnit } from '@shared/schemas/auth.schema';
import type { PositionDto, ReferenceDto } from '@shared/schemas/register.schema';
import { mediumLabel } from '@shared/checks/compatibility';
import { fromCelsius, fromKpa, fromMm, LENGTH_UNIT_SYMBOLS, PRESSURE_UNIT_SYMBOLS, TEMPERATURE_UNIT_SYMBOLS } from '@shared/units/units';
import { SelectField, TextField } from '@/components/ui/field';
import { RadioTiles } from '@/components/ui/radio-tiles';
import { useSiteServices } from '../api/get-site-services';
import { days, sizeOptionLabel } from './position-labels';
import { editableNumber, messageOf, QuantityField, type Quantity } from './quantity-input';

/** The design conditions as the forms hold them: quantities in the reader's units, empty as null. */
export interface DesignValues {
  serviceCode: string;
  mediumCode: string | null;
  maxOperatingPressure: Quantity<PressureUnit> | null;
  minTemp: Quantity<TemperatureUnit> | null;
  maxTemp: Quantity<TemperatureUnit> | null;
  sizeCode: string;
  requiredLength: Quantity<LengthUnit> | null;
  endAConnection: string | null;
  endBConnection: string | null;
  suctionDuty: boolean | null;
  routedBendRadius: Quantity<LengthUnit> | null;
  criticality: Criticality;
  inspectionIntervalDays: number | null;
}

export const DESIGN_FIELDS = [
  'serviceCode',
  'mediumCode',
  'maxOperatingPressure',
  'minTemp',
  'maxTemp',
  'sizeCode',
  'requiredLength',
  'endAConnection',
  'endBConnection',
  'suctionDuty',
  'routedBendRadius',
  'criticality',
  'inspectionIntervalDays',
] as const satisfies ReadonlyArray<keyof DesignValues>;

/** The design conditions kept as `{ value, unit }`. */
export const QUANTITY_FIELDS = ['maxOperatingPressure', 'minTemp', 'maxTemp', 'requiredLength', 'routedBendRadius'] as const;

const pressure = (kpa: number | null, unit: PressureUnit): Quantity<PressureUnit> | null => (kpa == null ? null : { value: editableNumber(fromKpa(kpa, unit)), unit });
const length = (mm: number | null, unit: LengthUnit): Quantity<LengthUnit> | null => (mm == null ? null : { value: editableNumber(fromMm(mm, unit)), unit });
const temperature = (c: number | null, unit: TemperatureUnit): Quantity<TemperatureUnit> | null => (c == null ? null : { value: editableNumber(fromCelsius(c, unit)), unit });

/** A position's design conditions in the reader's units, or a new position's starting values. */
export function designValuesOf(position: PositionDto | null, units: Preferences): DesignValues {
  return {
    serviceCode: position?.serviceCode ?? '',
    mediumCode: position?.mediumCode ?? null,
    maxOperatingPressure: pressure(position?.maxOperatingPressureKpa ?? null, units.pressureUnit),
    minTemp: temperature(position?.minTempC ?? null, units.temperatureUnit),
    maxTemp: temperature(position?.maxTempC ?? null, units.temperatureUnit),
    sizeCode: position?.sizeCode ?? '',
    requiredLength: length(position?.requiredLengthMm ?? null, units.lengthUnit),
    endAConnection: position?.endAConnection ?? null,
    endBConnection: position?.endBConnection ?? null,
    suctionDuty: position?.suctionDuty ?? null,
    routedBendRadius: length(position?.routedBendRadiusMm ?? null, units.lengthUnit),
    criticality: (position?.criticality as Criticality | undefined) ?? 'medium',
    inspectionIntervalDays: position?.inspectionIntervalDays ?? null,
  };
}

const emptyToNull = (value: unknown) => (value === '' || value == null ? null : value);
const wholeOrNull = (value: unknown) => {
  const text = String(value ?? '').trim();
  if (text === '') return null;
  return /^\d+$/.test(text) ? Number(text) : Number.NaN;
};
const booleanOrNull = (value: unknown) => (value === 'true' ? true : value === 'false' ? false : null);

/** zod's words for a number that is not one are not a fitter's. */
const intervalMessage = (message: string | undefined) => (message && /NaN|expected number/i.test(message) ? 'Enter the interval as a whole number of days' : message);

interface DesignFieldsProps {
  reference: ReferenceDto;
  units: Preferences;
  /** The site whose service settings set the default inspection interval; empty until one is chosen. */
  siteId: string;
}

/** Every design condition of a position, for the new-position and edit forms. */
export function DesignFields({ reference, units, siteId }: DesignFieldsProps) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<DesignValues>();
  const [serviceCode, criticality] = useWatch({ control, name: ['serviceCode', 'criticality'] });
  const siteServices = useSiteServices(siteId);
  const service = siteServices.data?.find((s) => s.serviceCode === serviceCode);
  const level = reference.criticalityLevels.find((c) => c.code === criticality);
  const serviceDays = service?.settings.defaultInspectionIntervalDays;
  const intervalHint =
    serviceDays && level
      ? `Leave empty to use ${service.name.toLowerCase()}'s interval at this site: every ${days(serviceDays)}, ${days(inspectionIntervalDays(serviceDays, level.code))} at ${level.label.toLowerCase()} criticality.`
      : "Leave empty to use the service's interval at this site, adjusted for criticality.";

  const p = PRESSURE_UNIT_SYMBOLS[units.pressureUnit];
  const t = TEMPERATURE_UNIT_SYMBOLS[units.temperatureUnit];
  const l = LENGTH_UNIT_SYMBOLS[units.lengthUnit];

  return (
    <div className="flex flex-col gap-5">
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <SelectField
          label="Service"
          placeholder="Choose the service"
          options={reference.services.map((s) => ({ value: s.code, label: s.name }))}
          error={errors.serviceCode?.message}
          {...register('serviceCode')}
        />
        <SelectField
          label="Size"
          placeholder="Choose the nominal size"
          options={reference.sizeClasses.map((s) => ({ value: s.code, label: sizeOptionLabel(s, units.lengthUnit) }))}
          error={errors.sizeCode?.message}
          {...register('sizeCode')}
        />
        <SelectField
          label="Medium"
          placeholder="Not recorded"
          hint="What flows through the hose; the tube compound is checked against it."
          containerClassName="sm:col-span-2"
          options={reference.media.map((m) => ({ value: m.code, label: mediumLabel(m) }))}
          error={errors.mediumCode?.message}
          {...register('mediumCode', { setValueAs: emptyToNull })}
        />
        <QuantityField<DesignValues> name="maxOperatingPressure" label="Maximum operating pressure" unit={units.pressureUnit} symbol={p} hint="The highest the hose sees here, surges included." />
        <SelectField
          label="Suction duty"
          placeholder="Not recorded"
          hint="Under vacuum, the hose needs a vacuum rating."
          options={[
            { value: 'true', label: 'Yes, it works under vacuum' },
            { value: 'false', label: 'No' },
          ]}
          error={errors.suctionDuty?.message}
          {...register('suctionDuty', { setValueAs: booleanOrNull })}
        />
        <QuantityField<DesignValues> name="minTemp" label="Lowest temperature" unit={units.temperatureUnit} symbol={t} />
        <QuantityField<DesignValues> name="maxTemp" label="Highest temperature" unit={units.temperatureUnit} symbol={t} />
        <QuantityField<DesignValues> name="requiredLength" label="Required length" unit={units.lengthUnit} symbol={l} hint="Overall, fittings included." />
        <QuantityField<DesignValues> name="routedBendRadius" label="Routed bend radius" unit={units.lengthUnit} symbol={l} hint="The tightest bend it is routed through." />
        <TextField label="End A connection" autoComplete="off" placeholder="e.g. Claw coupling, 1 in" error={errors.endAConnection?.message} {...register('endAConnection', { setValueAs: emptyToNull })} />
        <TextField label="End B connection" autoComplete="off" placeholder="e.g. 2 in cam and groove" error={errors.endBConnection?.message} {...register('endBConnection', { setValueAs: emptyToNull })} />
        <TextField
          label="Inspection interval, days"
          inputMode="numeric"
          autoComplete="off"
          containerClassName="sm:col-span-2"
          className="sm:max-w-48"
          hint={intervalHint}
          error={intervalMessage(messageOf(errors.inspectionIntervalDays))}
          {...register('inspectionIntervalDays', { setValueAs: wholeOrNull })}
        />
      </div>
      <RadioTiles
        legend="Criticality"
        options={reference.criticalityLevels.map((c) => ({ value: c.code, label: c.label, description: c.definition }))}
        error={errors.criticality?.message}
        {...register('criticality')}
      />
    </div>
  );
}
