import type { ServiceSettings } from '../services/service-catalogue.js';

export const CHECK_OUTCOMES = ['pass', 'warn', 'fail'] as const;
export type CheckOutcome = (typeof CHECK_OUTCOMES)[number];

export const SELECTION_CHECK_CODES = [
  'allowable-pressure',
  'temperature-range',
  'medium-compatibility',
  'vacuum-rating',
  'bend-radius',
  'size-class',
  'conductivity',
  'food-contact',
  'proof-test',
  'shelf-life',
  'service-life',
] as const;
export type SelectionCheckCode = (typeof SELECTION_CHECK_CODES)[number];

/** Each check's name as people read it. */
export const SELECTION_CHECK_LABELS: Record<SelectionCheckCode, string> = {
  'allowable-pressure': 'Allowable pressure',
  'temperature-range': 'Temperature range',
  'medium-compatibility': 'Tube and medium',
  'vacuum-rating': 'Vacuum rating',
  'bend-radius': 'Bend radius',
  'size-class': 'Size',
  conductivity: 'Conductivity',
  'food-contact': 'Food contact',
  'proof-test': 'Proof test',
  'shelf-life': 'Shelf and storage life',
  'service-life': 'Service life',
};

/** Where a check's rule comes from: a published text and its section, a design rule, or common practice. */
export interface CheckSource {
  title: string;
  section: string;
}

/** The answer of one selection check, in words a fitter understands. */
export interface CheckResult {
  check: SelectionCheckCode;
  outcome: CheckOutcome;
  sentence: string;
  /** The rule's sources, the main one first. */
  source: CheckSource[];
  /** Whether a competent person may accept a fail of this check with a reason. */
  overridable: boolean;
}

export const REINFORCEMENTS = [
  'textile',
  'textile-helical-wire',
  'steel-wire-braid',
  'steel-wire-spiral',
  'none',
] as const;
export type Reinforcement = (typeof REINFORCEMENTS)[number];

export const ELECTRICAL_PROPERTIES = ['none', 'conductive', 'static-dissipative'] as const;
export type ElectricalProperty = (typeof ELECTRICAL_PROPERTIES)[number];

/** A hose construction as the checks see it. Null means not recorded. */
export interface ConstructionCheckInput {
  code: string;
  tubeCompound: string | null;
  reinforcement: Reinforcement | null;
  coverCompound: string | null;
  sizeCode: string | null;
  workingPressureKpa: number | null;
  burstPressureKpa: number | null;
  /** Vacuum the hose withstands, kPa below atmospheric; null when the construction has no vacuum rating. */
  vacuumRatingKpa: number | null;
  minTempC: number | null;
  maxTempC: number | null;
  minBendRadiusMm: number | null;
  electrical: ElectricalProperty | null;
  foodContactCertified: boolean | null;
  /** Longest life of an assembly from its build date, storage included, months; absent when the construction sets none. */
  serviceLifeMonths?: number | null;
  /** Oldest the bulk hose may be when assembled, months; absent when the construction sets none. */
  shelfLifeMonths?: number | null;
  /** Longest an assembly may be stored between build and install, months; absent when the construction sets none. */
  storageLifeMonths?: number | null;
}

/** One end fitting. Null means not recorded. */
export interface FittingCheckInput {
  sizeCode: string | null;
  ratingKpa: number | null;
}

/** A position's design conditions. Null means not recorded. */
export interface PositionCheckInput {
  serviceCode: string | null;
  mediumCode: string | null;
  maxOperatingPressureKpa: number | null;
  minTempC: number | null;
  maxTempC: number | null;
  sizeCode: string | null;
  /** Null falls back to the service's default. */
  suctionDuty: boolean | null;
  /** The tightest bend the hose is routed through, mm, measured to the inside of the bend. */
  routedBendRadiusMm: number | null;
}

/** The service settings the checks use (the site's, or the catalogue's defaults). */
export type ServiceCheckSettings = Pick<
  ServiceSettings,
  'designFactorBands' | 'conductivityRequired' | 'foodContactRequired'
> & { suctionDuty?: boolean };

export interface ProofTestCheckInput {
  result: 'pass' | 'fail';
  heldPressureKpa: number | null;
  /** Null takes the default: half the construction's burst pressure. */
  requiredPressureKpa: number | null;
}

/** The physical assembly. Dates are ISO dates ("2024-03-15") or full ISO timestamps. */
export interface AssemblyCheckInput {
  hoseManufacturedOn: string | null;
  builtOn: string | null;
  installedOn?: string | null;
  proofTest: ProofTestCheckInput | null;
}

/** Everything the selection checks look at for one assembly at one position. */
export interface SelectionCheckInput {
  construction: ConstructionCheckInput;
  fittings: { endA: FittingCheckInput | null; endB: FittingCheckInput | null };
  position: PositionCheckInput;
  service: ServiceCheckSettings | null;
  assembly: AssemblyCheckInput;
}
