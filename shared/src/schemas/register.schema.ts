import { z } from 'zod';
import { ELECTRICAL_PROPERTIES, REINFORCEMENTS, type CheckOutcome, type ElectricalProperty, type Reinforcement } from '../checks/types.js';
import { TUBE_COMPOUNDS, type CompatibilityRating, type CompatibilityTable, type Medium, type TubeCompound } from '../checks/compatibility.js';
import { MEDIA } from '../checks/compatibility.js';
import { CRITICALITY_LEVELS, type CriticalityDefinition } from '../services/criticality.js';
import type { RemovalReasonDefinition } from '../services/removal-reasons.js';
import { CONDUCTIVITY_REQUIREMENTS, PERIODIC_TEST_KINDS, SERVICE_CODES, type ServiceDefinition } from '../services/service-catalogue.js';
import { SIZE_CLASS_CODES, type SizeClass } from '../sizes/nominal-sizes.js';
import {
  LENGTH_UNITS,
  lengthInput,
  PRESSURE_UNITS,
  pressureInput,
  TEMPERATURE_UNITS,
  temperatureInput,
  type LengthUnit,
  type PressureUnit,
  type TemperatureUnit,
} from '../units/units.js';
import { pageQuerySchema, uuidSchema } from './common.schema.js';

/** Limits of free text in the register. */
export const CODE_MAX = 40;
export const NAME_MAX = 160;
export const NOTE_MAX = 4000;

export const codeSchema = (label: string) =>
  z
    .string({ message: `${label} is required` })
    .trim()
    .min(1, `${label} is required`)
    .max(CODE_MAX, `${label} is at most ${CODE_MAX} characters`)
    .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, `${label} may hold letters, digits and . _ / - only`);
export const nameSchema = (label: string) =>
  z.string({ message: `${label} is required` }).trim().min(1, `${label} is required`).max(NAME_MAX, `${label} is at most ${NAME_MAX} characters`);
const optionalText = (label: string, max = NAME_MAX) =>
  z.string().trim().max(max, `${label} is at most ${max} characters`).nullable().transform((v) => (v ? v : null));
export const noteSchema = optionalText('Note', NOTE_MAX);

export const sizeCodeSchema = z.enum(SIZE_CLASS_CODES as [string, ...string[]], { message: 'Choose a nominal size' });
export const serviceCodeSchema = z.enum(SERVICE_CODES as unknown as [string, ...string[]], { message: 'Choose a service' });
export const mediumCodeSchema = z.enum(MEDIA.map((m) => m.code) as [string, ...string[]], { message: 'Choose a medium from the list' });
const isoDate = (label: string) => z.iso.date({ message: `${label}: use a date like 2026-03-31` });
export { isoDate };

// ── Sites, areas, equipment ───────────────────────────────────────────────────────────────────

export const siteUnitsSchema = z.strictObject({
  pressureUnit: z.enum(PRESSURE_UNITS),
  lengthUnit: z.enum(LENGTH_UNITS),
  temperatureUnit: z.enum(TEMPERATURE_UNITS),
});

export const siteCreateSchema = z.strictObject({
  code: codeSchema('Site code'),
  name: nameSchema('Site name'),
  timeZone: z.string().trim().min(1).max(64).refine(isTimeZone, 'Choose a time zone such as Europe/London'),
  currency: z.string().trim().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code such as GBP'),
  defaultUnits: siteUnitsSchema,
});
export const siteUpdateSchema = siteCreateSchema.omit({ code: true }).partial();
export type SiteCreateInput = z.infer<typeof siteCreateSchema>;
export type SiteUpdateInput = z.infer<typeof siteUpdateSchema>;

function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

export const areaCreateSchema = z.strictObject({ siteId: uuidSchema, code: codeSchema('Area code'), name: nameSchema('Area name') });
export const areaUpdateSchema = areaCreateSchema.omit({ siteId: true }).partial();
export type AreaCreateInput = z.infer<typeof areaCreateSchema>;
export type AreaUpdateInput = z.infer<typeof areaUpdateSchema>;

export const equipmentCreateSchema = z.strictObject({
  areaId: uuidSchema,
  assetNumber: codeSchema('Asset number'),
  name: nameSchema('Equipment name'),
  hasHourMeter: z.boolean().default(false),
});
// No defaults in an update: a field left out stays as it is.
export const equipmentUpdateSchema = equipmentCreateSchema.extend({ hasHourMeter: z.boolean() }).partial();
export type EquipmentCreateInput = z.infer<typeof equipmentCreateSchema>;
export type EquipmentUpdateInput = z.infer<typeof equipmentUpdateSchema>;

// ── Services at a site ────────────────────────────────────────────────────────────────────────

