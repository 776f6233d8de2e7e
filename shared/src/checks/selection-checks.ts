import {
  atLeast,
  atMost,
  formatLength,
  formatPressure,
  formatTemperature,
  type LengthUnit,
  type PressureUnit,
  type TemperatureUnit,
} from '../units/units.js';
import { designFactorFor } from '../services/service-catalogue.js';
import { findSizeClass, sizeLabel } from '../sizes/nominal-sizes.js';
import { compatibility, CONFIRM_WITH_MAKER, mediumByCode, mediumLabel } from './compatibility.js';
import type {
  CheckOutcome,
  CheckResult,
  CheckSource,
  SelectionCheckCode,
  SelectionCheckInput,
} from './types.js';

// Each check says pass, warn or fail for one assembly at one position, and why, in words a fitter
// understands. Missing data warns; nothing passes on data that is not there.

/** Units the sentences use; pressure defaults to bar, length to mm, temperature to °C. */
export interface SelectionCheckOptions {
  pressureUnit?: PressureUnit;
  lengthUnit?: LengthUnit;
  temperatureUnit?: TemperatureUnit;
}

/** The options with the moment the checks are made, for the date checks. */
export interface DatedSelectionCheckOptions extends SelectionCheckOptions {
  now: Date;
}

/** Checks a competent person may not override: the pressure the assembly can hold, and its proof test. */
export const NOT_OVERRIDABLE_CHECKS: readonly SelectionCheckCode[] = ['allowable-pressure', 'proof-test'];

const SOURCES = {
  designAllowable: { title: 'Ferrule design', section: 'Assembly: allowable pressure is the lowest of rating, burst ÷ design factor and fittings' },
  designRatios: { title: 'RMA Hose Handbook IP-2 (2003)', section: 'Design ratios for newly manufactured hose' },
  makersRating: { title: '29 CFR 1926.302(b)(5)', section: "The manufacturer's safe operating pressure shall not be exceeded" },
  assemblyRating: { title: 'common practice', section: 'An assembly is rated at the lower of its hose and its fittings' },
  temperature: { title: 'Ferrule design', section: "Selection checks: temperature inside the construction's range" },
  compatibility: { title: 'Ferrule design', section: 'Selection checks: tube compound suited to the medium' },
  suction: { title: 'Ferrule design', section: 'Selection checks: suction duty needs a vacuum rating' },
  suctionHelix: { title: 'common practice', section: 'A suction hose needs a helix or rigid wall to resist collapse' },
  bendRadius: { title: 'ARPM hose definitions', section: 'Bend radius: measured to the innermost surface of the bend' },
  sizeClass: { title: 'Ferrule design', section: 'Nominal size: rules compare size classes, never millimetres' },
  conductivity: { title: 'common practice', section: 'Conductive or static-dissipative hose where the medium builds static charge' },
  foodContact: { title: 'common practice', section: 'Hose in contact with food carries a food-contact certification' },
  proofTest: { title: 'RMA Hose Handbook IP-2 (2003)', section: 'Test methods: proof test usually 50 % of the minimum specified burst' },
  proofTestEach: { title: 'ISO 8331', section: 'Proof test each assembly after its fittings are attached (ISO 1402)' },
  lifeGuide: {
    title: 'DIN 20066 / DGUV Regel 113-020',
    section: 'Guide values: hose at most 4 years old when assembled; assembly life at most 6 years including at most 2 years of storage',
  },
} satisfies Record<string, CheckSource>;

function result(check: SelectionCheckCode, outcome: CheckOutcome, sentence: string, source: CheckSource[]): CheckResult {
  return { check, outcome, sentence, source, overridable: !NOT_OVERRIDABLE_CHECKS.includes(check) };
}

function known(value: number | null | undefined): value is number {
  return value != null && Number.isFinite(value);
}

