import { z } from 'zod';

// Stored values are SI doubles: pressure in kPa, length in mm, temperature in °C.
// Factors come from their definitions (NIST SP 811, Appendix B) and are never rounded here.

export const PRESSURE_UNITS = ['kPa', 'bar', 'psi', 'MPa'] as const;
export const LENGTH_UNITS = ['mm', 'in', 'm', 'ft'] as const;
export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

/** 1 in = 25.4 mm exactly (international inch, 1959). */
export const MM_PER_INCH = 25.4;
/** 1 ft = 12 in = 304.8 mm exactly. */
export const MM_PER_FOOT = 12 * MM_PER_INCH;
/** 1 lbf = 4.448 221 615 260 5 N exactly (standard gravity times the avoirdupois pound). */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
/** 1 psi in kPa, from 1 lbf / (1 in)²: 6.894 757 293 168… kPa. */
export const KPA_PER_PSI = NEWTONS_PER_POUND_FORCE / (MM_PER_INCH / 1000) ** 2 / 1000;
/** 1 bar = 100 kPa exactly. */
export const KPA_PER_BAR = 100;
/** 1 MPa = 1000 kPa. */
export const KPA_PER_MPA = 1000;

const KPA_PER_UNIT: Record<PressureUnit, number> = { kPa: 1, bar: KPA_PER_BAR, psi: KPA_PER_PSI, MPa: KPA_PER_MPA };
const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, in: MM_PER_INCH, m: 1000, ft: MM_PER_FOOT };

export const PRESSURE_UNIT_SYMBOLS: Record<PressureUnit, string> = { kPa: 'kPa', bar: 'bar', psi: 'psi', MPa: 'MPa' };
export const LENGTH_UNIT_SYMBOLS: Record<LengthUnit, string> = { mm: 'mm', in: 'in', m: 'm', ft: 'ft' };
export const TEMPERATURE_UNIT_SYMBOLS: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };

/** A pressure in `unit` converted to kPa. */
export function toKpa(value: number, unit: PressureUnit): number {
  return unit === 'kPa' ? value : value * KPA_PER_UNIT[unit];
}

/** A pressure in kPa converted to `unit`. */
export function fromKpa(pressureKpa: number, unit: PressureUnit): number {
  return unit === 'kPa' ? pressureKpa : pressureKpa / KPA_PER_UNIT[unit];
}

/** A length in `unit` converted to mm. */
export function toMm(value: number, unit: LengthUnit): number {
  return unit === 'mm' ? value : value * MM_PER_UNIT[unit];
}

/** A length in mm converted to `unit`. */
export function fromMm(lengthMm: number, unit: LengthUnit): number {
  return unit === 'mm' ? lengthMm : lengthMm / MM_PER_UNIT[unit];
}

/** A temperature in `unit` converted to °C: °C = (°F − 32) / 1.8. */
export function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'C' ? value : (value - 32) / 1.8;
}

/** A temperature in °C converted to `unit`: °F = °C × 1.8 + 32. */
export function fromCelsius(temperatureC: number, unit: TemperatureUnit): number {
  return unit === 'C' ? temperatureC : temperatureC * 1.8 + 32;
}

/** Shown for a value that is missing or not a finite number, so a screen never reads "NaN". */
export const NO_VALUE = '—';

function fixed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  // A small negative value rounds to "-0"; nobody wants to read "-0 bar".
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

function pressureDecimals(value: number, unit: PressureUnit): number {
  const size = Math.abs(value);
  switch (unit) {
    case 'psi':
      return size >= 100 ? 0 : size >= 10 ? 1 : 2;
    case 'bar':
      return size >= 1 ? 1 : 2;
    case 'kPa':
      return size >= 100 ? 0 : 1;
    case 'MPa':
      return size >= 100 ? 1 : 2;
  }
}

function lengthDecimals(value: number, unit: LengthUnit): number {
  const size = Math.abs(value);
  switch (unit) {
    case 'mm':
      return size >= 100 ? 0 : 1;
    case 'in':
      return size >= 100 ? 0 : size >= 10 ? 1 : 2;
    case 'm':
      return size >= 100 ? 1 : 2;
    case 'ft':
      return size >= 100 ? 0 : size >= 10 ? 1 : 2;
  }
}

/** A stored kPa value shown in `unit`, rounded for display only, e.g. "150 psi", "10.3 bar". */
export function formatPressure(pressureKpa: number | null | undefined, unit: PressureUnit): string {
  if (pressureKpa == null || !Number.isFinite(pressureKpa)) return NO_VALUE;
  const value = fromKpa(pressureKpa, unit);
  return `${fixed(value, pressureDecimals(value, unit))} ${PRESSURE_UNIT_SYMBOLS[unit]}`;
}

