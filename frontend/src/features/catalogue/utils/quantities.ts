import type { LengthUnit, PressureUnit, TemperatureUnit } from '@shared/schemas/auth.schema';
import { sizeLabel, type SizeClass } from '@shared/sizes/nominal-sizes';
import { fromCelsius, fromKpa, fromMm, MM_PER_FOOT, NO_VALUE } from '@shared/units/units';

/** 1 lb = 0.453 592 37 kg exactly (international pound, 1959). */
const KG_PER_POUND = 0.45359237;
/** 1 lb/ft in kg/m: 0.453 592 37 kg ÷ 0.3048 m = 1.488 163 94… kg/m. */
export const KG_PER_M_PER_LB_PER_FT = KG_PER_POUND / (MM_PER_FOOT / 1000);

/** Weight per length is shown in lb/ft to someone who reads lengths in inches, otherwise in kg/m. */
export type WeightUnit = 'kg/m' | 'lb/ft';
export const weightUnitFor = (lengthUnit: LengthUnit): WeightUnit => (lengthUnit === 'in' ? 'lb/ft' : 'kg/m');

export function fromKgPerM(kgPerM: number, unit: WeightUnit): number {
  return unit === 'kg/m' ? kgPerM : kgPerM / KG_PER_M_PER_LB_PER_FT;
}

export function toKgPerM(value: number, unit: WeightUnit): number {
  return unit === 'kg/m' ? value : value * KG_PER_M_PER_LB_PER_FT;
}

/** A stored kg/m value in the reader's weight unit, rounded for display only: "1.25 kg/m", "0.84 lb/ft". */
export function formatWeight(kgPerM: number | null | undefined, lengthUnit: LengthUnit): string {
  if (kgPerM == null || !Number.isFinite(kgPerM)) return NO_VALUE;
  const unit = weightUnitFor(lengthUnit);
  const value = fromKgPerM(kgPerM, unit);
  return `${value.toFixed(value >= 100 ? 0 : value >= 10 ? 1 : 2)} ${unit}`;
}

/**
 * A stored value put back into a form field: enough digits that saving it again changes nothing
 * a gauge could read, and none of the noise of the conversion (150 psi, not 150.00000000000003).
 */
export function fieldText(value: number | null | undefined): string {
  if (value == null || !Number.isFinite(value)) return '';
  return String(Number(value.toPrecision(7)));
}

export const pressureFieldText = (kpa: number | null | undefined, unit: PressureUnit) => (kpa == null ? '' : fieldText(fromKpa(kpa, unit)));
export const lengthFieldText = (mm: number | null | undefined, unit: LengthUnit) => (mm == null ? '' : fieldText(fromMm(mm, unit)));
export const temperatureFieldText = (c: number | null | undefined, unit: TemperatureUnit) => (c == null ? '' : fieldText(fromCelsius(c, unit)));
export const weightFieldText = (kgPerM: number | null | undefined, lengthUnit: LengthUnit) =>
  kgPerM == null ? '' : fieldText(fromKgPerM(kgPerM, weightUnitFor(lengthUnit)));

/** What a person typed in a number field: null when empty, NaN when it is not a number. A decimal comma is read as a point. */
export function parseDecimal(text: string | null | undefined): number | null {
  const trimmed = (text ?? '').trim().replace(/\s+/g, '');
  if (trimmed === '') return null;
  const normal = trimmed.replace(',', '.');
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(normal) ? Number(normal) : Number.NaN;
}

/** A whole number typed in a field: null when empty, NaN when it is not a whole number. */
export function parseWhole(text: string | null | undefined): number | null {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return null;
  return /^\d+$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** A size for a picker, in the reader's unit first and the other ways it is written after: "3/4 in (19 mm, −12)". */
export function sizeOptionLabel(size: SizeClass, lengthUnit: LengthUnit): string {
  const first = sizeLabel(size.code, lengthUnit);
  const other = lengthUnit === 'in' ? `${size.nominalBoreMm} mm` : `${size.inch} in`;
  return `${first} (${other}, −${size.dash})`;
}