/** "a", "a and b", "a, b and c". */
function listOf(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** "X is not recorded" / "X and Y are not recorded". */
function notRecorded(items: string[]): string {
  return `${capitalised(listOf(items))} ${items.length === 1 ? 'is' : 'are'} not recorded`;
}

/** RMA IP-2 proof test of a new hose: usually 50 % of the minimum specified burst pressure, kPa. */
export function defaultProofTestPressureKpa(burstPressureKpa: number): number {
  return burstPressureKpa / 2;
}

/** One limit on an assembly's pressure: what sets it and its value in kPa (null when not recorded). */
export interface PressureLimit {
  label: string;
  pressureKpa: number | null;
}

/** The limits that make up an assembly's allowable pressure, in kPa, with what each is called in a sentence. */
export function pressureLimits(input: SelectionCheckInput, maxOperatingPressureKpa: number | null): PressureLimit[] {
  const { construction, fittings, service } = input;
  const designFactor = service && known(maxOperatingPressureKpa) ? designFactorFor(service, maxOperatingPressureKpa) : null;
  const burstLimit: PressureLimit = !known(construction.burstPressureKpa)
    ? { label: 'the hose burst pressure', pressureKpa: null }
    : designFactor == null
      ? { label: "the service's design factor", pressureKpa: null }
      : {
          label: `the burst pressure ÷ ${designFactor.factor}`,
          pressureKpa: construction.burstPressureKpa / designFactor.factor,
        };
  const recorded = (kpa: number | null | undefined) => (known(kpa) ? kpa : null);
  return [
    { label: 'the hose working pressure', pressureKpa: recorded(construction.workingPressureKpa) },
    burstLimit,
    { label: 'the end A fitting rating', pressureKpa: recorded(fittings.endA?.ratingKpa) },
    { label: 'the end B fitting rating', pressureKpa: recorded(fittings.endB?.ratingKpa) },
  ];
}

/** The lowest of the limits, kPa, and what sets it; null when any limit is not recorded. */
export function allowablePressure(limits: PressureLimit[]): { pressureKpa: number; label: string } | null {
  let lowest: { pressureKpa: number; label: string } | null = null;
  for (const limit of limits) {
    if (limit.pressureKpa == null) return null;
    if (!lowest || limit.pressureKpa < lowest.pressureKpa) lowest = { pressureKpa: limit.pressureKpa, label: limit.label };
  }
  return lowest;
}

/** Allowable pressure (lowest of hose rating, burst ÷ design factor, fittings' ratings) ≥ the position's maximum operating pressure. */
export function checkAllowablePressure(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.pressureUnit ?? 'bar';
  const source = [SOURCES.designAllowable, SOURCES.designRatios, SOURCES.makersRating, SOURCES.assemblyRating];
  const mopKpa = input.position.maxOperatingPressureKpa;
  if (!known(mopKpa)) {
    return result(
      'allowable-pressure',
      'warn',
      "The position's maximum operating pressure is not recorded, so the allowable pressure cannot be checked.",
      source,
    );
  }
  const limits = pressureLimits(input, mopKpa);
  const recorded = limits.filter((l): l is { label: string; pressureKpa: number } => l.pressureKpa != null);
  const missing = limits.filter((l) => l.pressureKpa == null).map((l) => l.label);
  const lowest = recorded.reduce<(typeof recorded)[number] | null>(
    (low, l) => (low == null || l.pressureKpa < low.pressureKpa ? l : low),
    null,
  );
  const sees = `the ${formatPressure(mopKpa, unit)} this position can see`;
  if (lowest && !atLeast(lowest.pressureKpa, mopKpa)) {
    return result(
      'allowable-pressure',
      'fail',
      `Allowable ${formatPressure(lowest.pressureKpa, unit)} is below ${sees} (set by ${lowest.label}).`,
      source,
    );
  }
  if (missing.length > 0 || !lowest) {
    const soFar = lowest ? `; the recorded limits allow ${formatPressure(lowest.pressureKpa, unit)} against ${sees}` : '';
    return result(
      'allowable-pressure',
      'warn',
      `${notRecorded(missing)}, so the allowable pressure is not known${soFar}.`,
      source,
    );
  }
  return result(
    'allowable-pressure',
    'pass',
    `Allowable ${formatPressure(lowest.pressureKpa, unit)} (set by ${lowest.label}) covers ${sees}.`,
    source,
  );
}

/** The position's temperature range lies inside the construction's rated range. */
export function checkTemperatureRange(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.temperatureUnit ?? 'C';
  const t = (c: number) => formatTemperature(c, unit);
  const { construction, position } = input;
  const source = [SOURCES.temperature];
  const problems: string[] = [];
  if (known(position.maxTempC) && known(construction.maxTempC) && !atMost(position.maxTempC, construction.maxTempC)) {
    problems.push(`The position can reach ${t(position.maxTempC)} but the hose is rated only to ${t(construction.maxTempC)}.`);
  }
  if (known(position.minTempC) && known(construction.minTempC) && !atLeast(position.minTempC, construction.minTempC)) {
    problems.push(`The position can fall to ${t(position.minTempC)} but the hose is rated only down to ${t(construction.minTempC)}.`);
  }
  if (problems.length > 0) return result('temperature-range', 'fail', problems.join(' '), source);

  const missing = [
    known(position.minTempC) ? null : "the position's lowest temperature",
    known(position.maxTempC) ? null : "the position's highest temperature",
    known(construction.minTempC) ? null : "the hose's lowest rated temperature",
    known(construction.maxTempC) ? null : "the hose's highest rated temperature",
  ].filter((m): m is string => m != null);
  if (missing.length > 0) {
    return result('temperature-range', 'warn', `${notRecorded(missing)}, so the temperature range cannot be checked.`, source);
  }
  return result(
    'temperature-range',
    'pass',
    `The position's ${t(position.minTempC as number)} to ${t(position.maxTempC as number)} is inside the hose's rated ${t(construction.minTempC as number)} to ${t(construction.maxTempC as number)}.`,
    source,
  );
}

/** The tube compound suits the position's medium, by the compatibility table. */
export function checkMediumCompatibility(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const compound = input.construction.tubeCompound?.trim() || null;
  const mediumCode = input.position.mediumCode?.trim() || null;
  if (!compound || !mediumCode) {
    const missing = [compound ? null : 'the tube compound', mediumCode ? null : "the position's medium"].filter(
      (m): m is string => m != null,
    );
    return result(
      'medium-compatibility',
      'warn',
      `${notRecorded(missing)}, so compatibility cannot be checked. ${CONFIRM_WITH_MAKER}`,
      [SOURCES.compatibility],
    );
  }
  const answer = compatibility(compound, mediumCode);
  const medium = mediumByCode(mediumCode);
  const cellSource: CheckSource = {
    title: answer.source ?? 'no source: the table has no rating',
    section: `${compound} with ${medium ? mediumLabel(medium) : mediumCode}`,
  };
  const source = [cellSource, SOURCES.compatibility];
  const maxTempC = input.position.maxTempC;
  if (answer.outcome === 'pass' && medium?.maxTempC != null && known(maxTempC) && !atMost(maxTempC, medium.maxTempC)) {
    const unit = options.temperatureUnit ?? 'C';
    return result(
      'medium-compatibility',
      'warn',
      `${answer.sentence} That rating covers up to ${formatTemperature(medium.maxTempC, unit)}; this position can reach ${formatTemperature(maxTempC, unit)}. ${CONFIRM_WITH_MAKER}`,
      source,
    );
  }
  return result('medium-compatibility', answer.outcome, answer.sentence, source);
}

const HELIX_REINFORCEMENTS = ['textile-helical-wire', 'steel-wire-spiral'];

/** A suction duty needs a hose with a vacuum rating. */
export function checkVacuumRating(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.pressureUnit ?? 'bar';
  const source = [SOURCES.suction, SOURCES.suctionHelix];
  const suction = input.position.suctionDuty ?? input.service?.suctionDuty ?? null;
  if (suction == null) {
    return result(
      'vacuum-rating',
      'warn',
      'Whether this position is a suction duty is not recorded, so the vacuum rating cannot be checked.',
      source,
    );
  }
  if (!suction) return result('vacuum-rating', 'pass', 'This position is not a suction duty; no vacuum rating is needed.', source);
  const { vacuumRatingKpa, reinforcement } = input.construction;
  if (known(vacuumRatingKpa) && vacuumRatingKpa > 0) {
    return result(
      'vacuum-rating',
      'pass',
      `This is a suction duty and the hose is rated for ${formatPressure(vacuumRatingKpa, unit)} of vacuum.`,
      source,
    );
  }
  if (vacuumRatingKpa == null && (reinforcement == null || HELIX_REINFORCEMENTS.includes(reinforcement))) {
    return result(
      'vacuum-rating',
      'warn',
      "This is a suction duty and the hose's vacuum rating is not recorded. Check the maker's data before using it on suction.",
      source,
    );
  }
  return result(
    'vacuum-rating',
    'fail',
    'This is a suction duty and the hose has no vacuum rating: it can collapse under suction.',
    source,
  );
}

/** The tightest routed bend is no tighter than the construction's minimum bend radius (both to the inside of the bend). */
export function checkBendRadius(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.lengthUnit ?? 'mm';
  const source = [SOURCES.bendRadius];
  const routedMm = input.position.routedBendRadiusMm;
  const minimumMm = input.construction.minBendRadiusMm;
  if (!known(routedMm) || !known(minimumMm)) {
    const missing = [
      known(routedMm) ? null : "the position's tightest routed bend",
      known(minimumMm) ? null : "the hose's minimum bend radius",
    ].filter((m): m is string => m != null);
    return result('bend-radius', 'warn', `${notRecorded(missing)}, so the bend radius cannot be checked.`, source);
  }
  if (!atLeast(routedMm, minimumMm)) {
    return result(
      'bend-radius',
      'fail',
      `The hose is routed through a ${formatLength(routedMm, unit)} bend, tighter than its ${formatLength(minimumMm, unit)} minimum bend radius.`,
      source,
    );
  }
  return result(
    'bend-radius',
    'pass',
    `The tightest bend, ${formatLength(routedMm, unit)}, is no tighter than the hose's ${formatLength(minimumMm, unit)} minimum bend radius.`,
    source,
  );
}

/** The hose's size class matches the position's, and each fitting's matches the hose's. */
export function checkSizeClass(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.lengthUnit ?? 'mm';
  const source = [SOURCES.sizeClass];
  const fails: string[] = [];
  const gaps: string[] = [];
  const classOf = (code: string | null | undefined, what: string) => {
    if (code == null || code.trim() === '') {
      gaps.push(`${what} is not recorded`);
      return null;
    }
    const size = findSizeClass(code);
    if (!size) gaps.push(`${what} "${code}" is not a known size class`);
    return size;
  };
  const hose = classOf(input.construction.sizeCode, "the hose's size");
  const position = classOf(input.position.sizeCode, "the position's size");
  const endA = input.fittings.endA ? classOf(input.fittings.endA.sizeCode, "the end A fitting's size") : null;
  const endB = input.fittings.endB ? classOf(input.fittings.endB.sizeCode, "the end B fitting's size") : null;
  if (!input.fittings.endA) gaps.push('the end A fitting is not recorded');
  if (!input.fittings.endB) gaps.push('the end B fitting is not recorded');
  const label = (code: string) => sizeLabel(code, unit);

  if (hose && position && hose.code !== position.code) {
    fails.push(`The hose is ${label(hose.code)} but the position needs ${label(position.code)}.`);
  }
  for (const [fitting, name] of [
    [endA, 'end A'],
    [endB, 'end B'],
  ] as const) {
    if (fitting && hose && fitting.code !== hose.code) {
      fails.push(`The ${name} fitting is ${label(fitting.code)} but the hose is ${label(hose.code)}.`);
    }
  }
  if (fails.length > 0) return result('size-class', 'fail', fails.join(' '), source);
  if (gaps.length > 0) {
    return result('size-class', 'warn', `${capitalised(listOf(gaps))}, so the sizes cannot all be checked.`, source);
  }
  return result('size-class', 'pass', `Hose, position and both fittings are all ${label((hose ?? position)?.code ?? '')}.`, source);
}

const ELECTRICAL_WORDS = { none: 'neither conductive nor static-dissipative', conductive: 'conductive', 'static-dissipative': 'static-dissipative' };

/** Conductive or static-dissipative hose where the service needs it; a conductive hose also serves where static-dissipative is asked. */
export function checkConductivity(input: SelectionCheckInput): CheckResult {
  const source = [SOURCES.conductivity];
  if (!input.service) {
    return result(
      'conductivity',
      'warn',
      "The service's settings are not known, so the need for conductive hose cannot be checked.",
      source,
    );
  }
  const needed = input.service.conductivityRequired;
  if (needed === 'none') {
    return result('conductivity', 'pass', 'This service needs no conductive or static-dissipative hose.', source);
  }
  const electrical = input.construction.electrical;
  if (electrical == null) {
    return result(
      'conductivity',
      'warn',
      `This service needs ${needed} hose and the hose's electrical property is not recorded.`,
      source,
    );
  }
  const meets = electrical === 'conductive' || (needed === 'static-dissipative' && electrical === 'static-dissipative');
  if (!meets) {
    return result(
      'conductivity',
      'fail',
      `This service needs ${needed} hose to drain static charge; this hose is ${ELECTRICAL_WORDS[electrical]}.`,
      source,
    );
  }
  return result(
    'conductivity',
    'pass',
    `This service needs ${needed} hose and this hose is ${electrical}; check continuity end to end once fitted.`,
    source,
  );
}

/** Hose for a food service carries a food-contact certification. */
export function checkFoodContact(input: SelectionCheckInput): CheckResult {
  const source = [SOURCES.foodContact];
  if (!input.service) {
    return result(
      'food-contact',
      'warn',
      "The service's settings are not known, so the need for food-contact hose cannot be checked.",
      source,
    );
  }
  if (!input.service.foodContactRequired) {
    return result('food-contact', 'pass', 'This is not a food service; no food-contact certification is needed.', source);
  }
  const certified = input.construction.foodContactCertified;
  if (certified == null) {
    return result(
      'food-contact',
      'warn',
      'This is a food service and whether the hose is certified for food contact is not recorded.',
      source,
    );
  }
  return certified
    ? result('food-contact', 'pass', 'This is a food service and the hose is certified for food contact.', source)
    : result('food-contact', 'fail', 'This is a food service and the hose is not certified for food contact.', source);
}

/** The assembly has a passed proof test at no less than the required pressure (default: half the burst pressure). */
export function checkProofTest(input: SelectionCheckInput, options: SelectionCheckOptions = {}): CheckResult {
  const unit = options.pressureUnit ?? 'bar';
  const source = [SOURCES.proofTestEach, SOURCES.proofTest];
  const test = input.assembly.proofTest;
  if (!test) {
    // A missing test blocks like a failed one: the only way past it is a test.
    return result(
      'proof-test',
      'fail',
      'No proof test is recorded for this assembly. Proof-test it after the fittings are attached, before it goes into service.',
      source,
    );
  }
  if (test.result === 'fail') {
    return result('proof-test', 'fail', 'This assembly failed its proof test and must not go into service.', source);
  }
  const burstKpa = input.construction.burstPressureKpa;
  const requiredKpa = known(test.requiredPressureKpa)
    ? test.requiredPressureKpa
    : known(burstKpa)
      ? defaultProofTestPressureKpa(burstKpa)
      : null;
  const heldKpa = test.heldPressureKpa;
  if (!known(heldKpa)) {
    return result(
      'proof-test',
      'warn',
      'The proof test is recorded as passed but the pressure it held is not recorded.',
      source,
    );
  }
  if (requiredKpa == null) {
    return result(
      'proof-test',
      'warn',
      `The proof test held ${formatPressure(heldKpa, unit)}, but neither the required test pressure nor the hose burst pressure is recorded to compare it with.`,
      source,
    );
  }
  if (!atLeast(heldKpa, requiredKpa)) {
    return result(
      'proof-test',
      'fail',
      `The proof test held ${formatPressure(heldKpa, unit)}, below the required ${formatPressure(requiredKpa, unit)}; test it again at the full pressure.`,
      source,
    );
  }
  return result(
    'proof-test',
    'pass',
    `Proof test passed at ${formatPressure(heldKpa, unit)} (required ${formatPressure(requiredKpa, unit)}).`,
    source,
  );
}

/** A calendar date (UTC) from an ISO date or timestamp; null when it is not one. */
export function parseDay(text: string | null | undefined): Date | null {
  if (text == null || text.trim() === '') return null;
  const dateOnly = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  const date = dateOnly
    ? new Date(Date.UTC(Number(dateOnly[1]), Number(dateOnly[2]) - 1, Number(dateOnly[3])))
    : new Date(text);
  if (Number.isNaN(date.getTime())) return null;
  if (dateOnly && date.getUTCDate() !== Number(dateOnly[3])) return null; // e.g. 2024-02-30
  return new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate()));
}

