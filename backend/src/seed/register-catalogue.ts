import type { ElectricalProperty, Reinforcement } from '../../../shared/src/checks/types.js';
import type { TubeCompound } from '../../../shared/src/checks/compatibility.js';
import type { FittingStyle } from '../../../shared/src/schemas/register.schema.js';

// The hose builds and end fittings Kestrel Ridge buys, under the plant's own codes. Pressures kPa,
// lengths mm, temperatures °C, prices in pounds. Makers are left blank: the stores item number is
// how the plant reorders.

/** One construction as the `constructions` table holds it. */
export interface ConstructionRow {
  code: string;
  name: string;
  tubeCompound: TubeCompound;
  reinforcement: Reinforcement;
  coverCompound: string;
  sizeCode: string;
  workingPressureKpa: number;
  burstPressureKpa: number;
  vacuumRatingKpa: number | null;
  minTempC: number;
  maxTempC: number;
  minBendRadiusMm: number;
  weightKgPerM: number;
  electrical: ElectricalProperty | null;
  foodContactCertified: boolean;
  maker: string | null;
  partNumber: string | null;
  serviceLifeMonths: number | null;
  shelfLifeMonths: number | null;
  storageLifeMonths: number | null;
  notes: string | null;
}

/** DIN 20066 guide values for hydraulic hose, in months: 6 years in all, at most 2 of them in storage; bulk hose at most 4 years old when assembled. */
const HYDRAULIC_LIFE = { serviceLifeMonths: 72, shelfLifeMonths: 48, storageLifeMonths: 24 } as const;
const HYDRAULIC_NOTE =
  'Life limits are the DIN 20066 guide values: 6 years from assembly including at most 2 years in store; bulk hose no older than 4 years when assembled.';
const NO_LIFE = { serviceLifeMonths: null, shelfLifeMonths: null, storageLifeMonths: null } as const;

function construction(row: Omit<ConstructionRow, 'maker' | 'serviceLifeMonths' | 'shelfLifeMonths' | 'storageLifeMonths' | 'notes' | 'foodContactCertified'> & Partial<ConstructionRow>): ConstructionRow {
  return { maker: null, foodContactCertified: false, notes: null, ...NO_LIFE, ...row };
}

