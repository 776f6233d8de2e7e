// Tag codes in Douglas Crockford's Base32: no I, L, O or U, so a code read aloud or off a worn
// label is not mistaken; a check symbol (value mod 37) makes a mistyped code fail rather than
// match another hose. Decoding maps I and L to 1 and O to 0, ignores hyphens and case.

const SYMBOLS = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
const CHECK_SYMBOLS = `${SYMBOLS}*~$=U`;
/** Data symbols in an assembly tag: 32^6, about a billion codes. */
export const TAG_DATA_LENGTH = 6;
const TAG_SPACE = 32 ** TAG_DATA_LENGTH;
// An odd multiplier permutes 0 … 2^30 − 1, so consecutive serials give unlike codes.
const SCRAMBLE = 0x2f0b3a5;

export function encodeBase32(value: number, length = 0): string {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError('Only whole numbers from 0 can be encoded');
  let out = '';
  let v = value;
  do {
    out = SYMBOLS[v % 32] + out;
    v = Math.floor(v / 32);
  } while (v > 0);
  return out.padStart(length, '0');
}

export function checkSymbol(value: number): string {
  return CHECK_SYMBOLS[value % 37]!;
}

/** Normalises typed text: upper case, hyphens and spaces dropped, I/L → 1, O → 0. */
export function normaliseTag(text: string): string {
  return text
    .toUpperCase()
    .replace(/[\s-]/g, '')
    .replace(/[IL]/g, '1')
    .replace(/O/g, '0');
}

function decodeSymbols(symbols: string): number | null {
  let value = 0;
  for (const c of symbols) {
    const digit = SYMBOLS.indexOf(c);
    if (digit < 0) return null;
    value = value * 32 + digit;
  }
  return value;
}

/** The value of a code with its check symbol last, or null when a symbol or the check is wrong. */
export function decodeWithCheck(text: string): number | null {
  const normal = normaliseTag(text);
  if (normal.length < 2) return null;
  const value = decodeSymbols(normal.slice(0, -1));
  if (value === null || !Number.isSafeInteger(value)) return null;
  return checkSymbol(value) === normal.slice(-1) ? value : null;
}

/** The canonical tag code (6 data symbols and a check symbol) of the n-th assembly number. */
export function tagCodeForSerial(serial: number): string {
  if (!Number.isSafeInteger(serial) || serial < 0 || serial >= TAG_SPACE) throw new RangeError('Serial out of range');
  const value = Number((BigInt(serial) * BigInt(SCRAMBLE)) % BigInt(TAG_SPACE));
  return encodeBase32(value, TAG_DATA_LENGTH) + checkSymbol(value);
}

/** A typed or scanned code in canonical form, or null when it is not a valid tag code. */
export function parseTagCode(text: string): string | null {
  const normal = normaliseTag(text);
  if (normal.length !== TAG_DATA_LENGTH + 1) return null;
  return decodeWithCheck(normal) === null ? null : normal;
}

/** A code as printed and shown: "3KQ-7VM-X". */
export function formatTagCode(code: string): string {
  return `${code.slice(0, 3)}-${code.slice(3, 6)}-${code.slice(6)}`;
}
