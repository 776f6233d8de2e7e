import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure, toMm } from '@shared/units/units';
import type { Preferences } from '@shared/schemas/auth.schema';
import { Badge } from '@/components/ui/badge';
import { SelectField } from '@/components/ui/field';
import { numberOrNull } from '../form-values';
import { MeasureField } from '../measure-field';
import type { BuildValues } from './build-values';

interface FittingEndFieldsProps {
  end: 'endA' | 'endB';
  label: string;
  fittings: FittingTypeDto[];
  fittingTypeId: string;
  crimpText: string;
  sizeCode: string | null;
  units: Preferences;
  register: UseFormRegister<BuildValues>;
  errors: FieldErrors<BuildValues>;
}

/** One end: the fitting type, its rating and crimp specification at the hose's size, and the crimp as measured. */
export function FittingEndFields({ end, label, fittings, fittingTypeId, crimpText, sizeCode, units, register, errors }: FittingEndFieldsProps) {
  const fitting = fittings.find((f) => f.id === fittingTypeId) ?? null;
  const size = fitting && sizeCode ? (fitting.sizes.find((s) => s.sizeCode === sizeCode) ?? null) : null;
  const measured = numberOrNull(crimpText);
  const measuredMm = measured != null && Number.isFinite(measured) ? toMm(measured, units.lengthUnit) : null;
  const within =
    measuredMm != null && size?.crimpDiameterMm != null && size.crimpToleranceMm != null ? Math.abs(measuredMm - size.crimpDiameterMm) <= size.crimpToleranceMm + 1e-9 : null;
  const endErrors = errors[end];

  const spec = !fitting ? null : !sizeCode ? (
    'Choose the construction to see this fitting’s rating at the hose’s size.'
  ) : !size ? (
    <span className="font-semibold text-danger-800">This fitting type lists no {sizeLabel(sizeCode, units.lengthUnit)} size: check it suits the hose.</span>
  ) : (
    <>
      At {sizeLabel(sizeCode, units.lengthUnit)}: {size.ratingKpa != null ? `rated ${formatPressure(size.ratingKpa, units.pressureUnit)}` : 'no rating recorded'}
      {size.crimpDiameterMm != null
        ? `; crimp to ${formatLength(size.crimpDiameterMm, units.lengthUnit)}${size.crimpToleranceMm != null ? ` ± ${formatLength(size.crimpToleranceMm, units.lengthUnit)}` : ''}`
        : '; no crimp specification'}
      .
    </>
  );

  return (
    <fieldset className="flex flex-col gap-3 rounded-[var(--radius-control)] border border-ink-200 px-4 pt-2 pb-4">
      <legend className="px-1 text-lg font-semibold text-ink-900">{label}</legend>
      <SelectField
        label="Fitting type"
        placeholder="No fitting recorded"
        options={fittings.map((f) => ({ value: f.id, label: `${f.code} · ${f.name}` }))}
        hint={spec ?? undefined}
        error={endErrors?.fittingTypeId?.message}
        {...register(`${end}.fittingTypeId`)}
      />
      {fitting ? (
        <div className="flex flex-col gap-1.5">
          <MeasureField label="Crimp diameter as measured (optional)" unit={units.lengthUnit} error={endErrors?.crimpDiameter?.message} {...register(`${end}.crimpDiameter`)} />
          {within === true ? <Badge tone="success" className="self-start">Within specification</Badge> : null}
          {within === false ? <Badge tone="danger" className="self-start">Outside specification: re-crimp or scrap before it is tested</Badge> : null}
        </div>
      ) : null}
    </fieldset>
  );
}