export const CONSTRUCTIONS: readonly ConstructionRow[] = [
  construction({
    code: 'AIR-19-TX', name: 'Air hose 19 mm, NBR tube, textile plies, CR cover', tubeCompound: 'NBR', reinforcement: 'textile', coverCompound: 'CR',
    sizeCode: 'bore-19', workingPressureKpa: 2000, burstPressureKpa: 8000, vacuumRatingKpa: null, minTempC: -30, maxTempC: 80,
    minBendRadiusMm: 150, weightKgPerM: 0.46, electrical: 'none', partNumber: 'stores item 40117',
  }),
  construction({
    code: 'AIR-25-TX', name: 'Air hose 25 mm, NBR tube, textile plies, CR cover', tubeCompound: 'NBR', reinforcement: 'textile', coverCompound: 'CR',
    sizeCode: 'bore-25', workingPressureKpa: 2000, burstPressureKpa: 8000, vacuumRatingKpa: null, minTempC: -30, maxTempC: 80,
    minBendRadiusMm: 200, weightKgPerM: 0.64, electrical: 'none', partNumber: 'stores item 40118',
  }),
  construction({
    code: 'WSD-102-HW', name: 'Water suction and discharge 102 mm, SBR tube, textile with helical wire', tubeCompound: 'SBR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-102', workingPressureKpa: 1000, burstPressureKpa: 3000, vacuumRatingKpa: 80, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 600, weightKgPerM: 4.3, electrical: 'none', partNumber: 'stores item 40231',
  }),
  construction({
    code: 'WSD-152-HW', name: 'Water suction and discharge 152 mm, SBR tube, textile with helical wire', tubeCompound: 'SBR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-152', workingPressureKpa: 1000, burstPressureKpa: 3000, vacuumRatingKpa: 80, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 900, weightKgPerM: 7.9, electrical: 'none', partNumber: 'stores item 40232',
  }),
  construction({
    code: 'WDH-25-TX', name: 'Water delivery 25 mm, EPDM tube, textile plies, EPDM cover', tubeCompound: 'EPDM', reinforcement: 'textile', coverCompound: 'EPDM',
    sizeCode: 'bore-25', workingPressureKpa: 1500, burstPressureKpa: 6000, vacuumRatingKpa: null, minTempC: -40, maxTempC: 100,
    minBendRadiusMm: 150, weightKgPerM: 0.55, electrical: 'none', partNumber: 'stores item 40240',
  }),
  construction({
    code: 'FUL-25-CD', name: 'Fuel delivery and suction 25 mm, NBR tube, textile with helical wire, static wire', tubeCompound: 'NBR', reinforcement: 'textile-helical-wire', coverCompound: 'CR',
    sizeCode: 'bore-25', workingPressureKpa: 1000, burstPressureKpa: 4000, vacuumRatingKpa: 80, minTempC: -30, maxTempC: 80,
    minBendRadiusMm: 125, weightKgPerM: 0.72, electrical: 'conductive', partNumber: 'stores item 40310',
  }),
  construction({
    code: 'OIL-25-GP', name: 'General oil delivery 25 mm, NBR tube, textile plies', tubeCompound: 'NBR', reinforcement: 'textile', coverCompound: 'NBR/PVC',
    sizeCode: 'bore-25', workingPressureKpa: 1500, burstPressureKpa: 6000, vacuumRatingKpa: null, minTempC: -20, maxTempC: 80,
    minBendRadiusMm: 150, weightKgPerM: 0.5, electrical: null, partNumber: 'stores item 40314',
    notes: "Bought for the lube reels. The supplier's sheet gives no electrical property.",
  }),
  construction({
    code: 'CHM-25-XL', name: 'Chemical transfer 25 mm, XLPE tube, textile with helical wire, EPDM cover', tubeCompound: 'XLPE', reinforcement: 'textile-helical-wire', coverCompound: 'EPDM',
    sizeCode: 'bore-25', workingPressureKpa: 1000, burstPressureKpa: 4000, vacuumRatingKpa: 90, minTempC: -30, maxTempC: 90,
    minBendRadiusMm: 150, weightKgPerM: 0.85, electrical: 'none', partNumber: 'stores item 40420',
  }),
  construction({
    code: 'LPG-12-CD', name: 'LPG hose 12.5 mm, NBR tube, textile plies, CR cover, conductive', tubeCompound: 'NBR', reinforcement: 'textile', coverCompound: 'CR',
    sizeCode: 'bore-12.5', workingPressureKpa: 2500, burstPressureKpa: 12500, vacuumRatingKpa: null, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 100, weightKgPerM: 0.32, electrical: 'conductive', partNumber: 'stores item 40450',
  }),
  construction({
    code: 'DRY-102-SD', name: 'Dry bulk 102 mm, NR tube, textile with helical wire, static-dissipative', tubeCompound: 'NR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-102', workingPressureKpa: 600, burstPressureKpa: 2400, vacuumRatingKpa: 50, minTempC: -30, maxTempC: 80,
    minBendRadiusMm: 500, weightKgPerM: 4.1, electrical: 'static-dissipative', partNumber: 'stores item 40510',
  }),
  construction({
    code: 'HOT-76-SD', name: 'Hot air tanker blower hose 76 mm, EPDM tube, textile with helical wire, static-dissipative', tubeCompound: 'EPDM', reinforcement: 'textile-helical-wire', coverCompound: 'EPDM',
    sizeCode: 'bore-76', workingPressureKpa: 700, burstPressureKpa: 2800, vacuumRatingKpa: null, minTempC: -40, maxTempC: 180,
    minBendRadiusMm: 380, weightKgPerM: 2.6, electrical: 'static-dissipative', partNumber: 'stores item 40520',
  }),
  construction({
    code: 'SLR-102-NR', name: 'Slurry discharge 102 mm, NR tube, textile with helical wire', tubeCompound: 'NR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-102', workingPressureKpa: 1600, burstPressureKpa: 6400, vacuumRatingKpa: null, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 800, weightKgPerM: 6.8, electrical: 'none', partNumber: 'stores item 40610',
  }),
  construction({
    code: 'SLR-152-NR', name: 'Slurry discharge 152 mm, NR tube, textile with helical wire', tubeCompound: 'NR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-152', workingPressureKpa: 1600, burstPressureKpa: 6400, vacuumRatingKpa: null, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 1200, weightKgPerM: 12.4, electrical: 'none', partNumber: 'stores item 40611',
  }),
  construction({
    code: 'BLS-32-SD', name: 'Blast hose 32 mm, NR tube, textile plies, static-dissipative', tubeCompound: 'NR', reinforcement: 'textile', coverCompound: 'SBR',
    sizeCode: 'bore-31.5', workingPressureKpa: 1200, burstPressureKpa: 4800, vacuumRatingKpa: null, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 250, weightKgPerM: 1.2, electrical: 'static-dissipative', partNumber: 'stores item 40710',
  }),
  construction({
    code: 'VAC-102-HW', name: 'Vacuum truck suction 102 mm, NR tube, textile with rigid helix', tubeCompound: 'NR', reinforcement: 'textile-helical-wire', coverCompound: 'SBR',
    sizeCode: 'bore-102', workingPressureKpa: 700, burstPressureKpa: 2800, vacuumRatingKpa: 95, minTempC: -30, maxTempC: 70,
    minBendRadiusMm: 450, weightKgPerM: 3.6, electrical: 'none', partNumber: 'stores item 40720',
  }),
  construction({
    code: 'HYD-25-SR', name: 'Hydraulic suction and return 25 mm, NBR tube, textile with helical wire', tubeCompound: 'NBR', reinforcement: 'textile-helical-wire', coverCompound: 'CR',
    sizeCode: 'bore-25', workingPressureKpa: 1400, burstPressureKpa: 5600, vacuumRatingKpa: 85, minTempC: -40, maxTempC: 100,
    minBendRadiusMm: 125, weightKgPerM: 0.78, electrical: 'none', partNumber: 'stores item 40810', ...HYDRAULIC_LIFE, notes: HYDRAULIC_NOTE,
  }),
  construction({
    code: 'HYD-51-SR', name: 'Hydraulic suction and return 51 mm, NBR tube, textile with helical wire', tubeCompound: 'NBR', reinforcement: 'textile-helical-wire', coverCompound: 'CR',
    sizeCode: 'bore-51', workingPressureKpa: 700, burstPressureKpa: 2800, vacuumRatingKpa: 85, minTempC: -40, maxTempC: 100,
    minBendRadiusMm: 250, weightKgPerM: 1.9, electrical: 'none', partNumber: 'stores item 40811', ...HYDRAULIC_LIFE, notes: HYDRAULIC_NOTE,
  }),
  construction({
    code: 'FDB-25-FC', name: 'Food delivery and suction 25 mm, white NBR tube, textile with helical wire', tubeCompound: 'NBR', reinforcement: 'textile-helical-wire', coverCompound: 'NBR',
    sizeCode: 'bore-25', workingPressureKpa: 1000, burstPressureKpa: 4000, vacuumRatingKpa: 90, minTempC: -30, maxTempC: 90,
    minBendRadiusMm: 100, weightKgPerM: 0.7, electrical: 'none', foodContactCertified: true, partNumber: 'stores item 40910',
  }),
  construction({
    code: 'STM-19-EP', name: 'Saturated steam 19 mm, EPDM tube, two steel wire braids, EPDM cover', tubeCompound: 'EPDM', reinforcement: 'steel-wire-braid', coverCompound: 'EPDM',
    sizeCode: 'bore-19', workingPressureKpa: 1800, burstPressureKpa: 18000, vacuumRatingKpa: null, minTempC: -40, maxTempC: 210,
    minBendRadiusMm: 190, weightKgPerM: 0.95, electrical: 'none', partNumber: 'stores item 40950',
  }),
];

