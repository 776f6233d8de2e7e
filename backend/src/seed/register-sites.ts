import type { Criticality } from '../../../shared/src/services/criticality.js';

// The two sites of the demo as their maintenance planners laid them out: areas, equipment under
// the plant's own asset numbers, and the hose positions on it with their design conditions as
// ranges (the plan draws the recorded values). Pressures kPa, temperatures °C, lengths m.

export interface PositionTemplate {
  /** Suffix of the position code after the asset number, e.g. "AIR" in "CWM-DR-03/AIR". */
  key: string;
  name: string;
  service: string;
  medium: string | null;
  construction: string;
  ends: readonly [string, string];
  connections: readonly [string, string];
  mopKpa: readonly [number, number];
  tempC: readonly [number, number];
  lengthM: readonly [number, number];
  /** Explicit suction duty; left out, the service's default applies. */
  suction?: boolean;
  criticality: Criticality;
  /** The tightest routed bend, mm, when it is fixed by the layout; 'unsurveyed' leaves it unrecorded. */
  bendMm?: number | 'unsurveyed';
  inspectionIntervalDays?: number;
  notes?: string;
}

export interface EquipmentTemplate {
  assetNumber: string;
  name: string;
  area: string;
  /** Hour meter at the anchor and the hours it runs on an ordinary day; absent when the machine has no meter. */
  meter?: { hours: number; perDay: number };
  /** Days before the anchor the equipment was first run, for equipment without a meter that is newer than the records. */
  commissionedDaysAgo?: number;
  positions: readonly PositionTemplate[];
}

export interface SiteTemplate {
  code: string;
  areas: ReadonlyArray<{ code: string; name: string }>;
  equipment: readonly EquipmentTemplate[];
}

type Options = Partial<PositionTemplate>;

const OUTDOOR: readonly [number, number] = [-15, 40];
const UNDERGROUND: readonly [number, number] = [5, 25];

function air(key: string, name: string, size: 19 | 25, claw: boolean, o: Options = {}): PositionTemplate {
  const bore = size === 19 ? '3/4 in' : '1 in';
  return {
    key, name, service: 'compressed-air', medium: 'compressed-air-oil-mist', construction: size === 19 ? 'AIR-19-TX' : 'AIR-25-TX',
    ends: claw ? ['CLW-DI', 'CLW-DI'] : ['CRP-ST', 'CRP-ST'],
    connections: claw ? [`${bore} claw coupling`, `${bore} claw coupling`] : [`${bore} BSP male`, `${bore} BSP male`],
    mopKpa: [700, 900], tempC: OUTDOOR, lengthM: [10, 20], suction: false, criticality: 'high', ...o,
  };
}

function hydraulic(key: string, name: string, suction: boolean, o: Options = {}): PositionTemplate {
  return suction
    ? {
        key, name, service: 'hydraulic-suction-return', medium: 'hydraulic-oil-mineral', construction: 'HYD-51-SR', ends: ['CRP-ST', 'CRP-ST'],
        connections: ['2 in BSP male', '2 in SAE flange adaptor'], mopKpa: [100, 200], tempC: [-10, 80], lengthM: [1, 2.5], suction: true, criticality: 'medium', ...o,
      }
    : {
        key, name, service: 'hydraulic-suction-return', medium: 'hydraulic-oil-mineral', construction: 'HYD-25-SR', ends: ['CRP-ST', 'CRP-ST'],
        connections: ['1 in BSP male', '1 in BSP male'], mopKpa: [500, 1000], tempC: [-10, 80], lengthM: [1.5, 4], suction: false, criticality: 'medium', ...o,
      };
}

function water(key: string, name: string, claw: boolean, o: Options = {}): PositionTemplate {
  return {
    key, name, service: 'water-discharge', medium: 'water', construction: 'WDH-25-TX', ends: claw ? ['CLW-DI', 'CLW-DI'] : ['CRP-ST', 'CRP-ST'],
    connections: claw ? ['1 in claw coupling', '1 in claw coupling'] : ['1 in BSP male', '1 in BSP male'],
    mopKpa: [400, 700], tempC: [0, 30], lengthM: [3, 8], criticality: 'low', ...o,
  };
}

