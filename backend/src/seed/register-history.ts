import type { RemovalReason } from '../../../shared/src/services/removal-reasons.js';
import type { Random } from './random.js';
import {
  BAD_BATCH,
  drawMode,
  EARLY_WEAR_FINDINGS,
  failureNote,
  LONGEST_LIFE_DAYS,
  minorFinding,
  RELOCATION_MEAN_DAYS,
  weibullDays,
  type FailureMode,
  type LifeModel,
} from './register-life.js';

// The past of one position as a sequence of lives: when each hose went in, how it was inspected,
// and when and why it came out. Pure: drawn from a seeded Random. Times are days from the start of
// the anchor's day (UTC), negative in the past, so a time t < 0 is before "today".

/** One inspection of the hose in a position. */
export interface InspectionDraw {
  t: number;
  result: 'pass' | 'defects';
  findings: string[];
  note: string | null;
}

/** One hose's time in one position. */
export interface LifeDraw {
  start: number;
  /** In place before records began: its start is an estimate. */
  estimated: boolean;
  /** Built from the bad hose batch. */
  bad: boolean;
  /** When it came out; null while it is still in the position at the anchor. */
  end: number | null;
  reason: RemovalReason | null;
  note: string | null;
  /** The inspections recorded while it was in; none before records began. */
  inspections: InspectionDraw[];
}

/** What the simulation of one position needs to know. */
export interface PositionHistoryInput {
  model: LifeModel;
  serviceCode: string;
  areaCode: string;
  /** The inspection interval in force, days. */
  intervalDays: number;
  /** Low-criticality positions may stand empty for a day or two after a removal. */
  lowCriticality: boolean;
  /** When records began (negative). */
  recordsBegan: number;
  /** When the equipment was first run, or null when that was long before records began. */
  commissionedAt: number | null;
  /** Whether a new hose installed at `t` would come from the bad batch. */
  badAt: (t: number) => boolean;
  /** The hose in place now must have gone in at least this many days ago. */
  minCurrentAgeDays?: number;
  /** One hose, in place since `start` (before records began) and never changed. */
  onlyLifeSince?: number;
  /** The position stood empty from this time on: the hose then in came out for `reason`. */
  emptiedAt?: { t: number; reason: RemovalReason; note: string | null };
}

const HOUR = 1 / 24;
const REASON_OF: Record<FailureMode, RemovalReason> = { failure: 'failure', damaged: 'damaged', worn: 'worn-at-inspection' };

/** A random time in working hours (07:00–16:00) on the day that holds `t`. */
function workingTime(rng: Random, t: number): number {
  return Math.floor(t) + (7 + rng.next() * 9) * HOUR;
}

/** Days from one inspection to the next: mostly on time, often a little late, now and then a round missed. */
export function inspectionGapDays(rng: Random, intervalDays: number): number {
  const roll = rng.next();
  const factor = roll < 0.6 ? 0.85 + rng.next() * 0.2 : roll < 0.86 ? 1.05 + rng.next() * 0.45 : 1.5 + rng.next();
  return Math.max(1, Math.round(intervalDays * factor));
}

/** The lives at one position from before records began until the anchor, oldest first. */
export function simulatePosition(rng: Random, input: PositionHistoryInput): LifeDraw[] {
  const { recordsBegan } = input;
  const limit = input.emptiedAt?.t ?? 0;
  if (input.onlyLifeSince != null) return [runLife(rng, input, input.onlyLifeSince, { noEnd: true, limit })];

  const commissioned = input.commissionedAt;
  let start = commissioned != null && commissioned > recordsBegan ? commissioned : Math.max(commissioned ?? -Infinity, recordsBegan - LONGEST_LIFE_DAYS - 200);
  const lives: LifeDraw[] = [];
  for (;;) {
    let life = runLife(rng, input, start, { noEnd: false, limit });
    const least = input.minCurrentAgeDays;
    if (least != null && start <= -least && (life.end == null || life.end > -least)) life = runLife(rng, input, start, { noEnd: true, limit });
    if (life.end == null || life.end > recordsBegan) lives.push(life);
    if (life.end == null) break;
    // The replacement goes in the same shift, or the next morning; a low-criticality line may wait a day or two.
    let next = input.lowCriticality && rng.chance(0.5) ? workingTime(rng, life.end + 1 + rng.next() * 2) : life.end + (1 + rng.next() * 3) * HOUR;
    if (next - Math.floor(next) > 22 * HOUR) next = Math.floor(next) + 1 + (7 + rng.next() * 3) * HOUR;
    if (least != null && life.end <= -least && next > -least) next = -least;
    if (next >= limit) break;
    start = next;
  }
  return lives;
}

