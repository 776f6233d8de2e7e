import { KPA_PER_PSI, atMost } from '../units/units.js';

// The services Ferrule ships with their defaults. A site may edit the settings; the catalogue
// is where a new site starts.

export const CONDUCTIVITY_REQUIREMENTS = ['none', 'conductive', 'static-dissipative'] as const;
export type ConductivityRequirement = (typeof CONDUCTIVITY_REQUIREMENTS)[number];

export const PERIODIC_TEST_KINDS = ['pressure', 'continuity'] as const;
export type PeriodicTestKind = (typeof PERIODIC_TEST_KINDS)[number];

/** One pressure band of a service's design factor (minimum burst ÷ maximum working pressure). */
export interface DesignFactorBand {
  /** Upper end of the band, kPa, inclusive; null for no upper end. */
  upToKpa: number | null;
  factor: number;
  /** The published sentence or setting the factor comes from. */
  source: string;
}

export interface PeriodicTest {
  kind: PeriodicTestKind;
  intervalDays: number;
}

/** The settings of a service that a site may edit. */
export interface ServiceSettings {
  designFactorBands: DesignFactorBand[];
  defaultInspectionIntervalDays: number;
  conductivityRequired: ConductivityRequirement;
  periodicTest: PeriodicTest | null;
  suctionDuty: boolean;
  foodContactRequired: boolean;
}

/** A shipped service: its stable code, words for people, default settings and where each default comes from. */
export interface ServiceDefinition extends ServiceSettings {
  code: string;
  name: string;
  description: string;
  sources: {
    inspectionInterval: string;
    conductivity: string;
    periodicTest: string;
  };
}

const RMA_IP2 = 'RMA Hose Handbook IP-2 (2003), design ratios for newly manufactured hose';
const COMMON_PRACTICE = 'common practice';

/** Top of the RMA IP-2 "water hose up to 150 psi" band, kPa (1034.2 kPa). */
export const WATER_LOW_PRESSURE_LIMIT_KPA = 150 * KPA_PER_PSI;

const WATER_BANDS: DesignFactorBand[] = [
  { upToKpa: WATER_LOW_PRESSURE_LIMIT_KPA, factor: 3, source: `${RMA_IP2}: water hose up to 150 psi, 3:1` },
  { upToKpa: null, factor: 4, source: `${RMA_IP2}: water hose over 150 psi, 4:1` },
];
const LIQUID_BANDS: DesignFactorBand[] = [{ upToKpa: null, factor: 4, source: `${RMA_IP2}: other liquids, 4:1` }];
const SUSPENDED_SOLIDS_BANDS: DesignFactorBand[] = [
  { upToKpa: null, factor: 4, source: `${RMA_IP2}: solids suspended in liquids or air, 4:1` },
];
const GAS_BANDS: DesignFactorBand[] = [
  { upToKpa: null, factor: 4, source: `${RMA_IP2}: compressed air and other gases, 4:1` },
];
const FLASHING_LIQUID_BANDS: DesignFactorBand[] = [
  { upToKpa: null, factor: 5, source: `${RMA_IP2}: liquids that flash to gas (LPG, ammonia), 5:1` },
];
const STEAM_BANDS: DesignFactorBand[] = [{ upToKpa: null, factor: 10, source: `${RMA_IP2}: steam, 10:1` }];

const INTERVAL_SOURCE = `${COMMON_PRACTICE}; inspection frequency by the severity of the application and risk potential (SAE J1273)`;
const NO_CONDUCTIVITY = `${COMMON_PRACTICE}: no static build-up expected in this service`;
const CONDUCTIVITY_SOURCE = `${COMMON_PRACTICE}: flowing fuel, powder and blast media build static charge`;
const PRESSURE_TEST_SOURCE =
  'ARPM IP-2 care and maintenance: one minute at 150 % of the recommended working pressure, hose straight; interval: common practice';