/** `months` calendar months after a date (UTC), the day clamped to the month's end (31 Jan + 1 month = 28/29 Feb). */
export function addMonths(date: Date, months: number): Date {
  const year = date.getUTCFullYear();
  const month = date.getUTCMonth() + months;
  const lastDay = new Date(Date.UTC(year, month + 1, 0)).getUTCDate();
  return new Date(Date.UTC(year, month, Math.min(date.getUTCDate(), lastDay)));
}

/** Whole calendar months from `start` to `end`. */
export function wholeMonthsBetween(start: Date, end: Date): number {
  let months = (end.getUTCFullYear() - start.getUTCFullYear()) * 12 + (end.getUTCMonth() - start.getUTCMonth());
  if (addMonths(start, months) > end) months -= 1;
  return months;
}

function today(now: Date): Date {
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
}

function limitOf(months: number | null | undefined): number | null {
  return known(months) && months > 0 ? months : null;
}

/** The bulk hose was not older than the construction's shelf life when assembled, and the assembly not stored longer than its storage limit. */
export function checkShelfLife(input: SelectionCheckInput, options: DatedSelectionCheckOptions): CheckResult {
  const source = [SOURCES.lifeGuide];
  const shelfMonths = limitOf(input.construction.shelfLifeMonths);
  const storageMonths = limitOf(input.construction.storageLifeMonths);
  if (shelfMonths == null && storageMonths == null) {
    return result('shelf-life', 'pass', 'This construction sets no shelf-life or storage limit.', source);
  }
  const made = parseDay(input.assembly.hoseManufacturedOn);
  const built = parseDay(input.assembly.builtOn);
  const installed = parseDay(input.assembly.installedOn);
  const storedUntil = installed ?? today(options.now);
  const fails: string[] = [];
  const gaps: string[] = [];
  const fine: string[] = [];

  if (shelfMonths != null) {
    if (!made || !built) {
      const missing = [made ? null : "the hose's manufacture date", built ? null : 'the build date'];
      gaps.push(notRecorded(missing.filter((m): m is string => m != null)));
    } else if (built < made) {
      gaps.push('The build date is before the hose was made');
    } else {
      const ageMonths = wholeMonthsBetween(made, built);
      if (built > addMonths(made, shelfMonths)) {
        fails.push(`The bulk hose was ${ageMonths} months old when assembled; this construction allows ${shelfMonths} months.`);
      } else {
        fine.push(`the bulk hose was ${ageMonths} months old when assembled (limit ${shelfMonths} months)`);
      }
    }
  }
  if (storageMonths != null) {
    if (!built) {
      if (shelfMonths == null) gaps.push(notRecorded(['the build date']));
    } else if (storedUntil < built) {
      gaps.push(installed ? 'The install date is before the build date' : 'The build date is in the future');
    } else {
      const storedMonths = wholeMonthsBetween(built, storedUntil);
      const stored = installed ? 'was stored' : 'has been in stock';
      if (storedUntil > addMonths(built, storageMonths)) {
        fails.push(`The assembly ${stored} ${storedMonths} months; this construction allows ${storageMonths} months of storage before installation.`);
      } else {
        fine.push(`the assembly ${stored} ${storedMonths} months (limit ${storageMonths} months)`);
      }
    }
  }
  if (fails.length > 0) return result('shelf-life', 'fail', fails.join(' '), source);
  if (gaps.length > 0) return result('shelf-life', 'warn', `${gaps.join('. ')}, so the shelf life cannot be checked.`, source);
  return result('shelf-life', 'pass', `${capitalised(listOf(fine))}.`, source);
}