function runLife(rng: Random, input: PositionHistoryInput, start: number, options: { noEnd: boolean; limit: number }): LifeDraw {
  const { model, recordsBegan } = input;
  const bad = start > recordsBegan && input.badAt(start);
  const estimated = start < recordsBegan;
  const etaDays = model.etaDays * (bad ? BAD_BATCH.etaFactor : 1);
  const lifeDays = Math.max(0.1, Math.min(LONGEST_LIFE_DAYS, weibullDays(rng, model.beta, etaDays)));
  // Hose from the bad batch wears through from the inside: it is not lost to damage.
  const drawn = drawMode(rng, model);
  const mode = bad && drawn === 'damaged' ? 'worn' : drawn;
  const relocateDays = Math.max(1, -Math.log(1 - rng.next()) * RELOCATION_MEAN_DAYS);

  // The moments that would end the life, whichever comes first; a worn hose ends at the inspection that finds it.
  const latent = options.noEnd ? Infinity : start + lifeDays;
  // A hose fails while the machine runs: between 06:00 and 22:00 on the day its life runs out.
  const failAt = mode === 'worn' || latent === Infinity ? Infinity : Math.max(start + HOUR, Math.floor(latent) + (6 + (latent - Math.floor(latent)) * 16) * HOUR);
  const plannedAt = options.noEnd || model.plannedReplacementDays == null ? Infinity : Math.floor(start + model.plannedReplacementDays) + 9 * HOUR;
  const relocateAt = options.noEnd || bad ? Infinity : workingTime(rng, start + relocateDays);
  const hardEnd = Math.min(failAt, plannedAt, relocateAt);
  const stopAt = Math.min(hardEnd, options.limit);

  const inspections: InspectionDraw[] = [];
  let end: number | null = null;
  let reason: RemovalReason | null = null;
  let note: string | null = null;
  let at = workingTime(rng, start + inspectionGapDays(rng, input.intervalDays));
  while (at < stopAt) {
    const recorded = at > recordsBegan;
    if (mode === 'worn' && at >= latent) {
      note = failureNote(rng, input.serviceCode, input.areaCode, 'worn', bad);
      inspections.push({ t: at, result: 'defects', findings: [note], note: 'Removed from service.' });
      end = at + (1 + rng.next() * 2) * HOUR;
      reason = 'worn-at-inspection';
      break;
    }
    if (recorded) {
      const roll = rng.next();
      if (mode === 'worn' && at >= latent - 1.5 * input.intervalDays && roll < 0.35) {
        inspections.push({ t: at, result: 'defects', findings: [rng.pick(EARLY_WEAR_FINDINGS)], note: null });
      } else if (roll > 0.96) {
        inspections.push({ t: at, result: 'defects', findings: [minorFinding(rng, input.serviceCode)], note: 'Put right at the inspection; hose left in service.' });
      } else {
        inspections.push({ t: at, result: 'pass', findings: [], note: null });
      }
    }
    at = workingTime(rng, at + inspectionGapDays(rng, input.intervalDays));
  }
  if (end == null && hardEnd < options.limit) {
    end = hardEnd;
    if (hardEnd === failAt) {
      reason = REASON_OF[mode];
      note = failureNote(rng, input.serviceCode, input.areaCode, mode, bad);
    } else if (hardEnd === plannedAt) {
      reason = 'planned-replacement';
    } else {
      reason = 'relocated';
    }
  }
  if (end == null && input.emptiedAt && options.limit === input.emptiedAt.t) {
    end = input.emptiedAt.t;
    reason = input.emptiedAt.reason;
    note = input.emptiedAt.note;
    if (reason === 'worn-at-inspection') inspections.push({ t: end - 2 * HOUR, result: 'defects', findings: [note ?? 'Worn through.'], note: 'Removed from service.' });
  }
  // Inspections before records began were on paper, if at all.
  return { start, estimated, bad, end, reason, note, inspections: inspections.filter((i) => i.t > recordsBegan) };
}

// ── Hour meters ─────────────────────────────────────────────────────────────────────────────────

/**
 * An hour meter read backwards from the anchor: the machine ran about `perDay` hours a day, more in
 * some weeks and less in others, and stood idle now and then. Readings never go backwards.
 */
export class HourMeter {
  /** Hours run in the `w` weeks before the anchor. */
  private readonly usedBefore: number[];
  private readonly weekly: number[];
  /** When the meter read zero (the machine's first run), or null when that was before `spanDays`. */
  readonly commissionedAt: number | null;

  constructor(
    rng: Random,
    private readonly hoursAtAnchor: number,
    perDay: number,
    spanDays: number,
  ) {
    const weeks = Math.ceil(spanDays / 7) + 1;
    this.weekly = [];
    this.usedBefore = [0];
    let commissioned: number | null = null;
    for (let w = 0; w < weeks; w++) {
      const idle = rng.chance(0.04);
      const hours = 7 * perDay * (idle ? 0.1 : 0.75 + rng.next() * 0.45);
      this.weekly.push(hours);
      const before = this.usedBefore[w]!;
      this.usedBefore.push(before + hours);
      if (commissioned == null && before + hours >= hoursAtAnchor) commissioned = -(7 * w + (7 * (hoursAtAnchor - before)) / hours);
    }
    this.commissionedAt = commissioned;
  }

  /** The reading at time `t`, whole hours; null before the machine was first run. */
  at(t: number): number | null {
    const back = -t;
    const w = Math.floor(back / 7);
    if (w >= this.weekly.length) return null;
    const used = this.usedBefore[w]! + (this.weekly[w]! * (back - 7 * w)) / 7;
    const hours = this.hoursAtAnchor - used;
    return hours >= 1 ? Math.round(hours) : null;
  }
}
