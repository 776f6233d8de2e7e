import { createHash, randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';

/** A random URL-safe token of 32 bytes. */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

export function sha256(text: string): string {
  return createHash('sha256').update(text).digest('hex');
}

/**
 * bcrypt reads only the first 72 bytes, so the password is first reduced to its SHA-256
 * (44 characters of base64): long passphrases keep all of their strength.
 */
function prehash(password: string): string {
  return createHash('sha256').update(password, 'utf8').digest('base64');
}

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(prehash(password), cost);
}

export function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  // Compare against a fixed hash when there is none, so unknown accounts take as long as known ones.
  return bcrypt.compare(prehash(password), hash ?? DUMMY_HASH);
}

const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.q1fI1Yt8G3v4Ch5oZ.xhQ8V8c6yW';
