import type { CheckOutcome } from './types.js';

// Tube compound against medium. Every cell names its source: a published text, 'common practice',
// or 'from memory'. A cell from memory, an empty cell or an unknown medium never passes.

/** Generic tube compounds by their ASTM D1418 / ISO 1043 abbreviations. */
export const TUBE_COMPOUNDS = ['EPDM', 'NBR', 'NR', 'SBR', 'CR', 'CIIR', 'CSM', 'FKM', 'XLPE', 'UHMWPE', 'PVC', 'PTFE'] as const;
export type TubeCompound = (typeof TUBE_COMPOUNDS)[number];

export const TUBE_COMPOUND_NAMES: Record<TubeCompound, string> = {
  EPDM: 'ethylene propylene diene rubber',
  NBR: 'nitrile rubber',
  NR: 'natural rubber',
  SBR: 'styrene butadiene rubber',
  CR: 'chloroprene rubber',
  CIIR: 'chlorobutyl rubber',
  CSM: 'chlorosulfonated polyethylene',
  FKM: 'fluoroelastomer',
  XLPE: 'cross-linked polyethylene',
  UHMWPE: 'ultra-high-molecular-weight polyethylene',
  PVC: 'plasticised polyvinyl chloride',
  PTFE: 'polytetrafluoroethylene',
};

export const COMPATIBILITY_RATINGS = ['suitable', 'limited', 'unsuitable'] as const;
export type CompatibilityRating = (typeof COMPATIBILITY_RATINGS)[number];

export const COMMON_PRACTICE = 'common practice';
export const FROM_MEMORY = 'from memory';
/** Said whenever the table cannot vouch for a pairing. */
export const CONFIRM_WITH_MAKER = "Confirm with the hose maker's chemical resistance data.";

/** A medium as specific as a rating needs: what, how strong, how hot. */
export interface Medium {
  code: string;
  name: string;
  /** Concentration band, e.g. "10–50 %", or 'any'. */
  concentration: string;
  /** Temperature band, e.g. "up to 40 °C", or 'any'. */
  temperature: string;
  /** Top of the temperature band, °C; null for 'any'. */
  maxTempC: number | null;
}

function medium(code: string, name: string, concentration: string, maxTempC: number | null, minTempC?: number): Medium {
  const temperature = maxTempC == null ? 'any' : minTempC == null ? `up to ${maxTempC} °C` : `${minTempC}–${maxTempC} °C`;
  return { code, name, concentration, temperature, maxTempC };
}

export const MEDIA: readonly Medium[] = [
  medium('water', 'water', 'any', 70),
  medium('hot-water', 'hot water', 'any', 95, 70),
  medium('saturated-steam', 'saturated steam', 'any', 180),
  medium('compressed-air-oil-mist', 'compressed air with compressor oil mist', 'any', 70),
  medium('compressed-air-oil-free', 'compressed air, dry and oil-free', 'any', 70),
  medium('hydraulic-oil-mineral', 'hydraulic oil (mineral)', 'any', 100),
  medium('diesel-fuel', 'diesel fuel', 'any', 60),
  medium('gasoline', 'gasoline', 'up to 10 % ethanol', 40),
  medium('ethanol', 'ethanol', 'up to 100 %', 40),
  medium('sulfuric-acid-up-to-10', 'sulfuric acid', 'up to 10 %', 40),
  medium('sulfuric-acid-10-50', 'sulfuric acid', '10–50 %', 40),
  medium('hydrochloric-acid-up-to-37', 'hydrochloric acid', 'up to 37 %', 40),
  medium('sodium-hydroxide-up-to-20', 'sodium hydroxide', 'up to 20 %', 40),
  medium('sodium-hypochlorite-up-to-15', 'sodium hypochlorite', 'up to 15 %', 30),
  medium('acetone', 'acetone', 'up to 100 %', 30),
  medium('limestone-slurry', 'limestone slurry', 'up to 60 % solids', 60),
  medium('sand-gravel-dry', 'sand and gravel (dry abrasive)', 'any', 60),
  medium('cement-powder-dry', 'cement and fly ash (dry powder)', 'any', 70),
  medium('food-oils', 'food oils (vegetable)', 'any', 60),
  medium('milk', 'milk', 'any', 70),
];

