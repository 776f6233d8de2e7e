import type { Preferences } from '@shared/schemas/auth.schema';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import type { ConstructionCreateBody } from '../api/create-construction';
import type { ConstructionUpdateBody } from '../api/update-construction';
import { lengthFieldText, parseDecimal, parseWhole, pressureFieldText, temperatureFieldText, toKgPerM, weightFieldText, weightUnitFor } from './quantities';

/** A construction as typed in the form: every number as the text typed, in the reader's units. */
export interface ConstructionFormValues {
  code: string;
  name: string;
  sizeCode: string;
  tubeCompound: string;
  reinforcement: string;
  coverCompound: string;
  workingPressure: string;
  burstPressure: string;
  vacuumRating: string;
  minTemp: string;
  maxTemp: string;
  minBendRadius: string;
  /** In kg/m, or lb/ft for a reader of inches. */
  weight: string;
  electrical: string;
  /** '' not recorded, 'yes' certified, 'no' not certified. */
  foodContactCertified: '' | 'yes' | 'no';
  maker: string;
  partNumber: string;
  serviceLifeMonths: string;
  shelfLifeMonths: string;
  storageLifeMonths: string;
  notes: string;
}

export const CONSTRUCTION_FIELDS = [
  'code',
  'name',
  'sizeCode',
  'tubeCompound',
  'reinforcement',
  'coverCompound',
  'workingPressure',
  'burstPressure',
  'vacuumRating',
  'minTemp',
  'maxTemp',
  'minBendRadius',
  'weight',
  'electrical',
  'foodContactCertified',
  'maker',
  'partNumber',
  'serviceLifeMonths',
  'shelfLifeMonths',
  'storageLifeMonths',
  'notes',
] as const satisfies ReadonlyArray<keyof ConstructionFormValues>;

/** The input field the weight is sent in. */
export const CONSTRUCTION_RENAMES = { weightKgPerM: 'weight' };

export const CONSTRUCTION_LABELS: Record<string, string> = {
  code: 'Construction code',
  name: 'Name',
  sizeCode: 'Nominal size',
  workingPressure: 'Working pressure',
  burstPressure: 'Burst pressure',
  vacuumRating: 'Vacuum rating',
  minTemp: 'Lowest temperature',
  maxTemp: 'Highest temperature',
  minBendRadius: 'Minimum bend radius',
  weight: 'Weight',
  serviceLifeMonths: 'Service life',
  shelfLifeMonths: 'Shelf life',
  storageLifeMonths: 'Storage life',
};

export const EMPTY_CONSTRUCTION: ConstructionFormValues = {
  code: '',
  name: '',
  sizeCode: '',
  tubeCompound: '',
  reinforcement: '',
  coverCompound: '',
  workingPressure: '',
  burstPressure: '',
  vacuumRating: '',
  minTemp: '',
  maxTemp: '',
  minBendRadius: '',
  weight: '',
  electrical: '',
  foodContactCertified: '',
  maker: '',
  partNumber: '',
  serviceLifeMonths: '',
  shelfLifeMonths: '',
  storageLifeMonths: '',
  notes: '',
};

const numberText = (n: number | null) => (n == null ? '' : String(n));

/** A stored construction in the form, in the reader's units. */
export function constructionFormValues(c: ConstructionDto, units: Preferences): ConstructionFormValues {
  return {
    code: c.code,
    name: c.name,
    sizeCode: c.sizeCode,
    tubeCompound: c.tubeCompound ?? '',
    reinforcement: c.reinforcement ?? '',
    coverCompound: c.coverCompound ?? '',
    workingPressure: pressureFieldText(c.workingPressureKpa, units.pressureUnit),
    burstPressure: pressureFieldText(c.burstPressureKpa, units.pressureUnit),
    vacuumRating: pressureFieldText(c.vacuumRatingKpa, units.pressureUnit),
    minTemp: temperatureFieldText(c.minTempC, units.temperatureUnit),
    maxTemp: temperatureFieldText(c.maxTempC, units.temperatureUnit),
    minBendRadius: lengthFieldText(c.minBendRadiusMm, units.lengthUnit),
    weight: weightFieldText(c.weightKgPerM, units.lengthUnit),
    electrical: c.electrical ?? '',
    foodContactCertified: c.foodContactCertified == null ? '' : c.foodContactCertified ? 'yes' : 'no',
    maker: c.maker ?? '',
    partNumber: c.partNumber ?? '',
    serviceLifeMonths: numberText(c.serviceLifeMonths),
    shelfLifeMonths: numberText(c.shelfLifeMonths),
    storageLifeMonths: numberText(c.storageLifeMonths),
    notes: c.notes ?? '',
  };
}

