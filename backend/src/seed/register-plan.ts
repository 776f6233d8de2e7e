import type { ElectricalProperty } from '../../../shared/src/checks/types.js';
import type { AssemblyStatus, ProofTestMedium } from '../../../shared/src/schemas/assemblies.schema.js';
import type { FittingStyle } from '../../../shared/src/schemas/register.schema.js';
import { inspectionIntervalDays, type Criticality } from '../../../shared/src/services/criticality.js';
import type { RemovalReason } from '../../../shared/src/services/removal-reasons.js';
import { defaultServiceSettings, SERVICE_CATALOGUE, serviceByCode, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { DEMO_FAMILY_NAMES, DEMO_GIVEN_NAMES } from './demo-scenario.js';
import { Random } from './random.js';
import { CONSTRUCTIONS, constructionByCode, FITTING_TYPES, fittingSize, HOSE_PRICE_PER_M, type ConstructionRow } from './register-catalogue.js';
import { HourMeter, simulatePosition, type LifeDraw } from './register-history.js';
import {
  BAD_BATCH,
  CLAW_TAG_OUT_NOTE,
  drawMode,
  failureNote,
  LIFE_MODELS,
  LONGEST_LIFE_DAYS,
  PLANNED_NOTES,
  PLANNED_SCRAP_NOTE,
  RELOCATED_NOTES,
  RETEST_FAILED_NOTE,
  RETURN_NOTES,
  SCRAP_NOTES,
  TAG_OUT_NOTES,
  VACANT_NOTES,
  type LifeModel,
} from './register-life.js';
import { SITE_TEMPLATES, type EquipmentTemplate, type PositionTemplate } from './register-sites.js';

// The register of the demo as a plan: plain data drawn from a seeded Random and the anchor date,
// nothing read from the clock or the database, so the same seed and anchor give the same plan.
// Times are ISO strings; pressures kPa, lengths mm, temperatures °C, costs in pounds.
//
// The past is three years of records at every position: hose after hose, each life drawn from its
// construction's life distribution (register-life.ts), inspected at about the position's interval,
// and ended by a failure, a planned replacement or a move, with the removed hose scrapped, kept
// for the hose shop, or re-tested back into stock and fitted elsewhere. The hose in place at the
// anchor is the last life at its position.

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
  | { kind: 'return_to_stock'; at: string; storeLocation: string; inspectionNote: string }
  | { kind: 'inspection'; at: string; positionCode: string; result: 'pass' | 'defects'; findings: string[]; note: string | null; hourMeterHours: number | null };

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
  history: HistorySummary;
}

/** What the history of the demo holds, for the reader and the tests. */
export interface HistorySummary {
  /** The first day of records, three years before the anchor. */
  recordsBeganOn: string;
  /** The hose batch that wore out early, and the positions its assemblies served. */
  badBatch: { siteCode: string; constructionCode: string; hoseBatch: string; positionCodes: string[] };
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
  /** Positions left empty: the first few with their hose awaiting re-test, the rest with it scrapped. */
  vacant: 8,
  vacantAwaitingRetest: 5,
  taggedOut: 6,
  /** Spares on the shelf, with the re-tested assemblies that were not fitted again. */
  inStock: 62,
  awaitingProofTest: 6,
  storageExpired: 2,
};

const LABOUR_PER_ASSEMBLY = 18;
const DAY_MS = 86_400_000;
const HOUR = 1 / 24;
/** Keeps the register's draws apart from the people's, so one never reshuffles the other. */
const REGISTER_STREAM = 0x5eed4e67;
/** Each position's history and each machine's hour meter draw from a stream of their own. */
const HISTORY_STREAM = 0x4a15c0de;
/** A removed assembly that passed its re-test is fitted again, where one of its construction and length is wanted, this often. */
const REUSE_CHANCE = 0.7;

const OVERRIDE_REASON =
  'The grizzly guard rail forces a 110 mm bend at the breaker inlet and there is no other route until the new guard with a wider hose port is fitted (WO-47120). ' +
  'Accepted for the interim: the bend is inspected every week for kinking and cover cracking, and whip restraints are fitted at both ends. Review when the guard is changed.';

