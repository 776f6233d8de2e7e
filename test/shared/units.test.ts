import { describe, it, expect } from 'vitest';
import {
  approxEqual,
  atLeast,
  atMost,
  formatLength,
  formatPressure,
  formatTemperature,
  fromCelsius,
  fromKpa,
  fromMm,
  KPA_PER_PSI,
  lengthInputSchema,
  pressureInput,
  pressureInputSchema,
  temperatureInputSchema,
  toCelsius,
  toKpa,
  toMm,
} from '../../shared/src/units/index.js';

// Independent derivation of the psi: NIST SP 811 B.8 gives 1 lb = 0.453 592 37 kg exactly and
// standard gravity g_n = 9.806 65 m/s² exactly, so 1 lbf = 0.453 592 37 × 9.806 65 N.
const PSI_IN_PA_FROM_POUND_AND_GRAVITY = (0.45359237 * 9.80665) / 0.0254 ** 2;

describe('pressure conversions', () => {
  it('NIST SP 811 Appendix B: 1 psi = 6.894 757 E+03 Pa, to its printed digits', () => {
    expect(toKpa(1, 'psi') * 1000).toBeCloseTo(6894.757, 3);
    expect(fromKpa(6.894757, 'psi')).toBeCloseTo(1, 6);
  });

  it('1 psi = 6 894.757 293 168… Pa exactly from 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² over (0.0254 m)² (NIST SP 811 B.8)', () => {
    expect(KPA_PER_PSI * 1000).toBeCloseTo(PSI_IN_PA_FROM_POUND_AND_GRAVITY, 9);
    expect(KPA_PER_PSI * 1000).toBeCloseTo(6894.757293168, 9);
  });

  it('NIST SP 811 Appendix B: psi to MPa 6.894 757 E-03, so 3000 psi = 20.684 MPa', () => {
    expect(fromKpa(toKpa(1, 'psi'), 'MPa')).toBeCloseTo(6.894757e-3, 9);
    expect(fromKpa(toKpa(3000, 'psi'), 'MPa')).toBeCloseTo(20.684272, 6);
  });

  it('NIST SP 811 Appendix B: 1 bar = 1.0 E+05 Pa exactly, both ways', () => {
    expect(toKpa(1, 'bar')).toBe(100);
    expect(fromKpa(100, 'bar')).toBe(1);
    expect(toKpa(10.3, 'bar')).toBeCloseTo(1030, 10);
    expect(fromKpa(1030, 'bar')).toBeCloseTo(10.3, 12);
  });

  it('1 MPa = 1000 kPa (SI prefixes), both ways', () => {
    expect(toKpa(2.5, 'MPa')).toBe(2500);
    expect(fromKpa(2500, 'MPa')).toBe(2.5);
  });

  it('kPa is the stored unit and passes through unchanged', () => {
    expect(toKpa(1234.5, 'kPa')).toBe(1234.5);
    expect(fromKpa(1234.5, 'kPa')).toBe(1234.5);
  });

  it('150 psi = 1034.214 kPa = 10.342 bar (from 1 psi = 6.894 757 293 168 kPa)', () => {
    expect(toKpa(150, 'psi')).toBeCloseTo(1034.2135939753, 9);
    expect(fromKpa(1034.2135939753, 'psi')).toBeCloseTo(150, 9);
    expect(fromKpa(toKpa(150, 'psi'), 'bar')).toBeCloseTo(10.342135939753, 9);
  });

  it('converts psi to kPa and back without drift', () => {
    for (const psi of [0, 1, 14.7, 150, 300, 3000, 6000]) {
      expect(approxEqual(fromKpa(toKpa(psi, 'psi'), 'psi'), psi)).toBe(true);
    }
  });
});

describe('length conversions', () => {
  it('1 in = 25.4 mm exactly (NIST SP 811 Appendix B: 2.54 E-02 m), both ways', () => {
    expect(toMm(1, 'in')).toBe(25.4);
    expect(fromMm(25.4, 'in')).toBe(1);
  });

  it('ISO 1307 and dash numbers: 3/4 in = 19.05 mm, both ways', () => {
    expect(toMm(0.75, 'in')).toBeCloseTo(19.05, 12);
    expect(fromMm(19.05, 'in')).toBeCloseTo(0.75, 12);
  });

  it('NIST SP 811 Appendix B: 1 ft = 3.048 E-01 m, both ways', () => {
    expect(toMm(1, 'ft')).toBeCloseTo(304.8, 12);
    expect(fromMm(304.8, 'ft')).toBeCloseTo(1, 12);
  });

  it('1 m = 1000 mm (SI prefixes), both ways', () => {
    expect(toMm(2.5, 'm')).toBe(2500);
    expect(fromMm(2500, 'm')).toBe(2.5);
  });

  it('mm is the stored unit and passes through unchanged', () => {
    expect(toMm(19, 'mm')).toBe(19);
    expect(fromMm(19, 'mm')).toBe(19);
  });
});