export const designFactorBandSchema = z.strictObject({
  upToKpa: z.number().positive('The top of a band must be above zero').nullable(),
  factor: z.number().min(1, 'A design factor is at least 1').max(20, 'A design factor above 20 is not plausible'),
  source: z.string().trim().min(1, 'Say where the factor comes from').max(400),
});

export const serviceSettingsSchema = z
  .strictObject({
    designFactorBands: z.array(designFactorBandSchema).min(1, 'Give at least one design factor band').max(6),
    defaultInspectionIntervalDays: z.number().int().min(1, 'At least one day').max(3650, 'At most ten years'),
    conductivityRequired: z.enum(CONDUCTIVITY_REQUIREMENTS),
    periodicTest: z.strictObject({ kind: z.enum(PERIODIC_TEST_KINDS), intervalDays: z.number().int().min(1).max(3650) }).nullable(),
    suctionDuty: z.boolean(),
    foodContactRequired: z.boolean(),
  })
  .refine((s) => s.designFactorBands.filter((b) => b.upToKpa === null).length === 1 && s.designFactorBands.at(-1)?.upToKpa === null, {
    message: 'The last band must have no upper end, and only the last',
    path: ['designFactorBands'],
  });
export type ServiceSettingsInput = z.infer<typeof serviceSettingsSchema>;

/** The path of one service at one site; an unknown service code is a 404, not a 400. */
export const siteServiceParamsSchema = z.strictObject({ siteId: uuidSchema, serviceCode: z.string().trim().min(1).max(80) });
export const siteServicesQuerySchema = z.object({ siteId: uuidSchema });

// ── Constructions and fitting types ───────────────────────────────────────────────────────────

const constructionFields = {
  code: codeSchema('Construction code'),
  name: nameSchema('Name'),
  tubeCompound: z.enum(TUBE_COMPOUNDS, { message: 'Choose the tube compound' }).nullable(),
  reinforcement: z.enum(REINFORCEMENTS, { message: 'Choose the reinforcement' }).nullable(),
  coverCompound: optionalText('Cover compound', 40),
  sizeCode: sizeCodeSchema,
  workingPressure: pressureInput('Working pressure').nullable(),
  burstPressure: pressureInput('Burst pressure').nullable(),
  vacuumRating: pressureInput('Vacuum rating').nullable(),
  minTemp: temperatureInput('Lowest temperature').nullable(),
  maxTemp: temperatureInput('Highest temperature').nullable(),
  minBendRadius: lengthInput('Minimum bend radius').nullable(),
  weightKgPerM: z.number().positive('Weight must be above zero').max(500).nullable(),
  electrical: z.enum(ELECTRICAL_PROPERTIES).nullable(),
  foodContactCertified: z.boolean().nullable(),
  maker: optionalText('Maker'),
  partNumber: optionalText('Part number', 80),
  serviceLifeMonths: z.number().int().min(1).max(600).nullable(),
  shelfLifeMonths: z.number().int().min(1).max(600).nullable(),
  storageLifeMonths: z.number().int().min(1).max(600).nullable(),
  notes: noteSchema,
};

function burstAboveWorking(v: { workingPressure?: number | null; burstPressure?: number | null }): boolean {
  return v.workingPressure == null || v.burstPressure == null || v.burstPressure >= v.workingPressure;
}
function temperatureOrder(v: { minTemp?: number | null; maxTemp?: number | null }): boolean {
  return v.minTemp == null || v.maxTemp == null || v.minTemp <= v.maxTemp;
}

export const constructionCreateSchema = z
  .strictObject(constructionFields)
  .partial()
  .required({ code: true, name: true, sizeCode: true })
  .refine(burstAboveWorking, { message: 'Burst pressure must be at least the working pressure', path: ['burstPressure'] })
  .refine(temperatureOrder, { message: 'The highest temperature must be at least the lowest', path: ['maxTemp'] });
export const constructionUpdateSchema = z
  .strictObject(constructionFields)
  .omit({ code: true })
  .partial()
  .refine(burstAboveWorking, { message: 'Burst pressure must be at least the working pressure', path: ['burstPressure'] })
  .refine(temperatureOrder, { message: 'The highest temperature must be at least the lowest', path: ['maxTemp'] });
export type ConstructionCreateInput = z.infer<typeof constructionCreateSchema>;
export type ConstructionUpdateInput = z.infer<typeof constructionUpdateSchema>;

export const FITTING_STYLES = ['crimped', 'banded', 'claw', 'cam-groove', 'threaded', 'flanged', 'sanitary-clamp'] as const;
export type FittingStyle = (typeof FITTING_STYLES)[number];
export const FITTING_STYLE_LABELS: Record<FittingStyle, string> = {
  crimped: 'Crimped stem and ferrule',
  banded: 'Banded',
  claw: 'Claw (twist-lock)',
  'cam-groove': 'Cam and groove',
  threaded: 'Threaded',
  flanged: 'Flanged',
  'sanitary-clamp': 'Sanitary clamp',
};

