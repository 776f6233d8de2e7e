import Papa from 'papaparse';
import { CSV_UNIT_WORDS, IMPORT_LIMITS, type CsvColumn, type CsvQuantity } from '../../../shared/src/schemas/csv.schema.js';
import { findSizeClass } from '../../../shared/src/sizes/nominal-sizes.js';
import { ValidationError } from '../errors.js';

/** One problem in a file: `row` 1 is the first row under the header, 0 the header. */
export interface Problem {
  row: number;
  column: string | null;
  message: string;
}

export type Delimiter = ',' | ';' | '\t';

/** A file split into cells: the header and the data rows, each with its row number. */
export interface CsvTable {
  delimiter: Delimiter;
  /** Semicolon files may write 1,5 for 1.5. */
  decimalComma: boolean;
  headers: string[];
  rows: Array<{ row: number; cells: string[] }>;
  /** Problems of the file's structure (quotes, cells beyond the header). */
  problems: Problem[];
}

/** The upload as text: UTF-8 with or without a byte-order mark; anything else is refused. */
export function decodeUpload(buffer: Buffer): string {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw new ValidationError('The file is not UTF-8 text. Save it from the spreadsheet as "CSV UTF-8" and upload it again.', 'file', 'not_utf8');
  }
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

/** The separator of the header line: the one of comma, semicolon and tab it holds most of, outside quotes. */
export function detectDelimiter(text: string): Delimiter {
  const counts: Record<Delimiter, number> = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '"') quoted = !quoted;
    else if (!quoted && (c === '\n' || c === '\r')) break;
    else if (!quoted && (c === ',' || c === ';' || c === '\t')) counts[c]++;
  }
  const best = (Object.entries(counts) as Array<[Delimiter, number]>).sort((a, b) => b[1] - a[1])[0]!;
  return best[1] > 0 ? best[0] : ',';
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === '');

/**
 * How many data rows the file has, without reading every cell: by its line breaks, and only
 * when those pass the limit by splitting it properly (a quoted cell may hold a line break).
 */
export function countDataRows(text: string): number {
  let lines = 0;
  for (let at = text.indexOf('\n'); at !== -1; at = text.indexOf('\n', at + 1)) lines++;
  if (lines <= IMPORT_LIMITS.maxRows) return lines;
  return parseCsv(text).rows.length;
}

export function parseCsv(text: string): CsvTable {
  const delimiter = detectDelimiter(text);
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false, header: false });
  const [headers = [], ...data] = parsed.data;
  const problems: Problem[] = [];
  for (const error of parsed.errors) {
    const row = error.row ?? 0;
    const message =
      error.code === 'MissingQuotes'
        ? 'A quoted cell is not closed: a " is missing.'
        : error.code === 'InvalidQuotes'
          ? 'A quote inside a cell is not doubled: write "" for a " inside quotes.'
          : `The file could not be read here: ${error.message}.`;
    problems.push({ row, column: null, message });
  }
  const rows: CsvTable['rows'] = [];
  data.forEach((cells, index) => {
    if (isBlank(cells)) return;
    const row = index + 1;
    const extra = cells.slice(headers.length).filter((c) => c.trim() !== '');
    if (extra.length) problems.push({ row, column: null, message: `The row has ${cells.length} cells but the header names ${headers.length} columns.` });
    rows.push({ row, cells });
  });
  return { delimiter, decimalComma: delimiter === ';', headers: headers.map((h) => h.replace(/^\uFEFF/, '')), rows, problems };
}

// ── Units ─────────────────────────────────────────────────────────────────────────────────────

const UNIT_LOOKUP = {} as Record<CsvQuantity, Map<string, string>>;
for (const quantity of Object.keys(CSV_UNIT_WORDS) as CsvQuantity[]) {
  const map = new Map<string, string>();
  for (const [unit, words] of Object.entries(CSV_UNIT_WORDS[quantity])) for (const word of words as readonly string[]) map.set(word, unit);
  UNIT_LOOKUP[quantity] = map;
}

/** The unit a word names for a kind of quantity ("PSI" → psi, "°C" → C), or null. */
export function unitOf(quantity: CsvQuantity, text: string): string | null {
  const word = text.trim().toLowerCase().replace(/\s+/g, ' ');
  return UNIT_LOOKUP[quantity].get(word) ?? UNIT_LOOKUP[quantity].get(word.replace(/^°\s*/, '°')) ?? null;
}

const unitWords = (quantity: CsvQuantity) => [...UNIT_LOOKUP[quantity].keys()].filter((w) => /^[a-z°]+$/.test(w) || w.includes(' '));
const describeUnits = (quantity: CsvQuantity) => Object.keys(CSV_UNIT_WORDS[quantity]).map((u) => (quantity === 'temperature' ? `°${u}` : u)).join(', ');

const isQuantity = (column: CsvColumn): column is CsvColumn & { kind: CsvQuantity } => column.kind === 'pressure' || column.kind === 'length' || column.kind === 'temperature';

// ── Headers ───────────────────────────────────────────────────────────────────────────────────

