import type { ElectricalProperty } from '../../../shared/src/checks/types.js';
import type { AssemblyStatus, ProofTestMedium } from '../../../shared/src/schemas/assemblies.schema.js';
import type { FittingStyle } from '../../../shared/src/schemas/register.schema.js';
import type { Criticality } from '../../../shared/src/services/criticality.js';
import type { RemovalReason } from '../../../shared/src/services/removal-reasons.js';
import { defaultServiceSettings, SERVICE_CATALOGUE, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { DEMO_FAMILY_NAMES, DEMO_GIVEN_NAMES } from './demo-scenario.js';
import { Random } from './random.js';
import { CONSTRUCTIONS, constructionByCode, FITTING_TYPES, fittingSize, HOSE_PRICE_PER_M, type ConstructionRow } from './register-catalogue.js';
import { SITE_TEMPLATES, type EquipmentTemplate, type PositionTemplate } from './register-sites.js';

// The register of the demo as a plan: plain data drawn from a seeded Random and the anchor date,
// nothing read from the clock or the database, so the same seed and anchor give the same plan.
// Times are ISO strings; pressures kPa, lengths mm, temperatures °C, costs in pounds.

export interface SiteServicePlan {
  siteCode: string;
  serviceCode: string;
  settings: ServiceSettings;
}

export interface AreaPlan {
  siteCode: string;
  code: string;
  name: string;
}

export interface EquipmentPlan {
  siteCode: string;
  areaCode: string;
  assetNumber: string;
  name: string;
  hasHourMeter: boolean;
  hourMeterHours: number | null;
  hourMeterReadAt: string | null;
}

export interface PositionPlan {
  siteCode: string;
  assetNumber: string;
  /** Unique across the demo: it starts with the asset number, which starts with the site code. */
  code: string;
  name: string;
  serviceCode: string;
  mediumCode: string | null;
  maxOperatingPressureKpa: number;
  minTempC: number;
  maxTempC: number;
  sizeCode: string;
  requiredLengthMm: number;
  endAConnection: string;
  endBConnection: string;
  suctionDuty: boolean | null;
  routedBendRadiusMm: number | null;
  criticality: Criticality;
  inspectionIntervalDays: number | null;
  notes: string | null;
}

export interface FittingTypePlan {
  code: string;
  name: string;
  style: FittingStyle;
  material: string;
  notes: string | null;
  sizes: Array<{ sizeCode: string; ratingKpa: number; crimpDiameterMm: number | null; crimpToleranceMm: number | null }>;
}

export interface OverridePlan {
  checks: Array<'bend-radius'>;
  reason: string;
  reviewOn: string;
}

export type AssemblyStep =
  | { kind: 'proof_test'; testedOn: string; medium: ProofTestMedium; heldPressureKpa: number; holdSeconds: number; result: 'pass' | 'fail'; tester: string; note: string | null }
  | { kind: 'install'; at: string; estimated: boolean; positionCode: string; hourMeterHours: number | null; workOrder: string | null; note: string | null; override: OverridePlan | null }
  | { kind: 'remove'; at: string; reason: RemovalReason; hourMeterHours: number | null; workOrder: string | null; note: string | null }
  | { kind: 'tag_out'; at: string; note: string; workOrder: string | null }
  | { kind: 'scrap'; at: string; note: string }
  | { kind: 'return_to_stock'; at: string; storeLocation: string; inspectionNote: string };

export interface FittingEndPlan {
  fittingCode: string;
  crimpMm: number | null;
}

/** One physical assembly: how it was built, then what happened to it, oldest first. */
export interface AssemblyPlan {
  ref: number;
  siteCode: string;
  constructionCode: string;
  endA: FittingEndPlan;
  endB: FittingEndPlan;
  hoseBatch: string | null;
  hoseManufacturedOn: string | null;
  overallLengthMm: number;
  cutLengthMm: number;
  builtOn: string;
  builtOnEstimated: boolean;
  builder: string | null;
  cost: number | null;
  storeLocation: string | null;
  note: string | null;
  /** Installed before records began: flagged after its install. */
  predatesRecords: boolean;
  steps: AssemblyStep[];
  /** Where its steps leave it. */
  status: AssemblyStatus;
}

/** A later change of a position's design conditions, made after its current assembly went in. */
export interface PositionChangePlan {
  positionCode: string;
  at: string;
  set: { maxOperatingPressureKpa?: number; routedBendRadiusMm?: number };
  reason: string;
}

/** A later correction of a construction's record. */
export interface ConstructionChangePlan {
  constructionCode: string;
  at: string;
  set: { electrical: ElectricalProperty; notes: string };
  reason: string;
}

export interface RegisterPlan {
  siteServices: SiteServicePlan[];
  areas: AreaPlan[];
  equipment: EquipmentPlan[];
  positions: PositionPlan[];
  constructions: ConstructionRow[];
  fittingTypes: FittingTypePlan[];
  assemblies: AssemblyPlan[];
  positionChanges: PositionChangePlan[];
  constructionChanges: ConstructionChangePlan[];
}

/** Records began three years before the anchor; hoses installed earlier are flagged. */
export const RECORDS_BEGAN_DAYS = 1096;

/** The one position whose assembly went in with a failed check accepted: the routed bend is tighter than the hose allows. */
export const OVERRIDDEN_POSITION = 'CWM-RB-03/AIR';
/** Its air supply was raised after the assembly went in, above the claw couplings' rating. */
export const PRESSURE_RAISED_POSITION = 'BFQ-DR-04/AIR-MAIN';
/** Re-routed after the assembly went in, through a bend tighter than the hose allows. */
export const REROUTED_POSITION = 'CWM-DW-02/DISCH';
/** Holds a hydraulic assembly from before records began, now past its service life. */
export const OVERAGE_POSITION = 'BFQ-CR-01/HYD-RET';
/** Found not conductive after its assemblies went into fuel and oil service. */
export const NON_CONDUCTIVE_CONSTRUCTION = 'OIL-25-GP';

/** About 6½ years: built a few days before that, the assembly is now past the 72-month service life of its construction. */
const OVERAGE_INSTALLED_DAYS = 2372;

const SPECIAL = new Set([OVERRIDDEN_POSITION, PRESSURE_RAISED_POSITION, REROUTED_POSITION, OVERAGE_POSITION]);

const COUNTS = {
  vacant: 8,
  taggedOut: 6,
  predatesRecords: 9,
  recentRemovals: 32,
  recentRemovalsAtVacant: 5,
  scrappedRemovals: 42,
  returnedToStock: 4,
  newStock: 64,
  awaitingProofTest: 6,
  storageExpired: 2,
};

/** Typical life of a hose in each service (Weibull scale η, days, and shape β), before a position's own factor. */
const LIFE: Readonly<Record<string, { etaDays: number; beta: number }>> = {
  'compressed-air': { etaDays: 420, beta: 1.6 },
  'water-suction-discharge': { etaDays: 1000, beta: 1.8 },
  'water-discharge': { etaDays: 700, beta: 1.4 },
  'fuel-oil': { etaDays: 900, beta: 1.5 },
  'chemical-transfer': { etaDays: 800, beta: 1.6 },
  'liquefied-gas': { etaDays: 1500, beta: 2.5 },
  'dry-bulk': { etaDays: 500, beta: 2 },
  'hot-air-bulk-unloading': { etaDays: 450, beta: 2.2 },
  slurry: { etaDays: 240, beta: 2.4 },
  'abrasive-blasting': { etaDays: 140, beta: 2 },
  'vacuum-truck-suction': { etaDays: 260, beta: 1.8 },
  'hydraulic-suction-return': { etaDays: 1100, beta: 1.9 },
  'food-beverage': { etaDays: 720, beta: 1.5 },
  steam: { etaDays: 300, beta: 1.6 },
};

/** Services where a hose may well have been in place since before records began. */
const LONG_LIVED = new Set(['water-suction-discharge', 'water-discharge', 'fuel-oil', 'liquefied-gas', 'chemical-transfer', 'food-beverage']);

const LABOUR_PER_ASSEMBLY = 18;
const DAY_MS = 86_400_000;
const HOUR_MS = 3_600_000;
/** Keeps the register's draws apart from the people's, so one never reshuffles the other. */
const REGISTER_STREAM = 0x5eed4e67;

const FAILURE_NOTES = [
  'Burst about 300 mm from end A; reinforcement broken.',
  'Leaking at the end B ferrule; found spraying at the start of the shift.',
  'Pulled out of the end A fitting.',
  'Burst at the bend nearest end B.',
  'Blister on the cover burst through; tube split underneath.',
];
const WORN_NOTES = [
  'Cover worn through to the reinforcement where it rubs on the frame.',
  'Reinforcement showing at the clamp.',
  'Cover cracked all along the top of the run.',
  'Abrasion through the cover on the underside.',
];
const DAMAGED_NOTES = [
  'Cover gouged through to the reinforcement by a sharp edge.',
  'Crushed when a load was set down on it.',
  'Kinked flat where it was pulled round a corner.',
];
/** Damage that only happens where machines move and rock falls. */
const MOBILE_DAMAGED_NOTES = ['Crushed under a loader wheel.', 'Cut by falling rock.', 'Kinked flat when the machine tracked over it.'];
const MOBILE_AREAS = new Set(['DNB', 'DEV', 'STP', 'DWT', 'SHC', 'SMP']);
const SERVICE_FAILURE_NOTES: Readonly<Record<string, string[]>> = {
  slurry: ['Tube worn through on the outside of the bend at the pump discharge.', 'Tube worn thin at end A; leaking slurry through the cover.'],
  'abrasive-blasting': ['Worn through a metre from the nozzle; media escaping.', 'Tube worn through at the pot outlet.'],
  'compressed-air': ['Burst near end A; the whip restraint held it.', 'Burst where the hose crosses the frame.'],
  'hydraulic-suction-return': ['Cover cracked and weeping oil at the clamp.', 'Leaking at the end A crimp.'],
  'vacuum-truck-suction': ['Helix broken; hose collapsed under suction.', 'Tube worn through on the boom side.'],
};
const SCRAP_NOTES = [
  'Not fit to re-test: reinforcement damaged. Cut in two and scrapped.',
  'Scrapped: failed the hose shop inspection.',
  'Fittings recovered for re-use; hose scrapped.',
  'Scrapped after the failure review.',
];
const RECENT_NOTES: Readonly<Record<RemovalReason, string[]>> = {
  'planned-replacement': ['Changed at the planned interval.', 'Changed with the equipment’s planned service.'],
  relocated: ['Taken off while the equipment was moved; to be re-tested before it is used again.', 'Swapped for a longer assembly; sent to the hose shop.'],
  obsolete: ['Taken off: the line is not needed until the plant change is finished.'],
  'worn-at-inspection': ['Cover cracking at the clamp found at inspection; to be assessed in the hose shop.'],
  damaged: ['Cover gouged; sent to the hose shop to decide whether it can be re-tested.'],
  failure: ['Failed in service; kept for the failure review.'],
};
const VACANT_NOTES = [
  'Taken off while the equipment is stood down for repair; to be re-tested before it is refitted.',
  'Line taken out of use while the pipework is changed.',
];
const TAG_OUT_NOTES = [
  'Weeping at the end A fitting. Isolated and tagged out until the replacement is built.',
  'Cover cut through to the reinforcement. Tagged out; replacement on order.',
  'Bulge near end B seen at the pre-start check. Tagged out; do not pressurise.',
  'Cover cracking along the top of the run. Tagged out pending replacement.',
];
const CLAW_TAG_OUT_NOTE = 'Whip restraint found missing and a coupling pin bent. Tagged out until both are replaced.';
const RETURN_NOTES = [
  'Inspected in the hose shop: cover and fittings sound, re-tested. Back in stock.',
  'No damage found; re-tested and re-tagged. Back in stock.',
];
const OVERRIDE_REASON =
  'The grizzly guard rail forces a 110 mm bend at the breaker inlet and there is no other route until the new guard with a wider hose port is fitted (WO-47120). ' +
  'Accepted for the interim: the bend is inspected every week for kinking and cover cracking, and whip restraints are fitted at both ends. Review when the guard is changed.';

interface Slot {
  position: PositionPlan;
  template: PositionTemplate;
  equipment: EquipmentTemplate;
  construction: ConstructionRow;
  etaDays: number;
  beta: number;
  vacant: boolean;
  vacantKind: 'recent' | 'scrapped';
  taggedOut: boolean;
  predates: boolean;
  recent: number;
  scrapped: number;
  returned: number;
}

interface Moment {
  days: number;
  hour: number;
}

/** The whole register of the demo, drawn from `seed` and the anchor. */
export function planRegister(seed: number, anchor: Date): RegisterPlan {
  const rng = new Random((seed ^ REGISTER_STREAM) >>> 0);
  const day0 = Date.UTC(anchor.getUTCFullYear(), anchor.getUTCMonth(), anchor.getUTCDate());
  /** A time `days` before the anchor's day, at `hour` UTC; always before the anchor for days ≥ 1. */
  const timeAt = (m: Moment) => new Date(day0 - m.days * DAY_MS + m.hour * HOUR_MS).toISOString();
  const dateAt = (days: number) => new Date(day0 - days * DAY_MS).toISOString().slice(0, 10);
  const uniform = (low: number, high: number) => low + rng.next() * (high - low);
  const workOrder = () => (rng.chance(0.55) ? `WO-${rng.int(41000, 48999)}` : null);

  const builders: Record<string, string[]> = { BFQ: [], CWM: [] };
  for (const [site, n] of [['BFQ', 3], ['CWM', 2]] as const) {
    while (builders[site]!.length < n) {
      const [given, family] = [rng.pick(DEMO_GIVEN_NAMES), rng.pick(DEMO_FAMILY_NAMES)];
      const taken = [...builders.BFQ!, ...builders.CWM!].some((name) => name.startsWith(`${given} `) || name.endsWith(` ${family}`));
      if (!taken) builders[site]!.push(`${given} ${family}`);
    }
  }
  const storeLocation = (site: string) =>
    site === 'BFQ' ? `Main stores, hose rack ${rng.pick(['A', 'B', 'C'])}${rng.int(1, 6)}` : `Portal store, bay ${rng.int(1, 4)}`;

  // ── Sites, areas, equipment, positions ──────────────────────────────────────────────────────
  const siteServices: SiteServicePlan[] = [];
  const areas: AreaPlan[] = [];
  const equipment: EquipmentPlan[] = [];
  const positions: PositionPlan[] = [];
  const slots: Slot[] = [];
  const meterOf = new Map<string, EquipmentTemplate['meter']>();
  for (const site of SITE_TEMPLATES) {
    for (const service of SERVICE_CATALOGUE) siteServices.push({ siteCode: site.code, serviceCode: service.code, settings: defaultServiceSettings(service) });
    for (const area of site.areas) areas.push({ siteCode: site.code, ...area });
    for (const eq of site.equipment) {
      const readDays = rng.int(1, 3);
      equipment.push({
        siteCode: site.code,
        areaCode: eq.area,
        assetNumber: eq.assetNumber,
        name: eq.name,
        hasHourMeter: eq.meter != null,
        hourMeterHours: eq.meter ? Math.round(eq.meter.hours - eq.meter.perDay * (readDays - 6 / 24)) : null,
        hourMeterReadAt: eq.meter ? timeAt({ days: readDays, hour: 6 }) : null,
      });
      meterOf.set(eq.assetNumber, eq.meter);
      for (const t of eq.positions) {
        const construction = constructionByCode(t.construction);
        const code = `${eq.assetNumber}/${t.key}`;
        const mop = Math.round(uniform(t.mopKpa[0], t.mopKpa[1]) / 10) * 10;
        const lengthMm = Math.round(uniform(t.lengthM[0], t.lengthM[1]) * 10) * 100;
        const drawnBend = Math.round((construction.minBendRadiusMm * uniform(1.3, 3)) / 10) * 10;
        const unsurveyed = t.bendMm === 'unsurveyed' || (!SPECIAL.has(code) && rng.chance(0.04));
        const position: PositionPlan = {
          siteCode: site.code,
          assetNumber: eq.assetNumber,
          code,
          name: t.name,
          serviceCode: t.service,
          mediumCode: t.medium,
          maxOperatingPressureKpa: mop,
          minTempC: t.tempC[0],
          maxTempC: t.tempC[1],
          sizeCode: construction.sizeCode,
          requiredLengthMm: lengthMm,
          endAConnection: t.connections[0],
          endBConnection: t.connections[1],
          suctionDuty: t.suction ?? null,
          routedBendRadiusMm: unsurveyed ? null : typeof t.bendMm === 'number' ? t.bendMm : drawnBend,
          criticality: t.criticality,
          inspectionIntervalDays: t.inspectionIntervalDays ?? null,
          notes: t.notes ?? (unsurveyed ? 'Routing not yet surveyed.' : null),
        };
        positions.push(position);
        const life = LIFE[t.service]!;
        slots.push({
          position, template: t, equipment: eq, construction, etaDays: life.etaDays * (t.lifeFactor ?? 1), beta: life.beta,
          vacant: false, vacantKind: 'recent', taggedOut: false, predates: false, recent: 0, scrapped: 0, returned: 0,
        });
      }
    }
  }

  // ── Which positions are empty, tagged out, old, and which saw hoses come and go ─────────────
  const isOil = (s: Slot) => s.construction.code === NON_CONDUCTIVE_CONSTRUCTION;
  const ordinary = (s: Slot) => !SPECIAL.has(s.position.code) && !isOil(s);
  for (const s of pickSome(rng, slots.filter(ordinary), COUNTS.vacant)) s.vacant = true;
  slots.forEach((s) => (s.predates = s.position.code === OVERAGE_POSITION));
  const oldCandidates = slots.filter((s) => ordinary(s) && !s.vacant && LONG_LIVED.has(s.position.serviceCode));
  for (const s of pickSome(rng, oldCandidates, COUNTS.predatesRecords)) s.predates = true;
  for (const s of pickSome(rng, slots.filter((s) => ordinary(s) && !s.vacant), COUNTS.taggedOut)) s.taggedOut = true;
  slots.filter((s) => s.vacant).forEach((s, i) => (s.vacantKind = i < COUNTS.recentRemovalsAtVacant ? 'recent' : 'scrapped'));
  const recentPool = slots.filter((s) => ordinary(s) && !s.vacant && !s.predates);
  for (const s of pickSome(rng, recentPool, COUNTS.recentRemovals - COUNTS.recentRemovalsAtVacant)) s.recent = 1;
  const historyAllowed = (s: Slot) => s.position.code !== OVERRIDDEN_POSITION && s.position.code !== OVERAGE_POSITION && !s.predates;
  for (const s of pickSome(rng, slots.filter((s) => historyAllowed(s) && !s.vacant), COUNTS.returnedToStock)) s.returned = 1;
  const scrapTarget = COUNTS.scrappedRemovals - slots.filter((s) => s.vacant && s.vacantKind === 'scrapped').length;
  for (let placed = 0; placed < scrapTarget; placed++) {
    const pool = slots.filter((s) => historyAllowed(s) && s.recent + s.scrapped + s.returned < 3);
    pickWeighted(rng, pool, (s) => 1 / s.etaDays).scrapped++;
  }

  // ── Assemblies ──────────────────────────────────────────────────────────────────────────────
  const assemblies: AssemblyPlan[] = [];
  const hoursAt = (assetNumber: string, m: Moment): number | null => {
    const meter = meterOf.get(assetNumber);
    if (!meter) return null;
    const hours = Math.round(meter.hours - meter.perDay * (m.days - m.hour / 24));
    return hours > 50 ? hours : null;
  };

  /** A new assembly built `builtDays` before the anchor, proof-tested no later than `testBy` days before it. */
  const build = (t: PositionTemplate, siteCode: string, lengthMm: number, builtDays: number, testBy: number | null, estimated: boolean): AssemblyPlan => {
    const construction = constructionByCode(t.construction);
    const [a, b] = [fittingSize(t.ends[0], construction.sizeCode), fittingSize(t.ends[1], construction.sizeCode)];
    const crimp = (spec: typeof a) =>
      spec.crimpDiameterMm == null ? null : Math.round((spec.crimpDiameterMm + (rng.next() * 2 - 1) * 0.6 * (spec.crimpToleranceMm ?? 0)) * 100) / 100;
    const madeDays = estimated || rng.chance(0.12) ? null : builtDays + rng.int(20, 300);
    const builder = estimated ? null : rng.pick(builders[siteCode]!);
    const plan: AssemblyPlan = {
      ref: assemblies.length,
      siteCode,
      constructionCode: construction.code,
      endA: { fittingCode: t.ends[0], crimpMm: crimp(a) },
      endB: { fittingCode: t.ends[1], crimpMm: crimp(b) },
      hoseBatch: madeDays == null ? null : `L${dateAt(madeDays).slice(2, 7).replace('-', '')}-${rng.int(10, 99)}`,
      hoseManufacturedOn: madeDays == null ? null : dateAt(madeDays),
      overallLengthMm: lengthMm,
      cutLengthMm: lengthMm - a.allowanceMm - b.allowanceMm,
      builtOn: dateAt(builtDays),
      builtOnEstimated: estimated,
      builder,
      cost: estimated ? null : Math.round(((lengthMm / 1000) * HOSE_PRICE_PER_M[construction.code]! + a.price + b.price + LABOUR_PER_ASSEMBLY) * 100) / 100,
      storeLocation: null,
      note: estimated ? 'In place before records began; build date estimated from the maintenance history.' : null,
      predatesRecords: false,
      steps: [],
      status: 'built',
    };
    if (testBy != null) {
      plan.steps.push({
        kind: 'proof_test',
        testedOn: dateAt(estimated ? builtDays : Math.max(testBy, builtDays - rng.int(0, 2))),
        medium: t.service === 'hydraulic-suction-return' ? 'hydraulic-oil' : 'water',
        heldPressureKpa: Math.ceil((construction.burstPressureKpa / 2) * (1 + rng.next() * 0.03) / 10) * 10,
        holdSeconds: rng.pick([60, 60, 60, 120, 30]),
        result: 'pass',
        tester: builder ?? 'Hose shop',
        note: estimated ? 'Transcribed from the paper test log.' : null,
      });
      plan.status = 'in_stock';
    }
    assemblies.push(plan);
    return plan;
  };

  const install = (plan: AssemblyPlan, slot: Slot, m: Moment, estimated: boolean, override: OverridePlan | null = null) => {
    // Nothing was written down for a hose fitted before records began: no work order, no meter reading.
    plan.steps.push({
      kind: 'install', at: timeAt(m), estimated, positionCode: slot.position.code, hourMeterHours: estimated ? null : hoursAt(slot.equipment.assetNumber, m),
      workOrder: estimated ? null : workOrder(), note: null, override,
    });
    plan.status = 'installed';
    plan.predatesRecords = estimated;
  };
  const remove = (plan: AssemblyPlan, slot: Slot, m: Moment, reason: RemovalReason, note: string | null) => {
    plan.steps.push({ kind: 'remove', at: timeAt(m), reason, hourMeterHours: hoursAt(slot.equipment.assetNumber, m), workOrder: workOrder(), note });
    plan.status = 'removed';
  };

  const currentStarts = new Map<string, number>();
  for (const slot of slots) {
    const code = slot.position.code;
    const history: Array<'recent' | 'scrapped' | 'returned'> = [];
    if (slot.vacant) history.push(slot.vacantKind);
    if (slot.recent) history.push('recent');
    for (let i = 0; i < slot.returned; i++) history.push('returned');
    for (let i = 0; i < slot.scrapped; i++) history.push('scrapped');

    let boundary: Moment;
    if (slot.vacant) {
      boundary = { days: rng.int(3, 45), hour: rng.int(7, 15) };
    } else {
      let startDays: number;
      if (code === OVERAGE_POSITION) startDays = OVERAGE_INSTALLED_DAYS;
      else if (slot.predates) startDays = RECORDS_BEGAN_DAYS + rng.int(60, 700);
      else if (code === OVERRIDDEN_POSITION) startDays = 26;
      else if (slot.recent) startDays = rng.int(4, 75);
      else {
        const least = code === PRESSURE_RAISED_POSITION || code === REROUTED_POSITION ? 120 : isOil(slot) ? 60 : slot.returned ? 30 : slot.taggedOut ? 12 : 8;
        startDays = Math.min(RECORDS_BEGAN_DAYS - 30, Math.max(least, Math.round(slot.etaDays * uniform(0.05, 0.95))));
      }
      boundary = { days: startDays, hour: rng.int(7, 15) };
      currentStarts.set(code, startDays);
      const builtDays = startDays + (slot.predates ? rng.int(3, 20) : rng.int(2, 45));
      const current = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, builtDays, startDays + 1, slot.predates);
      const override = code === OVERRIDDEN_POSITION ? { checks: ['bend-radius' as const], reason: OVERRIDE_REASON, reviewOn: dateAt(-30) } : null;
      install(current, slot, boundary, slot.predates, override);
      if (slot.taggedOut) {
        const notes = slot.template.ends.includes('CLW-DI') ? [...TAG_OUT_NOTES, CLAW_TAG_OUT_NOTE] : TAG_OUT_NOTES;
        current.steps.push({ kind: 'tag_out', at: timeAt({ days: rng.int(1, Math.min(9, startDays - 1)), hour: 13 }), note: rng.pick(notes), workOrder: workOrder() });
        current.status = 'tagged_out';
      }
    }

    for (const kind of history) {
      const removal = boundary;
      const lifeDays = Math.round(Math.min(3 * slot.etaDays, Math.max(15, slot.etaDays * Math.pow(-Math.log(1 - rng.next()), 1 / slot.beta))));
      const start: Moment = { days: removal.days + lifeDays, hour: rng.int(7, 15) };
      const predates = start.days > RECORDS_BEGAN_DAYS;
      const plan = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, start.days + (predates ? rng.int(3, 20) : rng.int(2, 45)), start.days + 1, predates);
      install(plan, slot, start, predates);
      if (kind === 'scrapped') {
        const roll = rng.next();
        const reason: RemovalReason = roll < 0.35 ? 'failure' : roll < 0.7 ? 'worn-at-inspection' : 'damaged';
        const specific = SERVICE_FAILURE_NOTES[slot.position.serviceCode];
        const note =
          reason === 'failure'
            ? rng.pick(specific && rng.chance(0.6) ? specific : FAILURE_NOTES)
            : reason === 'damaged'
              ? rng.pick(MOBILE_AREAS.has(slot.equipment.area) ? [...DAMAGED_NOTES, ...MOBILE_DAMAGED_NOTES] : DAMAGED_NOTES)
              : rng.pick(WORN_NOTES);
        remove(plan, slot, removal, reason, note);
        plan.steps.push({ kind: 'scrap', at: timeAt({ days: Math.max(1, removal.days - rng.int(1, 10)), hour: 16 }), note: rng.pick(SCRAP_NOTES) });
        plan.status = 'scrapped';
      } else if (kind === 'recent') {
        const reason: RemovalReason = slot.vacant
          ? rng.pick(['relocated', 'obsolete'] as const)
          : rng.pick(['planned-replacement', 'planned-replacement', 'planned-replacement', 'worn-at-inspection', 'damaged', 'relocated'] as const);
        remove(plan, slot, removal, reason, slot.vacant ? rng.pick(VACANT_NOTES) : rng.pick(RECENT_NOTES[reason]));
      } else {
        const reason: RemovalReason = rng.pick(['relocated', 'planned-replacement'] as const);
        remove(plan, slot, removal, reason, rng.pick(RECENT_NOTES[reason]));
        const testDays = removal.days - rng.int(1, Math.min(6, removal.days - 2));
        plan.steps.push({
          kind: 'proof_test',
          testedOn: dateAt(testDays),
          medium: slot.position.serviceCode === 'hydraulic-suction-return' ? 'hydraulic-oil' : 'water',
          heldPressureKpa: Math.ceil(slot.construction.burstPressureKpa / 2 / 10) * 10,
          holdSeconds: 60,
          result: 'pass',
          tester: rng.pick(builders[slot.position.siteCode]!),
          note: 'Re-test after removal.',
        });
        plan.steps.push({ kind: 'return_to_stock', at: timeAt({ days: Math.max(1, testDays - rng.int(0, 2)), hour: 15 }), storeLocation: storeLocation(slot.position.siteCode), inspectionNote: rng.pick(RETURN_NOTES) });
        plan.status = 'in_stock';
      }
      boundary = start;
      if (predates) break; // nothing before records began is known
    }
  }

  // ── Stock, the hose shop's queue, and what was scrapped from the shelf ──────────────────────
  const stockable = slots.filter((s) => !isOil(s) && s.position.code !== OVERRIDDEN_POSITION);
  // Spares per construction follow how many a year the positions use up, at least one of each.
  for (const [code, count] of Object.entries(spareCounts(stockable, COUNTS.newStock))) {
    const users = stockable.filter((s) => s.construction.code === code);
    for (let i = 0; i < count; i++) {
      const slot = rng.pick(users);
      const plan = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, rng.int(5, 320), 1, false);
      plan.storeLocation = storeLocation(slot.position.siteCode);
    }
  }
  for (let i = 0; i < COUNTS.awaitingProofTest; i++) {
    const slot = rng.pick(stockable);
    const plan = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, rng.int(1, 6), null, false);
    plan.storeLocation = 'Hose shop, awaiting proof test';
  }
  {
    const slot = rng.pick(stockable.filter((s) => s.template.ends.includes('CRP-ST')));
    const builtDays = rng.int(20, 60);
    const plan = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, builtDays, null, false);
    plan.steps.push({
      kind: 'proof_test', testedOn: dateAt(builtDays - 1), medium: 'water', heldPressureKpa: Math.round((slot.construction.burstPressureKpa / 2) * 0.85 / 10) * 10,
      holdSeconds: 20, result: 'fail', tester: plan.builder ?? 'Hose shop', note: 'Weeping at the end B ferrule at 85 % of the test pressure; test stopped.',
    });
    plan.steps.push({ kind: 'scrap', at: timeAt({ days: builtDays - 3, hour: 16 }), note: 'Failed its proof test at the ferrule. Fittings cannot be re-used after crimping; scrapped.' });
    plan.status = 'scrapped';
  }
  const hydraulicStock = stockable.filter((s) => s.position.serviceCode === 'hydraulic-suction-return');
  for (let i = 0; i < COUNTS.storageExpired; i++) {
    const slot = rng.pick(hydraulicStock);
    const builtDays = rng.int(745, 790);
    const plan = build(slot.template, slot.position.siteCode, slot.position.requiredLengthMm, builtDays, builtDays - 2, false);
    plan.storeLocation = storeLocation(slot.position.siteCode);
    plan.steps.push({ kind: 'scrap', at: timeAt({ days: rng.int(5, 40), hour: 16 }), note: 'In store longer than the 24-month storage limit for hydraulic assemblies; scrapped rather than fitted.' });
    plan.status = 'scrapped';
  }

  // ── Later changes to what the checks look at ────────────────────────────────────────────────
  const changeBefore = (code: string, least: number) => timeAt({ days: rng.int(least, currentStarts.get(code)! - 20), hour: 10 });
  const positionChanges: PositionChangePlan[] = [
    {
      positionCode: PRESSURE_RAISED_POSITION,
      at: changeBefore(PRESSURE_RAISED_POSITION, 10),
      set: { maxOperatingPressureKpa: 1400 },
      reason: 'The rig is now fed by the high-pressure compressor for the deeper holes: 14 bar at the rig, up from 8.6 bar.',
    },
    {
      positionCode: REROUTED_POSITION,
      at: changeBefore(REROUTED_POSITION, 10),
      set: { routedBendRadiusMm: 450 },
      reason: 'Discharge re-routed under the new ventilation duct at the pump station; tightest bend re-measured at 450 mm.',
    },
  ];
  const oilStart = Math.min(...slots.filter((s) => isOil(s) && !s.vacant).map((s) => currentStarts.get(s.position.code)!));
  const oilTestDays = rng.int(5, oilStart - 10);
  const constructionChanges: ConstructionChangePlan[] = [
    {
      constructionCode: NON_CONDUCTIVE_CONSTRUCTION,
      at: timeAt({ days: oilTestDays, hour: 11 }),
      set: {
        electrical: 'none',
        notes: `Bought for the lube reels. Continuity test on ${dateAt(oilTestDays)}: open circuit end to end on both reels. Not conductive: not for fuel or oil dispensing.`,
      },
      reason: 'Electrical property recorded after the continuity test of the lube reels.',
    },
  ];

  return {
    siteServices,
    areas,
    equipment,
    positions,
    constructions: CONSTRUCTIONS.map((c) => ({ ...c })),
    fittingTypes: FITTING_TYPES.map((f) => ({
      code: f.code,
      name: f.name,
      style: f.style,
      material: f.material,
      notes: f.notes,
      sizes: f.sizes.map((s) => ({ sizeCode: s.sizeCode, ratingKpa: s.ratingKpa, crimpDiameterMm: s.crimpDiameterMm, crimpToleranceMm: s.crimpToleranceMm })),
    })),
    assemblies,
    positionChanges,
    constructionChanges,
  };
}