export const fittingSizeSchema = z.strictObject({
  sizeCode: sizeCodeSchema,
  rating: pressureInput('Rating').nullable(),
  crimpDiameter: lengthInput('Crimp diameter').nullable().default(null),
  crimpTolerance: lengthInput('Crimp tolerance').nullable().default(null),
});

const fittingFields = {
  code: codeSchema('Fitting code'),
  name: nameSchema('Name'),
  style: z.enum(FITTING_STYLES, { message: 'Choose the fitting style' }),
  material: nameSchema('Material'),
  sizes: z
    .array(fittingSizeSchema)
    .max(30)
    .refine((sizes) => new Set(sizes.map((s) => s.sizeCode)).size === sizes.length, 'Each size appears once'),
  notes: noteSchema.default(null),
};
export const fittingTypeCreateSchema = z.strictObject(fittingFields);
export const fittingTypeUpdateSchema = z.strictObject({ ...fittingFields, notes: noteSchema }).omit({ code: true }).partial();
export type FittingTypeCreateInput = z.infer<typeof fittingTypeCreateSchema>;
export type FittingTypeUpdateInput = z.infer<typeof fittingTypeUpdateSchema>;

// ── Positions ─────────────────────────────────────────────────────────────────────────────────

const positionDesignFields = {
  serviceCode: serviceCodeSchema,
  mediumCode: mediumCodeSchema.nullable(),
  maxOperatingPressure: pressureInput('Maximum operating pressure').nullable(),
  minTemp: temperatureInput('Lowest temperature').nullable(),
  maxTemp: temperatureInput('Highest temperature').nullable(),
  sizeCode: sizeCodeSchema,
  requiredLength: lengthInput('Required length').nullable(),
  endAConnection: optionalText('End A connection', 80),
  endBConnection: optionalText('End B connection', 80),
  suctionDuty: z.boolean().nullable(),
  routedBendRadius: lengthInput('Routed bend radius').nullable(),
  criticality: z.enum(CRITICALITY_LEVELS, { message: 'Choose the criticality' }),
  inspectionIntervalDays: z.number().int().min(1, 'At least one day').max(3650, 'At most ten years').nullable(),
};

export const positionCreateSchema = z
  .strictObject({
    equipmentId: uuidSchema,
    code: codeSchema('Position code'),
    name: nameSchema('Position name'),
    notes: noteSchema,
    ...positionDesignFields,
  })
  .partial()
  .required({ equipmentId: true, code: true, name: true, serviceCode: true, sizeCode: true })
  .refine(temperatureOrder, { message: 'The highest temperature must be at least the lowest', path: ['maxTemp'] });
export const positionUpdateSchema = z
  .strictObject({ name: nameSchema('Position name'), notes: noteSchema, equipmentId: uuidSchema, ...positionDesignFields, reason: optionalText('Reason for the change', 400) })
  .partial()
  .refine(temperatureOrder, { message: 'The highest temperature must be at least the lowest', path: ['maxTemp'] });
export type PositionCreateInput = z.infer<typeof positionCreateSchema>;
export type PositionUpdateInput = z.infer<typeof positionUpdateSchema>;

// ── Lists ─────────────────────────────────────────────────────────────────────────────────────

export const listQuery = <T extends readonly [string, ...string[]]>(sorts: T) =>
  pageQuerySchema.extend({
    q: z.string().trim().max(100).optional(),
    sort: z.enum(sorts).default(sorts[0] as T[number] as never),
    dir: z.enum(['asc', 'desc']).default('asc'),
    archived: z.enum(['exclude', 'include', 'only']).default('exclude'),
  });

export const constructionListQuerySchema = listQuery(['code', 'name', 'sizeCode', 'workingPressureKpa', 'updatedAt'] as const).extend({
  sizeCode: sizeCodeSchema.optional(),
  tubeCompound: z.enum(TUBE_COMPOUNDS).optional(),
});
export const fittingTypeListQuerySchema = listQuery(['code', 'name', 'style'] as const).extend({ style: z.enum(FITTING_STYLES).optional() });
export const positionListQuerySchema = listQuery(['code', 'name', 'equipment', 'serviceCode', 'criticality', 'updatedAt'] as const).extend({
  siteId: uuidSchema.optional(),
  areaId: uuidSchema.optional(),
  equipmentId: uuidSchema.optional(),
  serviceCode: serviceCodeSchema.optional(),
  occupied: z.enum(['yes', 'no']).optional(),
});
export const equipmentListQuerySchema = listQuery(['assetNumber', 'name'] as const).extend({ siteId: uuidSchema.optional(), areaId: uuidSchema.optional() });
export const areaListQuerySchema = listQuery(['code', 'name'] as const).extend({ siteId: uuidSchema.optional() });
export type ArchivedFilter = 'exclude' | 'include' | 'only';
export type AreaListQuery = z.infer<typeof areaListQuerySchema>;
export type EquipmentListQuery = z.infer<typeof equipmentListQuerySchema>;
export type PositionListQuery = z.infer<typeof positionListQuerySchema>;
export type ConstructionListQuery = z.infer<typeof constructionListQuerySchema>;
export type FittingTypeListQuery = z.infer<typeof fittingTypeListQuerySchema>;