describe('temperature conversions', () => {
  it('NIST SP 811 Appendix B: t/°C = (t/°F − 32)/1.8 — water freezes at 32 °F = 0 °C and boils at 212 °F = 100 °C', () => {
    expect(toCelsius(32, 'F')).toBe(0);
    expect(toCelsius(212, 'F')).toBeCloseTo(100, 12);
    expect(fromCelsius(0, 'F')).toBe(32);
    expect(fromCelsius(100, 'F')).toBeCloseTo(212, 12);
  });

  it('the scales meet at −40 (from the definition), both ways', () => {
    expect(toCelsius(-40, 'F')).toBeCloseTo(-40, 12);
    expect(fromCelsius(-40, 'F')).toBeCloseTo(-40, 12);
  });

  it('NIST SP 811: absolute zero 0 K = −273.15 °C = −459.67 °F', () => {
    expect(toCelsius(-459.67, 'F')).toBeCloseTo(-273.15, 10);
    expect(fromCelsius(-273.15, 'F')).toBeCloseTo(-459.67, 10);
  });

  it('°C is the stored unit and passes through unchanged', () => {
    expect(toCelsius(40, 'C')).toBe(40);
    expect(fromCelsius(40, 'C')).toBe(40);
  });
});

describe('display formatting', () => {
  it('shows psi in whole numbers from 100 psi up, with the unit symbol', () => {
    expect(formatPressure(toKpa(150, 'psi'), 'psi')).toBe('150 psi');
    expect(formatPressure(toKpa(3000, 'psi'), 'psi')).toBe('3000 psi');
    expect(formatPressure(toKpa(14.7, 'psi'), 'psi')).toBe('14.7 psi');
    expect(formatPressure(toKpa(2.5, 'psi'), 'psi')).toBe('2.50 psi');
  });

  it('shows bar to one decimal (two below 1 bar)', () => {
    expect(formatPressure(toKpa(150, 'psi'), 'bar')).toBe('10.3 bar');
    expect(formatPressure(1200, 'bar')).toBe('12.0 bar');
    expect(formatPressure(80, 'bar')).toBe('0.80 bar');
  });

  it('shows kPa in whole numbers from 100 kPa up and MPa to two decimals', () => {
    expect(formatPressure(1034.2136, 'kPa')).toBe('1034 kPa');
    expect(formatPressure(85.25, 'kPa')).toBe('85.3 kPa');
    expect(formatPressure(toKpa(3000, 'psi'), 'MPa')).toBe('20.68 MPa');
  });

  it('shows lengths with the unit symbol', () => {
    expect(formatLength(19.05, 'in')).toBe('0.75 in');
    expect(formatLength(19.05, 'mm')).toBe('19.1 mm');
    expect(formatLength(250, 'mm')).toBe('250 mm');
    expect(formatLength(1500, 'm')).toBe('1.50 m');
    expect(formatLength(304.8 * 25, 'ft')).toBe('25.0 ft');
  });

  it('shows temperatures in whole degrees with °C or °F', () => {
    expect(formatTemperature(40, 'C')).toBe('40 °C');
    expect(formatTemperature(40, 'F')).toBe('104 °F');
    expect(formatTemperature(-40, 'F')).toBe('-40 °F');
  });

  it('never shows "-0" for a value that rounds to zero', () => {
    expect(formatTemperature(-0.2, 'C')).toBe('0 °C');
    expect(formatPressure(-0.0001, 'bar')).toBe('0.00 bar');
  });

  it('shows a dash, never NaN, for a missing or non-finite value', () => {
    expect(formatPressure(null, 'bar')).toBe('—');
    expect(formatLength(Number.NaN, 'mm')).toBe('—');
    expect(formatTemperature(undefined, 'C')).toBe('—');
    expect(formatPressure(Number.POSITIVE_INFINITY, 'psi')).toBe('—');
  });

  it('rounds only for display: the stored value keeps its digits', () => {
    const storedKpa = toKpa(150, 'psi');
    formatPressure(storedKpa, 'bar');
    expect(storedKpa).toBeCloseTo(1034.2135939753, 9);
  });
});

