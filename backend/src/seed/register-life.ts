import type { Random } from './random.js';

// How long the demo's hoses last, per construction, and the words the plant's people use when one
// comes out. Invented parameters for a demonstration, not published life data: each construction
// has a 2-parameter Weibull life (shape β, scale η in days in service), the age at which the plant
// replaces it on schedule where it does, and how its failures divide between failure in service,
// damage and wear found at an inspection.

export type FailureMode = 'failure' | 'damaged' | 'worn';

export interface LifeModel {
  /** Weibull shape β: below 1 early failures dominate, about 1 failures come at random, above 1 the hose wears out. */
  beta: number;
  /** Weibull scale η, days in service: about 63 % of hoses have failed by this age. */
  etaDays: number;
  /** Age at which the plant replaces the hose on schedule, days; null when it runs until it fails or wears out. */
  plannedReplacementDays: number | null;
  /** Shares of the failures that happen in service, from damage, and as wear found at an inspection. */
  modes: Readonly<Record<FailureMode, number>>;
  /** The story the parameters tell, in a reliability engineer's words. */
  story: string;
}

/** The demo's life distributions, by construction code. */
export const LIFE_MODELS: Readonly<Record<string, LifeModel>> = {
  'AIR-19-TX': {
    beta: 1.1, etaDays: 450, plannedReplacementDays: null, modes: { failure: 0.5, damaged: 0.35, worn: 0.15 },
    story: 'Breaker and drill whip hoses, air knives and reels: bursts and damage at random.',
  },
  'AIR-25-TX': {
    beta: 1, etaDays: 400, plannedReplacementDays: null, modes: { failure: 0.55, damaged: 0.35, worn: 0.1 },
    story: 'Drill and manifold air lines, compressor discharges: failures at random, whatever the hose’s age, so replacing them early buys nothing.',
  },
  'WSD-102-HW': {
    beta: 1.6, etaDays: 1400, plannedReplacementDays: null, modes: { failure: 0.3, damaged: 0.4, worn: 0.3 },
    story: 'Dewatering suction and discharge: long lives, lost to damage as often as to wear.',
  },
  'WSD-152-HW': {
    beta: 1.8, etaDays: 1600, plannedReplacementDays: null, modes: { failure: 0.3, damaged: 0.35, worn: 0.35 },
    story: 'Large dewatering hose: long lives, slow wear.',
  },
  'WDH-25-TX': {
    beta: 0.7, etaDays: 800, plannedReplacementDays: null, modes: { failure: 0.2, damaged: 0.72, worn: 0.08 },
    story: 'Water discharge lines: most are lost early to external damage (crushed, cut, torn); a hose that survives its first months lasts.',
  },
  'FUL-25-CD': {
    beta: 1.5, etaDays: 1100, plannedReplacementDays: null, modes: { failure: 0.3, damaged: 0.4, worn: 0.3 },
    story: 'Fuel dispenser and bowser hoses: driven over and pulled more than worn out.',
  },
  'OIL-25-GP': {
    beta: 1.5, etaDays: 1000, plannedReplacementDays: null, modes: { failure: 0.3, damaged: 0.3, worn: 0.4 },
    story: 'Lube oil reels: moderate wear at the reel guide.',
  },
  'CHM-25-XL': {
    beta: 1.8, etaDays: 900, plannedReplacementDays: 730, modes: { failure: 0.35, damaged: 0.1, worn: 0.55 },
    story: 'Chemical dosing hoses: replaced every 2 years on schedule; some swell or crack before that.',
  },
  'LPG-12-CD': {
    beta: 1.5, etaDays: 1200, plannedReplacementDays: 1826, modes: { failure: 0.3, damaged: 0.1, worn: 0.6 },
    story: 'Gas pigtails and filling hoses: replaced every 5 years on schedule; cover cracking found at inspection before that.',
  },
  'DRY-102-SD': {
    beta: 2, etaDays: 520, plannedReplacementDays: null, modes: { failure: 0.4, damaged: 0.1, worn: 0.5 },
    story: 'Tanker fill hoses: wear at the bends from the powder.',
  },
  'HOT-76-SD': {
    beta: 2.2, etaDays: 600, plannedReplacementDays: null, modes: { failure: 0.35, damaged: 0.1, worn: 0.55 },
    story: 'Blower hoses: the cover hardens and cracks from the heat.',
  },
  'SLR-102-NR': {
    beta: 2.2, etaDays: 220, plannedReplacementDays: null, modes: { failure: 0.4, damaged: 0.05, worn: 0.55 },
    story: 'Slurry lines of the wash plant: steady wear of the tube; one hose batch wore through in weeks (below).',
  },
  'SLR-152-NR': {
    beta: 2.4, etaDays: 300, plannedReplacementDays: null, modes: { failure: 0.4, damaged: 0.05, worn: 0.55 },
    story: 'Main slurry pump discharges: steady wear of the tube.',
  },
  'BLS-32-SD': {
    beta: 3, etaDays: 75, plannedReplacementDays: null, modes: { failure: 0.35, damaged: 0.05, worn: 0.6 },
    story: 'Blast booth hoses: the media wears them out fast and predictably; most are caught worn thin at the frequent inspections.',
  },
  'VAC-102-HW': {
    beta: 1.8, etaDays: 260, plannedReplacementDays: null, modes: { failure: 0.5, damaged: 0.1, worn: 0.4 },
    story: 'Vacuum truck suction: broken helix and worn tube.',
  },
  'HYD-25-SR': {
    beta: 2.5, etaDays: 1500, plannedReplacementDays: 1461, modes: { failure: 0.35, damaged: 0.05, worn: 0.6 },
    story: 'Hydraulic return lines: slow wear-out, replaced at 4 years on schedule; with η close to 4 years more than half wear out first, a case for a shorter interval.',
  },
  'HYD-51-SR': {
    beta: 2.5, etaDays: 1900, plannedReplacementDays: 1461, modes: { failure: 0.3, damaged: 0.05, worn: 0.65 },
    story: 'Hydraulic pump suction lines: replaced with the returns at 4 years.',
  },
  'FDB-25-FC': {
    beta: 1.5, etaDays: 900, plannedReplacementDays: 730, modes: { failure: 0.25, damaged: 0.15, worn: 0.6 },
    story: 'Canteen food hoses: replaced every 2 years; cracks that cannot be cleaned before that.',
  },
  'STM-19-EP': {
    beta: 1.6, etaDays: 420, plannedReplacementDays: 365, modes: { failure: 0.4, damaged: 0.1, worn: 0.5 },
    story: 'Steam hoses: replaced every year on schedule; blistering and bursts before that.',
  },
};