/** Bulk hose price per metre, pounds. */
export const HOSE_PRICE_PER_M: Readonly<Record<string, number>> = {
  'AIR-19-TX': 9.5, 'AIR-25-TX': 13, 'WSD-102-HW': 68, 'WSD-152-HW': 118, 'WDH-25-TX': 8.5, 'FUL-25-CD': 22, 'OIL-25-GP': 14, 'CHM-25-XL': 46, 'LPG-12-CD': 12,
  'DRY-102-SD': 75, 'HOT-76-SD': 88, 'SLR-102-NR': 140, 'SLR-152-NR': 260, 'BLS-32-SD': 24, 'VAC-102-HW': 95, 'HYD-25-SR': 28, 'HYD-51-SR': 55, 'FDB-25-FC': 38, 'STM-19-EP': 42,
};

/** One size of a fitting type: rating kPa, crimp diameter and tolerance mm, and what the plan needs besides (price, hose length taken by the fitting). */
export interface FittingSizeSpec {
  sizeCode: string;
  ratingKpa: number;
  crimpDiameterMm: number | null;
  crimpToleranceMm: number | null;
  /** Pounds per end. */
  price: number;
  /** Length of the assembly taken by the fitting beyond the cut hose, mm. */
  allowanceMm: number;
}

export interface FittingTypeSpec {
  code: string;
  name: string;
  style: FittingStyle;
  material: string;
  notes: string | null;
  sizes: readonly FittingSizeSpec[];
}