/** "sulfuric acid 10–50 %, up to 40 °C"; "water, up to 70 °C". */
export function mediumLabel(m: Medium): string {
  const strength = m.concentration === 'any' ? '' : ` ${m.concentration}`;
  const heat = m.temperature === 'any' ? '' : `, ${m.temperature}`;
  return `${m.name}${strength}${heat}`;
}

export function mediumByCode(code: string | null | undefined): Medium | null {
  if (code == null) return null;
  return MEDIA.find((m) => m.code === code) ?? null;
}

export interface CompatibilityCell {
  rating: CompatibilityRating;
  /** A citation, or exactly 'common practice' or 'from memory'. */
  source: string;
}

// The general properties of the common elastomers, as the trade states them; a plant confirms
// them against its hose maker's chemical resistance data.
const FACTS = 'common practice (general properties of the elastomer)';
const NBR_OIL = `${FACTS}: NBR is oil and fuel resistant`;
const EPDM_NO_OIL = `${FACTS}: EPDM is not for petroleum oils`;
const NR_NO_OIL = `${FACTS}: natural rubber is not oil resistant`;
const NR_ABRASION = `${FACTS}: natural rubber has the highest abrasion resistance of the common elastomers`;
const SBR_NO_OIL = `${FACTS}: SBR is not oil resistant`;
const SBR_ABRASION = `${FACTS}: SBR has good abrasion resistance`;
const CIIR_ACIDS = `${FACTS}: chlorobutyl is good with acids and alkalis`;
const CIIR_NO_OIL = `${FACTS}: chlorobutyl is not oil resistant`;

type Row = Partial<Record<string, CompatibilityCell>>;
/** Compound → medium code → cell; a missing cell means not known. */
export type CompatibilityTable = Record<TubeCompound, Row>;
const ok = (source: string): CompatibilityCell => ({ rating: 'suitable', source });
const limited = (source: string): CompatibilityCell => ({ rating: 'limited', source });
const no = (source: string): CompatibilityCell => ({ rating: 'unsuitable', source });
const CP = COMMON_PRACTICE;
const FM = FROM_MEMORY;

