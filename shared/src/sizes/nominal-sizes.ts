import { MM_PER_INCH, type LengthUnit } from '../units/units.js';

// One size class for a bore however it is written: ISO 1307 nominal bore in mm, the inch
// fraction, or the dash number (sixteenths of an inch). Rules compare classes, never millimetres.

/** One nominal size class. `code` is stable: the database stores it. */
export interface SizeClass {
  code: string;
  /** ISO 1307 nominal bore, mm (for 203, 254 and 305 mm: common practice). */
  nominalBoreMm: number;
  /** Other ways the metric bore is written, mm (e.g. 50 for 51). */
  alsoWrittenMm: readonly number[];
  /** Inch size as written, e.g. "3/4", "1-1/4", "2". */
  inch: string;
  /** Dash number: the bore in sixteenths of an inch (−12 = 3/4 in). */
  dash: number;
  source: string;
}

const ISO_1307 = 'ISO 1307 nominal bores; dash number = sixteenths of an inch (common practice)';
const LARGE_BORE = 'common practice (larger industrial bores); dash number = sixteenths of an inch';

function sizeClass(nominalBoreMm: number, inch: string, dash: number, alsoWrittenMm: number[] = [], source = ISO_1307): SizeClass {
  return { code: `bore-${nominalBoreMm}`, nominalBoreMm, alsoWrittenMm, inch, dash, source };
}

/** The nominal size classes, smallest first. */
export const SIZE_CLASSES: readonly SizeClass[] = [
  sizeClass(6.3, '1/4', 4),
  sizeClass(8, '5/16', 5),
  sizeClass(10, '3/8', 6),
  sizeClass(12.5, '1/2', 8),
  sizeClass(16, '5/8', 10),
  sizeClass(19, '3/4', 12),
  sizeClass(25, '1', 16),
  sizeClass(31.5, '1-1/4', 20),
  sizeClass(38, '1-1/2', 24),
  sizeClass(51, '2', 32, [50]),
  sizeClass(63, '2-1/2', 40),
  sizeClass(76, '3', 48),
  sizeClass(102, '4', 64, [100]),
  sizeClass(152, '6', 96, [150]),
  sizeClass(203, '8', 128, [200], LARGE_BORE),
  sizeClass(254, '10', 160, [250], LARGE_BORE),
  sizeClass(305, '12', 192, [300], LARGE_BORE),
];

export const SIZE_CLASS_CODES: readonly string[] = SIZE_CLASSES.map((s) => s.code);

/** The exact inch bore of a class, mm (dash × 25.4 / 16), e.g. 19.05 mm for −12. */
export function inchBoreMm(sizeClass: SizeClass): number {
  return (sizeClass.dash * MM_PER_INCH) / 16;
}

/** The class with this stable code, or null. */
export function sizeClassByCode(code: string | null | undefined): SizeClass | null {
  if (code == null) return null;
  return SIZE_CLASSES.find((s) => s.code === code) ?? null;
}

function byDash(dash: number): SizeClass | null {
  return SIZE_CLASSES.find((s) => s.dash === dash) ?? null;
}

function byMm(mm: number): SizeClass | null {
  const near = (a: number, b: number, within: number) => Math.abs(a - b) <= within;
  return (
    SIZE_CLASSES.find((s) => near(s.nominalBoreMm, mm, 1e-9) || s.alsoWrittenMm.some((w) => near(w, mm, 1e-9))) ??
    // The exact inch bore written in mm to two decimals, e.g. 19.05 or 12.7.
    SIZE_CLASSES.find((s) => near(inchBoreMm(s), mm, 0.0051)) ??
    null
  );
}

function bySixteenths(sixteenths: number): SizeClass | null {
  const rounded = Math.round(sixteenths);
  return Math.abs(sixteenths - rounded) < 1e-9 ? byDash(rounded) : null;
}

/** Inches in "3/4", "1-1/4", "1 1/4", "2", "0.75"; null when it is not such a number. */
function parseInches(text: string): number | null {
  const mixed = /^(\d+)(?:\s*-\s*|\s+)(\d+)\s*\/\s*(\d+)$/.exec(text);
  if (mixed) return Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  const fraction = /^(\d+)\s*\/\s*(\d+)$/.exec(text);
  if (fraction) return Number(fraction[1]) / Number(fraction[2]);
  if (/^(\d+(\.\d*)?|\.\d+)$/.test(text)) return Number(text);
  return null;
}

const NUMBER = /^(\d+(?:[.,]\d+)?)$/;

/**
 * The size class a written size names, or null. Reads "19", "19 mm", "3/4", "3/4 in", "3/4\"",
 * "1-1/4 inch", "0.75 in", "2 in", "-12", "dash 12", "#12", "50", "51 mm" and the class code itself.
 * A bare number is millimetres; a bare fraction is inches.
 */
export function findSizeClass(text: string | null | undefined): SizeClass | null {
  if (text == null) return null;
  const written = text
    .trim()
    .toLowerCase()
    .replace(/[\u2212\u2013\u2012]/g, '-') // minus sign and dashes typed as a hyphen
    .replace(/[\u201d\u2033]/g, '"')
    .replace(/\s+/g, ' ');
  if (written === '') return null;

  const byCode = sizeClassByCode(written);
  if (byCode) return byCode;

  const dash = /^(?:-|dash ?-?|#) ?(\d+)$/.exec(written);
  if (dash) return byDash(Number(dash[1]));

  const mm = /^(.+?) ?(?:mm|millimet(?:re|er)s?)$/.exec(written);
  if (mm) {
    const value = NUMBER.exec(mm[1] ?? '');
    return value ? byMm(Number((value[1] ?? '').replace(',', '.'))) : null;
  }

  const inch = /^(.+?) ?(?:"|''|in|in\.|inch|inches)$/.exec(written);
  if (inch) {
    const inches = parseInches(inch[1] ?? '');
    return inches == null ? null : bySixteenths(inches * 16);
  }

  const bare = NUMBER.exec(written);
  if (bare) return byMm(Number((bare[1] ?? '').replace(',', '.')));

  const inches = parseInches(written);
  return inches == null ? null : bySixteenths(inches * 16);
}

/** True when both written sizes (or codes) name the same class; false when either is unknown. */
export function sameSizeClass(a: string | null | undefined, b: string | null | undefined): boolean {
  const first = findSizeClass(a);
  const second = findSizeClass(b);
  return first != null && second != null && first.code === second.code;
}

/** A class shown in the user's length unit: "19 mm" for mm and m, "3/4 in" for in and ft; the code itself when unknown. */
export function sizeLabel(code: string, lengthUnit: LengthUnit): string {
  const size = sizeClassByCode(code);
  if (!size) return code;
  return lengthUnit === 'mm' || lengthUnit === 'm' ? `${size.nominalBoreMm} mm` : `${size.inch} in`;
}