const size = (sizeCode: string, ratingKpa: number, price: number, allowanceMm: number, crimp: [number, number] | null = null): FittingSizeSpec => ({
  sizeCode,
  ratingKpa,
  crimpDiameterMm: crimp?.[0] ?? null,
  crimpToleranceMm: crimp?.[1] ?? null,
  price,
  allowanceMm,
});

export const FITTING_TYPES: readonly FittingTypeSpec[] = [
  {
    code: 'CRP-ST', name: 'Crimped stem and ferrule, male BSP', style: 'crimped', material: 'Zinc-plated carbon steel',
    notes: 'Crimp to the diameter given for the size; measure across the flats after crimping.',
    sizes: [size('bore-12.5', 3500, 9, 45, [23.4, 0.2]), size('bore-19', 2500, 11, 55, [31.2, 0.2]), size('bore-25', 2500, 14, 65, [38.9, 0.25]), size('bore-51', 1600, 32, 95, [67.8, 0.3])],
  },
  {
    code: 'CRP-STM', name: 'Crimped steam stem with interlocking ferrule, male BSP', style: 'crimped', material: 'Stainless steel 316',
    notes: 'Steam service only. Re-tighten after the first heat-up.',
    sizes: [size('bore-19', 1800, 38, 70, [33.5, 0.15])],
  },
  {
    code: 'CLW-DI', name: 'Claw coupling with locking pin holes, hose tail and band clamp', style: 'claw', material: 'Zinc-plated ductile iron',
    notes: 'Fit a locking pin or clip at every claw joint, and a whip restraint across it.',
    sizes: [size('bore-19', 1000, 16, 60), size('bore-25', 1000, 19, 70)],
  },
  {
    code: 'CAM-AL', name: 'Cam-and-groove, hose tail with band clamps', style: 'cam-groove', material: 'Cast aluminium',
    notes: null,
    sizes: [size('bore-25', 1700, 18, 75), size('bore-102', 1000, 52, 140)],
  },
  {
    code: 'CAM-SS', name: 'Cam-and-groove, hose tail with crimped ferrule', style: 'cam-groove', material: 'Stainless steel 316',
    notes: 'For acids, alkalis and hypochlorite; PTFE gaskets.',
    sizes: [size('bore-25', 1700, 48, 75)],
  },
  {
    code: 'FLG-16', name: 'Rotating flange PN16, built-in hose end', style: 'flanged', material: 'Galvanised steel flange on a steel nipple',
    notes: null,
    sizes: [size('bore-102', 1600, 120, 160), size('bore-152', 1600, 185, 190)],
  },
  {
    code: 'SAN-CL', name: 'Sanitary clamp ferrule, crimped', style: 'sanitary-clamp', material: 'Stainless steel 316L, polished',
    notes: 'Food hose only. Gaskets in white EPDM.',
    sizes: [size('bore-25', 1000, 36, 60)],
  },
  {
    code: 'BND-SS', name: 'Banded hose tail with two bands', style: 'banded', material: 'Stainless steel tail and bands',
    notes: 'Band with the bonding wire of the hose carried onto the tail.',
    sizes: [size('bore-76', 1000, 44, 120), size('bore-102', 1000, 58, 140)],
  },
  {
    code: 'BLC-TH', name: 'Blast hose coupling, screw-on', style: 'threaded', material: 'Aluminium body, nitrile gasket',
    notes: 'Screwed onto the hose cover; pin with two screws and fit a safety cable across each joint.',
    sizes: [size('bore-31.5', 1200, 26, 50)],
  },
];

export function constructionByCode(code: string): ConstructionRow {
  const found = CONSTRUCTIONS.find((c) => c.code === code);
  if (!found) throw new Error(`No construction ${code} in the demo catalogue`);
  return found;
}

export function fittingSize(fittingCode: string, sizeCode: string): FittingSizeSpec {
  const fitting = FITTING_TYPES.find((f) => f.code === fittingCode);
  const found = fitting?.sizes.find((s) => s.sizeCode === sizeCode);
  if (!found) throw new Error(`Fitting ${fittingCode} does not come in ${sizeCode}`);
  return found;
}