/** The assembly's life from its build date, storage included, has not passed the construction's service life. */
export function checkServiceLife(input: SelectionCheckInput, options: DatedSelectionCheckOptions): CheckResult {
  const source = [SOURCES.lifeGuide];
  const lifeMonths = limitOf(input.construction.serviceLifeMonths);
  if (lifeMonths == null) return result('service-life', 'pass', 'This construction sets no service-life limit.', source);
  const built = parseDay(input.assembly.builtOn);
  const now = today(options.now);
  if (!built) {
    return result('service-life', 'warn', 'The build date is not recorded, so the service life cannot be checked.', source);
  }
  if (built > now) return result('service-life', 'warn', 'The build date is in the future, so the service life cannot be checked.', source);
  const endsOn = addMonths(built, lifeMonths);
  const ageMonths = wholeMonthsBetween(built, now);
  if (now > endsOn) {
    return result(
      'service-life',
      'fail',
      `The assembly is ${ageMonths} months old, past the ${lifeMonths}-month service life of this construction; replace it.`,
      source,
    );
  }
  return result(
    'service-life',
    'pass',
    `The assembly is ${ageMonths} months old, within the ${lifeMonths}-month service life; replace it by ${endsOn.toISOString().slice(0, 10)}.`,
    source,
  );
}