const orNull = (text: string) => (text.trim() === '' ? null : text.trim());
function quantity<U extends string>(text: string, unit: U): { value: number; unit: U } | null {
  const value = parseDecimal(text);
  return value == null ? null : { value, unit };
}

/** The request body of the typed values: quantities as `{ value, unit }` in the reader's units, blanks as null. */
export function constructionInput(v: ConstructionFormValues, units: Preferences): ConstructionCreateBody {
  const weight = parseDecimal(v.weight);
  return {
    code: v.code,
    name: v.name,
    sizeCode: v.sizeCode,
    tubeCompound: (orNull(v.tubeCompound) as ConstructionCreateBody['tubeCompound']) ?? null,
    reinforcement: (orNull(v.reinforcement) as ConstructionCreateBody['reinforcement']) ?? null,
    coverCompound: orNull(v.coverCompound),
    workingPressure: quantity(v.workingPressure, units.pressureUnit),
    burstPressure: quantity(v.burstPressure, units.pressureUnit),
    vacuumRating: quantity(v.vacuumRating, units.pressureUnit),
    minTemp: quantity(v.minTemp, units.temperatureUnit),
    maxTemp: quantity(v.maxTemp, units.temperatureUnit),
    minBendRadius: quantity(v.minBendRadius, units.lengthUnit),
    // The server keeps weight in kg/m only; a reader of inches types lb/ft.
    weightKgPerM: weight == null ? null : toKgPerM(weight, weightUnitFor(units.lengthUnit)),
    electrical: (orNull(v.electrical) as ConstructionCreateBody['electrical']) ?? null,
    foodContactCertified: v.foodContactCertified === '' ? null : v.foodContactCertified === 'yes',
    maker: orNull(v.maker),
    partNumber: orNull(v.partNumber),
    serviceLifeMonths: parseWhole(v.serviceLifeMonths),
    shelfLifeMonths: parseWhole(v.shelfLifeMonths),
    storageLifeMonths: parseWhole(v.storageLifeMonths),
    notes: orNull(v.notes),
  };
}

/** Which input field each form field fills. */
const INPUT_OF: Record<keyof ConstructionFormValues, keyof ConstructionCreateBody> = {
  code: 'code',
  name: 'name',
  sizeCode: 'sizeCode',
  tubeCompound: 'tubeCompound',
  reinforcement: 'reinforcement',
  coverCompound: 'coverCompound',
  workingPressure: 'workingPressure',
  burstPressure: 'burstPressure',
  vacuumRating: 'vacuumRating',
  minTemp: 'minTemp',
  maxTemp: 'maxTemp',
  minBendRadius: 'minBendRadius',
  weight: 'weightKgPerM',
  electrical: 'electrical',
  foodContactCertified: 'foodContactCertified',
  maker: 'maker',
  partNumber: 'partNumber',
  serviceLifeMonths: 'serviceLifeMonths',
  shelfLifeMonths: 'shelfLifeMonths',
  storageLifeMonths: 'storageLifeMonths',
  notes: 'notes',
};

/** A change: only the fields that were edited, so a value shown rounded is never written back rounded. */
export function constructionChange(v: ConstructionFormValues, units: Preferences, dirty: Partial<Record<keyof ConstructionFormValues, unknown>>): ConstructionUpdateBody {
  const full = constructionInput(v, units) as Record<string, unknown>;
  const change: Record<string, unknown> = {};
  for (const field of CONSTRUCTION_FIELDS) {
    if (field === 'code' || !dirty[field]) continue;
    const key = INPUT_OF[field];
    change[key] = full[key];
  }
  return change as ConstructionUpdateBody;
}

/** The input an edit is checked against: everything but the code, which never changes. */
export function constructionUpdateCheckInput(v: ConstructionFormValues, units: Preferences): ConstructionUpdateBody {
  const { code: _code, ...rest } = constructionInput(v, units);
  return rest;
}