/** One hose batch that wore out far sooner than the same construction's others. */
export const BAD_BATCH = {
  siteCode: 'BFQ',
  constructionCode: 'SLR-102-NR',
  /** Multiplies the construction's η for assemblies built from the batch. */
  etaFactor: 0.3,
  /** The batch was on the hose shop's reel stand from this many days before the anchor… */
  fromDays: 640,
  /** …until this many, when the reel was used up. */
  toDays: 490,
} as const;

/** Longest a drawn life may run, days: no hose in the demo outlives this. */
export const LONGEST_LIFE_DAYS = 3000;
/** Mean time until a position's hose is taken off to be used elsewhere, days (an exponential competing with failure). */
export const RELOCATION_MEAN_DAYS = 4000;

/** A life drawn from a 2-parameter Weibull distribution, days (inverse of the distribution function). */
export function weibullDays(rng: Random, beta: number, etaDays: number): number {
  return etaDays * Math.pow(-Math.log(1 - rng.next()), 1 / beta);
}

/** One of the failure modes, with the model's shares. */
export function drawMode(rng: Random, model: LifeModel): FailureMode {
  const roll = rng.next();
  if (roll < model.modes.failure) return 'failure';
  if (roll < model.modes.failure + model.modes.damaged) return 'damaged';
  return 'worn';
}

// ── The words ─────────────────────────────────────────────────────────────────────────────────
// Each note tells what was seen and, where it helps, why (the ISO 14224 way: mode, then cause).