const SEVERITY: Record<CheckOutcome, number> = { pass: 0, warn: 1, fail: 2 };

/** The worst of several outcomes: fail over warn over pass; pass for none. */
export function worstOutcome(outcomes: CheckOutcome[]): CheckOutcome {
  return outcomes.reduce<CheckOutcome>((worst, o) => (SEVERITY[o] > SEVERITY[worst] ? o : worst), 'pass');
}

export interface SelectionCheckSummary {
  results: CheckResult[];
  /** The worst outcome of all checks. */
  outcome: CheckOutcome;
  /** True when any check fails: the assembly is not to be installed without an override. */
  blocksInstall: boolean;
  /** True when every failing check may be overridden (true when nothing fails). */
  allFailsOverridable: boolean;
}

/** Every selection check for one assembly at one position. */
export function runSelectionChecks(input: SelectionCheckInput, options: DatedSelectionCheckOptions): SelectionCheckSummary {
  const results = [
    checkAllowablePressure(input, options),
    checkTemperatureRange(input, options),
    checkMediumCompatibility(input, options),
    checkVacuumRating(input, options),
    checkBendRadius(input, options),
    checkSizeClass(input, options),
    checkConductivity(input),
    checkFoodContact(input),
    checkProofTest(input, options),
    checkShelfLife(input, options),
    checkServiceLife(input, options),
  ];
  const fails = results.filter((r) => r.outcome === 'fail');
  return {
    results,
    outcome: worstOutcome(results.map((r) => r.outcome)),
    blocksInstall: fails.length > 0,
    allFailsOverridable: fails.every((r) => r.overridable),
  };
}
