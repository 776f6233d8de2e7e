import { describe, it, expect } from 'vitest';
import {
  addMonths,
  allowablePressure,
  checkAllowablePressure,
  checkBendRadius,
  checkConductivity,
  checkFoodContact,
  checkMediumCompatibility,
  checkProofTest,
  checkServiceLife,
  checkShelfLife,
  checkSizeClass,
  checkTemperatureRange,
  checkVacuumRating,
  defaultProofTestPressureKpa,
  parseDay,
  pressureLimits,
  runSelectionChecks,
  wholeMonthsBetween,
  worstOutcome,
} from '../../shared/src/checks/selection-checks.js';
import type { SelectionCheckInput } from '../../shared/src/checks/types.js';
import { SELECTION_CHECK_CODES } from '../../shared/src/checks/types.js';
import { defaultServiceSettings, serviceByCode } from '../../shared/src/services/service-catalogue.js';
import { CONFIRM_WITH_MAKER } from '../../shared/src/checks/compatibility.js';
import { toKpa, toMm } from '../../shared/src/units/units.js';

const psi = (value: number) => toKpa(value, 'psi');
const bar = (value: number) => toKpa(value, 'bar');
const NOW = new Date('2025-01-01T10:00:00Z');

function serviceSettings(code: string) {
  const service = serviceByCode(code);
  if (!service) throw new Error(`no service ${code}`);
  return defaultServiceSettings(service);
}

/** A 3/4-inch compressed-air assembly that passes every check. */
function passingInput(): SelectionCheckInput {
  return {
    construction: {
      code: 'AIR-19-300',
      tubeCompound: 'NBR',
      reinforcement: 'textile',
      coverCompound: 'CR',
      sizeCode: 'bore-19',
      workingPressureKpa: psi(300),
      burstPressureKpa: psi(1200),
      vacuumRatingKpa: null,
      minTempC: -40,
      maxTempC: 90,
      minBendRadiusMm: 125,
      electrical: 'none',
      foodContactCertified: false,
      serviceLifeMonths: 72,
      shelfLifeMonths: 48,
      storageLifeMonths: 24,
    },
    fittings: { endA: { sizeCode: 'bore-19', ratingKpa: psi(300) }, endB: { sizeCode: '3/4 in', ratingKpa: psi(300) } },
    position: {
      serviceCode: 'compressed-air',
      mediumCode: 'compressed-air-oil-mist',
      maxOperatingPressureKpa: bar(10),
      minTempC: -10,
      maxTempC: 50,
      sizeCode: '19 mm',
      suctionDuty: false,
      routedBendRadiusMm: 200,
    },
    service: serviceSettings('compressed-air'),
    assembly: {
      hoseManufacturedOn: '2023-01-10',
      builtOn: '2023-06-01',
      installedOn: '2023-07-01',
      proofTest: { result: 'pass', heldPressureKpa: psi(600), requiredPressureKpa: null },
    },
  };
}

type Patch = {
  construction?: Partial<SelectionCheckInput['construction']>;
  fittings?: Partial<SelectionCheckInput['fittings']>;
  position?: Partial<SelectionCheckInput['position']>;
  service?: SelectionCheckInput['service'];
  assembly?: Partial<SelectionCheckInput['assembly']>;
};

function inputWith(patch: Patch): SelectionCheckInput {
  const base = passingInput();
  return {
    construction: { ...base.construction, ...patch.construction },
    fittings: { ...base.fittings, ...patch.fittings },
    position: { ...base.position, ...patch.position },
    service: patch.service === undefined ? base.service : patch.service,
    assembly: { ...base.assembly, ...patch.assembly },
  };
}