function dewatering(key: string, name: string, bore: 102 | 152, suction: boolean, o: Options = {}): PositionTemplate {
  const flange = bore === 152 ? 'DN150 PN16 flange' : 'DN100 PN16 flange';
  return {
    key, name, service: 'water-suction-discharge', medium: 'water', construction: bore === 152 ? 'WSD-152-HW' : 'WSD-102-HW',
    ends: bore === 152 ? ['FLG-16', 'FLG-16'] : ['CAM-AL', 'CAM-AL'],
    connections: bore === 152 ? [flange, flange] : ['4 in cam-and-groove', '4 in cam-and-groove'],
    mopKpa: suction ? [100, 150] : [400, 700], tempC: [2, 30], lengthM: suction ? [5, 8] : [10, 20], suction, criticality: suction ? 'medium' : 'high', ...o,
  };
}

function slurry(key: string, name: string, bore: 102 | 152, o: Options = {}): PositionTemplate {
  const flange = bore === 152 ? 'DN150 PN16 flange' : 'DN100 PN16 flange';
  return {
    key, name, service: 'slurry', medium: 'limestone-slurry', construction: bore === 152 ? 'SLR-152-NR' : 'SLR-102-NR', ends: ['FLG-16', 'FLG-16'],
    connections: [flange, flange], mopKpa: [1000, 1400], tempC: [2, 40], lengthM: [3, 6], suction: false, criticality: 'high', ...o,
  };
}

function chemical(key: string, name: string, medium: string | null, o: Options = {}): PositionTemplate {
  return {
    key, name, service: 'chemical-transfer', medium, construction: 'CHM-25-XL', ends: ['CAM-SS', 'CAM-SS'], connections: ['1 in cam-and-groove', '1 in cam-and-groove'],
    mopKpa: [300, 600], tempC: [5, 25], lengthM: [3, 8], suction: false, criticality: 'high', ...o,
  };
}

function fuel(key: string, name: string, o: Options = {}): PositionTemplate {
  return {
    key, name, service: 'fuel-oil', medium: 'diesel-fuel', construction: 'FUL-25-CD', ends: ['CRP-ST', 'CRP-ST'], connections: ['1 in BSP male', '1 in BSP male'],
    mopKpa: [250, 400], tempC: [-15, 35], lengthM: [4, 6], suction: false, criticality: 'high', ...o,
  };
}

function lpg(key: string, name: string, o: Options = {}): PositionTemplate {
  return {
    key, name, service: 'liquefied-gas', medium: null, construction: 'LPG-12-CD', ends: ['CRP-ST', 'CRP-ST'], connections: ['1/2 in BSP male', '1/2 in BSP male'],
    mopKpa: [1000, 1500], tempC: [-10, 35], lengthM: [1, 2], suction: false, criticality: 'high',
    notes: 'Propane. Liquefied gas is not in the compatibility table: the tube is taken on the supplier’s word.', ...o,
  };
}

function tankerUnloading(key: string, material: string, medium: string | null, o: Options = {}): PositionTemplate[] {
  return [
    {
      key: `${key}-BLOWER`, name: `Tanker blower air to ${material} tanker`, service: 'hot-air-bulk-unloading', medium: 'compressed-air-oil-free', construction: 'HOT-76-SD',
      ends: ['BND-SS', 'BND-SS'], connections: ['3 in banded tail to blower outlet', '3 in banded tail to tanker air inlet'], mopKpa: [150, 250], tempC: [-10, 140],
      lengthM: [5, 7], suction: false, criticality: 'medium',
    },
    {
      key: `${key}-FILL`, name: `${material[0]!.toUpperCase()}${material.slice(1)} from tanker to silo fill pipe`, service: 'dry-bulk', medium, construction: 'DRY-102-SD',
      ends: ['CAM-AL', 'BND-SS'], connections: ['4 in cam-and-groove to tanker outlet', '4 in banded tail on silo fill pipe'], mopKpa: [150, 250], tempC: [-10, 65],
      lengthM: [5, 7], suction: false, criticality: 'medium', ...o,
    },
  ];
}