const CONTINUITY_TEST_SOURCE = `${COMMON_PRACTICE}: electrical continuity end to end, interval included`;
const NO_TEST_SOURCE = `${COMMON_PRACTICE}: no periodic test by default`;

function service(
  definition: Omit<ServiceDefinition, 'sources' | 'suctionDuty' | 'foodContactRequired'> &
    Partial<Pick<ServiceDefinition, 'suctionDuty' | 'foodContactRequired'>>,
): ServiceDefinition {
  const sources = {
    inspectionInterval: INTERVAL_SOURCE,
    conductivity: definition.conductivityRequired === 'none' ? NO_CONDUCTIVITY : CONDUCTIVITY_SOURCE,
    periodicTest:
      definition.periodicTest == null
        ? NO_TEST_SOURCE
        : definition.periodicTest.kind === 'pressure'
          ? PRESSURE_TEST_SOURCE
          : CONTINUITY_TEST_SOURCE,
  };
  return { suctionDuty: false, foodContactRequired: false, ...definition, sources };
}

/** The shipped services, in the order a picker shows them. */
export const SERVICE_CATALOGUE: readonly ServiceDefinition[] = [
  service({
    code: 'compressed-air',
    name: 'Compressed air',
    description: 'Plant and drill air from the compressor to tools, rock drills and machines.',
    designFactorBands: GAS_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'none',
    periodicTest: null,
  }),
  service({
    code: 'water-suction-discharge',
    name: 'Water suction and discharge',
    description: 'Pump suction and discharge of water, such as dewatering; the hose must not collapse under suction.',
    designFactorBands: WATER_BANDS,
    defaultInspectionIntervalDays: 180,
    conductivityRequired: 'none',
    periodicTest: null,
    suctionDuty: true,
  }),
  service({
    code: 'water-discharge',
    name: 'Water discharge',
    description: 'Water under pressure only: wash-down, spray, dust suppression and process water.',
    designFactorBands: WATER_BANDS,
    defaultInspectionIntervalDays: 180,
    conductivityRequired: 'none',
    periodicTest: null,
  }),
  service({
    code: 'fuel-oil',
    name: 'Fuel and oil',
    description: 'Diesel, fuel oil and lubricating oils in transfer and dispensing.',
    designFactorBands: LIQUID_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'conductive',
    periodicTest: { kind: 'pressure', intervalDays: 365 },
  }),
  service({
    code: 'chemical-transfer',
    name: 'Chemical transfer',
    description: 'Acids, alkalis and solvents between tanks, tankers and process.',
    designFactorBands: LIQUID_BANDS,
    defaultInspectionIntervalDays: 30,
    conductivityRequired: 'none',
    periodicTest: { kind: 'pressure', intervalDays: 365 },
  }),
  service({
    code: 'liquefied-gas',
    name: 'Liquefied gas',
    description: 'Liquids that flash to gas when released, such as LPG and anhydrous ammonia.',
    designFactorBands: FLASHING_LIQUID_BANDS,
    defaultInspectionIntervalDays: 30,
    conductivityRequired: 'conductive',
    periodicTest: { kind: 'pressure', intervalDays: 365 },
  }),
  service({
    code: 'dry-bulk',
    name: 'Dry bulk and abrasive',
    description: 'Cement, fly ash, sand, grain and other powders and granules conveyed in air.',
    designFactorBands: SUSPENDED_SOLIDS_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'static-dissipative',
    periodicTest: { kind: 'continuity', intervalDays: 365 },
  }),
  service({
    code: 'hot-air-bulk-unloading',
    name: 'Hot air bulk unloading',
    description: 'Blower air, hot from compression, unloading bulk tankers and railcars.',
    designFactorBands: SUSPENDED_SOLIDS_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'static-dissipative',
    periodicTest: { kind: 'continuity', intervalDays: 365 },
  }),
  service({
    code: 'slurry',
    name: 'Slurry',
    description: 'Tailings, lime and mineral slurries pumped through process and mine circuits.',
    designFactorBands: SUSPENDED_SOLIDS_BANDS,
    defaultInspectionIntervalDays: 30,
    conductivityRequired: 'none',
    periodicTest: null,
  }),
  service({
    code: 'abrasive-blasting',
    name: 'Abrasive blasting',
    description: 'Blast media in air from the blast pot to the nozzle.',
    designFactorBands: SUSPENDED_SOLIDS_BANDS,
    defaultInspectionIntervalDays: 7,
    conductivityRequired: 'static-dissipative',
    periodicTest: { kind: 'continuity', intervalDays: 180 },
  }),
  service({
    code: 'vacuum-truck-suction',
    name: 'Vacuum truck and material suction',
    description: 'Suction of sludge, spills and loose material into a vacuum truck or loader.',
    designFactorBands: SUSPENDED_SOLIDS_BANDS,
    defaultInspectionIntervalDays: 30,
    conductivityRequired: 'none',
    periodicTest: null,
    suctionDuty: true,
  }),
  service({
    code: 'hydraulic-suction-return',
    name: 'Hydraulic suction and return',
    description: 'Low-pressure hydraulic lines: pump suction from the tank and return to it.',
    designFactorBands: LIQUID_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'none',
    periodicTest: null,
    suctionDuty: true,
  }),
  service({
    code: 'food-beverage',
    name: 'Food and beverage',
    description: 'Milk, juices, edible oils and other food in contact with the hose tube.',
    designFactorBands: LIQUID_BANDS,
    defaultInspectionIntervalDays: 90,
    conductivityRequired: 'none',
    periodicTest: { kind: 'pressure', intervalDays: 365 },
    foodContactRequired: true,
  }),
  service({
    code: 'steam',
    name: 'Steam',
    description: 'Saturated steam for cleaning, heating and process.',
    designFactorBands: STEAM_BANDS,
    defaultInspectionIntervalDays: 30,
    conductivityRequired: 'none',
    periodicTest: { kind: 'pressure', intervalDays: 180 },
  }),
];