interface Slot {
  position: PositionPlan;
  template: PositionTemplate;
  equipment: EquipmentTemplate;
  construction: ConstructionRow;
  model: LifeModel;
  meter: HourMeter | null;
  /** When the equipment first ran, when that falls within records; else null. */
  commissionedAt: number | null;
  vacant: 'awaiting-retest' | 'scrapped' | null;
  lives: LifeDraw[];
  tagOut: { at: number; note: string } | null;
}

/** A re-tested assembly on the shelf, waiting to be fitted again. */
interface Returned {
  plan: AssemblyPlan;
  availableAt: number;
  siteCode: string;
  constructionCode: string;
  /** Where it came out: it goes back anywhere but there. */
  positionCode: string;
}

/** A stream of its own for `key`, so that changing one position's draws leaves the others alone. */
function streamFor(seed: number, key: string): Random {
  let h = 0x811c9dc5;
  for (let i = 0; i < key.length; i++) h = Math.imul(h ^ key.charCodeAt(i), 0x01000193);
  return new Random((h ^ seed ^ HISTORY_STREAM) >>> 0);
}

/** The whole register of the demo, drawn from `seed` and the anchor. */
export function planRegister(seed: number, anchor: Date): RegisterPlan {
  const rng = new Random((seed ^ REGISTER_STREAM) >>> 0);
  const day0 = Date.UTC(anchor.getUTCFullYear(), anchor.getUTCMonth(), anchor.getUTCDate());
  // Times inside the plan are days from the start of the anchor's day, negative in the past.
  const iso = (t: number) => new Date(day0 + Math.round(t * 1440) * 60_000).toISOString();
  const dateOf = (t: number) => iso(Math.floor(t)).slice(0, 10);
  const dateAt = (days: number) => new Date(day0 - days * DAY_MS).toISOString().slice(0, 10);
  const uniform = (low: number, high: number) => low + rng.next() * (high - low);
  const recordsBegan = -RECORDS_BEGAN_DAYS;
  /** Work orders are numbered in the order they were raised, about ten a day. */
  const workOrder = (t: number) => (rng.chance(0.55) ? `WO-${38000 + Math.round((t - recordsBegan) * 9.5) + rng.int(0, 40)}` : null);
  const workingTime = (t: number, from = 7, to = 16) => Math.floor(t) + (from + rng.next() * (to - from)) * HOUR;

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
  const readAtOf = new Map<string, number>();
  const meterSpanDays = RECORDS_BEGAN_DAYS + LONGEST_LIFE_DAYS + 400;
  for (const site of SITE_TEMPLATES) {
    for (const service of SERVICE_CATALOGUE) siteServices.push({ siteCode: site.code, serviceCode: service.code, settings: defaultServiceSettings(service) });
    for (const area of site.areas) areas.push({ siteCode: site.code, ...area });
    for (const eq of site.equipment) {
      const meter = eq.meter ? new HourMeter(streamFor(seed, `meter:${eq.assetNumber}`), eq.meter.hours, eq.meter.perDay, meterSpanDays) : null;
      const readAt = -rng.int(1, 3) + 6 * HOUR;
      readAtOf.set(eq.assetNumber, readAt);
      equipment.push({
        siteCode: site.code,
        areaCode: eq.area,
        assetNumber: eq.assetNumber,
        name: eq.name,
        hasHourMeter: meter != null,
        hourMeterHours: meter ? meter.at(readAt) : null,
        hourMeterReadAt: meter ? iso(readAt) : null,
      });
      const firstRun = eq.commissionedDaysAgo != null ? -eq.commissionedDaysAgo : meter?.commissionedAt ?? null;
      // The first hoses go on the record at the commissioning inspection, a day after the first run.
      const commissionedAt = firstRun != null && firstRun > recordsBegan ? workingTime(firstRun + 1) : null;
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
        const model = LIFE_MODELS[construction.code];
        if (!model) throw new Error(`No life model for the construction ${construction.code}`);
        slots.push({ position, template: t, equipment: eq, construction, model, meter, commissionedAt, vacant: null, lives: [], tagOut: null });
      }
    }
  }

  // ── Each position's lives, from before records began to the anchor ─────────────────────────
  const isOil = (s: Slot) => s.construction.code === NON_CONDUCTIVE_CONSTRUCTION;
  const ordinary = (s: Slot) => !SPECIAL.has(s.position.code) && !isOil(s) && s.commissionedAt == null;
  pickSome(rng, slots.filter(ordinary), COUNTS.vacant).forEach((s, i) => (s.vacant = i < COUNTS.vacantAwaitingRetest ? 'awaiting-retest' : 'scrapped'));
  const badFrom = -BAD_BATCH.fromDays;
  const badTo = -BAD_BATCH.toDays;
  for (const slot of slots) {
    const code = slot.position.code;
    const history = streamFor(seed, `position:${code}`);
    const service = serviceByCode(slot.position.serviceCode)!;
    let emptiedAt: { t: number; reason: RemovalReason; note: string | null } | undefined;
    if (slot.vacant) {
      const t = workingTime(-history.int(3, 45));
      if (slot.vacant === 'awaiting-retest') {
        emptiedAt = { t, reason: history.pick(['relocated', 'obsolete'] as const), note: history.pick(VACANT_NOTES) };
      } else {
        const mode = drawMode(history, slot.model);
        const reason = mode === 'worn' ? 'worn-at-inspection' : mode;
        emptiedAt = { t, reason, note: failureNote(history, slot.position.serviceCode, slot.equipment.area, mode) };
      }
    }
    slot.lives = simulatePosition(history, {
      model: slot.model,
      serviceCode: slot.position.serviceCode,
      areaCode: slot.equipment.area,
      intervalDays: slot.position.inspectionIntervalDays ?? inspectionIntervalDays(service.defaultInspectionIntervalDays, slot.position.criticality),
      lowCriticality: slot.position.criticality === 'low',
      recordsBegan,
      commissionedAt: slot.commissionedAt,
      badAt: (t) => slot.position.siteCode === BAD_BATCH.siteCode && slot.construction.code === BAD_BATCH.constructionCode && t >= badFrom && t < badTo,
      ...(code === OVERAGE_POSITION ? { onlyLifeSince: workingTime(-OVERAGE_INSTALLED_DAYS) } : {}),
      ...(code === OVERRIDDEN_POSITION ? { minCurrentAgeDays: 26 } : {}),
      ...(code === PRESSURE_RAISED_POSITION || code === REROUTED_POSITION ? { minCurrentAgeDays: 120 } : {}),
      ...(isOil(slot) ? { minCurrentAgeDays: 60 } : {}),
      ...(emptiedAt ? { emptiedAt } : {}),
    });
  }
  const currentLife = (s: Slot) => s.lives.find((l) => l.end == null) ?? null;

  // A few hoses found faulty in the last days and tagged out: the inspection that found it, then the tag.
  const tagOutPool = slots.filter((s) => ordinary(s) && !s.vacant && (currentLife(s)?.start ?? 0) <= -15);
  for (const slot of pickSome(rng, tagOutPool, COUNTS.taggedOut)) {
    const life = currentLife(slot)!;
    const at = -rng.int(1, 9) + 13 * HOUR;
    const notes = slot.template.ends.includes('CLW-DI') ? [...TAG_OUT_NOTES, CLAW_TAG_OUT_NOTE] : TAG_OUT_NOTES;
    const note = rng.pick(notes);
    life.inspections = life.inspections.filter((i) => i.t < at - 2 * HOUR);
    life.inspections.push({ t: at - HOUR, result: 'defects', findings: [note.split('. ')[0]!.replace(/\.$/, '')], note: 'Tagged out.' });
    slot.tagOut = { at, note };
  }

  // ── Assemblies ──────────────────────────────────────────────────────────────────────────────
  const assemblies: AssemblyPlan[] = [];
  const hoursAt = (slot: Slot, t: number): number | null => slot.meter?.at(t) ?? null;

  // Bulk hose comes in batches: each site's hose shop works through one reel of a construction after another.
  const batches = new Map<string, Array<{ fromDay: number; code: string; madeDay: number }>>();
  const batchCode = (madeDay: number) => `L${dateOf(madeDay).slice(2, 7).replace('-', '')}-${rng.int(10, 99)}`;
  const badMadeDay = badFrom - rng.int(30, 120);
  const badBatch = { code: batchCode(badMadeDay), madeDay: badMadeDay };
  const batchFor = (siteCode: string, constructionCode: string, day: number) => {
    const key = `${siteCode}:${constructionCode}`;
    let list = batches.get(key);
    if (!list) {
      list = [];
      for (let from = recordsBegan - LONGEST_LIFE_DAYS; from < 0; from += rng.int(90, 300)) {
        const madeDay = from - rng.int(20, 200);
        let code = batchCode(madeDay);
        while (code === badBatch.code) code = batchCode(madeDay);
        list.push({ fromDay: from, madeDay, code });
      }
      batches.set(key, list);
    }
    return [...list].reverse().find((b) => b.fromDay <= day) ?? list[0]!;
  };

  /** A new assembly built on `builtDay`, proof-tested by `testByDay` when given. */
  const build = (slot: Slot, builtDay: number, testByDay: number | null, options: { estimated?: boolean; bad?: boolean } = {}): AssemblyPlan => {
    const { template: t, construction } = slot;
    const siteCode = slot.position.siteCode;
    const estimated = options.estimated ?? false;
    const [a, b] = [fittingSize(t.ends[0], construction.sizeCode), fittingSize(t.ends[1], construction.sizeCode)];
    const crimp = (spec: typeof a) =>
      spec.crimpDiameterMm == null ? null : Math.round((spec.crimpDiameterMm + (rng.next() * 2 - 1) * 0.6 * (spec.crimpToleranceMm ?? 0)) * 100) / 100;
    const unrecorded = estimated || (slot.position.serviceCode !== 'slurry' && rng.chance(0.1));
    const batch = unrecorded ? null : options.bad ? badBatch : batchFor(siteCode, construction.code, builtDay);
    const builder = estimated ? null : rng.pick(builders[siteCode]!);
    const lengthMm = slot.position.requiredLengthMm;
    const plan: AssemblyPlan = {
      ref: assemblies.length,
      siteCode,
      constructionCode: construction.code,
      endA: { fittingCode: t.ends[0], crimpMm: crimp(a) },
      endB: { fittingCode: t.ends[1], crimpMm: crimp(b) },
      hoseBatch: batch?.code ?? null,
      hoseManufacturedOn: batch ? dateOf(batch.madeDay) : null,
      overallLengthMm: lengthMm,
      cutLengthMm: lengthMm - a.allowanceMm - b.allowanceMm,
      builtOn: dateOf(builtDay),
      builtOnEstimated: estimated,
      builder,
      cost: estimated ? null : Math.round(((lengthMm / 1000) * HOSE_PRICE_PER_M[construction.code]! + a.price + b.price + LABOUR_PER_ASSEMBLY) * 100) / 100,
      storeLocation: null,
      note: estimated ? 'In place before records began; build date estimated from the maintenance history.' : null,
      predatesRecords: false,
      steps: [],
      status: 'built',
    };
    if (testByDay != null) {
      plan.steps.push({
        kind: 'proof_test',
        testedOn: dateOf(estimated ? builtDay : Math.min(testByDay, builtDay + rng.int(0, 2))),
        medium: t.service === 'hydraulic-suction-return' ? 'hydraulic-oil' : 'water',
        heldPressureKpa: Math.ceil(((construction.burstPressureKpa / 2) * (1 + rng.next() * 0.03)) / 10) * 10,
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

  const latestReading = new Map<string, { t: number; hours: number }>();
  const noteReading = (slot: Slot, t: number, hours: number | null) => {
    if (hours == null) return;
    const seen = latestReading.get(slot.equipment.assetNumber);
    if (!seen || seen.t < t) latestReading.set(slot.equipment.assetNumber, { t, hours });
  };

  // Every life across the register in the order it began, so a re-tested assembly can be fitted again later.
  const lives = slots.flatMap((slot) => slot.lives.map((life) => ({ slot, life })));
  lives.sort((x, y) => x.life.start - y.life.start);
  const shelf: Returned[] = [];
  const badRemovals: Array<{ plan: AssemblyPlan; step: Extract<AssemblyStep, { kind: 'remove' }>; days: number; t: number }> = [];
  const badPositions = new Set<string>();
  for (const { slot, life } of lives) {
    const { position } = slot;
    const startDay = Math.floor(life.start);
    let plan: AssemblyPlan;
    const fits = (r: Returned) =>
      r.siteCode === position.siteCode && r.constructionCode === slot.construction.code && r.positionCode !== position.code && r.availableAt < life.start - 0.5 &&
      Math.abs((r.plan.overallLengthMm - position.requiredLengthMm) / position.requiredLengthMm) <= 0.15 &&
      // A construction with a storage limit counts the time since the build, so an old assembly is not fitted again.
      (slot.construction.storageLifeMonths == null || life.start - (Date.parse(r.plan.builtOn) - day0) / DAY_MS < slot.construction.storageLifeMonths * 30 - 15);
    const reusable = life.estimated || life.bad ? -1 : shelf.findIndex(fits);
    if (life.estimated) {
      plan = build(slot, startDay - rng.int(3, 20), startDay, { estimated: true });
    } else if (reusable >= 0 && rng.chance(REUSE_CHANCE)) {
      plan = shelf.splice(reusable, 1)[0]!.plan;
    } else {
      const builtDay = Math.max(Math.min(startDay - 1, recordsBegan), startDay - rng.int(1, 40));
      plan = build(slot, builtDay, startDay - 1, { bad: life.bad });
    }
    if (life.bad) badPositions.add(position.code);
    const installHours = life.estimated ? null : hoursAt(slot, life.start);
    noteReading(slot, life.start, installHours);
    // Nothing was written down for a hose fitted before records began: no work order, no meter reading.
    plan.steps.push({
      kind: 'install', at: iso(life.start), estimated: life.estimated, positionCode: position.code, hourMeterHours: installHours,
      workOrder: life.estimated ? null : workOrder(life.start), note: null,
      override: position.code === OVERRIDDEN_POSITION && life.end == null ? { checks: ['bend-radius'], reason: OVERRIDE_REASON, reviewOn: dateAt(-30) } : null,
    });
    plan.status = 'installed';
    if (life.estimated) plan.predatesRecords = true;
    for (const inspection of life.inspections) {
      const hours = hoursAt(slot, inspection.t);
      noteReading(slot, inspection.t, hours);
      plan.steps.push({
        kind: 'inspection', at: iso(inspection.t), positionCode: position.code, result: inspection.result, findings: inspection.findings, note: inspection.note, hourMeterHours: hours,
      });
    }
    if (life.end == null) {
      if (slot.tagOut) {
        plan.steps.push({ kind: 'tag_out', at: iso(slot.tagOut.at), note: slot.tagOut.note, workOrder: workOrder(slot.tagOut.at) });
        plan.status = 'tagged_out';
      }
      continue;
    }

    const end = life.end;
    const reason = life.reason!;
    const removeHours = hoursAt(slot, end);
    noteReading(slot, end, removeHours);
    const note = life.note ?? (reason === 'planned-replacement' ? rng.pick(PLANNED_NOTES) : reason === 'relocated' ? rng.pick(RELOCATED_NOTES) : null);
    const removal: Extract<AssemblyStep, { kind: 'remove' }> = { kind: 'remove', at: iso(end), reason, hourMeterHours: removeHours, workOrder: workOrder(end), note };
    plan.steps.push(removal);
    plan.status = 'removed';
    if (life.bad && reason !== 'relocated') badRemovals.push({ plan, step: removal, days: end - life.start, t: end });

    // What the hose shop did with it: failures are kept for the failure review, then scrapped; a hose
    // taken off in good order is re-tested and goes back on the shelf. Some are still waiting today.
    const endDay = Math.floor(end);
    const emptiedHere = slot.vacant != null && life === slot.lives[slot.lives.length - 1];
    if (emptiedHere && slot.vacant === 'awaiting-retest') continue;
    if (reason === 'relocated' || reason === 'obsolete') {
      const testDay = endDay + rng.int(3, 90);
      const returnAt = testDay + 15 * HOUR;
      if (returnAt >= 0) continue;
      const passed = !rng.chance(0.08);
      const testPressureKpa = Math.ceil(slot.construction.burstPressureKpa / 2 / 10) * 10;
      plan.steps.push({
        kind: 'proof_test', testedOn: dateOf(testDay), medium: position.serviceCode === 'hydraulic-suction-return' ? 'hydraulic-oil' : 'water',
        heldPressureKpa: passed ? testPressureKpa : Math.round((testPressureKpa * 0.8) / 10) * 10, holdSeconds: passed ? 60 : 15, result: passed ? 'pass' : 'fail',
        tester: rng.pick(builders[position.siteCode]!), note: passed ? 'Re-test after removal.' : 'Re-test after removal: weeping at the end A ferrule at 80 % of the test pressure; test stopped.',
      });
      if (!passed) {
        plan.steps.push({ kind: 'scrap', at: iso(testDay + 16 * HOUR), note: RETEST_FAILED_NOTE });
        plan.status = 'scrapped';
        continue;
      }
      const location = storeLocation(position.siteCode);
      plan.steps.push({ kind: 'return_to_stock', at: iso(returnAt), storeLocation: location, inspectionNote: rng.pick(RETURN_NOTES) });
      plan.status = 'in_stock';
      shelf.push({ plan, availableAt: returnAt, siteCode: position.siteCode, constructionCode: slot.construction.code, positionCode: position.code });
      continue;
    }
    const delayDays = emptiedHere
      ? rng.int(1, Math.max(1, -endDay - 1))
      : reason === 'planned-replacement' ? rng.int(0, 10) : reason === 'failure' ? rng.int(7, 150) : reason === 'damaged' ? rng.int(3, 90) : rng.int(2, 45);
    let scrapAt = endDay + delayDays + 16 * HOUR;
    if (scrapAt <= end) scrapAt += 1;
    if (scrapAt >= 0) continue;
    plan.steps.push({ kind: 'scrap', at: iso(scrapAt), note: reason === 'planned-replacement' ? PLANNED_SCRAP_NOTE : rng.pick(SCRAP_NOTES) });
    plan.status = 'scrapped';
  }

  // The bad batch, as the reliability engineer came to see it, one early failure after another.
  badRemovals.sort((x, y) => x.t - y.t);
  badRemovals.forEach(({ step, days }, i) => {
    const weeks = Math.max(1, Math.round(days / 7));
    const tail = i === 0 ? `hose batch ${badBatch.code}; reported to the supplier` : `hose batch ${badBatch.code} again, early failure ${i + 1} from it`;
    step.note = `${step.note ?? 'Worn through.'} ${weeks} week${weeks === 1 ? '' : 's'} in service; ${tail}.`;
  });

  // ── Stock, the hose shop's queue, and what was scrapped from the shelf ──────────────────────
  const stockable = slots.filter((s) => !isOil(s) && s.position.code !== OVERRIDDEN_POSITION);
  const onShelf = assemblies.filter((a) => a.status === 'in_stock').length;
  // Spares per construction follow how many a year the positions use up, at least one of each.
  for (const [code, count] of Object.entries(spareCounts(stockable, Math.max(20, COUNTS.inStock - onShelf)))) {
    const users = stockable.filter((s) => s.construction.code === code);
    for (let i = 0; i < count; i++) {
      const slot = rng.pick(users);
      const plan = build(slot, -rng.int(5, 320), -1);
      plan.storeLocation = storeLocation(slot.position.siteCode);
    }
  }
  for (let i = 0; i < COUNTS.awaitingProofTest; i++) {
    const slot = rng.pick(stockable);
    const plan = build(slot, -rng.int(1, 6), null);
    plan.storeLocation = 'Hose shop, awaiting proof test';
  }
  {
    const slot = rng.pick(stockable.filter((s) => s.template.ends.includes('CRP-ST')));
    const builtDays = rng.int(20, 60);
    const plan = build(slot, -builtDays, null);
    plan.steps.push({
      kind: 'proof_test', testedOn: dateAt(builtDays - 1), medium: 'water', heldPressureKpa: Math.round(((slot.construction.burstPressureKpa / 2) * 0.85) / 10) * 10,
      holdSeconds: 20, result: 'fail', tester: plan.builder ?? 'Hose shop', note: 'Weeping at the end B ferrule at 85 % of the test pressure; test stopped.',
    });
    plan.steps.push({ kind: 'scrap', at: iso(-(builtDays - 3) + 16 * HOUR), note: 'Failed its proof test at the ferrule. Fittings cannot be re-used after crimping; scrapped.' });
    plan.status = 'scrapped';
  }
  const hydraulicStock = stockable.filter((s) => s.position.serviceCode === 'hydraulic-suction-return');
  for (let i = 0; i < COUNTS.storageExpired; i++) {
    const slot = rng.pick(hydraulicStock);
    const builtDays = rng.int(745, 790);
    const plan = build(slot, -builtDays, -(builtDays - 2));
    plan.storeLocation = storeLocation(slot.position.siteCode);
    plan.steps.push({ kind: 'scrap', at: iso(-rng.int(5, 40) + 16 * HOUR), note: 'In store longer than the 24-month storage limit for hydraulic assemblies; scrapped rather than fitted.' });
    plan.status = 'scrapped';
  }

  // The equipment's latest reading is the newest one any event brought.
  for (const eq of equipment) {
    const latest = latestReading.get(eq.assetNumber);
    if (latest && eq.hasHourMeter && latest.t > readAtOf.get(eq.assetNumber)!) {
      eq.hourMeterHours = latest.hours;
      eq.hourMeterReadAt = iso(latest.t);
    }
  }

  // ── Later changes to what the checks look at ────────────────────────────────────────────────
  const currentStartDays = (code: string) => Math.floor(-currentLife(slots.find((s) => s.position.code === code)!)!.start);
  const changeBefore = (code: string, least: number) => iso(-rng.int(least, currentStartDays(code) - 20) + 10 * HOUR);
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
  const oilStart = Math.min(...slots.filter((s) => isOil(s) && currentLife(s)).map((s) => currentStartDays(s.position.code)));
  const oilTestDays = rng.int(5, oilStart - 10);
  const constructionChanges: ConstructionChangePlan[] = [
    {
      constructionCode: NON_CONDUCTIVE_CONSTRUCTION,
      at: iso(-oilTestDays + 11 * HOUR),
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
    history: {
      recordsBeganOn: dateAt(RECORDS_BEGAN_DAYS),
      badBatch: { siteCode: BAD_BATCH.siteCode, constructionCode: BAD_BATCH.constructionCode, hoseBatch: badBatch.code, positionCodes: [...badPositions].sort() },
    },
  };
}

/** `total` spares shared among the constructions in proportion to the assemblies their positions use a year, at least one each (largest remainders). */
function spareCounts(slots: readonly Slot[], total: number): Record<string, number> {
  const usePerYear = new Map<string, number>();
  for (const s of slots) usePerYear.set(s.construction.code, (usePerYear.get(s.construction.code) ?? 0) + 365 / Math.min(s.model.etaDays, s.model.plannedReplacementDays ?? Infinity));
  const codes = [...usePerYear.keys()].sort();
  const sum = codes.reduce((n, c) => n + usePerYear.get(c)!, 0);
  const share = (c: string) => (Math.max(0, total - codes.length) * usePerYear.get(c)!) / sum;
  const counts = Object.fromEntries(codes.map((c) => [c, 1 + Math.floor(share(c))]));
  const left = total - Object.values(counts).reduce((n, c) => n + c, 0);
  const byRemainder = [...codes].sort((a, b) => (share(b) % 1) - (share(a) % 1) || a.localeCompare(b));
  for (const c of byRemainder.slice(0, Math.max(0, left))) counts[c]! += 1;
  return counts;
}

/** `n` different items of `pool`, drawn at random. */
function pickSome<T>(rng: Random, pool: readonly T[], n: number): T[] {
  const left = [...pool];
  const out: T[] = [];
  while (out.length < n && left.length > 0) out.push(left.splice(Math.floor(rng.next() * left.length), 1)[0]!);
  return out;
}
