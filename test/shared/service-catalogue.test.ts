import { describe, it, expect } from 'vitest';
import {
  defaultServiceSettings,
  designFactorFor,
  SERVICE_CATALOGUE,
  serviceByCode,
  WATER_LOW_PRESSURE_LIMIT_KPA,
} from '../../shared/src/services/service-catalogue.js';
import {
  defaultLifeOutcome,
  isRemovalReason,
  REMOVAL_REASON_DEFINITIONS,
  REMOVAL_REASONS,
} from '../../shared/src/services/removal-reasons.js';
import {
  CRITICALITY_DEFINITIONS,
  CRITICALITY_LEVELS,
  inspectionIntervalDays,
} from '../../shared/src/services/criticality.js';
import { toKpa } from '../../shared/src/units/units.js';

function settingsOf(code: string) {
  const service = serviceByCode(code);
  if (!service) throw new Error(`no service ${code}`);
  return defaultServiceSettings(service);
}

describe('the service catalogue', () => {
  it('has unique kebab-case codes, names and descriptions', () => {
    const codes = SERVICE_CATALOGUE.map((s) => s.code);
    expect(new Set(codes).size).toBe(codes.length);
    for (const s of SERVICE_CATALOGUE) {
      expect(s.code).toMatch(/^[a-z]+(-[a-z]+)*$/);
      expect(s.name.length).toBeGreaterThan(0);
      expect(s.description.length).toBeGreaterThan(0);
    }
  });

  it('holds the services the plant runs', () => {
    for (const code of [
      'compressed-air',
      'water-suction-discharge',
      'water-discharge',
      'fuel-oil',
      'dry-bulk',
      'slurry',
      'hydraulic-suction-return',
      'hot-air-bulk-unloading',
      'abrasive-blasting',
      'chemical-transfer',
      'food-beverage',
      'vacuum-truck-suction',
      'steam',
    ]) {
      expect(serviceByCode(code), code).not.toBeNull();
    }
    expect(serviceByCode('no-such-service')).toBeNull();
  });

  it('names a source for every design factor band, inspection interval, conductivity and periodic test', () => {
    for (const s of SERVICE_CATALOGUE) {
      expect(s.designFactorBands.length).toBeGreaterThan(0);
      for (const band of s.designFactorBands) expect(band.source).toMatch(/^RMA Hose Handbook IP-2 \(2003\)/);
      expect(s.sources.inspectionInterval).toMatch(/common practice/);
      expect(s.sources.conductivity).toMatch(/common practice/);
      expect(s.sources.periodicTest).toMatch(/common practice/);
      expect(s.defaultInspectionIntervalDays).toBeGreaterThan(0);
      if (s.periodicTest) expect(s.periodicTest.intervalDays).toBeGreaterThan(0);
    }
  });

  it('ends every band list with an open-ended band, so any pressure has a factor', () => {
    for (const s of SERVICE_CATALOGUE) expect(s.designFactorBands.at(-1)?.upToKpa).toBeNull();
  });

  it('needs conductive or static-dissipative hose for fuel, dry bulk powders and abrasive blasting (common practice)', () => {
    expect(settingsOf('fuel-oil').conductivityRequired).toBe('conductive');
    expect(settingsOf('dry-bulk').conductivityRequired).not.toBe('none');
    expect(settingsOf('abrasive-blasting').conductivityRequired).not.toBe('none');
    expect(settingsOf('compressed-air').conductivityRequired).toBe('none');
  });

  it('marks suction duties and food contact', () => {
    expect(settingsOf('water-suction-discharge').suctionDuty).toBe(true);
    expect(settingsOf('vacuum-truck-suction').suctionDuty).toBe(true);
    expect(settingsOf('hydraulic-suction-return').suctionDuty).toBe(true);
    expect(settingsOf('water-discharge').suctionDuty).toBe(false);
    expect(settingsOf('food-beverage').foodContactRequired).toBe(true);
    expect(settingsOf('chemical-transfer').foodContactRequired).toBe(false);
  });

  it('periodic pressure test on steam (ARPM IP-2: one minute at 150 % of working pressure; interval common practice)', () => {
    expect(settingsOf('steam').periodicTest?.kind).toBe('pressure');
    expect(serviceByCode('steam')?.sources.periodicTest).toMatch(/150 %/);
  });

  it('gives a site a copy it can change without touching the catalogue', () => {
    const settings = settingsOf('compressed-air');
    settings.designFactorBands[0]!.factor = 99;
    expect(serviceByCode('compressed-air')?.designFactorBands[0]?.factor).toBe(4);
  });
});