// ── Outputs ───────────────────────────────────────────────────────────────────────────────────

export interface SiteDto {
  id: string;
  code: string;
  name: string;
  timeZone: string;
  currency: string;
  defaultUnits: z.infer<typeof siteUnitsSchema>;
  archivedAt: string | null;
  abilities: { update: boolean };
}
export interface AreaDto {
  id: string;
  siteId: string;
  code: string;
  name: string;
  archivedAt: string | null;
  abilities: { update: boolean; archive: boolean };
}
export interface EquipmentDto {
  id: string;
  siteId: string;
  areaId: string;
  areaName: string;
  assetNumber: string;
  name: string;
  hasHourMeter: boolean;
  hourMeterHours: number | null;
  hourMeterReadAt: string | null;
  archivedAt: string | null;
  abilities: { update: boolean; archive: boolean };
}
export interface SiteServiceDto {
  siteId: string;
  serviceCode: string;
  name: string;
  description: string;
  settings: ServiceSettingsInput;
  defaults: ServiceSettingsInput;
  customised: boolean;
}
export interface ConstructionDto {
  id: string;
  code: string;
  name: string;
  tubeCompound: string | null;
  reinforcement: string | null;
  coverCompound: string | null;
  sizeCode: string;
  workingPressureKpa: number | null;
  burstPressureKpa: number | null;
  vacuumRatingKpa: number | null;
  minTempC: number | null;
  maxTempC: number | null;
  minBendRadiusMm: number | null;
  weightKgPerM: number | null;
  electrical: string | null;
  foodContactCertified: boolean | null;
  maker: string | null;
  partNumber: string | null;
  serviceLifeMonths: number | null;
  shelfLifeMonths: number | null;
  storageLifeMonths: number | null;
  notes: string | null;
  archivedAt: string | null;
  updatedAt: string;
  abilities: { update: boolean; archive: boolean };
}
export interface FittingSizeDto {
  sizeCode: string;
  ratingKpa: number | null;
  crimpDiameterMm: number | null;
  crimpToleranceMm: number | null;
}
export interface FittingTypeDto {
  id: string;
  code: string;
  name: string;
  style: FittingStyle;
  material: string;
  sizes: FittingSizeDto[];
  notes: string | null;
  archivedAt: string | null;
  abilities: { update: boolean; archive: boolean };
}
export interface PositionDto {
  id: string;
  siteId: string;
  siteName: string;
  equipmentId: string;
  equipmentName: string;
  equipmentAssetNumber: string;
  areaId: string;
  areaName: string;
  code: string;
  name: string;
  serviceCode: string;
  mediumCode: string | null;
  maxOperatingPressureKpa: number | null;
  minTempC: number | null;
  maxTempC: number | null;
  sizeCode: string;
  requiredLengthMm: number | null;
  endAConnection: string | null;
  endBConnection: string | null;
  suctionDuty: boolean | null;
  routedBendRadiusMm: number | null;
  criticality: string;
  inspectionIntervalDays: number | null;
  /** The interval in force: the position's own, or the service's adjusted by criticality. */
  effectiveInspectionIntervalDays: number;
  notes: string | null;
  currentAssembly: { id: string; number: string; status: string; checkOutcome: CheckOutcome | null } | null;
  archivedAt: string | null;
  updatedAt: string;
  abilities: { update: boolean; archive: boolean; install: boolean };
}

/** The lists and tables the client needs to fill pickers and explain checks, in one cacheable answer. */
export interface ReferenceDto {
  sizeClasses: SizeClass[];
  media: Medium[];
  tubeCompounds: Array<{ code: TubeCompound; name: string }>;
  /** Tube compound → medium code → rating and source; a missing cell means not known. */
  compatibility: CompatibilityTable;
  compatibilityRatings: CompatibilityRating[];
  reinforcements: Reinforcement[];
  electricalProperties: ElectricalProperty[];
  criticalityLevels: CriticalityDefinition[];
  removalReasons: RemovalReasonDefinition[];
  fittingStyles: Array<{ code: FittingStyle; label: string }>;
  services: ServiceDefinition[];
  units: { pressure: PressureUnit[]; length: LengthUnit[]; temperature: TemperatureUnit[] };
}