/** The table: compound → medium code → cell. A missing cell means not known. */
export const COMPATIBILITY_TABLE: CompatibilityTable = {
  EPDM: {
    water: ok(CP),
    'hot-water': ok(CP),
    'saturated-steam': ok(CP),
    'compressed-air-oil-mist': no(EPDM_NO_OIL),
    'compressed-air-oil-free': ok(CP),
    'hydraulic-oil-mineral': no(EPDM_NO_OIL),
    'diesel-fuel': no(EPDM_NO_OIL),
    gasoline: no(EPDM_NO_OIL),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': limited(FM),
    'hydrochloric-acid-up-to-37': limited(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': limited(FM),
    acetone: ok(FM),
    'food-oils': limited(FM),
    milk: ok(FM),
  },
  NBR: {
    water: ok(FM),
    'hot-water': limited(FM),
    'saturated-steam': no(FM),
    'compressed-air-oil-mist': ok(NBR_OIL),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': ok(NBR_OIL),
    'diesel-fuel': ok(NBR_OIL),
    gasoline: ok(NBR_OIL),
    ethanol: limited(FM),
    'sulfuric-acid-up-to-10': limited(FM),
    'sulfuric-acid-10-50': no(FM),
    'hydrochloric-acid-up-to-37': no(FM),
    'sodium-hydroxide-up-to-20': limited(FM),
    'sodium-hypochlorite-up-to-15': no(FM),
    acetone: no(FM),
    'food-oils': ok(NBR_OIL),
    milk: ok(FM),
  },
  NR: {
    water: ok(CP),
    'hot-water': limited(FM),
    'saturated-steam': no(FM),
    'compressed-air-oil-mist': no(NR_NO_OIL),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': no(NR_NO_OIL),
    'diesel-fuel': no(NR_NO_OIL),
    gasoline: no(NR_NO_OIL),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': limited(FM),
    'hydrochloric-acid-up-to-37': limited(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': no(FM),
    acetone: limited(FM),
    'limestone-slurry': ok(NR_ABRASION),
    'sand-gravel-dry': ok(NR_ABRASION),
    'cement-powder-dry': ok(NR_ABRASION),
    'food-oils': no(NR_NO_OIL),
  },
  SBR: {
    water: ok(CP),
    'hot-water': limited(FM),
    'saturated-steam': no(FM),
    'compressed-air-oil-mist': no(SBR_NO_OIL),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': no(SBR_NO_OIL),
    'diesel-fuel': no(SBR_NO_OIL),
    gasoline: no(SBR_NO_OIL),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'limestone-slurry': ok(SBR_ABRASION),
    'sand-gravel-dry': ok(SBR_ABRASION),
    'cement-powder-dry': ok(SBR_ABRASION),
    'food-oils': no(SBR_NO_OIL),
  },
  CR: {
    water: ok(FM),
    'hot-water': limited(FM),
    'saturated-steam': no(FM),
    'compressed-air-oil-mist': ok(FM),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': limited(FM),
    'diesel-fuel': limited(FM),
    gasoline: no(FM),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': limited(FM),
    'hydrochloric-acid-up-to-37': limited(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': limited(FM),
    acetone: no(FM),
    'food-oils': limited(FM),
  },
  CIIR: {
    water: ok(FM),
    'hot-water': ok(FM),
    'saturated-steam': ok(CP),
    'compressed-air-oil-mist': no(CIIR_NO_OIL),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': no(CIIR_NO_OIL),
    'diesel-fuel': no(CIIR_NO_OIL),
    gasoline: no(CIIR_NO_OIL),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(CIIR_ACIDS),
    'sulfuric-acid-10-50': ok(CIIR_ACIDS),
    'hydrochloric-acid-up-to-37': ok(CIIR_ACIDS),
    'sodium-hydroxide-up-to-20': ok(CIIR_ACIDS),
    'sodium-hypochlorite-up-to-15': limited(FM),
    acetone: ok(FM),
    'food-oils': no(CIIR_NO_OIL),
  },
  CSM: {
    water: ok(FM),
    'compressed-air-oil-mist': limited(FM),
    'hydraulic-oil-mineral': limited(FM),
    'diesel-fuel': limited(FM),
    gasoline: no(FM),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': ok(FM),
    'hydrochloric-acid-up-to-37': ok(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': ok(FM),
    acetone: no(FM),
  },
  FKM: {
    water: ok(FM),
    'hot-water': limited(FM),
    'saturated-steam': limited(FM),
    'compressed-air-oil-mist': ok(FM),
    'hydraulic-oil-mineral': ok(FM),
    'diesel-fuel': ok(FM),
    gasoline: ok(FM),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': ok(FM),
    'hydrochloric-acid-up-to-37': ok(FM),
    'sodium-hydroxide-up-to-20': limited(FM),
    'sodium-hypochlorite-up-to-15': ok(FM),
    acetone: no(FM),
    'food-oils': ok(FM),
  },
  XLPE: {
    water: ok(FM),
    'saturated-steam': no(FM),
    'diesel-fuel': limited(FM),
    gasoline: limited(FM),
    ethanol: ok(CP),
    'sulfuric-acid-up-to-10': ok(CP),
    'sulfuric-acid-10-50': ok(CP),
    'hydrochloric-acid-up-to-37': ok(CP),
    'sodium-hydroxide-up-to-20': ok(CP),
    'sodium-hypochlorite-up-to-15': ok(CP),
    acetone: ok(CP),
  },
  UHMWPE: {
    water: ok(FM),
    'saturated-steam': no(FM),
    'hydraulic-oil-mineral': ok(FM),
    'diesel-fuel': ok(FM),
    gasoline: ok(FM),
    ethanol: ok(CP),
    'sulfuric-acid-up-to-10': ok(CP),
    'sulfuric-acid-10-50': ok(CP),
    'hydrochloric-acid-up-to-37': ok(CP),
    'sodium-hydroxide-up-to-20': ok(CP),
    'sodium-hypochlorite-up-to-15': ok(CP),
    acetone: ok(CP),
    'limestone-slurry': ok(FM),
    'sand-gravel-dry': ok(FM),
  },
  PVC: {
    water: ok(FM),
    'hot-water': no(FM),
    'saturated-steam': no(FM),
    'compressed-air-oil-mist': limited(FM),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': limited(FM),
    'diesel-fuel': limited(FM),
    gasoline: no(FM),
    ethanol: limited(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': limited(FM),
    'hydrochloric-acid-up-to-37': limited(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': limited(FM),
    acetone: no(FM),
    'sand-gravel-dry': limited(FM),
    'food-oils': limited(FM),
    milk: ok(FM),
  },
  PTFE: {
    water: ok(FM),
    'hot-water': ok(FM),
    'saturated-steam': ok(FM),
    'compressed-air-oil-mist': ok(FM),
    'compressed-air-oil-free': ok(FM),
    'hydraulic-oil-mineral': ok(FM),
    'diesel-fuel': ok(FM),
    gasoline: ok(FM),
    ethanol: ok(FM),
    'sulfuric-acid-up-to-10': ok(FM),
    'sulfuric-acid-10-50': ok(FM),
    'hydrochloric-acid-up-to-37': ok(FM),
    'sodium-hydroxide-up-to-20': ok(FM),
    'sodium-hypochlorite-up-to-15': ok(FM),
    acetone: ok(FM),
    'limestone-slurry': limited(FM),
    'sand-gravel-dry': limited(FM),
    'food-oils': ok(FM),
    milk: ok(FM),
  },
};

/** The compound code for "epdm", " NBR " and the like; null when it is not in the table. */
export function findTubeCompound(text: string | null | undefined): TubeCompound | null {
  if (text == null) return null;
  const code = text.trim().toUpperCase();
  return (TUBE_COMPOUNDS as readonly string[]).includes(code) ? (code as TubeCompound) : null;
}

/** The cell for a compound and medium, or null when the table does not say. */
export function compatibilityCell(
  compound: string,
  mediumCode: string,
  table: CompatibilityTable = COMPATIBILITY_TABLE,
): CompatibilityCell | null {
  const code = findTubeCompound(compound);
  if (!code) return null;
  return table[code][mediumCode] ?? null;
}

export interface CompatibilityResult {
  outcome: CheckOutcome;
  rating: CompatibilityRating | null;
  source: string | null;
  sentence: string;
}

/**
 * What the table says about a tube compound with a medium. Passes only for a 'suitable' cell with
 * a published or common-practice source; warns for 'limited', for a cell from memory, an empty
 * cell, an unknown compound or an unknown medium; fails for a sourced 'unsuitable'. `table` defaults
 * to the shipped table.
 */
export function compatibility(
  compound: string,
  mediumCode: string,
  table: CompatibilityTable = COMPATIBILITY_TABLE,
): CompatibilityResult {
  const m = mediumByCode(mediumCode);
  if (!m) {
    return {
      outcome: 'warn',
      rating: null,
      source: null,
      sentence: `The medium "${mediumCode}" is not in the compatibility table. ${CONFIRM_WITH_MAKER}`,
    };
  }
  const label = mediumLabel(m);
  const code = findTubeCompound(compound);
  if (!code) {
    return {
      outcome: 'warn',
      rating: null,
      source: null,
      sentence: `The tube compound "${compound}" is not in the compatibility table, so nothing is known about it with ${label}. ${CONFIRM_WITH_MAKER}`,
    };
  }
  const cell = table[code][m.code];
  if (!cell || cell.source.trim() === '') {
    return {
      outcome: 'warn',
      rating: null,
      source: null,
      sentence: `The table has no rating for ${code} with ${label}. ${CONFIRM_WITH_MAKER}`,
    };
  }
  const { rating, source } = cell;
  if (source === FROM_MEMORY) {
    const said = rating === 'suitable' ? 'suitable' : rating === 'limited' ? 'limited' : 'not suitable';
    return {
      outcome: 'warn',
      rating,
      source,
      sentence: `The table rates ${code} ${said} for ${label}, but from memory, not from a source. ${CONFIRM_WITH_MAKER}`,
    };
  }
  switch (rating) {
    case 'suitable':
      return { outcome: 'pass', rating, source, sentence: `The ${code} tube is suitable for ${label}.` };
    case 'limited':
      return {
        outcome: 'warn',
        rating,
        source,
        sentence: `The ${code} tube has only limited resistance to ${label}: expect a shorter life and inspect it more often. ${CONFIRM_WITH_MAKER}`,
      };
    case 'unsuitable':
      return { outcome: 'fail', rating, source, sentence: `The ${code} tube is not suitable for ${label}.` };
  }
}