describe('comparisons with tolerance (relative 1e-9 plus absolute 1e-6 in the stored unit)', () => {
  it('does not fail a value that is equal but for floating-point rounding', () => {
    expect(0.1 + 0.2 >= 0.3).toBe(true);
    expect(0.3 >= 0.1 + 0.2).toBe(false);
    expect(atLeast(0.3, 0.1 + 0.2)).toBe(true);
    expect(approxEqual(0.3, 0.1 + 0.2)).toBe(true);
  });

  it('treats 150 psi entered in psi as equal to the same pressure entered in bar', () => {
    const fromPsi = toKpa(150, 'psi');
    const fromBar = toKpa(fromKpa(fromPsi, 'bar'), 'bar');
    expect(approxEqual(fromPsi, fromBar)).toBe(true);
    expect(atLeast(fromBar, fromPsi)).toBe(true);
    expect(atMost(fromBar, fromPsi)).toBe(true);
  });

  it('still tells apart values that differ by more than the tolerance', () => {
    expect(atLeast(1034, 1034.2)).toBe(false);
    expect(atLeast(1000, 1000.01)).toBe(false);
    expect(atMost(1000.01, 1000)).toBe(false);
    expect(approxEqual(19, 19.05)).toBe(false);
  });

  it('accepts a custom tolerance', () => {
    expect(approxEqual(100, 100.5, { relative: 0, absolute: 1 })).toBe(true);
  });
});

describe('value-with-unit schemas', () => {
  it('transforms a pressure in psi to kPa (1 psi = 6.894 757 293 168 kPa)', () => {
    expect(pressureInputSchema.parse({ value: 150, unit: 'psi' })).toBeCloseTo(1034.2135939753, 9);
    expect(pressureInputSchema.parse({ value: 12, unit: 'bar' })).toBe(1200);
    expect(pressureInputSchema.parse({ value: 1.5, unit: 'MPa' })).toBe(1500);
  });

  it('says "Pressure must be a number" for text or a missing value', () => {
    const result = pressureInputSchema.safeParse({ value: '150', unit: 'psi' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toBe('Pressure must be a number');
    expect(pressureInputSchema.safeParse({ unit: 'psi' }).error?.issues[0]?.message).toBe('Pressure must be a number');
  });

  it('says "Pressure cannot be negative"', () => {
    const result = pressureInputSchema.safeParse({ value: -1, unit: 'bar' });
    expect(result.error?.issues[0]?.message).toBe('Pressure cannot be negative');
    expect(result.error?.issues[0]?.path).toEqual(['value']);
  });

  it('refuses an unknown unit with the units it takes', () => {
    const result = pressureInputSchema.safeParse({ value: 1, unit: 'atm' });
    expect(result.error?.issues[0]?.message).toBe('Choose the unit of pressure: kPa, bar, psi or MPa');
    expect(result.error?.issues[0]?.path).toEqual(['unit']);
  });

  it('refuses infinity and NaN', () => {
    expect(pressureInputSchema.safeParse({ value: Number.POSITIVE_INFINITY, unit: 'bar' }).success).toBe(false);
    expect(pressureInputSchema.safeParse({ value: Number.NaN, unit: 'bar' }).success).toBe(false);
  });

  it('names the field in its messages when given a label', () => {
    const schema = pressureInput('Working pressure');
    expect(schema.safeParse({ value: -5, unit: 'psi' }).error?.issues[0]?.message).toBe('Working pressure cannot be negative');
  });

  it('transforms a length in inches to mm (1 in = 25.4 mm exactly)', () => {
    expect(lengthInputSchema.parse({ value: 0.75, unit: 'in' })).toBeCloseTo(19.05, 12);
    expect(lengthInputSchema.safeParse({ value: -1, unit: 'mm' }).error?.issues[0]?.message).toBe('Length cannot be negative');
    expect(lengthInputSchema.safeParse({ value: null, unit: 'mm' }).error?.issues[0]?.message).toBe('Length must be a number');
  });

  it('transforms a temperature in °F to °C and refuses one below absolute zero (−459.67 °F)', () => {
    expect(temperatureInputSchema.parse({ value: 212, unit: 'F' })).toBeCloseTo(100, 12);
    expect(temperatureInputSchema.parse({ value: -40, unit: 'C' })).toBe(-40);
    expect(temperatureInputSchema.safeParse({ value: -459.67, unit: 'F' }).success).toBe(true);
    expect(temperatureInputSchema.safeParse({ value: -500, unit: 'F' }).error?.issues[0]?.message).toBe(
      'Temperature cannot be below absolute zero',
    );
    expect(temperatureInputSchema.safeParse({ value: 'hot', unit: 'C' }).error?.issues[0]?.message).toBe(
      'Temperature must be a number',
    );
  });

  it('refuses fields it does not know', () => {
    expect(pressureInputSchema.safeParse({ value: 1, unit: 'bar', extra: true }).success).toBe(false);
  });
});