describe('designFactorFor — RMA IP-2 (2003) design ratios for newly manufactured hose', () => {
  it('water hose up to 150 psi: 3:1', () => {
    const factor = designFactorFor(settingsOf('water-discharge'), toKpa(100, 'psi'));
    expect(factor?.factor).toBe(3);
    expect(factor?.source).toMatch(/water hose up to 150 psi, 3:1/);
  });

  it('water hose at exactly 150 psi, entered in psi: still 3:1 (the band top is inclusive)', () => {
    expect(WATER_LOW_PRESSURE_LIMIT_KPA).toBeCloseTo(1034.2135939753, 9);
    expect(designFactorFor(settingsOf('water-discharge'), toKpa(150, 'psi'))?.factor).toBe(3);
  });

  it('water hose over 150 psi: 4:1', () => {
    const factor = designFactorFor(settingsOf('water-suction-discharge'), toKpa(151, 'psi'));
    expect(factor?.factor).toBe(4);
    expect(factor?.source).toMatch(/over 150 psi, 4:1/);
  });

  it('compressed air and other gases: 4:1', () => {
    expect(designFactorFor(settingsOf('compressed-air'), 700)?.factor).toBe(4);
  });

  it('other liquids (fuel, chemicals, food, hydraulic return): 4:1', () => {
    for (const code of ['fuel-oil', 'chemical-transfer', 'food-beverage', 'hydraulic-suction-return']) {
      expect(designFactorFor(settingsOf(code), 1000)?.factor, code).toBe(4);
    }
  });

  it('solids suspended in liquids or air (slurry, dry bulk, blasting): 4:1', () => {
    for (const code of ['slurry', 'dry-bulk', 'abrasive-blasting', 'vacuum-truck-suction', 'hot-air-bulk-unloading']) {
      expect(designFactorFor(settingsOf(code), 500)?.factor, code).toBe(4);
    }
  });

  it('liquids that flash to gas (LPG, ammonia): 5:1', () => {
    expect(designFactorFor(settingsOf('liquefied-gas'), 1700)?.factor).toBe(5);
  });

  it('steam: 10:1', () => {
    const factor = designFactorFor(settingsOf('steam'), 800);
    expect(factor?.factor).toBe(10);
    expect(factor?.source).toMatch(/steam, 10:1/);
  });

  it('reads bands in pressure order whatever order a site stored them in', () => {
    const bands = [...settingsOf('water-discharge').designFactorBands].reverse();
    expect(designFactorFor({ designFactorBands: bands }, toKpa(100, 'psi'))?.factor).toBe(3);
  });

  it('has no factor when no band covers the pressure or the pressure is not a number', () => {
    expect(designFactorFor({ designFactorBands: [] }, 500)).toBeNull();
    expect(designFactorFor({ designFactorBands: [{ upToKpa: 100, factor: 3, source: 'site' }] }, 500)).toBeNull();
    expect(designFactorFor(settingsOf('steam'), Number.NaN)).toBeNull();
  });
});

describe('removal reasons', () => {
  it('count failure, damaged and worn at inspection as failures by default (DESIGN: life data)', () => {
    expect(defaultLifeOutcome('failure')).toBe('failure');
    expect(defaultLifeOutcome('damaged')).toBe('failure');
    expect(defaultLifeOutcome('worn-at-inspection')).toBe('failure');
  });

  it('count planned replacement, relocation and obsolescence as suspensions by default', () => {
    expect(defaultLifeOutcome('planned-replacement')).toBe('suspension');
    expect(defaultLifeOutcome('relocated')).toBe('suspension');
    expect(defaultLifeOutcome('obsolete')).toBe('suspension');
  });

  it('define every reason once, with words for people', () => {
    expect(REMOVAL_REASON_DEFINITIONS.map((r) => r.code)).toEqual([...REMOVAL_REASONS]);
    for (const r of REMOVAL_REASON_DEFINITIONS) expect(r.label && r.description).toBeTruthy();
    expect(isRemovalReason('relocated')).toBe(true);
    expect(isRemovalReason('lost')).toBe(false);
  });
});

describe('criticality (common practice)', () => {
  it('defines three levels in one sentence each, marked common practice', () => {
    expect(CRITICALITY_DEFINITIONS.map((c) => c.code)).toEqual([...CRITICALITY_LEVELS]);
    for (const c of CRITICALITY_DEFINITIONS) {
      expect(c.definition).toMatch(/^[^.]+\.$/);
      expect(c.source).toMatch(/^common practice/);
    }
  });

  it('halves the service interval at a high-criticality position, keeps it at medium, stretches it at low', () => {
    expect(inspectionIntervalDays(90, 'high')).toBe(45);
    expect(inspectionIntervalDays(90, 'medium')).toBe(90);
    expect(inspectionIntervalDays(90, 'low')).toBe(135);
  });

  it('never gives an interval shorter than one day', () => {
    expect(inspectionIntervalDays(1, 'high')).toBe(1);
  });
});