describe('the passing assembly', () => {
  it('passes every check', () => {
    const summary = runSelectionChecks(passingInput(), { now: NOW });
    for (const r of summary.results) expect(r.outcome, `${r.check}: ${r.sentence}`).toBe('pass');
    expect(summary.outcome).toBe('pass');
    expect(summary.blocksInstall).toBe(false);
    expect(summary.allFailsOverridable).toBe(true);
  });

  it('answers every check once, each with a sentence and a named source', () => {
    const summary = runSelectionChecks(passingInput(), { now: NOW });
    expect(summary.results.map((r) => r.check)).toEqual([...SELECTION_CHECK_CODES]);
    for (const r of summary.results) {
      expect(r.sentence.length).toBeGreaterThan(10);
      expect(r.source.length).toBeGreaterThan(0);
      for (const s of r.source) expect(s.title && s.section).toBeTruthy();
    }
  });
});

describe('allowable pressure (RMA IP-2 design ratios; 29 CFR 1926.302(b)(5); assembly = lower of hose and fittings, common practice)', () => {
  it('passes when the lowest limit covers the position, and names what sets it', () => {
    // 300 psi working, 1200 psi burst ÷ 4 (RMA IP-2: compressed air 4:1) = 300 psi, fittings 300 psi.
    const r = checkAllowablePressure(passingInput());
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('Allowable 20.7 bar (set by the hose working pressure) covers the 10.0 bar this position can see.');
  });

  it('fails when a fitting rates lower than the position can see (assembly = lower of hose and fittings)', () => {
    const r = checkAllowablePressure(inputWith({ fittings: { endB: { sizeCode: 'bore-19', ratingKpa: psi(150) } }, position: { maxOperatingPressureKpa: bar(12) } }));
    expect(r.outcome).toBe('fail');
    // 150 psi = 10.342 bar (1 psi = 6.894 757 kPa)
    expect(r.sentence).toBe('Allowable 10.3 bar is below the 12.0 bar this position can see (set by the end B fitting rating).');
    expect(r.overridable).toBe(false);
  });

  it('fails when burst ÷ design factor is the limit: RMA IP-2 compressed air 4:1', () => {
    // Working 400 psi, burst 1200 psi: 1200 / 4 = 300 psi governs, below a 310 psi position.
    const r = checkAllowablePressure(
      inputWith({ construction: { workingPressureKpa: psi(400) }, fittings: { endA: { sizeCode: 'bore-19', ratingKpa: psi(500) }, endB: { sizeCode: 'bore-19', ratingKpa: psi(500) } }, position: { maxOperatingPressureKpa: psi(310) } }),
      { pressureUnit: 'psi' },
    );
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('Allowable 300 psi is below the 310 psi this position can see (set by the burst pressure ÷ 4).');
  });

  it('RMA IP-2: water hose up to 150 psi at 3:1 passes, over 150 psi at 4:1 fails the same hose', () => {
    const water = {
      construction: { workingPressureKpa: psi(250), burstPressureKpa: psi(600) },
      fittings: { endA: { sizeCode: 'bore-19', ratingKpa: psi(300) }, endB: { sizeCode: 'bore-19', ratingKpa: psi(300) } },
      service: serviceSettings('water-discharge'),
    };
    // 150 psi: 600 / 3 = 200 psi ≥ 150 psi.
    const low = checkAllowablePressure(inputWith({ ...water, position: { maxOperatingPressureKpa: psi(150) } }), { pressureUnit: 'psi' });
    expect(low.outcome).toBe('pass');
    expect(low.sentence).toMatch(/^Allowable 200 psi \(set by the burst pressure ÷ 3\)/);
    // 160 psi: 600 / 4 = 150 psi < 160 psi.
    const high = checkAllowablePressure(inputWith({ ...water, position: { maxOperatingPressureKpa: psi(160) } }), { pressureUnit: 'psi' });
    expect(high.outcome).toBe('fail');
    expect(high.sentence).toBe('Allowable 150 psi is below the 160 psi this position can see (set by the burst pressure ÷ 4).');
  });

  it('RMA IP-2: steam 10:1 — a 2000 kPa burst hose allows 200 kPa', () => {
    const steam = inputWith({
      construction: { workingPressureKpa: 1700, burstPressureKpa: 2000 },
      service: serviceSettings('steam'),
      position: { maxOperatingPressureKpa: 250 },
    });
    expect(checkAllowablePressure(steam, { pressureUnit: 'kPa' }).sentence).toBe(
      'Allowable 200 kPa is below the 250 kPa this position can see (set by the burst pressure ÷ 10).',
    );
  });

  it('does not fail an allowable equal to the position pressure entered in another unit', () => {
    // Hose rated 150 psi; position entered as 10.342135939752541 bar, the same pressure.
    const r = checkAllowablePressure(
      inputWith({
        construction: { workingPressureKpa: psi(150), burstPressureKpa: psi(600) },
        fittings: { endA: { sizeCode: 'bore-19', ratingKpa: psi(150) }, endB: { sizeCode: 'bore-19', ratingKpa: psi(150) } },
        position: { maxOperatingPressureKpa: bar(psi(150) / 100) },
      }),
    );
    expect(r.outcome).toBe('pass');
    const over = checkAllowablePressure(inputWith({ position: { maxOperatingPressureKpa: psi(300) + 0.01 } }));
    expect(over.outcome).toBe('fail');
  });

  it('warns when the position has no maximum operating pressure', () => {
    const r = checkAllowablePressure(inputWith({ position: { maxOperatingPressureKpa: null } }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toMatch(/maximum operating pressure is not recorded/);
  });

  it('warns when a limit is missing, saying which', () => {
    const r = checkAllowablePressure(inputWith({ construction: { burstPressureKpa: null }, fittings: { endB: { sizeCode: 'bore-19', ratingKpa: null } } }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toBe(
      'The hose burst pressure and the end B fitting rating are not recorded, so the allowable pressure is not known; the recorded limits allow 20.7 bar against the 10.0 bar this position can see.',
    );
  });

  it("warns when the service is unknown, so its design factor is too", () => {
    const r = checkAllowablePressure(inputWith({ service: null }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toMatch(/^The service's design factor is not recorded/);
  });

  it('warns when a fitting is not recorded at all', () => {
    expect(checkAllowablePressure(inputWith({ fittings: { endA: null } })).outcome).toBe('warn');
  });

  it('fails on a known low limit even when another limit is missing', () => {
    const r = checkAllowablePressure(inputWith({ construction: { burstPressureKpa: null, workingPressureKpa: bar(8) } }));
    expect(r.outcome).toBe('fail');
  });

  it('works out the lowest limit, or none while one is missing', () => {
    const limits = pressureLimits(passingInput(), bar(10));
    expect(allowablePressure(limits)?.pressureKpa).toBeCloseTo(psi(300), 9);
    expect(allowablePressure(pressureLimits(inputWith({ construction: { burstPressureKpa: null } }), bar(10)))).toBeNull();
  });
});

describe('temperature range', () => {
  it('passes when the position lies inside the hose range', () => {
    expect(checkTemperatureRange(passingInput()).sentence).toBe(
      "The position's -10 °C to 50 °C is inside the hose's rated -40 °C to 90 °C.",
    );
  });

  it('fails when the position runs hotter than the hose is rated, in °F when asked', () => {
    const r = checkTemperatureRange(inputWith({ position: { maxTempC: 100 } }), { temperatureUnit: 'F' });
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The position can reach 212 °F but the hose is rated only to 194 °F.');
  });

  it('fails when the position runs colder than the hose is rated', () => {
    const r = checkTemperatureRange(inputWith({ position: { minTempC: -45 } }));
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toMatch(/can fall to -45 °C/);
  });

  it('passes at the edge of the range', () => {
    expect(checkTemperatureRange(inputWith({ position: { minTempC: -40, maxTempC: 90 } })).outcome).toBe('pass');
  });

  it('warns when a temperature is missing', () => {
    const r = checkTemperatureRange(inputWith({ construction: { maxTempC: null } }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toMatch(/^The hose's highest rated temperature is not recorded/);
  });
});

describe('tube compound against medium', () => {
  it('passes a sourced suitable pairing (common practice, general elastomer properties: NBR oil resistant)', () => {
    const r = checkMediumCompatibility(passingInput());
    expect(r.outcome).toBe('pass');
    expect(r.source[0]?.title).toMatch(/general properties of the elastomer/);
  });

  it('fails a sourced unsuitable pairing (common practice, general elastomer properties: EPDM not for petroleum oils)', () => {
    const r = checkMediumCompatibility(inputWith({ construction: { tubeCompound: 'EPDM' }, position: { mediumCode: 'diesel-fuel' } }));
    expect(r.outcome).toBe('fail');
    expect(r.overridable).toBe(true);
  });

  it('warns on a pairing known only from memory', () => {
    const r = checkMediumCompatibility(inputWith({ construction: { tubeCompound: 'FKM' }, position: { mediumCode: 'diesel-fuel' } }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toContain(CONFIRM_WITH_MAKER);
  });

  it('warns on an unknown medium', () => {
    expect(checkMediumCompatibility(inputWith({ position: { mediumCode: 'molasses' } })).outcome).toBe('warn');
  });

  it('warns when the tube compound or the medium is missing', () => {
    expect(checkMediumCompatibility(inputWith({ construction: { tubeCompound: null } })).sentence).toMatch(/^The tube compound is not recorded/);
    expect(checkMediumCompatibility(inputWith({ position: { mediumCode: '' } })).outcome).toBe('warn');
  });

  it('warns when the position runs hotter than the rating covers', () => {
    const r = checkMediumCompatibility(inputWith({ position: { mediumCode: 'diesel-fuel', maxTempC: 80 } }));
    expect(r.outcome).toBe('warn');
    expect(r.sentence).toMatch(/covers up to 60 °C; this position can reach 80 °C/);
  });
});

describe('vacuum rating for suction duty', () => {
  const suction = (construction: Patch['construction']) =>
    inputWith({ construction, position: { suctionDuty: true }, service: serviceSettings('water-suction-discharge') });

  it('passes a position that is not a suction duty', () => {
    expect(checkVacuumRating(passingInput()).outcome).toBe('pass');
  });

  it('passes a suction duty with a vacuum-rated hose', () => {
    const r = checkVacuumRating(suction({ reinforcement: 'textile-helical-wire', vacuumRatingKpa: 85 }), { pressureUnit: 'kPa' });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('This is a suction duty and the hose is rated for 85.0 kPa of vacuum.');
  });

  it('fails a suction duty on a hose without a vacuum rating or helix', () => {
    const r = checkVacuumRating(suction({ reinforcement: 'textile', vacuumRatingKpa: null }));
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toMatch(/can collapse/);
    expect(checkVacuumRating(suction({ reinforcement: 'textile-helical-wire', vacuumRatingKpa: 0 })).outcome).toBe('fail');
  });

  it('warns on a suction duty when a helix hose has no vacuum rating recorded', () => {
    expect(checkVacuumRating(suction({ reinforcement: 'textile-helical-wire', vacuumRatingKpa: null })).outcome).toBe('warn');
    expect(checkVacuumRating(suction({ reinforcement: null, vacuumRatingKpa: null })).outcome).toBe('warn');
  });

  it("takes the service's default when the position does not say", () => {
    const r = checkVacuumRating(inputWith({ position: { suctionDuty: null }, service: serviceSettings('vacuum-truck-suction') }));
    expect(r.outcome).toBe('fail');
  });

  it('warns when nobody says whether it is a suction duty', () => {
    expect(checkVacuumRating(inputWith({ position: { suctionDuty: null }, service: null })).outcome).toBe('warn');
  });
});

describe('bend radius (ARPM: measured to the innermost surface of the bend)', () => {
  it('passes a routed bend no tighter than the minimum', () => {
    expect(checkBendRadius(passingInput()).outcome).toBe('pass');
  });

  it('passes a routed bend equal to the minimum, entered in inches (5 in = 127 mm, 1 in = 25.4 mm)', () => {
    const r = checkBendRadius(inputWith({ construction: { minBendRadiusMm: 127 }, position: { routedBendRadiusMm: toMm(5, 'in') } }), { lengthUnit: 'in' });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe("The tightest bend, 5.00 in, is no tighter than the hose's 5.00 in minimum bend radius.");
  });

  it('fails a bend tighter than the minimum', () => {
    const r = checkBendRadius(inputWith({ position: { routedBendRadiusMm: 100 } }));
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The hose is routed through a 100 mm bend, tighter than its 125 mm minimum bend radius.');
  });

  it('warns when either radius is missing', () => {
    expect(checkBendRadius(inputWith({ position: { routedBendRadiusMm: null } })).outcome).toBe('warn');
    expect(checkBendRadius(inputWith({ construction: { minBendRadiusMm: null } })).sentence).toMatch(/minimum bend radius is not recorded/);
  });
});

describe('size classes (ISO 1307 and dash numbers: 19 mm, 3/4 in and -12 are one class)', () => {
  it('passes when hose, position and fittings are one class, however written', () => {
    const r = checkSizeClass(inputWith({ fittings: { endA: { sizeCode: '-12', ratingKpa: psi(300) } } }), { lengthUnit: 'in' });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('Hose, position and both fittings are all 3/4 in.');
  });

  it('fails a hose of another class than the position', () => {
    const r = checkSizeClass(inputWith({ position: { sizeCode: 'bore-25' } }), { lengthUnit: 'in' });
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The hose is 3/4 in but the position needs 1 in.');
  });

  it('fails a fitting of another class than the hose', () => {
    const r = checkSizeClass(inputWith({ fittings: { endB: { sizeCode: 'bore-25', ratingKpa: psi(300) } } }));
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The end B fitting is 25 mm but the hose is 19 mm.');
  });

  it('warns on an unknown or missing size', () => {
    expect(checkSizeClass(inputWith({ position: { sizeCode: '7 mm' } })).outcome).toBe('warn');
    expect(checkSizeClass(inputWith({ construction: { sizeCode: null } })).outcome).toBe('warn');
    expect(checkSizeClass(inputWith({ fittings: { endA: null } })).sentence).toMatch(/end A fitting is not recorded/);
  });
});

describe('conductivity (common practice)', () => {
  const fuel = (electrical: SelectionCheckInput['construction']['electrical']) =>
    inputWith({ construction: { electrical }, service: serviceSettings('fuel-oil') });
  const blasting = (electrical: SelectionCheckInput['construction']['electrical']) =>
    inputWith({ construction: { electrical }, service: serviceSettings('abrasive-blasting') });

  it('passes a service that needs no conductive hose', () => {
    expect(checkConductivity(passingInput()).outcome).toBe('pass');
  });

  it('passes conductive hose on fuel and fails static-dissipative or plain hose there', () => {
    expect(checkConductivity(fuel('conductive')).outcome).toBe('pass');
    expect(checkConductivity(fuel('static-dissipative')).outcome).toBe('fail');
    expect(checkConductivity(fuel('none')).sentence).toBe(
      'This service needs conductive hose to drain static charge; this hose is neither conductive nor static-dissipative.',
    );
  });

  it('passes static-dissipative or conductive hose on abrasive blasting and fails plain hose', () => {
    expect(checkConductivity(blasting('static-dissipative')).outcome).toBe('pass');
    expect(checkConductivity(blasting('conductive')).outcome).toBe('pass');
    expect(checkConductivity(blasting('none')).outcome).toBe('fail');
  });

  it("warns when the hose's electrical property or the service is not known", () => {
    expect(checkConductivity(fuel(null)).outcome).toBe('warn');
    expect(checkConductivity(inputWith({ service: null })).outcome).toBe('warn');
  });
});

describe('food contact', () => {
  const food = (foodContactCertified: boolean | null) =>
    inputWith({ construction: { foodContactCertified }, service: serviceSettings('food-beverage') });

  it('passes a service that is not food', () => {
    expect(checkFoodContact(passingInput()).outcome).toBe('pass');
  });

  it('passes certified hose on a food service and fails uncertified hose', () => {
    expect(checkFoodContact(food(true)).outcome).toBe('pass');
    const r = checkFoodContact(food(false));
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('This is a food service and the hose is not certified for food contact.');
  });

  it('warns when certification or the service is not known', () => {
    expect(checkFoodContact(food(null)).outcome).toBe('warn');
    expect(checkFoodContact(inputWith({ service: null })).outcome).toBe('warn');
  });
});

describe('proof test (RMA IP-2: usually 50 % of minimum burst; ISO 8331: each assembly after fitting)', () => {
  it('RMA IP-2: the default proof pressure is half the minimum burst — 1200 psi burst gives 600 psi, twice a 300 psi rating at 4:1', () => {
    expect(defaultProofTestPressureKpa(psi(1200))).toBeCloseTo(psi(600), 9);
    expect(defaultProofTestPressureKpa(4000)).toBe(2000);
  });

  it('passes a passed test held at the default pressure', () => {
    const r = checkProofTest(passingInput(), { pressureUnit: 'psi' });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('Proof test passed at 600 psi (required 600 psi).');
  });

  it('passes against a required pressure the record gives', () => {
    const r = checkProofTest(inputWith({ assembly: { proofTest: { result: 'pass', heldPressureKpa: bar(45), requiredPressureKpa: bar(45) } } }));
    expect(r.outcome).toBe('pass');
  });

  it('fails a test held below the required pressure, and is not overridable', () => {
    const r = checkProofTest(inputWith({ assembly: { proofTest: { result: 'pass', heldPressureKpa: bar(30), requiredPressureKpa: null } } }));
    expect(r.outcome).toBe('fail');
    // required: 1200 psi / 2 = 600 psi = 41.4 bar
    expect(r.sentence).toBe('The proof test held 30.0 bar, below the required 41.4 bar; test it again at the full pressure.');
    expect(r.overridable).toBe(false);
  });

  it('fails a failed test', () => {
    const r = checkProofTest(inputWith({ assembly: { proofTest: { result: 'fail', heldPressureKpa: null, requiredPressureKpa: null } } }));
    expect(r.outcome).toBe('fail');
    expect(r.overridable).toBe(false);
  });

  it('fails, not overridable, when no proof test is recorded (ISO 8331: every assembly is proof-tested)', () => {
    const r = checkProofTest(inputWith({ assembly: { proofTest: null } }));
    expect(r.outcome).toBe('fail');
    expect(r.overridable).toBe(false);
    expect(r.sentence).toMatch(/^No proof test is recorded/);
  });

  it('warns when the held pressure, or anything to compare it with, is missing', () => {
    expect(checkProofTest(inputWith({ assembly: { proofTest: { result: 'pass', heldPressureKpa: null, requiredPressureKpa: 2000 } } })).outcome).toBe('warn');
    expect(
      checkProofTest(inputWith({ construction: { burstPressureKpa: null }, assembly: { proofTest: { result: 'pass', heldPressureKpa: 2000, requiredPressureKpa: null } } })).outcome,
    ).toBe('warn');
  });
});

describe('shelf life (DIN 20066 / DGUV Regel 113-020 guide values: hose ≤ 4 years old when assembled, ≤ 2 years storage)', () => {
  it('passes hose assembled at exactly 48 months old', () => {
    const r = checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: '2020-01-15', builtOn: '2024-01-15', installedOn: '2024-02-01' } }), { now: NOW });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe(
      'The bulk hose was 48 months old when assembled (limit 48 months) and the assembly was stored 0 months (limit 24 months).',
    );
  });

  it('fails hose assembled a day past 48 months old', () => {
    const r = checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: '2020-01-15', builtOn: '2024-01-16', installedOn: '2024-02-01' } }), { now: NOW });
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The bulk hose was 48 months old when assembled; this construction allows 48 months.');
  });

  it('passes an assembly stored exactly 24 months and fails one stored a day longer', () => {
    const at = (installedOn: string) =>
      checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: '2021-06-01', builtOn: '2022-01-01', installedOn } }), { now: NOW });
    expect(at('2024-01-01').outcome).toBe('pass');
    expect(at('2024-01-02').outcome).toBe('fail');
  });

  it('counts storage to now for an assembly still in stock', () => {
    const r = checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: '2022-06-01', builtOn: '2022-07-01', installedOn: null } }), { now: NOW });
    expect(r.outcome).toBe('fail');
    expect(r.sentence).toBe('The assembly has been in stock 30 months; this construction allows 24 months of storage before installation.');
  });

  it('warns when a date is missing or the dates disagree', () => {
    expect(checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: null } }), { now: NOW }).sentence).toMatch(
      /^The hose's manufacture date is not recorded/,
    );
    expect(checkShelfLife(inputWith({ assembly: { builtOn: null } }), { now: NOW }).outcome).toBe('warn');
    expect(checkShelfLife(inputWith({ assembly: { hoseManufacturedOn: '2023-08-01' } }), { now: NOW }).outcome).toBe('warn');
    expect(checkShelfLife(inputWith({ assembly: { builtOn: 'not a date' } }), { now: NOW }).outcome).toBe('warn');
  });

  it('has nothing to exceed when the construction sets no limits, and says so', () => {
    const r = checkShelfLife(inputWith({ construction: { shelfLifeMonths: null, storageLifeMonths: undefined } }), { now: NOW });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('This construction sets no shelf-life or storage limit.');
  });
});