/** Where one documented column is in the file, and how its unit is given. */
export interface ColumnPlace {
  column: CsvColumn;
  index: number;
  /** The header as the file writes it, for messages. */
  header: string;
  /** The unit written in the header. */
  headerUnit?: string;
  /** The column holding each row's unit. */
  unitIndex?: number;
  unitHeader?: string;
}

export interface HeaderMap {
  places: Map<string, ColumnPlace>;
  problems: Problem[];
}

const snake = (text: string) => text.trim().toLowerCase().replace(/[\s-]+/g, '_').replace(/_+/g, '_');

/** Reads the header against the documented columns: unknown, doubled, missing and unit-less columns are problems of row 0. */
export function mapHeaders(headers: string[], columns: readonly CsvColumn[]): HeaderMap {
  const byName = new Map<string, CsvColumn>();
  for (const column of columns) for (const name of [column.key, ...(column.aliases ?? [])]) byName.set(name, column);
  const places = new Map<string, ColumnPlace>();
  const units = new Map<string, { index: number; header: string }>();
  const problems: Problem[] = [];
  const header = (row: number, column: string | null, message: string) => problems.push({ row, column, message });

  const claim = (column: CsvColumn, index: number, written: string, headerUnit?: string) => {
    const existing = places.get(column.key);
    if (existing) {
      header(0, written, `The column ${column.key} is given twice (also as "${existing.header}").`);
      return;
    }
    places.set(column.key, { column, index, header: written, headerUnit });
  };

  headers.forEach((raw, index) => {
    const written = raw.trim();
    if (written === '') {
      header(0, `column ${index + 1}`, 'This column has no header. Name it, or delete the column.');
      return;
    }
    const bracket = /^(.*?)\s*[[(]\s*([^\])]*?)\s*[\])]\s*$/.exec(written);
    const name = snake(bracket ? bracket[1]! : written);
    const direct = byName.get(name);
    if (direct) {
      if (bracket && isQuantity(direct)) {
        const unit = unitOf(direct.kind, bracket[2]!);
        if (!unit) return header(0, written, `Unknown unit "${bracket[2]}" for ${direct.key}: use ${describeUnits(direct.kind)}.`);
        return claim(direct, index, written, unit);
      }
      return claim(direct, index, written);
    }
    if (!bracket && name.endsWith('_unit')) {
      const base = byName.get(name.slice(0, -'_unit'.length));
      if (base && isQuantity(base)) {
        if (units.has(base.key)) return header(0, written, `The unit of ${base.key} is given in two columns.`);
        units.set(base.key, { index, header: written });
        return;
      }
    }
    if (!bracket) {
      for (const column of columns) {
        if (!isQuantity(column)) continue;
        for (const base of [column.key, ...(column.aliases ?? [])]) {
          if (!name.startsWith(`${base}_`)) continue;
          const unit = unitOf(column.kind, name.slice(base.length + 1).replace(/_/g, ' '));
          if (unit) return claim(column, index, written, unit);
        }
      }
    }
    header(0, written, `Unknown column "${written}". The columns this file may have are listed on the import page and in the import guide.`);
  });

  for (const [key, unit] of units) {
    const place = places.get(key);
    if (!place) {
      header(0, unit.header, `The unit column ${unit.header} has no ${key} column beside it.`);
      continue;
    }
    if (place.headerUnit) {
      header(0, unit.header, `The unit of ${key} is given twice: in the header "${place.header}" and in the column ${unit.header}. Keep one.`);
      continue;
    }
    place.unitIndex = unit.index;
    place.unitHeader = unit.header;
  }
  for (const place of places.values()) {
    if (isQuantity(place.column) && !place.headerUnit && place.unitIndex === undefined) {
      const example = `${place.column.key}_${unitWords(place.column.kind)[0]}`;
      header(0, place.header, `${place.column.key} has no unit: add a column ${place.column.key}_unit, or write the unit in the header, e.g. ${example} or ${place.column.key} [${Object.keys(CSV_UNIT_WORDS[place.column.kind])[0]}].`);
    }
  }
  for (const column of columns) {
    if (column.required === true && !places.has(column.key)) header(0, column.key, `The required column ${column.key} is missing.`);
  }
  return { places, problems };
}

// ── Cells ─────────────────────────────────────────────────────────────────────────────────────

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A number as written: a decimal point, or (in a semicolon file) a decimal comma; no thousands separators. */
export function parseNumber(text: string, decimalComma: boolean): number | null {
  let written = text.trim();
  if (decimalComma && !written.includes('.')) written = written.replace(/^([+-]?\d*),(\d+)$/, '$1.$2');
  if (!NUMBER.test(written)) return null;
  const value = Number(written);
  return Number.isFinite(value) ? value : null;
}