/** A stored mm value shown in `unit`, rounded for display only, e.g. "19.0 mm", "0.75 in". */
export function formatLength(lengthMm: number | null | undefined, unit: LengthUnit): string {
  if (lengthMm == null || !Number.isFinite(lengthMm)) return NO_VALUE;
  const value = fromMm(lengthMm, unit);
  return `${fixed(value, lengthDecimals(value, unit))} ${LENGTH_UNIT_SYMBOLS[unit]}`;
}

/** A stored °C value shown in `unit` to whole degrees, e.g. "40 °C", "104 °F". */
export function formatTemperature(temperatureC: number | null | undefined, unit: TemperatureUnit): string {
  if (temperatureC == null || !Number.isFinite(temperatureC)) return NO_VALUE;
  return `${fixed(fromCelsius(temperatureC, unit), 0)} ${TEMPERATURE_UNIT_SYMBOLS[unit]}`;
}

/** Tolerance for comparing stored values: relative to the larger magnitude, plus an absolute floor in the stored unit. */
export interface Tolerance {
  relative: number;
  absolute: number;
}

/**
 * Relative 1e-9 plus absolute 1e-6 (kPa, mm or °C): far below any reading a gauge or tape gives,
 * far above the rounding of a value entered in psi, in or °F and converted.
 */
export const DEFAULT_TOLERANCE: Tolerance = { relative: 1e-9, absolute: 1e-6 };

function slack(a: number, b: number, tolerance: Tolerance): number {
  return tolerance.absolute + tolerance.relative * Math.max(Math.abs(a), Math.abs(b));
}

/** True when a and b (same stored unit) differ by no more than the tolerance. */
export function approxEqual(a: number, b: number, tolerance: Tolerance = DEFAULT_TOLERANCE): boolean {
  return Math.abs(a - b) <= slack(a, b, tolerance);
}

/** True when a ≥ b within the tolerance (same stored unit), so a converted value equal to its limit is not failed. */
export function atLeast(a: number, b: number, tolerance: Tolerance = DEFAULT_TOLERANCE): boolean {
  return a >= b - slack(a, b, tolerance);
}

/** True when a ≤ b within the tolerance (same stored unit). */
export function atMost(a: number, b: number, tolerance: Tolerance = DEFAULT_TOLERANCE): boolean {
  return a <= b + slack(a, b, tolerance);
}

/** Absolute zero in °C; no temperature entered can be below it. */
export const ABSOLUTE_ZERO_C = -273.15;

/** `{ value, unit }` of a pressure, transformed to kPa; `label` starts each message, e.g. "Working pressure". */
export function pressureInput(label = 'Pressure') {
  return z
    .strictObject({
      value: z.number({ message: `${label} must be a number` }).min(0, `${label} cannot be negative`),
      unit: z.enum(PRESSURE_UNITS, { message: `Choose the unit of ${label.toLowerCase()}: kPa, bar, psi or MPa` }),
    })
    .transform(({ value, unit }) => toKpa(value, unit));
}

/** `{ value, unit }` of a length, transformed to mm. */
export function lengthInput(label = 'Length') {
  return z
    .strictObject({
      value: z.number({ message: `${label} must be a number` }).min(0, `${label} cannot be negative`),
      unit: z.enum(LENGTH_UNITS, { message: `Choose the unit of ${label.toLowerCase()}: mm, in, m or ft` }),
    })
    .transform(({ value, unit }) => toMm(value, unit));
}

/** `{ value, unit }` of a temperature, transformed to °C; below absolute zero is refused. */
export function temperatureInput(label = 'Temperature') {
  return z
    .strictObject({
      value: z.number({ message: `${label} must be a number` }),
      unit: z.enum(TEMPERATURE_UNITS, { message: `Choose the unit of ${label.toLowerCase()}: °C or °F` }),
    })
    .transform(({ value, unit }) => toCelsius(value, unit))
    .refine((temperatureC) => atLeast(temperatureC, ABSOLUTE_ZERO_C), `${label} cannot be below absolute zero`);
}

export const pressureInputSchema = pressureInput();
export const lengthInputSchema = lengthInput();
export const temperatureInputSchema = temperatureInput();
export type PressureInput = z.input<typeof pressureInputSchema>;
export type LengthInput = z.input<typeof lengthInputSchema>;
export type TemperatureInput = z.input<typeof temperatureInputSchema>;