describe('service life (DIN 20066 / DGUV Regel 113-020 guide value: assembly ≤ 6 years including storage)', () => {
  it('passes an assembly exactly 72 months old and says when to replace it', () => {
    const r = checkServiceLife(inputWith({ assembly: { builtOn: '2019-01-01' } }), { now: NOW });
    expect(r.outcome).toBe('pass');
    expect(r.sentence).toBe('The assembly is 72 months old, within the 72-month service life; replace it by 2025-01-01.');
  });

  it('fails an assembly a day past 72 months old', () => {
    const r = checkServiceLife(inputWith({ assembly: { builtOn: '2018-12-31' } }), { now: NOW });
    expect(r.outcome).toBe('fail');
    expect(r.overridable).toBe(true);
  });

  it('warns when the build date is missing or in the future', () => {
    expect(checkServiceLife(inputWith({ assembly: { builtOn: null } }), { now: NOW }).outcome).toBe('warn');
    expect(checkServiceLife(inputWith({ assembly: { builtOn: '2026-01-01' } }), { now: NOW }).outcome).toBe('warn');
  });

  it('has nothing to exceed when the construction sets no service life', () => {
    expect(checkServiceLife(inputWith({ construction: { serviceLifeMonths: undefined } }), { now: NOW }).sentence).toBe(
      'This construction sets no service-life limit.',
    );
  });
});

