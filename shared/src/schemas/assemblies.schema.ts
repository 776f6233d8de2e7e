import { z } from 'zod';
import { SELECTION_CHECK_CODES, type CheckOutcome, type CheckResult } from '../checks/types.js';
import { REMOVAL_REASONS } from '../services/removal-reasons.js';
import { lengthInput, pressureInput } from '../units/units.js';
import { pageQuerySchema, uuidSchema } from './common.schema.js';
import { isoDate, noteSchema, serviceCodeSchema, sizeCodeSchema } from './register.schema.js';

export const ASSEMBLY_STATUSES = ['built', 'in_stock', 'installed', 'tagged_out', 'removed', 'scrapped'] as const;
export type AssemblyStatus = (typeof ASSEMBLY_STATUSES)[number];
export const ASSEMBLY_STATUS_LABELS: Record<AssemblyStatus, string> = {
  built: 'Built, awaiting proof test',
  in_stock: 'In stock',
  installed: 'Installed',
  tagged_out: 'Tagged out',
  removed: 'Removed',
  scrapped: 'Scrapped',
};

export const EVENT_KINDS = [
  'build',
  'proof_test',
  'install',
  'tag_out',
  'remove',
  'return_to_stock',
  'scrap',
  'override',
  'inspection',
  'note',
  'void',
] as const;
export type EventKind = (typeof EVENT_KINDS)[number];

/** Only liquids: a hose is never pressure-tested with air or gas. */
export const PROOF_TEST_MEDIA = ['water', 'water-glycol', 'hydraulic-oil'] as const;
export type ProofTestMedium = (typeof PROOF_TEST_MEDIA)[number];

/** The latest proof test of an assembly as kept on the assembly. Pressures kPa. */
export interface ProofTestRecord {
  eventId: string;
  testedOn: string;
  medium: ProofTestMedium;
  requiredPressureKpa: number;
  heldPressureKpa: number;
  holdSeconds: number;
  result: 'pass' | 'fail';
  tester: string;
}

export const idempotencyKeySchema = z
  .string()
  .trim()
  .min(8, 'The submission key is too short')
  .max(100, 'The submission key is too long')
  .regex(/^[A-Za-z0-9_-]+$/, 'The submission key may hold letters, digits, _ and - only');

const fieldFields = {
  /** When it happened in the plant; defaults to now. */
  occurredAt: z.iso.datetime({ offset: true, message: 'Use a date and time like 2026-03-31T14:05:00Z' }).optional(),
  occurredAtEstimated: z.boolean().default(false),
  workOrder: z.string().trim().max(60, 'Work order is at most 60 characters').nullable().default(null),
  hourMeterHours: z.number().min(0, 'Hours cannot be negative').max(1_000_000).nullable().default(null),
  note: noteSchema.default(null),
  idempotencyKey: idempotencyKeySchema.optional(),
};

const fittingEndSchema = z.strictObject({
  fittingTypeId: uuidSchema,
  crimpDiameter: lengthInput('Measured crimp diameter').nullable().default(null),
});

export const assemblyBuildSchema = z.strictObject({
  constructionId: uuidSchema,
  siteId: uuidSchema,
  storeLocation: z.string().trim().max(80).nullable().default(null),
  hoseBatch: z.string().trim().max(80).nullable().default(null),
  hoseManufacturedOn: isoDate('Hose manufacture date').nullable().default(null),
  overallLength: lengthInput('Overall length'),
  cutLength: lengthInput('Cut length').nullable().default(null),
  endA: fittingEndSchema.nullable(),
  endB: fittingEndSchema.nullable(),
  builtOn: isoDate('Build date'),
  builtOnEstimated: z.boolean().default(false),
  builder: z.string().trim().max(120).nullable().default(null),
  cost: z.number().min(0, 'Cost cannot be negative').max(10_000_000).nullable().default(null),
  note: noteSchema.default(null),
  idempotencyKey: idempotencyKeySchema.optional(),
});
export type AssemblyBuildInput = z.infer<typeof assemblyBuildSchema>;