export function isIsoDate(text: string): boolean {
  const m = ISO_DATE.exec(text);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(Date.UTC(y, mo - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === mo - 1 && date.getUTCDate() === d;
}

const YES = new Set(['yes', 'y', 'true', '1']);
const NO = new Set(['no', 'n', 'false', '0']);

/**
 * The cells of one row, read by column key. Each reader records a problem naming the row and the
 * column and answers `undefined` for a bad value; `null` is an empty cell.
 */
export class RowReader {
  readonly problems: Problem[] = [];

  constructor(
    private readonly map: HeaderMap,
    private readonly cells: string[],
    readonly row: number,
    private readonly decimalComma: boolean,
  ) {}

  has(key: string): boolean {
    return this.map.places.has(key);
  }

  /** The header as the file writes it, else the key. */
  columnName(key: string): string {
    return this.map.places.get(key)?.header ?? key;
  }

  problem(key: string | null, message: string): undefined {
    this.problems.push({ row: this.row, column: key === null ? null : this.columnName(key), message });
    return undefined;
  }

  /** The trimmed text of a cell, null when empty or when the column is absent. */
  raw(key: string): string | null {
    const place = this.map.places.get(key);
    if (!place) return null;
    const value = (this.cells[place.index] ?? '').trim();
    return value === '' ? null : value;
  }

  /** Records a missing value of a required column (once per file when the column itself is missing). */
  require<T>(key: string, value: T | null | undefined, message?: string): T | undefined {
    if (value === undefined) return undefined;
    if (value === null) {
      if (this.has(key)) this.problem(key, message ?? `${this.label(key)} is required.`);
      return undefined;
    }
    return value;
  }

  label(key: string): string {
    return this.map.places.get(key)?.column.label ?? key;
  }

  text(key: string, max = 160): string | null | undefined {
    const value = this.raw(key);
    if (value !== null && value.length > max) return this.problem(key, `${this.label(key)} is at most ${max} characters.`);
    return value;
  }

  number(key: string): number | null | undefined {
    const value = this.raw(key);
    if (value === null) return null;
    const n = parseNumber(value, this.decimalComma);
    if (n === null) {
      const hint = this.decimalComma ? 'a number such as 12,5 or 12.5' : 'a number such as 12.5 (with a decimal point)';
      return this.problem(key, `"${value}" is not a number: write ${hint}, without units or thousands separators.`);
    }
    return n;
  }

  integer(key: string): number | null | undefined {
    const n = this.number(key);
    if (n == null) return n;
    if (!Number.isInteger(n)) return this.problem(key, `${this.label(key)} must be a whole number.`);
    return n;
  }

  date(key: string): string | null | undefined {
    const value = this.raw(key);
    if (value === null) return null;
    if (!isIsoDate(value)) return this.problem(key, `"${value}" is not a date: write it as YYYY-MM-DD, e.g. 2021-03-31.`);
    return value;
  }

  yesNo(key: string): boolean | null | undefined {
    const value = this.raw(key);
    if (value === null) return null;
    const word = value.toLowerCase();
    if (YES.has(word)) return true;
    if (NO.has(word)) return false;
    return this.problem(key, `"${value}" is not yes or no.`);
  }

  /** A value from a list, matched without regard to case, spaces or hyphens; `names` maps other accepted words to a value. */
  choice<T extends string>(key: string, choices: readonly T[], names: Record<string, T> = {}): T | null | undefined {
    const value = this.raw(key);
    if (value === null) return null;
    const norm = (s: string) => s.toLowerCase().replace(/[\s_-]+/g, '-');
    const found = choices.find((c) => norm(c) === norm(value)) ?? names[value.toLowerCase()];
    if (found) return found;
    const list = choices.length <= 12 ? `: use ${choices.join(', ')}` : `: use one of the codes listed with the columns on the import page, e.g. ${choices[0]}`;
    return this.problem(key, `"${value}" is not a known ${this.label(key).toLowerCase()}${list}.`);
  }

  size(key: string): string | null | undefined {
    const value = this.raw(key);
    if (value === null) return null;
    const size = findSizeClass(value);
    if (!size) return this.problem(key, `"${value}" is not a known nominal size: write it like 19, 19 mm, 3/4 in or -12.`);
    return size.code;
  }

  /** A quantity with its unit, as the API takes it (`{ value, unit }`). */
  quantity(key: string): { value: number; unit: string } | null | undefined {
    const place = this.map.places.get(key);
    if (!place) return null;
    const value = this.number(key);
    if (value === null) return null;
    if (place.headerUnit) return value === undefined ? undefined : { value, unit: place.headerUnit };
    if (place.unitIndex === undefined) return undefined; // the header problem says so
    const written = (this.cells[place.unitIndex] ?? '').trim();
    const quantity = place.column.kind as CsvQuantity;
    if (value === undefined) {
      if (written !== '' && !unitOf(quantity, written)) this.problems.push({ row: this.row, column: place.unitHeader ?? null, message: `Unknown unit "${written}" for ${key}: use ${describeUnits(quantity)}.` });
      return undefined;
    }
    if (written === '') {
      this.problems.push({ row: this.row, column: place.unitHeader ?? null, message: `The unit of ${key} is missing: use ${describeUnits(quantity)}.` });
      return undefined;
    }
    const unit = unitOf(quantity, written);
    if (!unit) {
      this.problems.push({ row: this.row, column: place.unitHeader ?? null, message: `Unknown unit "${written}" for ${key}: use ${describeUnits(quantity)}.` });
      return undefined;
    }
    return { value, unit };
  }
}
