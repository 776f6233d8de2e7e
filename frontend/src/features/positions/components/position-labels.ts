import type { Preferences } from '@shared/schemas/auth.schema';
import type { PositionDto, ReferenceDto } from '@shared/schemas/register.schema';
import { mediumLabel } from '@shared/checks/compatibility';
import { sizeLabel, type SizeClass } from '@shared/sizes/nominal-sizes';
import { formatTemperature } from '@shared/units/units';

export const NOT_RECORDED = 'Not recorded';

export function serviceNameOf(reference: ReferenceDto | undefined, code: string): string {
  return reference?.services.find((s) => s.code === code)?.name ?? code;
}

export function mediumNameOf(reference: ReferenceDto | undefined, code: string | null): string {
  if (!code) return NOT_RECORDED;
  const medium = reference?.media.find((m) => m.code === code);
  return medium ? mediumLabel(medium) : code;
}

export function criticalityOf(reference: ReferenceDto | undefined, code: string) {
  return reference?.criticalityLevels.find((c) => c.code === code) ?? null;
}

export function removalReasonOf(reference: ReferenceDto | undefined, code: string | null) {
  if (!code) return null;
  return reference?.removalReasons.find((r) => r.code === code) ?? null;
}

/** A size for a picker, in the reader's unit first and the other ways it is written after: "3/4 in (19 mm, −12)". */
export function sizeOptionLabel(size: SizeClass, lengthUnit: Preferences['lengthUnit']): string {
  const other = lengthUnit === 'in' ? `${size.nominalBoreMm} mm` : `${size.inch} in`;
  return `${sizeLabel(size.code, lengthUnit)} (${other}, −${size.dash})`;
}

/** "−20 °C to 60 °C", "up to 60 °C", "from −20 °C", or not recorded. */
export function temperatureRange(position: Pick<PositionDto, 'minTempC' | 'maxTempC'>, unit: Preferences['temperatureUnit']): string {
  const { minTempC: min, maxTempC: max } = position;
  if (min == null && max == null) return NOT_RECORDED;
  if (min == null) return `up to ${formatTemperature(max, unit)}`;
  if (max == null) return `from ${formatTemperature(min, unit)}`;
  return `${formatTemperature(min, unit)} to ${formatTemperature(max, unit)}`;
}

export function yesNo(value: boolean | null): string {
  return value == null ? NOT_RECORDED : value ? 'Yes' : 'No';
}

export const days = (n: number) => `${n.toLocaleString()} ${n === 1 ? 'day' : 'days'}`;