export const SERVICE_CODES: readonly string[] = SERVICE_CATALOGUE.map((s) => s.code);

/** The shipped service with this code, or null. */
export function serviceByCode(code: string | null | undefined): ServiceDefinition | null {
  if (code == null) return null;
  return SERVICE_CATALOGUE.find((s) => s.code === code) ?? null;
}

/** The editable settings of a shipped service, as a fresh copy a site can change. */
export function defaultServiceSettings(definition: ServiceDefinition): ServiceSettings {
  return {
    designFactorBands: definition.designFactorBands.map((band) => ({ ...band })),
    defaultInspectionIntervalDays: definition.defaultInspectionIntervalDays,
    conductivityRequired: definition.conductivityRequired,
    periodicTest: definition.periodicTest ? { ...definition.periodicTest } : null,
    suctionDuty: definition.suctionDuty,
    foodContactRequired: definition.foodContactRequired,
  };
}

/** The design factor that applies at a pressure, kPa, with the sentence its band comes from. */
export interface DesignFactor {
  factor: number;
  source: string;
}

/**
 * The design factor of the band that holds `maxOperatingPressureKpa` (a band's top is inclusive,
 * within the stored-value tolerance); null when the settings have no band for it.
 */
export function designFactorFor(
  settings: Pick<ServiceSettings, 'designFactorBands'>,
  maxOperatingPressureKpa: number,
): DesignFactor | null {
  if (!Number.isFinite(maxOperatingPressureKpa)) return null;
  const bands = [...settings.designFactorBands].sort(
    (a, b) => (a.upToKpa ?? Number.POSITIVE_INFINITY) - (b.upToKpa ?? Number.POSITIVE_INFINITY),
  );
  const band = bands.find((b) => b.upToKpa == null || atMost(maxOperatingPressureKpa, b.upToKpa));
  if (!band || !(band.factor > 0)) return null;
  return { factor: band.factor, source: band.source };
}