export const SITE_TEMPLATES: readonly SiteTemplate[] = [
  {
    code: 'BFQ',
    areas: [
      { code: 'PCR', name: 'Primary crushing' },
      { code: 'SCR', name: 'Secondary and tertiary crushing' },
      { code: 'WSH', name: 'Wash plant' },
      { code: 'DNB', name: 'Drill and blast' },
      { code: 'FUE', name: 'Fuel bay' },
      { code: 'BLK', name: 'Bulk loadout' },
      { code: 'SMP', name: 'Pit dewatering sump' },
      { code: 'WKS', name: 'Maintenance workshop and blast booth' },
      { code: 'CAN', name: 'Canteen' },
    ],
    equipment: [
      {
        assetNumber: 'BFQ-CR-01', name: 'Primary jaw crusher', area: 'PCR', meter: { hours: 31200, perDay: 11 },
        positions: [
          hydraulic('HYD-RET', 'Setting cylinder return to tank', false),
          hydraulic('HYD-SUC', 'Power pack pump suction', true),
          hydraulic('LUBE-RET', 'Bearing lube oil return', false, { mopKpa: [300, 500] }),
          water('DUST', 'Dust suppression sprays at the feed hopper', false, { tempC: [0, 30] }),
        ],
      },
      {
        assetNumber: 'BFQ-RB-01', name: 'Pedestal rock breaker at the primary', area: 'PCR', meter: { hours: 14800, perDay: 6 },
        positions: [hydraulic('HYD-RET', 'Breaker return line', false), hydraulic('HYD-SUC', 'Power pack pump suction', true)],
      },
      {
        assetNumber: 'BFQ-FD-01', name: 'Apron feeder', area: 'PCR',
        positions: [hydraulic('HYD-RET', 'Drive motor case drain', false, { mopKpa: [300, 500] })],
      },
      {
        assetNumber: 'BFQ-CP-01', name: 'Plant air compressor', area: 'PCR', meter: { hours: 42100, perDay: 16 },
        positions: [air('DISCH', 'Compressor discharge to air receiver', 25, false, { mopKpa: [850, 950], tempC: [-10, 70], lengthM: [2, 3] })],
      },
      {
        assetNumber: 'BFQ-CR-02', name: 'Secondary cone crusher', area: 'SCR', meter: { hours: 27400, perDay: 12 },
        positions: [
          hydraulic('HYD-RET', 'Tramp release return to tank', false),
          hydraulic('HYD-SUC', 'Power pack pump suction', true),
          water('DUST', 'Dust suppression sprays at the discharge chute', false),
        ],
      },
      {
        assetNumber: 'BFQ-CR-03', name: 'Tertiary cone crusher', area: 'SCR', meter: { hours: 19600, perDay: 12 },
        positions: [
          hydraulic('HYD-RET', 'Tramp release return to tank', false),
          hydraulic('HYD-SUC', 'Power pack pump suction', true),
          water('DUST', 'Dust suppression sprays at the discharge chute', false),
        ],
      },
      {
        assetNumber: 'BFQ-SC-01', name: 'Double-deck rinsing screen', area: 'SCR',
        positions: [water('SPRAY-1', 'Top deck spray bar feed', false, { lengthM: [4, 6] }), water('SPRAY-2', 'Bottom deck spray bar feed', false, { lengthM: [4, 6] })],
      },
      {
        assetNumber: 'BFQ-SC-02', name: 'Triple-deck sizing screen', area: 'SCR',
        positions: [water('SPRAY-1', 'Top deck spray bar feed', false, { lengthM: [4, 6] }), water('SPRAY-2', 'Middle deck spray bar feed', false, { lengthM: [4, 6] })],
      },
      {
        assetNumber: 'BFQ-CV-01', name: 'Stockpile conveyor belt cleaners', area: 'SCR',
        positions: [
          air('AIR-1', 'Air knife at the head pulley', 19, false, { mopKpa: [600, 700], lengthM: [6, 10], criticality: 'low' }),
          air('AIR-2', 'Air knife at the tail pulley', 19, false, { mopKpa: [600, 700], lengthM: [6, 10], criticality: 'low' }),
        ],
      },
      {
        assetNumber: 'BFQ-SP-01', name: 'Wash plant slurry pump 1', area: 'WSH', meter: { hours: 23800, perDay: 14 },
        positions: [slurry('DISCH', 'Pump discharge to cyclone feed main', 152), water('GLAND', 'Gland seal water', false, { criticality: 'medium', lengthM: [2, 3] })],
      },
      {
        assetNumber: 'BFQ-SP-02', name: 'Wash plant slurry pump 2', area: 'WSH', meter: { hours: 19300, perDay: 14 },
        positions: [slurry('DISCH', 'Pump discharge to cyclone feed main', 152), water('GLAND', 'Gland seal water', false, { criticality: 'medium', lengthM: [2, 3] })],
      },
      {
        assetNumber: 'BFQ-SP-03', name: 'Fines recovery slurry pump', area: 'WSH', meter: { hours: 14600, perDay: 10 },
        positions: [slurry('DISCH', 'Pump discharge to fines cyclone', 102), water('GLAND', 'Gland seal water', false, { criticality: 'medium', lengthM: [2, 3] })],
      },
      {
        assetNumber: 'BFQ-CY-01', name: 'Sand cyclone cluster', area: 'WSH',
        positions: [
          slurry('FEED-1', 'Cyclone 1 feed', 102, { lengthM: [2, 4] }),
          slurry('FEED-2', 'Cyclone 2 feed', 102, { lengthM: [2, 4] }),
          slurry('UFLOW', 'Underflow to the dewatering screen', 102, { mopKpa: [300, 500], criticality: 'medium', lengthM: [2, 4] }),
        ],
      },
      {
        assetNumber: 'BFQ-TH-01', name: 'Water recovery thickener', area: 'WSH',
        positions: [
          slurry('UFLOW', 'Underflow pump discharge to the filter press', 102),
          chemical('FLOC-1', 'Flocculant dosing to feed well, line 1', null, { criticality: 'medium', notes: 'Polyacrylamide flocculant solution, about 0.1 %. Not in the compatibility table.' }),
          chemical('FLOC-2', 'Flocculant dosing to feed well, line 2', null, { criticality: 'medium', notes: 'Polyacrylamide flocculant solution, about 0.1 %. Not in the compatibility table.' }),
        ],
      },
      {
        assetNumber: 'BFQ-AD-01', name: 'Wash water pH correction skid', area: 'WSH',
        positions: [
          chemical('ACID', 'Sulfuric acid dosing from the IBC to the dosing pump', 'sulfuric-acid-up-to-10'),
          chemical('CAUSTIC', 'Caustic soda dosing from the IBC to the dosing pump', 'sodium-hydroxide-up-to-20'),
        ],
      },
      {
        assetNumber: 'BFQ-WT-01', name: 'Site drinking water treatment', area: 'WSH',
        positions: [chemical('HYPO', 'Hypochlorite dosing to the storage tank', 'sodium-hypochlorite-up-to-15', { mopKpa: [200, 400] })],
      },
      {
        assetNumber: 'BFQ-FP-01', name: 'Filter press', area: 'WSH', meter: { hours: 13900, perDay: 9 },
        positions: [
          slurry('FEED', 'Press feed from the underflow pump', 102, { mopKpa: [1200, 1500] }),
          water('WASH', 'Cloth wash water', false, { mopKpa: [800, 1000], criticality: 'medium' }),
          air('AIR-BLOW', 'Cake blow air', 25, false, { mopKpa: [700, 800], lengthM: [3, 5], tempC: [0, 35] }),
        ],
      },
      {
        assetNumber: 'BFQ-WS-01', name: 'Log washer', area: 'WSH',
        positions: [water('SPRAY', 'Feed box spray water', false, { lengthM: [3, 5] })],
      },
      ...(['01', '02', '03'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `BFQ-DR-${n}`, name: `Top-hammer crawler drill rig ${i + 1}`, area: 'DNB', meter: { hours: [13800, 16600, 11900][i]!, perDay: 9 },
          positions: [
            air('AIR-FLUSH', 'Flushing air, compressor to rotation head', 25, false, { mopKpa: [800, 950] }),
            air('AIR-LUB', 'Shank lubrication air', 19, false, { mopKpa: [600, 750], lengthM: [4, 8], criticality: 'medium' }),
            hydraulic('HYD-RET', 'Feed and boom return line', false),
            hydraulic('HYD-SUC', 'Main pump suction', true),
          ],
        }),
      ),
      {
        assetNumber: 'BFQ-DR-04', name: 'Down-the-hole drill rig', area: 'DNB', meter: { hours: 10900, perDay: 8 },
        positions: [
          air('AIR-MAIN', 'Main air from the portable compressor', 25, true, { mopKpa: [860, 860], lengthM: [15, 20] }),
          hydraulic('HYD-RET', 'Feed and boom return line', false),
          hydraulic('HYD-SUC', 'Main pump suction', true),
        ],
      },
      {
        assetNumber: 'BFQ-CP-02', name: 'Portable compressor for the drill fleet', area: 'DNB', meter: { hours: 15700, perDay: 8 },
        positions: [
          air('AIR-OUT-1', 'Outlet 1 to the hand-held drills', 25, true, { mopKpa: [700, 860], lengthM: [20, 30] }),
          air('AIR-OUT-2', 'Outlet 2 to the hand-held drills', 25, true, { mopKpa: [700, 860], lengthM: [20, 30] }),
        ],
      },
      {
        assetNumber: 'BFQ-HD-01', name: 'Hand-held rock drill for pop shooting', area: 'DNB',
        positions: [air('AIR', 'Drill whip hose', 19, true, { mopKpa: [600, 700], lengthM: [3, 5] })],
      },
      {
        assetNumber: 'BFQ-HD-02', name: 'Hand-held rock drill, spare', area: 'DNB',
        positions: [air('AIR', 'Drill whip hose', 19, true, { mopKpa: [600, 700], lengthM: [3, 5] })],
      },
      {
        assetNumber: 'BFQ-PB-01', name: 'Pneumatic breaker for oversize', area: 'DNB',
        positions: [air('AIR', 'Breaker whip hose', 19, true, { mopKpa: [600, 700], lengthM: [3, 5] })],
      },
      {
        assetNumber: 'BFQ-FB-01', name: 'Diesel dispensing island', area: 'FUE',
        positions: [fuel('NOZ-1', 'Dispenser hose, pump 1'), fuel('NOZ-2', 'Dispenser hose, pump 2')],
      },
      {
        assetNumber: 'BFQ-FB-02', name: 'Lube oil dispensing reels', area: 'FUE',
        positions: [
          fuel('HYD-OIL', 'Hydraulic oil reel', { medium: 'hydraulic-oil-mineral', construction: 'OIL-25-GP', mopKpa: [800, 1200], lengthM: [10, 15], criticality: 'medium' }),
          fuel('TRANS-OIL', 'Transmission oil reel (mineral)', { medium: 'hydraulic-oil-mineral', construction: 'OIL-25-GP', mopKpa: [800, 1200], lengthM: [10, 15], criticality: 'medium' }),
        ],
      },
      {
        assetNumber: 'BFQ-FT-01', name: 'Mobile fuel bowser', area: 'FUE', meter: { hours: 7400, perDay: 4 },
        positions: [
          fuel('DELIVERY', 'Delivery hose on the reel', { lengthM: [10, 15] }),
          fuel('SUCTION', 'Suction from the bulk tank', { suction: true, mopKpa: [100, 150], lengthM: [3, 4] }),
        ],
      },
      {
        assetNumber: 'BFQ-BL-01', name: 'Cement silo 1 tanker unloading point', area: 'BLK',
        positions: tankerUnloading('CEM', 'cement', 'cement-powder-dry'),
      },
      {
        assetNumber: 'BFQ-BL-02', name: 'Cement silo 2 tanker unloading point', area: 'BLK',
        positions: tankerUnloading('CEM', 'cement', 'cement-powder-dry'),
      },
      {
        assetNumber: 'BFQ-BL-03', name: 'Lime silo tanker unloading point', area: 'BLK',
        positions: tankerUnloading('LIME', 'lime', null, { notes: 'Hydrated lime powder. Not in the compatibility table.' }),
      },
      {
        assetNumber: 'BFQ-BL-04', name: 'Fly ash silo tanker unloading point', area: 'BLK',
        positions: tankerUnloading('ASH', 'fly ash', 'cement-powder-dry'),
      },
      {
        assetNumber: 'BFQ-DW-01', name: 'Diesel sump pump 1', area: 'SMP', meter: { hours: 21900, perDay: 13 },
        positions: [dewatering('SUCTION', 'Suction from the sump', 152, true), dewatering('DISCH', 'Discharge to the settling pond main', 152, false)],
      },
      {
        assetNumber: 'BFQ-DW-02', name: 'Diesel sump pump 2', area: 'SMP', meter: { hours: 16400, perDay: 9 },
        positions: [dewatering('SUCTION', 'Suction from the sump', 152, true), dewatering('DISCH', 'Discharge to the settling pond main', 152, false)],
      },
      {
        assetNumber: 'BFQ-DW-03', name: 'Electric submersible pump, lower bench', area: 'SMP',
        positions: [dewatering('DISCH', 'Discharge riser to the pit rim', 102, false, { lengthM: [15, 20] })],
      },
      {
        assetNumber: 'BFQ-DW-04', name: 'Settling pond return pump', area: 'SMP', meter: { hours: 14300, perDay: 10 },
        positions: [dewatering('SUCTION', 'Suction from the clear-water pond', 102, true), dewatering('DISCH', 'Discharge to the wash plant tank', 102, false)],
      },
      {
        assetNumber: 'BFQ-WK-01', name: 'Workshop air reels', area: 'WKS',
        positions: (['1', '2', '3', '4'] as const).map((n) =>
          air(`REEL-${n}`, `Air reel ${n}`, 19, false, { medium: 'compressed-air-oil-free', mopKpa: [700, 750], tempC: [5, 30], lengthM: [15, 15], criticality: 'low' }),
        ),
      },
      {
        assetNumber: 'BFQ-WK-02', name: 'Blast booth', area: 'WKS',
        positions: [
          ...(['1', '2', '3'] as const).map((n): PositionTemplate => ({
            key: `BLAST-${n}`, name: n === '3' ? 'Extension blast hose' : `Blast hose from pot ${n} to nozzle`, service: 'abrasive-blasting', medium: 'sand-gravel-dry',
            construction: 'BLS-32-SD', ends: ['BLC-TH', 'BLC-TH'], connections: ['1-1/4 in blast coupling', '1-1/4 in blast coupling'], mopKpa: [700, 860],
            tempC: [5, 35], lengthM: [15, 20], suction: false, criticality: 'high',
          })),
          air('AIR-SUPPLY', 'Dry air supply to the blast pots', 25, false, { medium: 'compressed-air-oil-free', mopKpa: [800, 900], tempC: [5, 35], lengthM: [5, 8] }),
        ],
      },
      {
        assetNumber: 'BFQ-WK-04', name: 'Wash-down bay', area: 'WKS',
        positions: [water('LANCE', 'Hot water wash-down hose', false, { medium: 'hot-water', tempC: [10, 85], mopKpa: [400, 600], lengthM: [15, 20], criticality: 'medium' })],
      },
      {
        assetNumber: 'BFQ-WK-05', name: 'Heating torch gas manifold', area: 'WKS',
        positions: [lpg('LPG', 'Cylinder to manifold pigtail')],
      },
      {
        assetNumber: 'BFQ-CN-01', name: 'Canteen kitchen', area: 'CAN',
        positions: [
          {
            key: 'FRYER-OIL', name: 'Cooking oil transfer to the fryer', service: 'food-beverage', medium: 'food-oils', construction: 'FDB-25-FC', ends: ['SAN-CL', 'SAN-CL'],
            connections: ['1 in sanitary clamp', '1 in sanitary clamp'], mopKpa: [200, 300], tempC: [15, 60], lengthM: [2, 3], criticality: 'medium',
          },
          {
            key: 'MILK', name: 'Milk dispenser bulk line', service: 'food-beverage', medium: 'milk', construction: 'FDB-25-FC', ends: ['SAN-CL', 'SAN-CL'],
            connections: ['1 in sanitary clamp', '1 in sanitary clamp'], mopKpa: [150, 250], tempC: [2, 10], lengthM: [1, 2], criticality: 'low',
          },
          lpg('LPG', 'Cooker supply from the cylinder bank', { lengthM: [1.5, 2] }),
        ],
      },
    ],
  },
  {
    code: 'CWM',
    areas: [
      { code: 'CMP', name: 'Surface compressor house' },
      { code: 'PRT', name: 'Portal workshop' },
      { code: 'DEV', name: 'Level 1 development' },
      { code: 'STP', name: 'Levels 2 and 3 stoping' },
      { code: 'DWT', name: 'Underground dewatering' },
      { code: 'SHC', name: 'Shotcrete' },
      { code: 'SVC', name: 'Mine services' },
      { code: 'STM', name: 'Steam-cleaning bay' },
    ],
    equipment: [
      ...(['01', '02'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-CP-${n}`, name: `Surface compressor ${i + 1}`, area: 'CMP', meter: { hours: [38500, 29700][i]!, perDay: 18 },
          positions: [air('DISCH', 'Compressor discharge to the air receiver', 25, false, { mopKpa: [850, 950], tempC: [-10, 70], lengthM: [2, 3] })],
        }),
      ),
      {
        assetNumber: 'CWM-WK-01', name: 'Portal workshop air reels', area: 'PRT',
        positions: (['1', '2', '3'] as const).map((n) =>
          air(`REEL-${n}`, `Air reel ${n}`, 19, false, { medium: 'compressed-air-oil-free', mopKpa: [700, 750], tempC: [0, 30], lengthM: [15, 15], criticality: 'low' }),
        ),
      },
      {
        assetNumber: 'CWM-WK-02', name: 'Forklift gas cylinder filling point', area: 'PRT',
        positions: [lpg('LPG', 'Filling hose from the bulk tank')],
      },
      {
        assetNumber: 'CWM-FL-01', name: 'Portal fuel station', area: 'PRT',
        positions: [
          fuel('NOZ-1', 'Dispenser hose, pump 1', { tempC: [-10, 30] }),
          fuel('NOZ-2', 'Dispenser hose, pump 2', { tempC: [-10, 30] }),
          fuel('LUBE', 'Hydraulic oil reel', { medium: 'hydraulic-oil-mineral', mopKpa: [500, 800], lengthM: [10, 12], criticality: 'medium' }),
        ],
      },
      ...(['01', '02', '03'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-DR-${n}`, name: `Pneumatic drifter rig ${i + 1}, development`, area: 'DEV', meter: { hours: [9800, 8700, 10900][i]!, perDay: 7 },
          positions: [
            air('AIR', 'Drill air from the level manifold', 25, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [20, 30] }),
            water('WTR', 'Flushing water from the level main', true, { mopKpa: [500, 800], tempC: UNDERGROUND, lengthM: [20, 30], criticality: 'medium' }),
          ],
        }),
      ),
      {
        assetNumber: 'CWM-RB-01', name: 'Pneumatic rock breaker, development heading', area: 'DEV',
        positions: [air('AIR', 'Breaker supply hose', 19, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [8, 12] })],
      },
      {
        assetNumber: 'CWM-AM-01', name: 'Level 1 air manifold', area: 'DEV',
        positions: (['1', '2', '3'] as const).map((n) =>
          air(`BR-${n}`, `Branch ${n} to the face`, 25, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [20, 30], criticality: 'medium' }),
        ),
      },
      ...(['04', '05', '06'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-DR-${n}`, name: `Longhole stope drill ${i + 1}`, area: 'STP', meter: { hours: [11900, 3800, 11400][i]!, perDay: 8 },
          positions: [
            air('AIR', 'Drill air from the level manifold', 25, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [20, 30] }),
            water('WTR', 'Flushing water from the level main', true, { mopKpa: [500, 800], tempC: UNDERGROUND, lengthM: [20, 30], criticality: 'medium' }),
          ],
        }),
      ),
      {
        assetNumber: 'CWM-RB-02', name: 'Pneumatic rock breaker, level 2 drawpoint', area: 'STP',
        positions: [air('AIR', 'Breaker supply hose', 19, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [8, 12] })],
      },
      {
        assetNumber: 'CWM-RB-03', name: 'Pneumatic rock breaker, level 3 grizzly', area: 'STP', commissionedDaysAgo: 28,
        positions: [
          air('AIR', 'Breaker supply hose under the grizzly guard', 19, true, {
            mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [6, 8], bendMm: 110, inspectionIntervalDays: 7,
            notes: 'The guard rail at the breaker inlet forces a tight bend; a wider hose port is on order.',
          }),
        ],
      },
      {
        assetNumber: 'CWM-AM-02', name: 'Level 2 air manifold', area: 'STP',
        positions: (['1', '2', '3'] as const).map((n) =>
          air(`BR-${n}`, `Branch ${n} to the stope`, 25, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [20, 30], criticality: 'medium' }),
        ),
      },
      {
        assetNumber: 'CWM-AM-03', name: 'Level 3 air manifold', area: 'STP',
        positions: (['1', '2'] as const).map((n) =>
          air(`BR-${n}`, `Branch ${n} to the stope`, 25, true, { mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [20, 30], criticality: 'medium' }),
        ),
      },
      ...(['01', '02'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-LH-${n}`, name: `Underground loader ${i + 1}`, area: 'STP', meter: { hours: [20600, 17900][i]!, perDay: 14 },
          positions: [
            hydraulic('HYD-RET', 'Bucket circuit return line', false, { tempC: [5, 80] }),
            hydraulic('HYD-SUC', 'Main pump suction', true, { tempC: [5, 80] }),
          ],
        }),
      ),
      ...(['01', '02', '03'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-DW-${n}`, name: `Dewatering pump ${i + 1}, ${['level 3 sump', 'level 2 sump', 'main pump station'][i]}`, area: 'DWT', meter: { hours: [25100, 21800, 33600][i]!, perDay: 16 },
          positions: [
            dewatering('SUCTION', 'Suction from the sump', 102, true, { tempC: UNDERGROUND }),
            dewatering('DISCH', 'Discharge to the rising main', 102, false, { tempC: UNDERGROUND, mopKpa: [500, 700], ...(i === 1 ? { bendMm: 900 } : {}) }),
          ],
        }),
      ),
      ...(['01', '02'] as const).map(
        (n, i): EquipmentTemplate => ({
          assetNumber: `CWM-MP-${n}`, name: `Mud pump ${i + 1}, level 3 settling sump`, area: 'DWT', meter: { hours: [8700, 8300][i]!, perDay: 6 },
          positions: [slurry('DISCH', 'Pump discharge to the surface settling pond', 102, { tempC: UNDERGROUND, mopKpa: [1000, 1300], lengthM: [10, 15] })],
        }),
      ),
      {
        assetNumber: 'CWM-SC-01', name: 'Shotcrete sprayer 1', area: 'SHC', meter: { hours: 6900, perDay: 5 },
        positions: [
          air('NOZ-AIR', 'Nozzle air', 25, true, { medium: 'compressed-air-oil-free', mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [10, 15], criticality: 'medium' }),
          chemical('ACCEL', 'Accelerator dosing to the nozzle', null, {
            tempC: UNDERGROUND, criticality: 'medium', notes: 'Alkali-free accelerator (aluminium sulfate based). Not in the compatibility table.',
          }),
          hydraulic('HYD-RET', 'Boom return line', false, { tempC: [5, 80] }),
          water('WTR', 'Line cleaning water', true, { tempC: UNDERGROUND, lengthM: [10, 15] }),
        ],
      },
      {
        assetNumber: 'CWM-SC-02', name: 'Shotcrete sprayer 2', area: 'SHC', meter: { hours: 2400, perDay: 5 },
        positions: [
          air('NOZ-AIR', 'Nozzle air', 25, true, { medium: 'compressed-air-oil-free', mopKpa: [600, 700], tempC: UNDERGROUND, lengthM: [10, 15], criticality: 'medium' }),
          chemical('ACCEL', 'Accelerator dosing to the nozzle', null, {
            tempC: UNDERGROUND, criticality: 'medium', notes: 'Alkali-free accelerator (aluminium sulfate based). Not in the compatibility table.',
          }),
        ],
      },
      {
        assetNumber: 'CWM-VT-01', name: 'Vacuum truck', area: 'SVC', meter: { hours: 8300, perDay: 5 },
        positions: [
          ...(['1', '2', '3'] as const).map((n): PositionTemplate => ({
            key: `SUCTION-${n}`, name: n === '3' ? 'Spare suction length' : `Boom suction hose ${n}`, service: 'vacuum-truck-suction', medium: 'limestone-slurry',
            construction: 'VAC-102-HW', ends: ['CAM-AL', 'CAM-AL'], connections: ['4 in cam-and-groove', '4 in cam-and-groove'], mopKpa: [200, 350], tempC: [0, 30],
            lengthM: [6, 10], suction: true, criticality: 'medium',
          })),
          water('WASH', 'Tank wash-out hose', true, { tempC: [0, 30], lengthM: [10, 15] }),
        ],
      },
      {
        assetNumber: 'CWM-ST-01', name: 'Steam generator', area: 'STM', meter: { hours: 5800, perDay: 4 },
        positions: [
          {
            key: 'OUTLET', name: 'Generator outlet to the lance manifold', service: 'steam', medium: 'saturated-steam', construction: 'STM-19-EP', ends: ['CRP-STM', 'CRP-STM'],
            connections: ['3/4 in BSP male', '3/4 in BSP male'], mopKpa: [700, 800], tempC: [5, 170], lengthM: [2, 3], suction: false, criticality: 'high',
          },
        ],
      },
      {
        assetNumber: 'CWM-ST-02', name: 'Steam lance reels', area: 'STM',
        positions: (['1', '2', '3', '4'] as const).map((n): PositionTemplate => ({
          key: `LANCE-${n}`, name: `Lance hose ${n}`, service: 'steam', medium: 'saturated-steam', construction: 'STM-19-EP', ends: ['CRP-STM', 'CRP-STM'],
          connections: ['3/4 in BSP male', '3/4 in steam lance'], mopKpa: [700, 800], tempC: [5, 170], lengthM: [10, 15], suction: false, criticality: 'high',
        })),
      },
    ],
  },
];
