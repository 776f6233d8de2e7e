import { decodeWithCheck, TAG_DATA_LENGTH, tagCodeForSerial } from '../../../shared/src/tags/tag-code.js';

// A tag code is its serial number scrambled by an odd multiplier modulo 32^6. Reading the serial
// back lets an import that brings tags already printed move the serial sequence past them, so a
// later assembly is never handed a code that is already on a hose.

const SPACE = 32n ** BigInt(TAG_DATA_LENGTH);
// Serial 1 encodes the multiplier itself.
const MULTIPLIER = BigInt(decodeWithCheck(tagCodeForSerial(1)) ?? 1);

function inverse(a: bigint, m: bigint): bigint {
  let [oldR, r] = [a % m, m];
  let [oldS, s] = [1n, 0n];
  while (r !== 0n) {
    const q = oldR / r;
    [oldR, r] = [r, oldR - q * r];
    [oldS, s] = [s, oldS - q * s];
  }
  return ((oldS % m) + m) % m;
}

const INVERSE = inverse(MULTIPLIER, SPACE);

/** The serial number behind a canonical tag code, or null when the code is not one the sequence makes. */
export function serialOfTag(code: string): number | null {
  const value = decodeWithCheck(code);
  if (value === null) return null;
  const serial = Number((BigInt(value) * INVERSE) % SPACE);
  return tagCodeForSerial(serial) === code ? serial : null;
}