export const proofTestSchema = z.strictObject({
  testedOn: isoDate('Test date'),
  medium: z.enum(PROOF_TEST_MEDIA, { message: 'Proof tests are hydrostatic: choose water, water-glycol or hydraulic oil. Never test with air or gas.' }),
  requiredPressure: pressureInput('Required test pressure').nullable().default(null),
  heldPressure: pressureInput('Held pressure'),
  holdSeconds: z.number().int().min(1, 'Hold for at least one second').max(86_400),
  result: z.enum(['pass', 'fail'], { message: 'Say whether the test passed' }),
  tester: z.string().trim().min(1, 'Say who tested it').max(120),
  note: noteSchema.default(null),
  idempotencyKey: idempotencyKeySchema.optional(),
});
export type ProofTestInput = z.infer<typeof proofTestSchema>;

export const overrideInputSchema = z.strictObject({
  checks: z.array(z.enum(SELECTION_CHECK_CODES)).min(1, 'Name the checks you accept'),
  reason: z.string().trim().min(10, 'Give the reason in a sentence (at least 10 characters)').max(1000),
  reviewOn: isoDate('Review date'),
});
export type OverrideInput = z.infer<typeof overrideInputSchema>;

export const installSchema = z.strictObject({
  positionId: uuidSchema,
  override: overrideInputSchema.optional(),
  ...fieldFields,
});
export type InstallInput = z.infer<typeof installSchema>;

export const removeSchema = z.strictObject({
  reason: z.enum(REMOVAL_REASONS, { message: 'Choose why it came out' }),
  ...fieldFields,
});
export type RemoveInput = z.infer<typeof removeSchema>;

export const replaceSchema = z.strictObject({
  newAssemblyId: uuidSchema,
  reason: z.enum(REMOVAL_REASONS, { message: 'Choose why the old assembly came out' }),
  override: overrideInputSchema.optional(),
  ...fieldFields,
});
export type ReplaceInput = z.infer<typeof replaceSchema>;

export const tagOutSchema = z.strictObject({ ...fieldFields, note: z.string().trim().min(3, 'Say why it is tagged out').max(4000) });
export type TagOutInput = z.infer<typeof tagOutSchema>;

export const returnToStockSchema = z.strictObject({
  siteId: uuidSchema.optional(),
  storeLocation: z.string().trim().max(80).nullable().default(null),
  inspectionNote: z.string().trim().min(3, 'Record what the inspection found').max(4000),
  ...fieldFields,
});
export type ReturnToStockInput = z.infer<typeof returnToStockSchema>;

export const scrapSchema = z.strictObject({ ...fieldFields, note: z.string().trim().min(3, 'Say why it is scrapped').max(4000) });
export type ScrapInput = z.infer<typeof scrapSchema>;

export const overrideCreateSchema = overrideInputSchema.extend({ idempotencyKey: idempotencyKeySchema.optional() });

export const voidEventSchema = z.strictObject({
  reason: z.string().trim().min(10, 'Give the reason in a sentence (at least 10 characters)').max(1000),
  idempotencyKey: idempotencyKeySchema.optional(),
});

export const ASSEMBLY_SORTS = ['number', 'construction', 'position', 'status', 'checkOutcome', 'nextInspectionDue', 'installedAt', 'updatedAt'] as const;
export const DUE_FILTERS = ['overdue', 'within-7-days', 'within-30-days'] as const;

export const assemblyListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional(),
  siteId: uuidSchema.optional(),
  areaId: uuidSchema.optional(),
  equipmentId: uuidSchema.optional(),
  positionId: uuidSchema.optional(),
  serviceCode: serviceCodeSchema.optional(),
  constructionId: uuidSchema.optional(),
  sizeCode: sizeCodeSchema.optional(),
  status: z
    .string()
    .transform((s) => s.split(',').filter(Boolean))
    .pipe(z.array(z.enum(ASSEMBLY_STATUSES, { message: 'Unknown status' })))
    .optional(),
  checkOutcome: z.enum(['pass', 'warn', 'fail']).optional(),
  due: z.enum(DUE_FILTERS).optional(),
  sort: z.enum(ASSEMBLY_SORTS).default('number'),
  dir: z.enum(['asc', 'desc']).default('asc'),
});
export type AssemblyListQuery = z.infer<typeof assemblyListQuerySchema>;

// ── Outputs ───────────────────────────────────────────────────────────────────────────────────

export interface OverrideDto {
  id: string;
  checkCode: string;
  reason: string;
  reviewOn: string;
  actorName: string | null;
  createdAt: string;
}

