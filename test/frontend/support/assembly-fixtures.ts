import type { CheckResult } from '@shared/checks/types';
import type { AssemblyDto, AssemblyEventDto, AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import type { ConstructionDto, FittingTypeDto, PositionDto, SiteServiceDto } from '@shared/schemas/register.schema';
import { defaultServiceSettings, serviceByCode } from '@shared/services/service-catalogue';
import { tagCodeForSerial } from '@shared/tags/tag-code';
import { SITES } from './fixtures';

let serial = 100;
let ids = 1;
const uuid = (prefix: string) => `${prefix}0000-0000-4000-8000-${String(ids++).padStart(12, '0')}`;

/** A fresh, valid tag code. */
export const nextTagCode = () => tagCodeForSerial(serial++);

export const CAUTIONS = [
  'Isolate the supply, lock it out under the site’s lockout procedure, and bleed the line down to zero before you disconnect anything.',
  'Never feel for a leak with your hand: fluid under pressure can inject through skin, and an injection injury needs urgent medical care.',
  'Stand clear of the hose ends while you loosen fittings; a hose under pressure can whip.',
  'Follow local codes, the site’s procedures and the competent person’s instructions.',
];

export const CONSTRUCTION: ConstructionDto = {
  id: '5c0a0000-0000-4000-8000-000000000001',
  code: 'AIR-19-20',
  name: 'Air hose, textile, NBR tube',
  tubeCompound: 'NBR',
  reinforcement: 'textile',
  coverCompound: 'CR',
  sizeCode: 'bore-19',
  workingPressureKpa: 2000,
  burstPressureKpa: 8000,
  vacuumRatingKpa: null,
  minTempC: -30,
  maxTempC: 80,
  minBendRadiusMm: 150,
  weightKgPerM: null,
  electrical: 'none',
  foodContactCertified: false,
  maker: null,
  partNumber: null,
  serviceLifeMonths: null,
  shelfLifeMonths: null,
  storageLifeMonths: null,
  notes: null,
  archivedAt: null,
  updatedAt: '2026-01-01T00:00:00.000Z',
  abilities: { update: false, archive: false },
};

export const CLAW: FittingTypeDto = {
  id: '5c0a0000-0000-4000-8000-0000000000f1',
  code: 'CLAW-19',
  name: 'Claw coupling with locking pin',
  style: 'claw',
  material: 'Ductile iron',
  sizes: [{ sizeCode: 'bore-19', ratingKpa: 2000, crimpDiameterMm: null, crimpToleranceMm: null }],
  notes: null,
  archivedAt: null,
  abilities: { update: false, archive: false },
};

export const CRIMPED: FittingTypeDto = {
  id: '5c0a0000-0000-4000-8000-0000000000f2',
  code: 'CS-19-M',
  name: 'Crimped stem, male thread',
  style: 'crimped',
  material: 'Zinc-plated steel',
  sizes: [{ sizeCode: 'bore-19', ratingKpa: 25000, crimpDiameterMm: 31.2, crimpToleranceMm: 0.2 }],
  notes: null,
  archivedAt: null,
  abilities: { update: false, archive: false },
};

export function buildPosition(overrides: Partial<PositionDto> = {}): PositionDto {
  return {
    id: uuid('9051'),
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    equipmentId: '3e110000-0000-4000-8000-000000000001',
    equipmentName: 'Drill rig 3',
    equipmentAssetNumber: 'DR-03',
    areaId: 'a4ea0000-0000-4000-8000-000000000001',
    areaName: 'Drilling',
    code: 'DR03-AIR',
    name: 'Main air supply',
    serviceCode: 'compressed-air',
    mediumCode: 'compressed-air-oil-mist',
    maxOperatingPressureKpa: 700,
    minTempC: -10,
    maxTempC: 50,
    sizeCode: 'bore-19',
    requiredLengthMm: null,
    endAConnection: null,
    endBConnection: null,
    suctionDuty: false,
    routedBendRadiusMm: 200,
    criticality: 'high',
    inspectionIntervalDays: null,
    effectiveInspectionIntervalDays: 45,
    notes: null,
    currentAssembly: null,
    archivedAt: null,
    updatedAt: '2026-01-01T00:00:00.000Z',
    abilities: { update: false, archive: false, install: true },
    ...overrides,
  };
}

export const SOURCE = { title: 'ARPM hose definitions', section: 'Bend radius: measured to the innermost surface of the bend' };

export function checkResult(overrides: Partial<CheckResult> & Pick<CheckResult, 'check'>): CheckResult {
  return { outcome: 'pass', sentence: `The ${overrides.check} check passes.`, source: [{ title: 'Ferrule design', section: 'Selection checks' }], overridable: true, ...overrides };
}

const ABILITIES_NONE = { proofTest: false, install: false, tagOut: false, remove: false, replace: false, returnToStock: false, scrap: false, override: false };

export function buildAssembly(overrides: Partial<AssemblyDto> = {}): AssemblyDto {
  const position = buildPosition();
  return {
    id: uuid('a55e'),
    number: nextTagCode(),
    status: 'installed',
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    construction: { id: CONSTRUCTION.id, code: CONSTRUCTION.code, name: CONSTRUCTION.name, sizeCode: 'bore-19' },
    position: { id: position.id, code: position.code, name: position.name, equipmentName: position.equipmentName, equipmentAssetNumber: position.equipmentAssetNumber, areaName: position.areaName, serviceCode: position.serviceCode },
    checkOutcome: 'pass',
    overridden: false,
    nextInspectionDue: '2099-01-15',
    installedAt: '2026-03-01T08:00:00.000Z',
    updatedAt: '2026-03-01T08:00:00.000Z',
    hoseBatch: 'B-2291',
    hoseManufacturedOn: '2025-11-01',
    overallLengthMm: 5000,
    cutLengthMm: 4900,
    endA: { fittingTypeId: CLAW.id, code: CLAW.code, name: CLAW.name, style: 'claw', ratingKpa: 2000, crimpDiameterMm: null, specifiedCrimpDiameterMm: null, crimpToleranceMm: null, crimpWithinSpec: null },
    endB: { fittingTypeId: CLAW.id, code: CLAW.code, name: CLAW.name, style: 'claw', ratingKpa: 2000, crimpDiameterMm: null, specifiedCrimpDiameterMm: null, crimpToleranceMm: null, crimpWithinSpec: null },
    builtOn: '2026-01-10',
    builtOnEstimated: false,
    builder: 'Hose shop',
    cost: 182.5,
    storeLocation: null,
    installedAtEstimated: false,
    predatesRecords: false,
    proofTest: { eventId: uuid('e7e7'), testedOn: '2026-01-11', medium: 'water', requiredPressureKpa: 4000, heldPressureKpa: 4000, holdSeconds: 60, result: 'pass', tester: 'Hose shop' },
    allowablePressureKpa: 2000,
    checkResults: [checkResult({ check: 'allowable-pressure', sentence: 'Allowable 20.0 bar covers the 7.0 bar this position can see.', overridable: false })],
    overrides: [],
    lastInspectedAt: null,
    notes: null,
    version: 1,
    abilities: { ...ABILITIES_NONE, tagOut: true, remove: true, replace: true },
    ...overrides,
  };
}

export function stockAssembly(overrides: Partial<AssemblyDto> = {}): AssemblyDto {
  return buildAssembly({
    status: 'in_stock',
    position: null,
    checkOutcome: null,
    checkResults: null,
    installedAt: null,
    nextInspectionDue: null,
    storeLocation: 'Rack C3',
    abilities: { ...ABILITIES_NONE, install: true, proofTest: true, scrap: true },
    ...overrides,
  });
}

export function listItemOf(a: AssemblyDto): AssemblyListItemDto {
  return {
    id: a.id,
    number: a.number,
    status: a.status,
    siteId: a.siteId,
    siteName: a.siteName,
    construction: a.construction,
    position: a.position,
    checkOutcome: a.checkOutcome,
    overridden: a.overridden,
    nextInspectionDue: a.nextInspectionDue,
    installedAt: a.installedAt,
    updatedAt: a.updatedAt,
  };
}

export function buildEvent(overrides: Partial<AssemblyEventDto> & Pick<AssemblyEventDto, 'kind'>): AssemblyEventDto {
  return {
    id: uuid('e0e0'),
    occurredAt: '2026-03-01T08:00:00.000Z',
    occurredAtEstimated: false,
    recordedAt: '2026-03-01T08:05:00.000Z',
    actorName: 'Avery Fitter',
    positionId: null,
    positionCode: null,
    siteId: SITES[0]!.id,
    workOrder: null,
    hourMeterHours: null,
    note: null,
    data: {},
    voidsEventId: null,
    voidedBy: null,
    ...overrides,
  };
}

export function siteServices(siteId = SITES[0]!.id): SiteServiceDto[] {
  const definition = serviceByCode('compressed-air')!;
  const settings = defaultServiceSettings(definition);
  return [{ siteId, serviceCode: definition.code, name: definition.name, description: definition.description, settings, defaults: settings, customised: false }];
}

export const page = <T>(data: T[]) => ({ data, pagination: { page: 1, pageSize: 25, total: data.length } });
