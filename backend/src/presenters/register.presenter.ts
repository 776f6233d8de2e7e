import { COMPATIBILITY_RATINGS, COMPATIBILITY_TABLE, MEDIA, TUBE_COMPOUND_NAMES, TUBE_COMPOUNDS } from '../../../shared/src/checks/compatibility.js';
import { ELECTRICAL_PROPERTIES, REINFORCEMENTS } from '../../../shared/src/checks/types.js';
import { roleMay } from '../../../shared/src/permissions.js';
import {
  FITTING_STYLE_LABELS,
  FITTING_STYLES,
  type AreaDto,
  type ConstructionDto,
  type EquipmentDto,
  type FittingStyle,
  type FittingTypeDto,
  type PositionDto,
  type ReferenceDto,
  type ServiceSettingsInput,
  type SiteDto,
  type SiteServiceDto,
} from '../../../shared/src/schemas/register.schema.js';
import { CRITICALITY_DEFINITIONS } from '../../../shared/src/services/criticality.js';
import { REMOVAL_REASON_DEFINITIONS } from '../../../shared/src/services/removal-reasons.js';
import { SERVICE_CATALOGUE, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { SIZE_CLASSES } from '../../../shared/src/sizes/nominal-sizes.js';
import { LENGTH_UNITS, PRESSURE_UNITS, TEMPERATURE_UNITS } from '../../../shared/src/units/units.js';
import type { Area, Construction, FittingType, Site } from '../entities/index.js';
import type { Actor } from '../policies/actor.js';
import type { EquipmentView } from '../services/equipment.service.js';
import type { PositionView } from '../services/positions.service.js';
import type { SiteServiceView } from '../services/site-services.service.js';

const iso = (d: Date | null): string | null => d?.toISOString() ?? null;

export function presentSite(site: Site, actor: Actor): SiteDto {
  return {
    id: site.id,
    code: site.code,
    name: site.name,
    timeZone: site.timeZone,
    currency: site.currency,
    defaultUnits: {
      pressureUnit: site.defaultUnits.pressureUnit,
      lengthUnit: site.defaultUnits.lengthUnit,
      temperatureUnit: site.defaultUnits.temperatureUnit,
    },
    archivedAt: iso(site.archivedAt),
    abilities: { update: roleMay(actor.role, 'sites.update') },
  };
}

export function presentArea(area: Area, actor: Actor): AreaDto {
  const edit = roleMay(actor.role, 'areas.edit');
  return {
    id: area.id,
    siteId: area.siteId,
    code: area.code,
    name: area.name,
    archivedAt: iso(area.archivedAt),
    abilities: { update: edit, archive: edit && !area.archivedAt },
  };
}

export function presentEquipment(view: EquipmentView, actor: Actor): EquipmentDto {
  const { equipment } = view;
  const edit = roleMay(actor.role, 'equipment.edit');
  return {
    id: equipment.id,
    siteId: equipment.siteId,
    areaId: equipment.areaId,
    areaName: view.areaName,
    assetNumber: equipment.assetNumber,
    name: equipment.name,
    hasHourMeter: equipment.hasHourMeter,
    hourMeterHours: equipment.hourMeterHours,
    hourMeterReadAt: iso(equipment.hourMeterReadAt),
    archivedAt: iso(equipment.archivedAt),
    abilities: { update: edit, archive: edit && !equipment.archivedAt },
  };
}

function presentSettings(settings: ServiceSettings): ServiceSettingsInput {
  return {
    designFactorBands: settings.designFactorBands.map((b) => ({ upToKpa: b.upToKpa, factor: b.factor, source: b.source })),
    defaultInspectionIntervalDays: settings.defaultInspectionIntervalDays,
    conductivityRequired: settings.conductivityRequired,
    periodicTest: settings.periodicTest ? { kind: settings.periodicTest.kind, intervalDays: settings.periodicTest.intervalDays } : null,
    suctionDuty: settings.suctionDuty,
    foodContactRequired: settings.foodContactRequired,
  };
}

export function presentSiteService(view: SiteServiceView): SiteServiceDto {
  return {
    siteId: view.siteId,
    serviceCode: view.definition.code,
    name: view.definition.name,
    description: view.definition.description,
    settings: presentSettings(view.settings),
    defaults: presentSettings(view.defaults),
    customised: view.customised,
  };
}

export function presentConstruction(c: Construction, actor: Actor): ConstructionDto {
  const edit = roleMay(actor.role, 'constructions.edit');
  return {
    id: c.id,
    code: c.code,
    name: c.name,
    tubeCompound: c.tubeCompound,
    reinforcement: c.reinforcement,
    coverCompound: c.coverCompound,
    sizeCode: c.sizeCode,
    workingPressureKpa: c.workingPressureKpa,
    burstPressureKpa: c.burstPressureKpa,
    vacuumRatingKpa: c.vacuumRatingKpa,
    minTempC: c.minTempC,
    maxTempC: c.maxTempC,
    minBendRadiusMm: c.minBendRadiusMm,
    weightKgPerM: c.weightKgPerM,
    electrical: c.electrical,
    foodContactCertified: c.foodContactCertified,
    maker: c.maker,
    partNumber: c.partNumber,
    serviceLifeMonths: c.serviceLifeMonths,
    shelfLifeMonths: c.shelfLifeMonths,
    storageLifeMonths: c.storageLifeMonths,
    notes: c.notes,
    archivedAt: iso(c.archivedAt),
    updatedAt: c.updatedAt.toISOString(),
    abilities: { update: edit, archive: edit && !c.archivedAt },
  };
}

export function presentFittingType(f: FittingType, actor: Actor): FittingTypeDto {
  const edit = roleMay(actor.role, 'fitting-types.edit');
  return {
    id: f.id,
    code: f.code,
    name: f.name,
    style: f.style as FittingStyle,
    material: f.material,
    sizes: f.sizes.map((s) => ({
      sizeCode: s.sizeCode,
      ratingKpa: s.ratingKpa,
      crimpDiameterMm: s.crimpDiameterMm,
      crimpToleranceMm: s.crimpToleranceMm,
    })),
    notes: f.notes,
    archivedAt: iso(f.archivedAt),
    abilities: { update: edit, archive: edit && !f.archivedAt },
  };
}

export function presentPosition(view: PositionView, actor: Actor): PositionDto {
  const { position: p, currentAssembly } = view;
  const edit = roleMay(actor.role, 'positions.edit');
  return {
    id: p.id,
    siteId: p.siteId,
    siteName: view.siteName,
    equipmentId: p.equipmentId,
    equipmentName: view.equipmentName,
    equipmentAssetNumber: view.equipmentAssetNumber,
    areaId: view.areaId,
    areaName: view.areaName,
    code: p.code,
    name: p.name,
    serviceCode: p.serviceCode,
    mediumCode: p.mediumCode,
    maxOperatingPressureKpa: p.maxOperatingPressureKpa,
    minTempC: p.minTempC,
    maxTempC: p.maxTempC,
    sizeCode: p.sizeCode,
    requiredLengthMm: p.requiredLengthMm,
    endAConnection: p.endAConnection,
    endBConnection: p.endBConnection,
    suctionDuty: p.suctionDuty,
    routedBendRadiusMm: p.routedBendRadiusMm,
    criticality: p.criticality,
    inspectionIntervalDays: p.inspectionIntervalDays,
    effectiveInspectionIntervalDays: view.effectiveInspectionIntervalDays,
    notes: p.notes,
    currentAssembly: currentAssembly
      ? { id: currentAssembly.id, number: currentAssembly.number, status: currentAssembly.status, checkOutcome: currentAssembly.checkOutcome }
      : null,
    archivedAt: iso(p.archivedAt),
    updatedAt: p.updatedAt.toISOString(),
    abilities: {
      update: edit,
      archive: edit && !p.archivedAt && !currentAssembly,
      install: roleMay(actor.role, 'assemblies.install') && !p.archivedAt && !currentAssembly,
    },
  };
}

/** The reference lists, the same for everyone. */
export function presentReference(): ReferenceDto {
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
  };
}