export interface AssemblyListItemDto {
  id: string;
  number: string;
  status: AssemblyStatus;
  siteId: string;
  siteName: string;
  construction: { id: string; code: string; name: string; sizeCode: string };
  position: { id: string; code: string; name: string; equipmentName: string; equipmentAssetNumber: string; areaName: string; serviceCode: string } | null;
  checkOutcome: CheckOutcome | null;
  overridden: boolean;
  nextInspectionDue: string | null;
  installedAt: string | null;
  updatedAt: string;
}

export interface AssemblyDto extends AssemblyListItemDto {
  hoseBatch: string | null;
  hoseManufacturedOn: string | null;
  overallLengthMm: number | null;
  cutLengthMm: number | null;
  endA: FittingEndDto | null;
  endB: FittingEndDto | null;
  builtOn: string | null;
  builtOnEstimated: boolean;
  builder: string | null;
  cost: number | null;
  storeLocation: string | null;
  installedAtEstimated: boolean;
  predatesRecords: boolean;
  proofTest: ProofTestRecord | null;
  /** The lowest of hose rating, burst ÷ design factor and fittings' ratings, kPa; null when unknown. */
  allowablePressureKpa: number | null;
  checkResults: CheckResult[] | null;
  overrides: OverrideDto[];
  lastInspectedAt: string | null;
  notes: string | null;
  version: number;
  abilities: AssemblyAbilities;
}

export interface FittingEndDto {
  fittingTypeId: string;
  code: string;
  name: string;
  style: string;
  ratingKpa: number | null;
  crimpDiameterMm: number | null;
  specifiedCrimpDiameterMm: number | null;
  crimpToleranceMm: number | null;
  /** Whether the measured crimp lies within specification; null when either is not recorded. */
  crimpWithinSpec: boolean | null;
}

export interface AssemblyAbilities {
  proofTest: boolean;
  install: boolean;
  tagOut: boolean;
  remove: boolean;
  replace: boolean;
  returnToStock: boolean;
  scrap: boolean;
  override: boolean;
}

export interface AssemblyEventDto {
  id: string;
  kind: EventKind;
  occurredAt: string;
  occurredAtEstimated: boolean;
  recordedAt: string;
  actorName: string | null;
  positionId: string | null;
  positionCode: string | null;
  siteId: string;
  workOrder: string | null;
  hourMeterHours: number | null;
  note: string | null;
  data: Record<string, unknown>;
  voidsEventId: string | null;
  voidedBy: { eventId: string; reason: string; at: string } | null;
}

/** One assembly's time at a position: when it went in and out, days in service and hours where the meter was read. */
export interface PositionLifeDto {
  assemblyId: string;
  assemblyNumber: string;
  constructionCode: string;
  installedAt: string;
  installedAtEstimated: boolean;
  removedAt: string | null;
  daysInService: number;
  hoursInService: number | null;
  removalReason: string | null;
  lifeOutcome: 'failure' | 'suspension' | null;
  current: boolean;
}

/** Cautions every removal and replacement shows before it is confirmed. */
export const REMOVAL_CAUTIONS: readonly string[] = [
  'Isolate the supply, lock it out under the site’s lockout procedure, and bleed the line down to zero before you disconnect anything.',
  'Never feel for a leak with your hand: fluid under pressure can inject through skin, and an injection injury needs urgent medical care.',
  'Stand clear of the hose ends while you loosen fittings; a hose under pressure can whip.',
  'Follow local codes, the site’s procedures and the competent person’s instructions.',
];

/** The plant's mapping of removal reasons to life outcomes; every reason must be given. */
export const removalOutcomesSchema = z.strictObject({
  outcomes: z.strictObject(
    Object.fromEntries(REMOVAL_REASONS.map((r) => [r, z.enum(['failure', 'suspension'], { message: 'Choose failure or suspension' })])) as Record<
      (typeof REMOVAL_REASONS)[number],
      z.ZodEnum<{ failure: 'failure'; suspension: 'suspension' }>
    >,
  ),
});
export type RemovalOutcomesInput = z.infer<typeof removalOutcomesSchema>;

export interface RemovalOutcomeDto {
  reason: (typeof REMOVAL_REASONS)[number];
  label: string;
  description: string;
  lifeOutcome: 'failure' | 'suspension';
  defaultLifeOutcome: 'failure' | 'suspension';
}
