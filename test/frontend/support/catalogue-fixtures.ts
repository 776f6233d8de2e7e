import { COMPATIBILITY_RATINGS, COMPATIBILITY_TABLE, MEDIA, TUBE_COMPOUND_NAMES, TUBE_COMPOUNDS } from '@shared/checks/compatibility';
import { ELECTRICAL_PROPERTIES, REINFORCEMENTS } from '@shared/checks/types';
import type { AreaDto, ConstructionDto, EquipmentDto, FittingTypeDto, ReferenceDto, SiteDto, SiteServiceDto } from '@shared/schemas/register.schema';
import { FITTING_STYLE_LABELS, FITTING_STYLES } from '@shared/schemas/register.schema';
import { CRITICALITY_DEFINITIONS } from '@shared/services/criticality';
import { REMOVAL_REASON_DEFINITIONS } from '@shared/services/removal-reasons';
import { defaultServiceSettings, SERVICE_CATALOGUE, serviceByCode } from '@shared/services/service-catalogue';
import { SIZE_CLASSES } from '@shared/sizes/nominal-sizes';
import { LENGTH_UNITS, PRESSURE_UNITS, TEMPERATURE_UNITS } from '@shared/units/units';
import { SITES } from './fixtures';

/** The reference lists as the server sends them, from the shared tables. */
export function buildReference(overrides: Partial<ReferenceDto> = {}): ReferenceDto {
  return {
    sizeClasses: SIZE_CLASSES.map((s) => ({ ...s, alsoWrittenMm: [...s.alsoWrittenMm] })),
    media: MEDIA.map((m) => ({ ...m })),
    tubeCompounds: TUBE_COMPOUNDS.map((code) => ({ code, name: TUBE_COMPOUND_NAMES[code] })),
    compatibility: COMPATIBILITY_TABLE,
    compatibilityRatings: [...COMPATIBILITY_RATINGS],
    reinforcements: [...REINFORCEMENTS],
    electricalProperties: [...ELECTRICAL_PROPERTIES],
    criticalityLevels: CRITICALITY_DEFINITIONS.map((c) => ({ ...c })),
    removalReasons: REMOVAL_REASON_DEFINITIONS.map((r) => ({ ...r })),
    fittingStyles: FITTING_STYLES.map((code) => ({ code, label: FITTING_STYLE_LABELS[code] })),
    services: SERVICE_CATALOGUE.map((s) => ({ ...s })),
    units: { pressure: [...PRESSURE_UNITS], length: [...LENGTH_UNITS], temperature: [...TEMPERATURE_UNITS] },
    ...overrides,
  };
}

let next = 1;
const uuid = (prefix: string) => `${prefix}-0000-4000-8000-${String(next++).padStart(12, '0')}`;

export function buildConstruction(overrides: Partial<ConstructionDto> = {}): ConstructionDto {
  return {
    id: uuid('c0a5e7b1'),
    code: 'AIR-19-2W',
    name: 'Air hose, 2-wire braid',
    tubeCompound: 'NBR',
    reinforcement: 'steel-wire-braid',
    coverCompound: 'CR',
    sizeCode: 'bore-19',
    workingPressureKpa: 2068.4271879504,
    burstPressureKpa: 8273.7087518016,
    vacuumRatingKpa: null,
    minTempC: -40,
    maxTempC: 93,
    minBendRadiusMm: 180,
    weightKgPerM: 0.82,
    electrical: 'none',
    foodContactCertified: false,
    maker: 'Hillmoor Rubber Works',
    partNumber: 'HM-2W-12',
    serviceLifeMonths: 60,
    shelfLifeMonths: 48,
    storageLifeMonths: 24,
    notes: null,
    archivedAt: null,
    updatedAt: '2026-03-02T07:15:00.000Z',
    abilities: { update: true, archive: true },
    ...overrides,
  };
}

export function buildFittingType(overrides: Partial<FittingTypeDto> = {}): FittingTypeDto {
  return {
    id: uuid('f17e7a9c'),
    code: 'CRIMP-NPT',
    name: 'Crimped stem and ferrule, NPT male',
    style: 'crimped',
    material: 'Zinc-plated steel',
    sizes: [
      { sizeCode: 'bore-12.5', ratingKpa: 34473.8, crimpDiameterMm: 23.4, crimpToleranceMm: 0.2 },
      { sizeCode: 'bore-19', ratingKpa: 27579, crimpDiameterMm: 31, crimpToleranceMm: 0.2 },
    ],
    notes: null,
    archivedAt: null,
    abilities: { update: true, archive: true },
    ...overrides,
  };
}

export function buildSiteService(code: string, overrides: Partial<SiteServiceDto> = {}, siteId = SITES[0]!.id): SiteServiceDto {
  const definition = serviceByCode(code)!;
  const defaults = defaultServiceSettings(definition);
  return {
    siteId,
    serviceCode: code,
    name: definition.name,
    description: definition.description,
    settings: defaults,
    defaults,
    customised: false,
    ...overrides,
  };
}

export function buildSite(overrides: Partial<SiteDto> = {}): SiteDto {
  const summary = SITES[0]!;
  return {
    id: summary.id,
    code: summary.code,
    name: summary.name,
    timeZone: 'Europe/London',
    currency: 'GBP',
    defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' },
    archivedAt: null,
    abilities: { update: false },
    ...overrides,
  };
}

export function buildArea(overrides: Partial<AreaDto> = {}): AreaDto {
  return { id: uuid('a4ea0000'), siteId: SITES[0]!.id, code: 'PIT', name: 'Main pit', archivedAt: null, abilities: { update: true, archive: true }, ...overrides };
}

export function buildEquipment(overrides: Partial<EquipmentDto> = {}): EquipmentDto {
  return {
    id: uuid('e9e90000'),
    siteId: SITES[0]!.id,
    areaId: uuid('a4ea0000'),
    areaName: 'Main pit',
    assetNumber: 'DR-03',
    name: 'Drill rig 3',
    hasHourMeter: true,
    hourMeterHours: null,
    hourMeterReadAt: null,
    archivedAt: null,
    abilities: { update: true, archive: true },
    ...overrides,
  };
}

export const page = <T,>(data: T[]) => ({ data, pagination: { page: 1, pageSize: Math.max(25, data.length), total: data.length } });