describe('calendar arithmetic', () => {
  it('reads ISO dates and timestamps as UTC days and refuses impossible dates', () => {
    expect(parseDay('2024-03-15')?.toISOString()).toBe('2024-03-15T00:00:00.000Z');
    expect(parseDay('2024-03-15T23:30:00Z')?.toISOString()).toBe('2024-03-15T00:00:00.000Z');
    expect(parseDay('2024-02-30')).toBeNull();
    expect(parseDay('')).toBeNull();
  });

  it('clamps to the month end (Gregorian calendar: 2024 is a leap year)', () => {
    expect(addMonths(new Date(Date.UTC(2024, 0, 31)), 1).toISOString().slice(0, 10)).toBe('2024-02-29');
    expect(addMonths(new Date(Date.UTC(2023, 0, 31)), 1).toISOString().slice(0, 10)).toBe('2023-02-28');
    expect(addMonths(new Date(Date.UTC(2020, 0, 15)), 48).toISOString().slice(0, 10)).toBe('2024-01-15');
  });

  it('counts whole months', () => {
    expect(wholeMonthsBetween(new Date(Date.UTC(2020, 0, 15)), new Date(Date.UTC(2024, 0, 14)))).toBe(47);
    expect(wholeMonthsBetween(new Date(Date.UTC(2020, 0, 15)), new Date(Date.UTC(2024, 0, 15)))).toBe(48);
  });
});

