import { describe, it, expect } from 'vitest';
import {
  findSizeClass,
  inchBoreMm,
  sameSizeClass,
  SIZE_CLASSES,
  sizeClassByCode,
  sizeLabel,
} from '../../shared/src/sizes/nominal-sizes.js';

const code = (text: string) => findSizeClass(text)?.code ?? null;

describe('the size class table', () => {
  it('ISO 1307 and dash numbers: dash −12 = 3/4 in = 19.05 mm, and nominal 19 mm is the 3/4-inch class', () => {
    const size = sizeClassByCode('bore-19');
    expect(size?.dash).toBe(12);
    expect(size?.inch).toBe('3/4');
    expect(inchBoreMm(size!)).toBeCloseTo(19.05, 12);
  });

  it('ISO 1307 and dash numbers: holds every ISO 1307 nominal bore 6.3 … 150 mm', () => {
    const bores = SIZE_CLASSES.map((s) => s.nominalBoreMm);
    for (const mm of [6.3, 8, 10, 12.5, 16, 19, 25, 31.5, 38, 51, 63, 76, 102, 152]) expect(bores).toContain(mm);
    expect(findSizeClass('50 mm')?.code).toBe('bore-51');
    expect(findSizeClass('100 mm')?.code).toBe('bore-102');
    expect(findSizeClass('150 mm')?.code).toBe('bore-152');
  });

  it('has unique codes and dash numbers', () => {
    expect(new Set(SIZE_CLASSES.map((s) => s.code)).size).toBe(SIZE_CLASSES.length);
    expect(new Set(SIZE_CLASSES.map((s) => s.dash)).size).toBe(SIZE_CLASSES.length);
  });

  it('dash number = sixteenths of an inch: each inch fraction equals dash/16 (common practice)', () => {
    for (const size of SIZE_CLASSES) {
      expect(findSizeClass(`${size.inch} in`)?.code).toBe(size.code);
      expect(findSizeClass(`-${size.dash}`)?.code).toBe(size.code);
    }
  });

  it('keeps each nominal metric bore within 0.6 mm of its exact inch bore (1 in = 25.4 mm)', () => {
    for (const size of SIZE_CLASSES) expect(Math.abs(inchBoreMm(size) - size.nominalBoreMm)).toBeLessThanOrEqual(0.6);
  });

  it('names a source for every class', () => {
    for (const size of SIZE_CLASSES) expect(size.source.length).toBeGreaterThan(0);
  });
});

describe('findSizeClass reads every written form of one class', () => {
  it.each([
    ['19', 'bore-19'],
    ['19 mm', 'bore-19'],
    ['19mm', 'bore-19'],
    ['3/4', 'bore-19'],
    ['3/4 in', 'bore-19'],
    ['3/4in', 'bore-19'],
    ['3/4"', 'bore-19'],
    ['3/4 inch', 'bore-19'],
    ['-12', 'bore-19'],
    ['−12', 'bore-19'],
    ['dash 12', 'bore-19'],
    ['Dash-12', 'bore-19'],
    ['#12', 'bore-19'],
    ['0.75 in', 'bore-19'],
    ['19.05 mm', 'bore-19'],
    ['bore-19', 'bore-19'],
    ['2 in', 'bore-51'],
    ['2"', 'bore-51'],
    ['50', 'bore-51'],
    ['51 mm', 'bore-51'],
    ['-32', 'bore-51'],
    ['1-1/4 in', 'bore-31.5'],
    ['1 1/4"', 'bore-31.5'],
    ['31.5 mm', 'bore-31.5'],
    ['1/2"', 'bore-12.5'],
    ['12.5', 'bore-12.5'],
    ['6,3 mm', 'bore-6.3'],
    ['4 inches', 'bore-102'],
    ['8 in', 'bore-203'],
    ['254 mm', 'bore-254'],
    ['12"', 'bore-305'],
    ['  3/4  IN ', 'bore-19'],
  ])('"%s" is %s', (text, expected) => {
    expect(code(text)).toBe(expected);
  });

  it.each([['12'], ['2'], ['7 mm'], ['7/8 in'], ['-11'], ['dash'], ['three quarter'], [''], ['1/0']])(
    '"%s" is no class (a bare number is millimetres; unknown sizes are null)',
    (text) => {
      expect(findSizeClass(text)).toBeNull();
    },
  );

  it('returns null for a missing value', () => {
    expect(findSizeClass(null)).toBeNull();
    expect(findSizeClass(undefined)).toBeNull();
  });
});

describe('sameSizeClass', () => {
  it('ISO 1307 and dash numbers: 19 mm, 3/4 in and -12 are one class', () => {
    expect(sameSizeClass('19 mm', '3/4 in')).toBe(true);
    expect(sameSizeClass('-12', '19')).toBe(true);
    expect(sameSizeClass('bore-19', '0.75"')).toBe(true);
  });

  it('50 and 51 mm are one class (ISO 1307: 50/51)', () => {
    expect(sameSizeClass('50', '51 mm')).toBe(true);
  });

  it('tells different classes apart', () => {
    expect(sameSizeClass('3/4', '1 in')).toBe(false);
    expect(sameSizeClass('19', '25')).toBe(false);
  });

  it('is false when either size is unknown or missing', () => {
    expect(sameSizeClass('7 mm', '7 mm')).toBe(false);
    expect(sameSizeClass(null, '19')).toBe(false);
  });
});

describe('sizeLabel', () => {
  it('shows the metric bore for mm and the inch size for in', () => {
    expect(sizeLabel('bore-19', 'mm')).toBe('19 mm');
    expect(sizeLabel('bore-19', 'in')).toBe('3/4 in');
    expect(sizeLabel('bore-31.5', 'in')).toBe('1-1/4 in');
    expect(sizeLabel('bore-51', 'm')).toBe('51 mm');
    expect(sizeLabel('bore-51', 'ft')).toBe('2 in');
  });

  it('shows an unknown code as it is', () => {
    expect(sizeLabel('bore-7', 'mm')).toBe('bore-7');
  });
});
