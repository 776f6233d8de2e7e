import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { CheckOutcome, CheckResult } from '../../../shared/src/checks/types.js';
import { MEDIA } from '../../../shared/src/checks/compatibility.js';
import { CRITICALITY_LEVELS, type Criticality } from '../../../shared/src/services/criticality.js';
import { SERVICE_CATALOGUE, SERVICE_CODES, defaultServiceSettings, serviceByCode, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { assemblyBuildSchema, proofTestSchema, PROOF_TEST_MEDIA, type ProofTestMedium, type ProofTestRecord, type AssemblyStatus } from '../../../shared/src/schemas/assemblies.schema.js';
import { constructionCreateSchema, positionCreateSchema } from '../../../shared/src/schemas/register.schema.js';
import { ELECTRICAL_PROPERTIES, REINFORCEMENTS } from '../../../shared/src/checks/types.js';
import { TUBE_COMPOUNDS } from '../../../shared/src/checks/compatibility.js';
import { IMPORT_LIMITS, type ImportKind, type ImportPreviewRow } from '../../../shared/src/schemas/csv.schema.js';
import { formatTagCode, parseTagCode } from '../../../shared/src/tags/tag-code.js';
import { Assembly, Construction, Equipment, FittingType, Position, Site } from '../entities/index.js';
import { effectiveInterval, runChecks } from '../services/assembly-checks.service.js';
import type { CsvTable, HeaderMap, Problem, RowReader } from './csv-reader.js';

// What each row of an import becomes, checked against the register as it is: codes that must
// exist are looked up in maps loaded once, codes that must be new are checked against the
// register and against the rows above.

/** Stands in for an id that could not be found, so the rest of the row is still checked. */
const NO_ID = '00000000-0000-4000-8000-000000000000';

type Preview = ImportPreviewRow['values'];

/** Codes matched exactly first, then without regard to case when that finds one record. */
class CodeIndex<T> {
  private readonly exact = new Map<string, T>();
  private readonly folded = new Map<string, T[]>();

  constructor(items: Iterable<T>, codeOf: (item: T) => string) {
    for (const item of items) {
      const code = codeOf(item);
      this.exact.set(code, item);
      const list = this.folded.get(code.toLowerCase()) ?? [];
      list.push(item);
      this.folded.set(code.toLowerCase(), list);
    }
  }

  find(code: string): T | null {
    const exact = this.exact.get(code);
    if (exact) return exact;
    const folded = this.folded.get(code.toLowerCase());
    return folded?.length === 1 ? folded[0]! : null;
  }

  /** Whether a code is taken, counting one that differs only in case. */
  taken(code: string): T | null {
    return this.exact.get(code) ?? this.folded.get(code.toLowerCase())?.[0] ?? null;
  }
}

/** Codes seen in the rows above: the second use of a code is a problem. */
class SeenCodes {
  private readonly rows = new Map<string, number>();

  /** The row that used the code first, or null (and the code is remembered). */
  firstRow(code: string, row: number): number | null {
    const key = code.toLowerCase();
    const first = this.rows.get(key);
    if (first !== undefined) return first;
    this.rows.set(key, row);
    return null;
  }
}

const camelToSnake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Puts a schema's issues on the row, by column; issues on a column that already has a problem are left out. */
function schemaProblems(reader: RowReader, issues: z.core.$ZodIssue[], columnOf: (field: string) => string, before: number): void {
  const reported = new Set(reader.problems.slice(0, before).map((p) => p.column));
  for (const issue of issues) {
    const field = issue.path.map(String).join('.');
    const key = columnOf(field);
    if (reported.has(reader.columnName(key))) continue;
    reported.add(reader.columnName(key));
    reader.problem(key, issue.message);
  }
}

const notFuture = (reader: RowReader, key: string, value: string | null | undefined, today: string) => {
  if (value && value > today) reader.problem(key, `${reader.label(key)} ${value} is in the future.`);
};

// ── Constructions ─────────────────────────────────────────────────────────────────────────────

export type ConstructionRecord = Omit<Construction, 'id' | 'archivedAt' | 'createdAt' | 'updatedAt'>;

export interface ConstructionLookups {
  kind: 'constructions';
  existing: CodeIndex<{ code: string }>;
  seen: SeenCodes;
}

const CONSTRUCTION_FIELDS: Record<string, string> = { sizeCode: 'size', notes: 'notes' };

export function checkConstructionRow(reader: RowReader, lookups: ConstructionLookups): { record: ConstructionRecord; preview: Preview } | null {
  const code = reader.require('code', reader.raw('code'));
  const name = reader.require('name', reader.raw('name'));
  const sizeCode = reader.require('size', reader.size('size'));
  if (code) {
    const first = lookups.seen.firstRow(code, reader.row);
    if (first !== null) reader.problem('code', `The construction code ${code} is also in row ${first}: each construction once.`);
    const taken = lookups.existing.taken(code);
    if (taken) reader.problem('code', `The construction ${taken.code} is already in the catalogue. An import adds, it never changes: edit it in the catalogue, or leave the row out.`);
  }
  const before = reader.problems.length;
  const input = {
    code: code ?? 'X',
    name: name ?? 'X',
    sizeCode: sizeCode ?? 'bore-19',
    tubeCompound: reader.choice('tube_compound', TUBE_COMPOUNDS) ?? null,
    reinforcement: reader.choice('reinforcement', REINFORCEMENTS) ?? null,
    coverCompound: reader.raw('cover_compound'),
    workingPressure: reader.quantity('working_pressure') ?? null,
    burstPressure: reader.quantity('burst_pressure') ?? null,
    vacuumRating: reader.quantity('vacuum_rating') ?? null,
    minTemp: reader.quantity('min_temp') ?? null,
    maxTemp: reader.quantity('max_temp') ?? null,
    minBendRadius: reader.quantity('min_bend_radius') ?? null,
    weightKgPerM: reader.number('weight_kg_per_m') ?? null,
    electrical: reader.choice('electrical', ELECTRICAL_PROPERTIES) ?? null,
    foodContactCertified: reader.yesNo('food_contact_certified') ?? null,
    maker: reader.raw('maker'),
    partNumber: reader.raw('part_number'),
    serviceLifeMonths: reader.integer('service_life_months') ?? null,
    shelfLifeMonths: reader.integer('shelf_life_months') ?? null,
    storageLifeMonths: reader.integer('storage_life_months') ?? null,
    notes: reader.raw('notes'),
  };
  const parsed = constructionCreateSchema.safeParse(input);
  if (!parsed.success) schemaProblems(reader, parsed.error.issues, (f) => CONSTRUCTION_FIELDS[f] ?? camelToSnake(f.split('.')[0]!), before);
  if (reader.problems.length || !parsed.success) return null;
  const v = parsed.data;
  const record: ConstructionRecord = {
    code: v.code,
    name: v.name,
    tubeCompound: v.tubeCompound ?? null,
    reinforcement: v.reinforcement ?? null,
    coverCompound: v.coverCompound ?? null,
    sizeCode: v.sizeCode,
    workingPressureKpa: v.workingPressure ?? null,
    burstPressureKpa: v.burstPressure ?? null,
    vacuumRatingKpa: v.vacuumRating ?? null,
    minTempC: v.minTemp ?? null,
    maxTempC: v.maxTemp ?? null,
    minBendRadiusMm: v.minBendRadius ?? null,
    weightKgPerM: v.weightKgPerM ?? null,
    electrical: v.electrical ?? null,
    foodContactCertified: v.foodContactCertified ?? null,
    maker: v.maker ?? null,
    partNumber: v.partNumber ?? null,
    serviceLifeMonths: v.serviceLifeMonths ?? null,
    shelfLifeMonths: v.shelfLifeMonths ?? null,
    storageLifeMonths: v.storageLifeMonths ?? null,
    notes: v.notes ?? null,
  };
  return {
    record,
    preview: {
      code: record.code,
      name: record.name,
      size: record.sizeCode,
      tube_compound: record.tubeCompound,
      reinforcement: record.reinforcement,
      working_pressure: record.workingPressureKpa,
      burst_pressure: record.burstPressureKpa,
      min_temp: record.minTempC,
      max_temp: record.maxTempC,
      min_bend_radius: record.minBendRadiusMm,
    },
  };
}

// ── Positions ─────────────────────────────────────────────────────────────────────────────────

export type PositionRecord = Omit<Position, 'id' | 'equipment' | 'archivedAt' | 'createdAt' | 'updatedAt'>;

export interface PositionLookups {
  kind: 'positions';
  site: Site;
  equipment: CodeIndex<Pick<Equipment, 'id' | 'assetNumber' | 'archivedAt'>>;
  existing: CodeIndex<{ code: string }>;
  seen: SeenCodes;
}

const SERVICE_NAMES: Record<string, string> = Object.fromEntries(SERVICE_CATALOGUE.map((s) => [s.name.toLowerCase(), s.code]));
const POSITION_FIELDS: Record<string, string> = { sizeCode: 'size', equipmentId: 'equipment', serviceCode: 'service', mediumCode: 'medium' };

export function checkPositionRow(reader: RowReader, lookups: PositionLookups): { record: PositionRecord; preview: Preview } | null {
  const code = reader.require('code', reader.raw('code'));
  const name = reader.require('name', reader.raw('name'));
  const assetNumber = reader.require('equipment', reader.raw('equipment'));
  const serviceCode = reader.require('service', reader.choice('service', SERVICE_CODES, SERVICE_NAMES));
  const sizeCode = reader.require('size', reader.size('size'));
  if (code) {
    const first = lookups.seen.firstRow(code, reader.row);
    if (first !== null) reader.problem('code', `The position code ${code} is also in row ${first}: each position once.`);
    const taken = lookups.existing.taken(code);
    if (taken) reader.problem('code', `Position ${taken.code} already exists at ${lookups.site.name}. An import adds, it never changes: edit it on its page, or leave the row out.`);
  }
  let equipmentId: string | undefined;
  if (assetNumber) {
    const equipment = lookups.equipment.find(assetNumber);
    if (!equipment) reader.problem('equipment', `No equipment with asset number ${assetNumber} at ${lookups.site.name}. Add it under Sites and equipment first.`);
    else if (equipment.archivedAt) reader.problem('equipment', `Equipment ${equipment.assetNumber} is archived.`);
    else equipmentId = equipment.id;
  }
  const before = reader.problems.length;
  const input = {
    equipmentId: equipmentId ?? NO_ID,
    code: code ?? 'X',
    name: name ?? 'X',
    notes: reader.raw('notes'),
    serviceCode: serviceCode ?? 'compressed-air',
    mediumCode: reader.choice('medium', MEDIA.map((m) => m.code)) ?? null,
    maxOperatingPressure: reader.quantity('max_operating_pressure') ?? null,
    minTemp: reader.quantity('min_temp') ?? null,
    maxTemp: reader.quantity('max_temp') ?? null,
    sizeCode: sizeCode ?? 'bore-19',
    requiredLength: reader.quantity('required_length') ?? null,
    endAConnection: reader.raw('end_a_connection'),
    endBConnection: reader.raw('end_b_connection'),
    suctionDuty: reader.yesNo('suction_duty') ?? null,
    routedBendRadius: reader.quantity('routed_bend_radius') ?? null,
    criticality: reader.choice<Criticality>('criticality', CRITICALITY_LEVELS) ?? 'medium',
    inspectionIntervalDays: reader.integer('inspection_interval_days') ?? null,
  };
  const parsed = positionCreateSchema.safeParse(input);
  if (!parsed.success) schemaProblems(reader, parsed.error.issues, (f) => POSITION_FIELDS[f] ?? camelToSnake(f.split('.')[0]!), before);
  if (reader.problems.length || !parsed.success) return null;
  const v = parsed.data;
  const record: PositionRecord = {
    siteId: lookups.site.id,
    equipmentId: v.equipmentId,
    code: v.code,
    name: v.name,
    serviceCode: v.serviceCode,
    mediumCode: v.mediumCode ?? null,
    maxOperatingPressureKpa: v.maxOperatingPressure ?? null,
    minTempC: v.minTemp ?? null,
    maxTempC: v.maxTemp ?? null,
    sizeCode: v.sizeCode,
    requiredLengthMm: v.requiredLength ?? null,
    endAConnection: v.endAConnection ?? null,
    endBConnection: v.endBConnection ?? null,
    suctionDuty: v.suctionDuty ?? null,
    routedBendRadiusMm: v.routedBendRadius ?? null,
    criticality: v.criticality ?? 'medium',
    inspectionIntervalDays: v.inspectionIntervalDays ?? null,
    notes: v.notes ?? null,
  };
  return {
    record,
    preview: {
      code: record.code,
      name: record.name,
      equipment: assetNumber ?? null,
      service: record.serviceCode,
      size: record.sizeCode,
      max_operating_pressure: record.maxOperatingPressureKpa,
      min_temp: record.minTempC,
      max_temp: record.maxTempC,
      criticality: record.criticality,
    },
  };
}

// ── Assemblies ────────────────────────────────────────────────────────────────────────────────

/** An assembly as it will be written, with what its events record. Lengths mm, pressures kPa. */
export interface AssemblyRecord {
  tagCode: string | null;
  constructionId: string;
  siteId: string;
  positionId: string | null;
  status: AssemblyStatus;
  storeLocation: string | null;
  hoseBatch: string | null;
  hoseManufacturedOn: string | null;
  overallLengthMm: number;
  cutLengthMm: number | null;
  endAFittingTypeId: string | null;
  endBFittingTypeId: string | null;
  endACrimpMm: number | null;
  endBCrimpMm: number | null;
  builtOn: string;
  builtOnEstimated: boolean;
  builder: string | null;
  cost: number | null;
  installedAt: Date | null;
  installedAtEstimated: boolean;
  predatesRecords: boolean;
  proofTest: Omit<ProofTestRecord, 'eventId'> | null;
  checkOutcome: CheckOutcome | null;
  checkResults: CheckResult[] | null;
  nextInspectionDue: string | null;
  notes: string | null;
}

type PositionState = Position & { occupiedBy: string | null };

export interface AssemblyLookups {
  kind: 'assemblies';
  site: Site;
  now: Date;
  constructions: CodeIndex<Construction>;
  fittings: CodeIndex<FittingType>;
  positions: CodeIndex<PositionState>;
  services: Map<string, ServiceSettings | null>;
  /** Tag codes of the file that are already in the register. */
  takenTags: Set<string>;
  seenTags: SeenCodes;
  seenPositions: SeenCodes;
}

const ASSEMBLY_FIELDS: Record<string, string> = {
  constructionId: 'construction',
  'endA.fittingTypeId': 'end_a_fitting',
  'endA.crimpDiameter': 'end_a_crimp_diameter',
  'endB.fittingTypeId': 'end_b_fitting',
  'endB.crimpDiameter': 'end_b_crimp_diameter',
  note: 'notes',
};
const PROOF_TEST_FIELDS: Record<string, string> = {
  testedOn: 'proof_test_on',
  heldPressure: 'proof_test_pressure',
  requiredPressure: 'proof_test_required_pressure',
  holdSeconds: 'proof_test_hold_seconds',
  result: 'proof_test_result',
  medium: 'proof_test_medium',
  tester: 'proof_test_tester',
};
const PROOF_TEST_COLUMNS = Object.values(PROOF_TEST_FIELDS);

/** Midday UTC of a calendar date: the instant the register keeps for a day written without a time. */
export const middayOf = (isoDate: string) => new Date(`${isoDate}T12:00:00Z`);

function addDays(date: Date, days: number): string {
  return new Date(date.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}

function lookupFitting(reader: RowReader, key: string, lookups: AssemblyLookups): FittingType | null {
  const code = reader.raw(key);
  if (!code) return null;
  const fitting = lookups.fittings.find(code);
  if (!fitting) {
    reader.problem(key, `No fitting type with the code ${code} in the catalogue.`);
    return null;
  }
  if (fitting.archivedAt) reader.problem(key, `Fitting type ${fitting.code} is archived.`);
  return fitting;
}

export function checkAssemblyRow(reader: RowReader, lookups: AssemblyLookups): { record: AssemblyRecord; preview: Preview } | null {
  const today = lookups.now.toISOString().slice(0, 10);
  let tagCode: string | null = null;
  const writtenTag = reader.raw('tag_code');
  if (writtenTag) {
    tagCode = parseTagCode(writtenTag);
    if (!tagCode) reader.problem('tag_code', `"${writtenTag}" is not a Ferrule tag code: a character is wrong or its check character does not match.`);
    else {
      const first = lookups.seenTags.firstRow(tagCode, reader.row);
      if (first !== null) reader.problem('tag_code', `Tag ${formatTagCode(tagCode)} is also in row ${first}: a tag is on one hose only.`);
      if (lookups.takenTags.has(tagCode)) reader.problem('tag_code', `Tag ${formatTagCode(tagCode)} is already on an assembly in the register. An import never changes an assembly.`);
    }
  }

  const constructionCode = reader.require('construction', reader.raw('construction'));
  let construction: Construction | null = null;
  if (constructionCode) {
    construction = lookups.constructions.find(constructionCode);
    if (!construction) reader.problem('construction', `No construction with the code ${constructionCode} in the catalogue.`);
    else if (construction.archivedAt) reader.problem('construction', `Construction ${construction.code} is archived.`);
  }
  const endA = lookupFitting(reader, 'end_a_fitting', lookups);
  const endB = lookupFitting(reader, 'end_b_fitting', lookups);

  const positionCode = reader.raw('position');
  let position: PositionState | null = null;
  if (positionCode) {
    position = lookups.positions.find(positionCode);
    if (!position) reader.problem('position', `No position ${positionCode} at ${lookups.site.name}. Import or add the position first.`);
    else if (position.archivedAt) reader.problem('position', `Position ${position.code} is archived.`);
    else {
      const first = lookups.seenPositions.firstRow(position.code, reader.row);
      if (first !== null) reader.problem('position', `Position ${position.code} is also given in row ${first}: a position holds one hose.`);
      else if (position.occupiedBy) reader.problem('position', `Position ${position.code} already holds assembly ${formatTagCode(position.occupiedBy)}. Remove or replace it in Ferrule, or leave this row's position empty.`);
    }
  }

  const builtOn = reader.require('built_on', reader.date('built_on'));
  const hoseManufacturedOn = reader.date('hose_manufactured_on');
  const installedOn = reader.date('installed_on');
  const installedOnEstimated = reader.yesNo('installed_on_estimated');
  const predatesRecords = reader.yesNo('predates_records');
  notFuture(reader, 'built_on', builtOn, today);
  notFuture(reader, 'hose_manufactured_on', hoseManufacturedOn, today);
  notFuture(reader, 'installed_on', installedOn, today);
  if (positionCode && installedOn === null) reader.problem('installed_on', 'installed_on is required when a position is given: the date it went in (an estimate, with installed_on_estimated = yes, will do).');
  if (!positionCode && installedOn) reader.problem('installed_on', 'installed_on needs a position: give the position the hose is in, or leave the date empty for a hose in stock.');
  if (!positionCode && (predatesRecords || installedOnEstimated)) reader.problem(predatesRecords ? 'predates_records' : 'installed_on_estimated', 'This applies to an installed hose: give its position and install date.');
  if (builtOn && installedOn && installedOn < builtOn) reader.problem('installed_on', `installed_on ${installedOn} is before built_on ${builtOn}.`);
  if (builtOn && hoseManufacturedOn && builtOn < hoseManufacturedOn) reader.problem('built_on', `built_on ${builtOn} is before the hose was made (${hoseManufacturedOn}).`);

  const before = reader.problems.length;
  const crimp = (key: string) => reader.quantity(key) ?? null;
  const endACrimp = crimp('end_a_crimp_diameter');
  const endBCrimp = crimp('end_b_crimp_diameter');
  if (endACrimp && !endA) reader.problem('end_a_crimp_diameter', 'A crimp diameter needs its end A fitting code.');
  if (endBCrimp && !endB) reader.problem('end_b_crimp_diameter', 'A crimp diameter needs its end B fitting code.');
  const input = {
    constructionId: construction?.id ?? NO_ID,
    siteId: lookups.site.id,
    storeLocation: reader.text('store_location', 80) ?? null,
    hoseBatch: reader.text('hose_batch', 80) ?? null,
    hoseManufacturedOn: hoseManufacturedOn ?? null,
    overallLength: reader.require('overall_length', reader.quantity('overall_length')) ?? { value: 1, unit: 'mm' },
    cutLength: reader.quantity('cut_length') ?? null,
    endA: endA ? { fittingTypeId: endA.id, crimpDiameter: endACrimp } : null,
    endB: endB ? { fittingTypeId: endB.id, crimpDiameter: endBCrimp } : null,
    builtOn: builtOn ?? today,
    builtOnEstimated: reader.yesNo('built_on_estimated') ?? false,
    builder: reader.text('builder', 120) ?? null,
    cost: reader.number('cost') ?? null,
    note: reader.raw('notes'),
  };
  const parsed = assemblyBuildSchema.safeParse(input);
  if (!parsed.success) schemaProblems(reader, parsed.error.issues, (f) => ASSEMBLY_FIELDS[f] ?? camelToSnake(f.split('.')[0]!), before);
  if (parsed.success && parsed.data.cutLength != null && parsed.data.cutLength > parsed.data.overallLength) reader.problem('cut_length', 'The cut length cannot be longer than the overall length.');

  let proofTest: AssemblyRecord['proofTest'] = null;
  if (PROOF_TEST_COLUMNS.some((key) => reader.raw(key) !== null)) {
    const beforeTest = reader.problems.length;
    const testedOn = reader.require('proof_test_on', reader.date('proof_test_on'), 'proof_test_on is required with the other proof test columns.');
    const held = reader.require('proof_test_pressure', reader.quantity('proof_test_pressure'), 'proof_test_pressure is required with the other proof test columns.');
    const result = reader.require('proof_test_result', reader.choice('proof_test_result', ['pass', 'fail'] as const), 'proof_test_result is required with the other proof test columns.');
    notFuture(reader, 'proof_test_on', testedOn, today);
    if (testedOn && builtOn && testedOn < builtOn) reader.problem('proof_test_on', `proof_test_on ${testedOn} is before built_on ${builtOn}.`);
    const test = proofTestSchema.safeParse({
      testedOn: testedOn ?? today,
      medium: reader.choice<ProofTestMedium>('proof_test_medium', PROOF_TEST_MEDIA) ?? 'water',
      requiredPressure: reader.quantity('proof_test_required_pressure') ?? null,
      heldPressure: held ?? { value: 0, unit: 'kPa' },
      holdSeconds: reader.integer('proof_test_hold_seconds') ?? 60,
      result: result ?? 'pass',
      tester: reader.text('proof_test_tester', 120) ?? 'not recorded',
      note: null,
    });
    if (!test.success) schemaProblems(reader, test.error.issues, (f) => PROOF_TEST_FIELDS[f.split('.')[0]!] ?? f, beforeTest);
    else {
      const requiredKpa = test.data.requiredPressure ?? (construction?.burstPressureKpa != null ? construction.burstPressureKpa / 2 : null);
      if (requiredKpa == null && construction) reader.problem('proof_test_required_pressure', `Construction ${construction.code} has no burst pressure: give proof_test_required_pressure.`);
      if (requiredKpa != null) {
        proofTest = {
          testedOn: test.data.testedOn,
          medium: test.data.medium,
          requiredPressureKpa: requiredKpa,
          heldPressureKpa: test.data.heldPressure,
          holdSeconds: test.data.holdSeconds,
          result: test.data.result,
          tester: test.data.tester,
        };
      }
    }
  }

  if (reader.problems.length || !parsed.success || !construction) return null;
  const v = parsed.data;
  const installedAt = position && installedOn ? middayOf(installedOn) : null;
  const passed = proofTest?.result === 'pass' && proofTest.heldPressureKpa >= proofTest.requiredPressureKpa * (1 - 1e-9);
  const status: AssemblyStatus = position ? 'installed' : passed ? 'in_stock' : 'built';
  const record: AssemblyRecord = {
    tagCode,
    constructionId: construction.id,
    siteId: lookups.site.id,
    positionId: position?.id ?? null,
    status,
    storeLocation: position ? null : v.storeLocation,
    hoseBatch: v.hoseBatch,
    hoseManufacturedOn: v.hoseManufacturedOn,
    overallLengthMm: v.overallLength,
    cutLengthMm: v.cutLength,
    endAFittingTypeId: endA?.id ?? null,
    endBFittingTypeId: endB?.id ?? null,
    endACrimpMm: v.endA?.crimpDiameter ?? null,
    endBCrimpMm: v.endB?.crimpDiameter ?? null,
    builtOn: v.builtOn,
    builtOnEstimated: v.builtOnEstimated,
    builder: v.builder,
    cost: v.cost,
    installedAt,
    installedAtEstimated: installedOnEstimated ?? false,
    predatesRecords: predatesRecords ?? false,
    proofTest,
    checkOutcome: null,
    checkResults: null,
    nextInspectionDue: null,
    notes: v.note,
  };
  if (position && installedAt) {
    const service = serviceAt(lookups, position);
    const assembly = Object.assign(new Assembly(), record, { id: NO_ID, proofTest: proofTest ? { ...proofTest, eventId: NO_ID } : null, lastInspectedAt: null });
    const summary = runChecks({ assembly, position, construction, fittings: { endA, endB }, service }, lookups.now);
    // No override can exist for a new assembly, so the worst result is the stored outcome.
    const outcomes = summary.results.map((r) => r.outcome);
    record.checkOutcome = outcomes.includes('fail') ? 'fail' : outcomes.includes('warn') ? 'warn' : 'pass';
    record.checkResults = summary.results;
    record.nextInspectionDue = addDays(installedAt, effectiveInterval(position, service));
  }
  return {
    record,
    preview: {
      tag_code: tagCode ? formatTagCode(tagCode) : null,
      construction: construction.code,
      position: position?.code ?? null,
      status,
      overall_length: record.overallLengthMm,
      built_on: record.builtOn,
      installed_on: installedOn ?? null,
      predates_records: record.predatesRecords,
      proof_test_result: proofTest?.result ?? null,
      check_outcome: record.checkOutcome,
    },
  };
}

function serviceAt(lookups: AssemblyLookups, position: Position): ServiceSettings | null {
  if (lookups.services.has(position.serviceCode)) return lookups.services.get(position.serviceCode) ?? null;
  const definition = serviceByCode(position.serviceCode);
  const settings = definition ? defaultServiceSettings(definition) : null;
  lookups.services.set(position.serviceCode, settings);
  return settings;
}

// ── Loading what the rows are checked against ─────────────────────────────────────────────────

export type Lookups = ConstructionLookups | PositionLookups | AssemblyLookups;

/** Everything the rows of a file are checked against, loaded in a few queries. */
export async function loadLookups(manager: EntityManager, kind: ImportKind, site: Site | null, table: CsvTable, map: HeaderMap, now: Date): Promise<Lookups> {
  if (kind === 'constructions') {
    const rows: Array<{ code: string }> = await manager.query(`SELECT code FROM constructions`);
    return { kind, existing: new CodeIndex(rows, (r) => r.code), seen: new SeenCodes() };
  }
  if (!site) throw new Error('A site is needed for this import');
  if (kind === 'positions') {
    const equipment: Array<Pick<Equipment, 'id' | 'assetNumber' | 'archivedAt'>> = await manager.query(
      `SELECT id, asset_number AS "assetNumber", archived_at AS "archivedAt" FROM equipment WHERE site_id = $1`,
      [site.id],
    );
    const positions: Array<{ code: string }> = await manager.query(`SELECT code FROM positions WHERE site_id = $1`, [site.id]);
    return { kind, site, equipment: new CodeIndex(equipment, (e) => e.assetNumber), existing: new CodeIndex(positions, (p) => p.code), seen: new SeenCodes() };
  }
  const constructions = await manager.getRepository(Construction).find();
  const fittings = await manager.getRepository(FittingType).find();
  // A site may have tens of thousands of positions: read as plain rows, not through the entity manager.
  const positionRows: Array<Record<string, unknown>> = await manager.query(
    `SELECT p.id, p.site_id AS "siteId", p.equipment_id AS "equipmentId", p.code, p.name, p.service_code AS "serviceCode", p.medium_code AS "mediumCode",
            p.max_operating_pressure_kpa AS "maxOperatingPressureKpa", p.min_temp_c AS "minTempC", p.max_temp_c AS "maxTempC", p.size_code AS "sizeCode",
            p.required_length_mm AS "requiredLengthMm", p.end_a_connection AS "endAConnection", p.end_b_connection AS "endBConnection",
            p.suction_duty AS "suctionDuty", p.routed_bend_radius_mm AS "routedBendRadiusMm", p.criticality, p.inspection_interval_days AS "inspectionIntervalDays",
            p.archived_at AS "archivedAt", a.number AS "occupiedBy"
       FROM positions p
       LEFT JOIN assemblies a ON a.position_id = p.id AND a.status IN ('installed', 'tagged_out')
      WHERE p.site_id = $1`,
    [site.id],
  );
  const services: Array<{ serviceCode: string; settings: ServiceSettings }> = await manager.query(
    `SELECT service_code AS "serviceCode", settings FROM site_services WHERE site_id = $1`,
    [site.id],
  );
  const tagPlace = map.places.get('tag_code');
  const fileTags = tagPlace ? [...new Set(table.rows.map((r) => parseTagCode((r.cells[tagPlace.index] ?? '').trim())).filter((t): t is string => !!t))] : [];
  const taken: Array<{ number: string }> = fileTags.length ? await manager.query(`SELECT number FROM assemblies WHERE number = ANY($1::text[])`, [fileTags]) : [];
  return {
    kind,
    site,
    now,
    constructions: new CodeIndex(constructions, (c) => c.code),
    fittings: new CodeIndex(fittings, (f) => f.code),
    positions: new CodeIndex(
      positionRows.map((row) => Object.assign(new Position(), row as Partial<PositionState>) as PositionState),
      (p) => p.code,
    ),
    services: new Map(services.map((s) => [s.serviceCode, s.settings])),
    takenTags: new Set(taken.map((t) => t.number)),
    seenTags: new SeenCodes(),
    seenPositions: new SeenCodes(),
  };
}

export type CheckedRow =
  | { kind: 'constructions'; row: number; record: ConstructionRecord; preview: Preview }
  | { kind: 'positions'; row: number; record: PositionRecord; preview: Preview }
  | { kind: 'assemblies'; row: number; record: AssemblyRecord; preview: Preview };

/** Checks one row; its problems are on the reader. */
export function checkRow(reader: RowReader, lookups: Lookups): CheckedRow | null {
  switch (lookups.kind) {
    case 'constructions': {
      const out = checkConstructionRow(reader, lookups);
      return out && { kind: 'constructions', row: reader.row, ...out };
    }
    case 'positions': {
      const out = checkPositionRow(reader, lookups);
      return out && { kind: 'positions', row: reader.row, ...out };
    }
    case 'assemblies': {
      const out = checkAssemblyRow(reader, lookups);
      return out && { kind: 'assemblies', row: reader.row, ...out };
    }
  }
}

/** Problems kept with a job: the first ones, in row order. */
export function capProblems(problems: Problem[]): Problem[] {
  return problems.slice(0, IMPORT_LIMITS.maxStoredProblems);
}