const FAILURE_NOTES = [
  'Burst about 300 mm from end A; reinforcement broken.',
  'Leaking at the end B ferrule; found spraying at the start of the shift.',
  'Pulled out of the end A fitting.',
  'Burst at the bend nearest end B.',
  'Blister on the cover burst through; tube split underneath.',
];
const WORN_NOTES = [
  'Cover worn through to the reinforcement where it rubs on the frame.',
  'Cover worn through at the clamp; reinforcement showing.',
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
/** Areas where machines move and rock falls. */
export const MOBILE_AREAS = new Set(['DNB', 'DEV', 'STP', 'DWT', 'SHC', 'SMP']);

const SERVICE_NOTES: Readonly<Record<string, Partial<Record<FailureMode, string[]>>>> = {
  'compressed-air': {
    failure: [
      'Burst at the end B ferrule; the whip restraint held it.',
      'Burst where the hose crosses the frame; reinforcement broken.',
      'Pulled out of the end A hose tail; the whip restraint held it.',
      'Burst about 300 mm from end A.',
    ],
    worn: ['Cover worn through at the clamp; reinforcement showing.', 'Cover cut to the reinforcement where it crosses the frame.'],
  },
  'abrasive-blasting': {
    failure: ['Worn through a metre from the nozzle; media escaping.', 'Tube worn through at the pot outlet coupling.'],
    worn: ['Soft spot a metre from the nozzle: tube worn thin.', 'Tube worn thin behind the pot outlet coupling; cover bulging.', 'Cover worn through at the nozzle end.'],
  },
  slurry: {
    failure: ['Tube worn through on the outside of the bend at the pump discharge.', 'Burst at end B after the tube wore through; slurry over the walkway.'],
    worn: ['Tube worn thin on the outside of the bend; soft spot at the pump end.', 'Cover bulging at end A: tube worn through underneath.'],
  },
  'hydraulic-suction-return': {
    failure: ['Leaking at the end A crimp.', 'Burst at the end B ferrule; oil on the deck.'],
    worn: ['Cover cracked and weeping oil at the clamp.', 'Cover worn through at the clamp; reinforcement showing.'],
  },
  'water-discharge': {
    failure: ['Burst near end A.', 'Leaking at the end B ferrule.'],
    damaged: [
      'Cut by the screen deck edge during a deck change.',
      'Crushed by the loader cleaning up spillage.',
      'Torn at end A when the spray bar was lifted out.',
      'Cover gouged through to the reinforcement by a sharp edge.',
    ],
    worn: ['Cover worn through where it rubs on the frame.'],
  },
  'water-suction-discharge': {
    worn: ['Cover worn through on the underside where it lies on the bench.', 'Helix showing through the cover at the pump end.'],
  },
  'chemical-transfer': {
    failure: ['Leaking at the end A ferrule; dosing stopped.', 'Tube split at the bend; dosing stopped and the spill contained.'],
    worn: ['Tube swollen and soft at end A.', 'Cover cracking along the top of the run.'],
  },
  'liquefied-gas': {
    failure: ['Gas smell at the end B fitting; leak confirmed with leak-detection fluid.'],
    worn: ['Cover cracked near the cylinder fitting (age and ozone).', 'Cover crazed along its length (age and ozone).'],
  },
  'dry-bulk': {
    failure: ['Worn through at the bend by the silo fill pipe; powder escaping.'],
    worn: ['Tube worn thin at the bend by the silo fill pipe: soft spot.'],
  },
  'hot-air-bulk-unloading': {
    failure: ['Split at the blower end; cover hardened by the heat.'],
    worn: ['Cover hardened and heat-cracked at the blower end.'],
  },
  'vacuum-truck-suction': {
    failure: ['Helix broken; hose collapsed under suction.', 'Tube worn through on the boom side.'],
    worn: ['Tube worn thin on the boom side.', 'Helix deformed near end A.'],
  },
  'food-beverage': {
    failure: ['Leaking at the clamp ferrule.'],
    worn: ['Tube cracked at the clamp ferrule; cannot be cleaned.', 'Tube discoloured and cracked inside end A.'],
  },
  steam: {
    failure: ['Blister on the cover burst; steam escaping near end B.', 'Burst at the lance end.'],
    worn: ['Cover blistered near end B.', 'Cover cracked at the fitting; steam weeping.'],
  },
  'fuel-oil': {
    failure: ['Leaking at the nozzle-end ferrule.', 'Split near end A; fuel on the apron, spill kit used.'],
    damaged: ['Driven over at the island; cover crushed.', 'Pulled off the reel by a vehicle driving away.'],
    worn: ['Cover worn through where the reel guide rubs it.'],
  },
};

/** What was seen when a hose failed, was damaged, or was found worn, in a service and area; `ownOnly` keeps to the service's own words. */
export function failureNote(rng: Random, serviceCode: string, areaCode: string, mode: FailureMode, ownOnly = false): string {
  const own = SERVICE_NOTES[serviceCode]?.[mode];
  if (own && (ownOnly || rng.chance(0.75))) return rng.pick(own);
  if (mode === 'failure') return rng.pick(FAILURE_NOTES);
  if (mode === 'worn') return rng.pick(WORN_NOTES);
  return rng.pick(MOBILE_AREAS.has(areaCode) ? [...DAMAGED_NOTES, ...MOBILE_DAMAGED_NOTES] : DAMAGED_NOTES);
}

/** Small defects an inspection finds and puts right on the spot; the hose stays in. */
const MINOR_FINDINGS: Readonly<Record<string, string[]>> = {
  'compressed-air': ['Whip restraint cable slack at end A; re-tensioned.', 'Locking pin missing from a claw coupling; pin fitted.', 'Hose lying across the walkway; re-routed and hung up.'],
  'abrasive-blasting': ['Coupling gasket worn; gasket replaced.', 'Safety cable missing across the nozzle joint; cable fitted.'],
  'hydraulic-suction-return': ['Support clamp loose; re-tightened.', 'Cover scuffed where it touches the frame; chafe sleeve fitted.'],
  slurry: ['Flange bolts found loose at end B; re-torqued.'],
};
const GENERAL_FINDINGS = ['Support clamp loose; re-tightened.', 'Cover scuffed where it touches the frame; chafe sleeve fitted.', 'Tag dirty and hard to read; cleaned.'];

/** A defect put right at the inspection. */
export function minorFinding(rng: Random, serviceCode: string): string {
  const own = MINOR_FINDINGS[serviceCode];
  return rng.pick(own && rng.chance(0.7) ? own : GENERAL_FINDINGS);
}

/** Early wear an inspection notes without taking the hose out. */
export const EARLY_WEAR_FINDINGS = [
  'Cover wear starting at the clamp; reinforcement not showing. Check again at the next inspection.',
  'Cover scuffed thin on the underside; not yet through. Check again at the next inspection.',
];

export const SCRAP_NOTES = [
  'Not fit to re-test: reinforcement damaged. Cut in two and scrapped.',
  'Scrapped: failed the hose shop inspection.',
  'Fittings recovered for re-use; hose scrapped.',
  'Scrapped after the failure review.',
];
export const PLANNED_SCRAP_NOTE = 'Scrapped at the end of its planned life; cut in two so it cannot be re-used.';
export const RETURN_NOTES = [
  'Inspected in the hose shop: cover and fittings sound, re-tested. Back in stock.',
  'No damage found; re-tested and re-tagged. Back in stock.',
];
export const RETEST_FAILED_NOTE = 'Failed its re-test; not fit for service. Scrapped.';
export const RELOCATED_NOTES = [
  'Taken off while the equipment was moved; to be re-tested before it is used again.',
  'Swapped for a longer assembly; sent to the hose shop.',
  'Taken off for a change of routing; sent to the hose shop to be re-tested.',
];
export const PLANNED_NOTES = ['Changed at the planned interval.', 'Changed at the planned interval, with the equipment’s planned service.'];
export const VACANT_NOTES = [
  'Taken off while the equipment is stood down for repair; to be re-tested before it is refitted.',
  'Line taken out of use while the pipework is changed.',
];
export const TAG_OUT_NOTES = [
  'Weeping at the end A fitting. Isolated and tagged out until the replacement is built.',
  'Cover cut through to the reinforcement. Tagged out; replacement on order.',
  'Bulge near end B seen at the pre-start check. Tagged out; do not pressurise.',
  'Cover cracking along the top of the run. Tagged out pending replacement.',
];
export const CLAW_TAG_OUT_NOTE = 'Whip restraint found missing and a coupling pin bent. Tagged out until both are replaced.';