/** `total` spares shared among the constructions in proportion to the assemblies their positions use a year, at least one each (largest remainders). */
function spareCounts(slots: readonly Slot[], total: number): Record<string, number> {
  const usePerYear = new Map<string, number>();
  for (const s of slots) usePerYear.set(s.construction.code, (usePerYear.get(s.construction.code) ?? 0) + 365 / s.etaDays);
  const codes = [...usePerYear.keys()].sort();
  const sum = codes.reduce((n, c) => n + usePerYear.get(c)!, 0);
  const share = (c: string) => ((total - codes.length) * usePerYear.get(c)!) / sum;
  const counts = Object.fromEntries(codes.map((c) => [c, 1 + Math.floor(share(c))]));
  const left = total - Object.values(counts).reduce((n, c) => n + c, 0);
  const byRemainder = [...codes].sort((a, b) => (share(b) % 1) - (share(a) % 1) || a.localeCompare(b));
  for (const c of byRemainder.slice(0, left)) counts[c]! += 1;
  return counts;
}

/** `n` different items of `pool`, drawn at random. */
function pickSome<T>(rng: Random, pool: readonly T[], n: number): T[] {
  const left = [...pool];
  const out: T[] = [];
  while (out.length < n && left.length > 0) out.push(left.splice(Math.floor(rng.next() * left.length), 1)[0]!);
  return out;
}

/** One item of `pool`, drawn with chances proportional to `weight`. */
function pickWeighted<T>(rng: Random, pool: readonly T[], weight: (item: T) => number): T {
  const total = pool.reduce((sum, item) => sum + weight(item), 0);
  let roll = rng.next() * total;
  for (const item of pool) {
    roll -= weight(item);
    if (roll < 0) return item;
  }
  return pool[pool.length - 1]!;
}