describe('runSelectionChecks', () => {
  it('blocks install on an overridable fail and says all fails may be overridden', () => {
    const summary = runSelectionChecks(inputWith({ position: { routedBendRadiusMm: 80 } }), { now: NOW });
    expect(summary.outcome).toBe('fail');
    expect(summary.blocksInstall).toBe(true);
    expect(summary.allFailsOverridable).toBe(true);
  });

  it('blocks install on an allowable-pressure fail that may not be overridden', () => {
    const summary = runSelectionChecks(
      inputWith({ position: { maxOperatingPressureKpa: bar(25), routedBendRadiusMm: 80 } }),
      { now: NOW, pressureUnit: 'psi' },
    );
    expect(summary.blocksInstall).toBe(true);
    expect(summary.allFailsOverridable).toBe(false);
    expect(summary.results.find((r) => r.check === 'allowable-pressure')?.sentence).toBe(
      'Allowable 300 psi is below the 363 psi this position can see (set by the hose working pressure).',
    );
  });

  it('blocks install on a failed proof test that may not be overridden', () => {
    const summary = runSelectionChecks(
      inputWith({ assembly: { proofTest: { result: 'fail', heldPressureKpa: null, requiredPressureKpa: null } } }),
      { now: NOW },
    );
    expect(summary.allFailsOverridable).toBe(false);
  });

  it('warns without blocking when only data is missing', () => {
    const summary = runSelectionChecks(inputWith({ construction: { minBendRadiusMm: null } }), { now: NOW });
    expect(summary.outcome).toBe('warn');
    expect(summary.blocksInstall).toBe(false);
  });

  it('never passes a check on missing data: with nothing recorded, every check warns or has no limit to exceed', () => {
    const empty: SelectionCheckInput = {
      construction: {
        code: 'UNKNOWN',
        tubeCompound: null,
        reinforcement: null,
        coverCompound: null,
        sizeCode: null,
        workingPressureKpa: null,
        burstPressureKpa: null,
        vacuumRatingKpa: null,
        minTempC: null,
        maxTempC: null,
        minBendRadiusMm: null,
        electrical: null,
        foodContactCertified: null,
        serviceLifeMonths: 72,
        shelfLifeMonths: 48,
      },
      fittings: { endA: { sizeCode: null, ratingKpa: null }, endB: null },
      position: {
        serviceCode: null,
        mediumCode: null,
        maxOperatingPressureKpa: null,
        minTempC: null,
        maxTempC: null,
        sizeCode: null,
        suctionDuty: null,
        routedBendRadiusMm: null,
      },
      service: null,
      assembly: { hoseManufacturedOn: null, builtOn: null, proofTest: null },
    };
    const summary = runSelectionChecks(empty, { now: NOW });
    // A missing proof test is the one gap that fails: it blocks until the assembly is tested.
    for (const r of summary.results) expect(r.outcome, r.check).toBe(r.check === 'proof-test' ? 'fail' : 'warn');
    expect(summary.outcome).toBe('fail');
    expect(summary.blocksInstall).toBe(true);
    expect(summary.allFailsOverridable).toBe(false);
  });

  it('takes the worst outcome', () => {
    expect(worstOutcome([])).toBe('pass');
    expect(worstOutcome(['pass', 'warn'])).toBe('warn');
    expect(worstOutcome(['warn', 'fail', 'pass'])).toBe('fail');
  });
});
