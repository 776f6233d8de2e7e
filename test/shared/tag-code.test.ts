import { describe, expect, it } from 'vitest';
import { checkSymbol, decodeWithCheck, encodeBase32, formatTagCode, normaliseTag, parseTagCode, tagCodeForSerial } from '../../shared/src/tags/tag-code.js';

// Source: Douglas Crockford, "Base32" specification (crockford.com/base32.html): symbols 0–9 A–Z
// without I L O U; check symbol = value mod 37 with extra symbols * ~ $ = U for 32–36; decoding
// maps I, L → 1 and O → 0, ignores hyphens, is case-insensitive. Values below computed by hand.
describe('Crockford Base32 tag codes', () => {
  it('encodes with the specification’s symbols', () => {
    expect(encodeBase32(0)).toBe('0');
    expect(encodeBase32(31)).toBe('Z');
    expect(encodeBase32(32)).toBe('10');
    expect(encodeBase32(1234)).toBe('16J'); // 1·1024 + 6·32 + 18 (J is the 18th symbol)
  });

  it('computes the check symbol as value mod 37, with * ~ $ = U for 32–36', () => {
    expect(checkSymbol(1234)).toBe('D'); // 1234 mod 37 = 13 → D
    expect(checkSymbol(32)).toBe('*');
    expect(checkSymbol(33)).toBe('~');
    expect(checkSymbol(34)).toBe('$');
    expect(checkSymbol(35)).toBe('=');
    expect(checkSymbol(36)).toBe('U');
  });

  it('decodes case-insensitively, ignoring hyphens, reading I and L as 1 and O as 0', () => {
    expect(normaliseTag('1o-il')).toBe('1011');
    expect(decodeWithCheck('16j-d')).toBe(1234);
    expect(decodeWithCheck('I6JD')).toBe(1234);
  });

  it('rejects a code whose check symbol does not match', () => {
    expect(decodeWithCheck('16JE')).toBeNull();
    expect(decodeWithCheck('16UD')).toBeNull(); // U is not a data symbol
  });

  it('gives every serial a distinct seven-symbol code that parses back', () => {
    const seen = new Set<string>();
    for (let serial = 0; serial < 5000; serial++) {
      const code = tagCodeForSerial(serial);
      expect(code).toHaveLength(7);
      expect(parseTagCode(code)).toBe(code);
      seen.add(code);
    }
    expect(seen.size).toBe(5000);
  });

  it('catches a single mistyped symbol and a swap of neighbours (the point of the check symbol)', () => {
    const code = tagCodeForSerial(4242);
    const symbols = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
    for (let i = 0; i < 6; i++) {
      for (const s of symbols) {
        if (s === code[i]) continue;
        expect(parseTagCode(code.slice(0, i) + s + code.slice(i + 1))).toBeNull();
      }
    }
    for (let i = 0; i < 5; i++) {
      if (code[i] === code[i + 1]) continue;
      const swapped = code.slice(0, i) + code[i + 1] + code[i] + code.slice(i + 2);
      expect(parseTagCode(swapped)).toBeNull();
    }
  });

  it('prints in groups and reads the printed form back', () => {
    const code = tagCodeForSerial(7);
    expect(formatTagCode(code)).toMatch(/^[0-9A-Z]{3}-[0-9A-Z]{3}-.$/);
    expect(parseTagCode(formatTagCode(code).toLowerCase())).toBe(code);
  });
});
