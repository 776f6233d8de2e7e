import type { Preferences } from '@shared/schemas/auth.schema';
import type { FittingSizeDto, FittingTypeDto } from '@shared/schemas/register.schema';
import type { FittingTypeCreateBody } from '../api/create-fitting-type';
import type { FittingTypeUpdateBody } from '../api/update-fitting-type';
import { lengthFieldText, parseDecimal, pressureFieldText } from './quantities';

export interface FittingSizeFormValues {
  sizeCode: string;
  rating: string;
  crimpDiameter: string;
  crimpTolerance: string;
}

/** A fitting type as typed in the form: numbers as typed, in the reader's units. */
export interface FittingTypeFormValues {
  code: string;
  name: string;
  style: string;
  material: string;
  notes: string;
  sizes: FittingSizeFormValues[];
}

export const FITTING_TYPE_FIELDS = ['code', 'name', 'style', 'material', 'notes', 'sizes'] as const;

export const FITTING_TYPE_LABELS: Record<string, string> = {
  code: 'Fitting code',
  name: 'Name',
  material: 'Material',
  'sizes.*.sizeCode': 'Size',
  'sizes.*.rating': 'Rating',
  'sizes.*.crimpDiameter': 'Crimp diameter',
  'sizes.*.crimpTolerance': 'Crimp tolerance',
};

export const EMPTY_SIZE: FittingSizeFormValues = { sizeCode: '', rating: '', crimpDiameter: '', crimpTolerance: '' };
export const EMPTY_FITTING_TYPE: FittingTypeFormValues = { code: '', name: '', style: '', material: '', notes: '', sizes: [{ ...EMPTY_SIZE }] };

function sizeFormValues(size: FittingSizeDto, units: Preferences): FittingSizeFormValues {
  return {
    sizeCode: size.sizeCode,
    rating: pressureFieldText(size.ratingKpa, units.pressureUnit),
    crimpDiameter: lengthFieldText(size.crimpDiameterMm, units.lengthUnit),
    crimpTolerance: lengthFieldText(size.crimpToleranceMm, units.lengthUnit),
  };
}

export function fittingTypeFormValues(f: FittingTypeDto, units: Preferences): FittingTypeFormValues {
  return {
    code: f.code,
    name: f.name,
    style: f.style,
    material: f.material,
    notes: f.notes ?? '',
    sizes: f.sizes.map((s) => sizeFormValues(s, units)),
  };
}

type SizeBody = FittingTypeCreateBody['sizes'][number];

/**
 * One quantity of a size row. A number left as it was shown is sent as the stored value in the
 * stored unit, so saving a list where one row changed does not nudge the others by a rounding.
 */
function quantity<U extends string>(text: string, unit: U, shown: string | undefined, storedValue: number | null | undefined, storedUnit: U): { value: number; unit: U } | null {
  if (shown !== undefined && text.trim() === shown && storedValue != null) return { value: storedValue, unit: storedUnit };
  const value = parseDecimal(text);
  return value == null ? null : { value, unit };
}

/** The request body of the typed sizes; `original`, when editing, is the fitting type as stored. */
export function sizesInput(rows: FittingSizeFormValues[], units: Preferences, original?: FittingTypeDto): SizeBody[] {
  const stored = new Map((original?.sizes ?? []).map((s) => [s.sizeCode, s]));
  return rows.map((row) => {
    const was = stored.get(row.sizeCode);
    const shown = was ? sizeFormValues(was, units) : undefined;
    return {
      sizeCode: row.sizeCode,
      rating: quantity(row.rating, units.pressureUnit, shown?.rating, was?.ratingKpa, 'kPa'),
      crimpDiameter: quantity(row.crimpDiameter, units.lengthUnit, shown?.crimpDiameter, was?.crimpDiameterMm, 'mm'),
      crimpTolerance: quantity(row.crimpTolerance, units.lengthUnit, shown?.crimpTolerance, was?.crimpToleranceMm, 'mm'),
    };
  });
}

const orNull = (text: string) => (text.trim() === '' ? null : text.trim());

export function fittingTypeInput(v: FittingTypeFormValues, units: Preferences): FittingTypeCreateBody {
  return {
    code: v.code,
    name: v.name,
    style: v.style as FittingTypeCreateBody['style'],
    material: v.material,
    sizes: sizesInput(v.sizes, units),
    notes: orNull(v.notes),
  };
}

/** Everything but the code, as an edit is checked. */
export function fittingTypeUpdateCheckInput(v: FittingTypeFormValues, units: Preferences, original: FittingTypeDto): FittingTypeUpdateBody {
  return { name: v.name, style: v.style as FittingTypeCreateBody['style'], material: v.material, sizes: sizesInput(v.sizes, units, original), notes: orNull(v.notes) };
}

/** Only what changed; the sizes go as a whole list when any row changed, was added or was removed. */
export function fittingTypeChange(v: FittingTypeFormValues, units: Preferences, original: FittingTypeDto): FittingTypeUpdateBody {
  const before = fittingTypeFormValues(original, units);
  const full = fittingTypeUpdateCheckInput(v, units, original);
  const change: FittingTypeUpdateBody = {};
  if (v.name !== before.name) change.name = full.name;
  if (v.style !== before.style) change.style = full.style;
  if (v.material !== before.material) change.material = full.material;
  if (v.notes !== before.notes) change.notes = full.notes;
  if (JSON.stringify(v.sizes) !== JSON.stringify(before.sizes)) change.sizes = full.sizes;
  return change;
}
