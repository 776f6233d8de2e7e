import { normaliseTag, parseTagCode, TAG_DATA_LENGTH } from '@shared/tags/tag-code';

/** The message for a typed code whose check symbol (or a symbol) is wrong. Never a match for another hose. */
export const INVALID_TAG_CODE = 'Not a valid tag code — check the label.';

export type TagSearch =
  | { kind: 'empty' }
  | { kind: 'tag'; code: string }
  | { kind: 'invalid-tag' }
  | { kind: 'text'; text: string };

/**
 * Reads what was typed in a search box: a tag code however it was typed (lower case, no hyphens,
 * I/L/O for 1/1/0), a code of the right length that fails its check, or plain text.
 */
export function readTagSearch(typed: string): TagSearch {
  const text = typed.trim();
  if (!text) return { kind: 'empty' };
  const code = parseTagCode(text);
  if (code) return { kind: 'tag', code };
  const normal = normaliseTag(text);
  // Seven symbols with no spaces inside is how a code is typed; a wrong one must not fall back to a text search that could find another hose.
  if (normal.length === TAG_DATA_LENGTH + 1 && /^[0-9A-Z*~$=]+$/.test(normal) && !/\s/.test(text.replace(/-/g, ''))) return { kind: 'invalid-tag' };
  return { kind: 'text', text };
}
