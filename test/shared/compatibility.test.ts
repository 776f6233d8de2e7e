import { describe, it, expect } from 'vitest';
import {
  COMMON_PRACTICE,
  COMPATIBILITY_TABLE,
  compatibility,
  compatibilityCell,
  CONFIRM_WITH_MAKER,
  FROM_MEMORY,
  MEDIA,
  mediumByCode,
  mediumLabel,
  TUBE_COMPOUNDS,
  type CompatibilityTable,
} from '../../shared/src/checks/compatibility.js';

const cells = TUBE_COMPOUNDS.flatMap((compound) =>
  Object.entries(COMPATIBILITY_TABLE[compound]).map(([mediumCode, cell]) => ({ compound, mediumCode, cell })),
);

describe('the compatibility table', () => {
  it('covers every required compound', () => {
    for (const compound of ['EPDM', 'NBR', 'NR', 'SBR', 'CR', 'CIIR', 'CSM', 'FKM', 'XLPE', 'UHMWPE', 'PVC', 'PTFE']) {
      expect(COMPATIBILITY_TABLE).toHaveProperty(compound);
    }
  });

  it('gives every cell a rating and a non-empty source: a citation, "common practice" or "from memory"', () => {
    expect(cells.length).toBeGreaterThan(100);
    for (const { compound, mediumCode, cell } of cells) {
      const where = `${compound} × ${mediumCode}`;
      expect(cell, where).toBeDefined();
      expect(['suitable', 'limited', 'unsuitable'], where).toContain(cell!.rating);
      expect(cell!.source.trim().length, where).toBeGreaterThan(0);
      const isCitation = cell!.source.startsWith('common practice (general properties of the elastomer): ');
      expect(isCitation || cell!.source === COMMON_PRACTICE || cell!.source === FROM_MEMORY, where).toBe(true);
    }
  });

  it('rates only media that are in the media list', () => {
    for (const { compound, mediumCode } of cells) expect(mediumByCode(mediumCode), `${compound} × ${mediumCode}`).not.toBeNull();
  });

  it('lists every medium specifically: a concentration band and a temperature band, or "any"', () => {
    expect(new Set(MEDIA.map((m) => m.code)).size).toBe(MEDIA.length);
    for (const m of MEDIA) {
      expect(m.concentration === 'any' || /\d+ %/.test(m.concentration), m.code).toBe(true);
      expect(m.temperature === 'any' || /^(up to \d+ °C|\d+–\d+ °C)$/.test(m.temperature), m.code).toBe(true);
      expect(m.temperature === 'any' ? m.maxTempC === null : m.temperature.endsWith(`${m.maxTempC} °C`), m.code).toBe(true);
    }
  });

  it('labels a medium with its band, e.g. "sulfuric acid 10–50 %, up to 40 °C"', () => {
    expect(mediumLabel(mediumByCode('sulfuric-acid-10-50')!)).toBe('sulfuric acid 10–50 %, up to 40 °C');
    expect(mediumLabel(mediumByCode('diesel-fuel')!)).toBe('diesel fuel, up to 60 °C');
    expect(mediumLabel(mediumByCode('saturated-steam')!)).toBe('saturated steam, up to 180 °C');
  });

  it('common practice, general elastomer properties: NBR is oil and fuel resistant', () => {
    for (const medium of ['hydraulic-oil-mineral', 'diesel-fuel', 'gasoline']) {
      expect(compatibilityCell('NBR', medium)).toEqual({ rating: 'suitable', source: expect.stringMatching(/NBR is oil and fuel resistant/) });
    }
  });

  it('common practice, general elastomer properties: EPDM is not for petroleum oils; NR, SBR and CIIR are not oil resistant', () => {
    for (const compound of ['EPDM', 'NR', 'SBR', 'CIIR']) {
      for (const medium of ['hydraulic-oil-mineral', 'diesel-fuel', 'gasoline']) {
        const cell = compatibilityCell(compound, medium);
        expect(cell?.rating, `${compound} × ${medium}`).toBe('unsuitable');
        expect(cell?.source, `${compound} × ${medium}`).toMatch(/^common practice \(general properties/);
      }
    }
  });

  it('common practice, general elastomer properties: CIIR good with acids and alkalis; NR and SBR abrasion resistant', () => {
    expect(compatibilityCell('CIIR', 'sulfuric-acid-10-50')?.source).toMatch(/good with acids and alkalis/);
    expect(compatibilityCell('CIIR', 'sodium-hydroxide-up-to-20')?.rating).toBe('suitable');
    expect(compatibilityCell('NR', 'sand-gravel-dry')?.source).toMatch(/highest abrasion resistance/);
    expect(compatibilityCell('SBR', 'limestone-slurry')?.source).toMatch(/good abrasion resistance/);
  });

  it('common practice, general elastomer properties: XLPE and UHMWPE broad chemical resistance is common practice', () => {
    for (const compound of ['XLPE', 'UHMWPE']) {
      for (const medium of ['sulfuric-acid-10-50', 'hydrochloric-acid-up-to-37', 'sodium-hydroxide-up-to-20']) {
        expect(compatibilityCell(compound, medium)).toEqual({ rating: 'suitable', source: COMMON_PRACTICE });
      }
    }
  });
});

describe('compatibility lookup', () => {
  it('passes a sourced suitable cell', () => {
    const answer = compatibility('NBR', 'diesel-fuel');
    expect(answer.outcome).toBe('pass');
    expect(answer.rating).toBe('suitable');
    expect(answer.source).toMatch(/general properties of the elastomer/);
    expect(answer.sentence).toBe('The NBR tube is suitable for diesel fuel, up to 60 °C.');
  });

  it('passes a common-practice suitable cell', () => {
    expect(compatibility('XLPE', 'sulfuric-acid-10-50').outcome).toBe('pass');
  });

  it('fails a sourced unsuitable cell', () => {
    const answer = compatibility('EPDM', 'diesel-fuel');
    expect(answer.outcome).toBe('fail');
    expect(answer.sentence).toBe('The EPDM tube is not suitable for diesel fuel, up to 60 °C.');
  });

  it('warns on a cell from memory, whatever its rating, and says to confirm with the maker', () => {
    for (const [compound, medium] of [
      ['FKM', 'diesel-fuel'],
      ['PVC', 'ethanol'],
      ['PVC', 'acetone'],
    ] as const) {
      expect(compatibilityCell(compound, medium)?.source).toBe(FROM_MEMORY);
      const answer = compatibility(compound, medium);
      expect(answer.outcome).toBe('warn');
      expect(answer.source).toBe(FROM_MEMORY);
      expect(answer.sentence).toContain(CONFIRM_WITH_MAKER);
    }
    expect(compatibility('PVC', 'acetone').sentence).toMatch(/rates PVC not suitable for acetone/);
  });

  it('warns on an empty cell and says so', () => {
    expect(compatibilityCell('SBR', 'acetone')).toBeNull();
    const answer = compatibility('SBR', 'acetone');
    expect(answer).toEqual({
      outcome: 'warn',
      rating: null,
      source: null,
      sentence: `The table has no rating for SBR with acetone up to 100 %, up to 30 °C. ${CONFIRM_WITH_MAKER}`,
    });
  });

  it('warns on an unknown medium', () => {
    const answer = compatibility('NBR', 'whisky');
    expect(answer.outcome).toBe('warn');
    expect(answer.rating).toBeNull();
    expect(answer.sentence).toContain(CONFIRM_WITH_MAKER);
  });

  it('warns on an unknown compound', () => {
    const answer = compatibility('TPU', 'water');
    expect(answer.outcome).toBe('warn');
    expect(answer.sentence).toContain(CONFIRM_WITH_MAKER);
  });

  it('reads the compound without regard to case or spaces', () => {
    expect(compatibility(' nbr ', 'diesel-fuel').outcome).toBe('pass');
  });

  it('warns on a sourced limited cell', () => {
    const table = { ...COMPATIBILITY_TABLE, NR: { 'hot-water': { rating: 'limited', source: 'a published table' } } } as CompatibilityTable;
    const answer = compatibility('NR', 'hot-water', table);
    expect(answer.outcome).toBe('warn');
    expect(answer.rating).toBe('limited');
    expect(answer.sentence).toMatch(/limited resistance/);
  });

  it('warns on a cell whose source is blank', () => {
    const table = { ...COMPATIBILITY_TABLE, NR: { water: { rating: 'suitable', source: ' ' } } } as CompatibilityTable;
    expect(compatibility('NR', 'water', table).outcome).toBe('warn');
  });

  it('never passes a pairing without a source', () => {
    for (const compound of TUBE_COMPOUNDS) {
      for (const m of MEDIA) {
        const answer = compatibility(compound, m.code);
        if (answer.outcome === 'pass') {
          expect(answer.source, `${compound} × ${m.code}`).not.toBe(FROM_MEMORY);
          expect(answer.source?.trim(), `${compound} × ${m.code}`).toBeTruthy();
          expect(answer.rating).toBe('suitable');
        }
      }
    }
  });
});
