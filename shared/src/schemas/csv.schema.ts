import { z } from 'zod';
import { REINFORCEMENTS, ELECTRICAL_PROPERTIES } from '../checks/types.js';
import { MEDIA, TUBE_COMPOUNDS } from '../checks/compatibility.js';
import { CRITICALITY_LEVELS } from '../services/criticality.js';
import { SERVICE_CODES } from '../services/service-catalogue.js';
import { LENGTH_UNITS, PRESSURE_UNITS, TEMPERATURE_UNITS } from '../units/units.js';
import { PROOF_TEST_MEDIA, assemblyListQuerySchema } from './assemblies.schema.js';
import { uuidSchema } from './common.schema.js';

// The columns of Ferrule's CSV files, in one place: the server reads and writes them, the import
// screen shows them, and docs/csv-import.md describes them.

export const IMPORT_KINDS = ['constructions', 'positions', 'assemblies'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];
export const IMPORT_KIND_LABELS: Record<ImportKind, string> = {
  constructions: 'Constructions',
  positions: 'Positions',
  assemblies: 'Assemblies',
};
/** Whether rows of this kind belong to one site, chosen when the file is uploaded. */
export const IMPORT_KIND_NEEDS_SITE: Record<ImportKind, boolean> = { constructions: false, positions: true, assemblies: true };

export const IMPORT_STATUSES = ['checking', 'checked', 'writing', 'done', 'failed'] as const;
export type ImportStatus = (typeof IMPORT_STATUSES)[number];

/** What one upload may hold. A larger file is refused before it is read. */
export const IMPORT_LIMITS = {
  maxBytes: 10 * 1024 * 1024,
  maxRows: 100_000,
  /** Problems kept with the job; the count of the rest is still given. */
  maxStoredProblems: 1000,
  /** Rows shown in the preview, as they will be written. */
  previewRows: 20,
} as const;

/** The unit words a file may use for each kind of quantity (case does not matter). */
export const CSV_UNIT_WORDS = {
  pressure: { kPa: ['kpa'], bar: ['bar'], psi: ['psi'], MPa: ['mpa'] },
  length: { mm: ['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'], in: ['in', 'inch', 'inches', '"'], m: ['m', 'metre', 'metres', 'meter', 'meters'], ft: ['ft', 'foot', 'feet'] },
  temperature: { C: ['c', '°c', 'degc', 'deg c', 'celsius'], F: ['f', '°f', 'degf', 'deg f', 'fahrenheit'] },
} as const satisfies {
  pressure: Record<(typeof PRESSURE_UNITS)[number], readonly string[]>;
  length: Record<(typeof LENGTH_UNITS)[number], readonly string[]>;
  temperature: Record<(typeof TEMPERATURE_UNITS)[number], readonly string[]>;
};

export type CsvQuantity = keyof typeof CSV_UNIT_WORDS;
export type CsvValueKind = 'text' | 'code' | 'size' | 'number' | 'integer' | 'date' | 'yes-no' | 'choice' | CsvQuantity;

/** One column of an import file. */
export interface CsvColumn {
  /** The header, in snake_case; a quantity's header may carry its unit (`working_pressure_bar`, `working_pressure [psi]`). */
  key: string;
  label: string;
  kind: CsvValueKind;
  /** `true`: every row needs a value; `false`: may be left empty; a sentence: needed in the case it names. */
  required: boolean | string;
  description: string;
  /** Other headers read as this column. */
  aliases?: readonly string[];
  /** The accepted values of a choice (case does not matter). */
  choices?: readonly string[];
  /** The unit of the example file's header, for a quantity. */
  exampleUnit?: string;
}

const code = (key: string, label: string, description: string, required: CsvColumn['required'] = true, aliases?: string[]): CsvColumn => ({
  key,
  label,
  kind: 'code',
  required,
  description,
  aliases,
});
const text = (key: string, label: string, description: string, required: CsvColumn['required'] = false): CsvColumn => ({ key, label, kind: 'text', required, description });
const quantity = (key: string, label: string, kind: CsvQuantity, exampleUnit: string, description: string, required: CsvColumn['required'] = false, aliases?: string[]): CsvColumn => ({
  key,
  label,
  kind,
  required,
  description,
  exampleUnit,
  aliases,
});
const choice = (key: string, label: string, choices: readonly string[], description: string, required: CsvColumn['required'] = false): CsvColumn => ({
  key,
  label,
  kind: 'choice',
  required,
  choices,
  description,
});
const yesNo = (key: string, label: string, description: string): CsvColumn => ({ key, label, kind: 'yes-no', required: false, description });
const date = (key: string, label: string, description: string, required: CsvColumn['required'] = false): CsvColumn => ({ key, label, kind: 'date', required, description });
const integer = (key: string, label: string, description: string): CsvColumn => ({ key, label, kind: 'integer', required: false, description });

const SIZE_WORDS = 'Any written form of the nominal bore: 19, 19 mm, 3/4 in, 3/4", -12 or dash 12 are one size.';

export const CONSTRUCTION_COLUMNS: readonly CsvColumn[] = [
  code('code', 'Construction code', "The plant's own code for the hose build; unique across the plant. Letters, digits and . _ / - only, at most 40 characters."),
  text('name', 'Name', 'What the hose is, in words, e.g. "Air hose, textile, NBR tube".', true),
  { key: 'size', label: 'Nominal size', kind: 'size', required: true, description: SIZE_WORDS, aliases: ['nominal_size', 'bore'] },
  choice('tube_compound', 'Tube compound', TUBE_COMPOUNDS, 'The tube compound by its abbreviation.'),
  choice('reinforcement', 'Reinforcement', REINFORCEMENTS, 'How the hose is reinforced.'),
  text('cover_compound', 'Cover compound', 'Free text, at most 40 characters.'),
  quantity('working_pressure', 'Working pressure', 'pressure', 'bar', 'Maximum working pressure.'),
  quantity('burst_pressure', 'Burst pressure', 'pressure', 'bar', 'Minimum burst pressure; at least the working pressure.'),
  quantity('vacuum_rating', 'Vacuum rating', 'pressure', 'kPa', 'Vacuum withstood, below atmospheric; empty when not rated for vacuum.'),
  quantity('min_temp', 'Lowest temperature', 'temperature', 'C', 'Lowest service temperature.'),
  quantity('max_temp', 'Highest temperature', 'temperature', 'C', 'Highest service temperature; at least the lowest.'),
  quantity('min_bend_radius', 'Minimum bend radius', 'length', 'mm', 'Tightest bend the hose is rated for.', false, ['bend_radius']),
  { key: 'weight_kg_per_m', label: 'Weight, kg per metre', kind: 'number', required: false, description: 'Weight per length in kilograms per metre.' },
  choice('electrical', 'Electrical property', ELECTRICAL_PROPERTIES, 'Whether the hose is conductive or static-dissipative.'),
  yesNo('food_contact_certified', 'Food contact certified', 'yes or no.'),
  text('maker', 'Maker', "The plant's supplier, as free text."),
  text('part_number', 'Part number', "The supplier's part number, as free text."),
  integer('service_life_months', 'Service life, months', 'Replace after this many months in service.'),
  integer('shelf_life_months', 'Shelf life, months', 'Unused hose is not to be built after this many months from manufacture.'),
  integer('storage_life_months', 'Storage life, months', 'A built assembly in stock is re-tested or scrapped after this many months.'),
  text('notes', 'Notes', 'Free text.'),
];

export const POSITION_COLUMNS: readonly CsvColumn[] = [
  code('code', 'Position code', 'The code of the hose point, unique at the site; it stays when the hose in it is replaced.'),
  text('name', 'Name', 'What the position is, e.g. "Main air supply".', true),
  code('equipment', 'Equipment asset number', 'The asset number of equipment already set up at the site (Sites and equipment).', true, ['equipment_asset_number', 'asset_number']),
  choice('service', 'Service', SERVICE_CODES, 'What the hose does: the service code, or its name as the catalogue writes it ("Compressed air").', true),
  choice('medium', 'Medium', MEDIA.map((m) => m.code), 'What flows, by the code of the compatibility table; empty when not known.'),
  quantity('max_operating_pressure', 'Maximum operating pressure', 'pressure', 'bar', 'The highest pressure the hose at this position can see.', false, ['max_pressure']),
  quantity('min_temp', 'Lowest temperature', 'temperature', 'C', 'Lowest temperature at the position.'),
  quantity('max_temp', 'Highest temperature', 'temperature', 'C', 'Highest temperature at the position; at least the lowest.'),
  { key: 'size', label: 'Required size', kind: 'size', required: true, description: SIZE_WORDS, aliases: ['nominal_size', 'bore'] },
  quantity('required_length', 'Required length', 'length', 'm', 'Overall length the position needs.'),
  text('end_a_connection', 'End A connection', 'What end A connects to, as free text.'),
  text('end_b_connection', 'End B connection', 'What end B connects to, as free text.'),
  yesNo('suction_duty', 'Suction duty', "yes or no; empty takes the service's setting."),
  quantity('routed_bend_radius', 'Routed bend radius', 'length', 'mm', 'The tightest bend the hose is routed through.', false, ['bend_radius']),
  choice('criticality', 'Criticality', CRITICALITY_LEVELS, 'high, medium or low; empty is medium.'),
  integer('inspection_interval_days', 'Inspection interval, days', "The position's own interval; empty takes the service's, adjusted by criticality."),
  text('notes', 'Notes', 'Free text.'),
];

export const ASSEMBLY_COLUMNS: readonly CsvColumn[] = [
  code('tag_code', 'Tag code', 'A Ferrule tag already fixed to the hose, e.g. 3KQ-7VM-X; empty gives the assembly a new tag code to print.', false, ['tag', 'number']),
  code('construction', 'Construction code', 'The code of a construction in the catalogue.', true, ['construction_code']),
  code('position', 'Position code', 'Where the hose is installed now, by the position code at the site; empty for a hose in stock.', false, ['position_code']),
  text('store_location', 'Store location', 'Where a hose in stock is kept.'),
  text('hose_batch', 'Hose batch', "The hose maker's batch or lot."),
  date('hose_manufactured_on', 'Hose manufactured on', 'Date the hose itself was made.'),
  quantity('overall_length', 'Overall length', 'length', 'mm', 'Length of the assembly end to end.', true, ['length']),
  quantity('cut_length', 'Cut length', 'length', 'mm', 'Length of hose cut; at most the overall length.'),
  code('end_a_fitting', 'End A fitting code', 'The code of a fitting type in the catalogue.', false),
  quantity('end_a_crimp_diameter', 'End A crimp diameter', 'length', 'mm', 'Measured crimp diameter at end A.'),
  code('end_b_fitting', 'End B fitting code', 'The code of a fitting type in the catalogue.', false),
  quantity('end_b_crimp_diameter', 'End B crimp diameter', 'length', 'mm', 'Measured crimp diameter at end B.'),
  date('built_on', 'Built on', 'Date the assembly was made up; for an old hose, your best estimate with built_on_estimated = yes.', true),
  yesNo('built_on_estimated', 'Build date estimated', 'yes when the build date is an estimate.'),
  text('builder', 'Builder', 'Who made it up: a hose shop or a person.'),
  { key: 'cost', label: 'Cost', kind: 'number', required: false, description: "What the assembly cost, in the site's currency." },
  date('installed_on', 'Installed on', 'Date it went into its position; for an old hose, your best estimate with installed_on_estimated = yes.', 'when position is given'),
  yesNo('installed_on_estimated', 'Install date estimated', 'yes when the install date is an estimate.'),
  yesNo('predates_records', 'Predates records', 'yes when the hose was in place before records began, so its true age is not known.'),
  date('proof_test_on', 'Proof test on', 'Date of its latest proof test.', 'with any proof test column'),
  quantity('proof_test_pressure', 'Proof test pressure held', 'pressure', 'bar', 'The pressure held in the test.', 'with any proof test column'),
  choice('proof_test_result', 'Proof test result', ['pass', 'fail'], 'pass or fail.', 'with any proof test column'),
  quantity('proof_test_required_pressure', 'Proof test pressure required', 'pressure', 'bar', "The pressure the test called for; empty takes half the construction's burst pressure."),
  choice('proof_test_medium', 'Proof test medium', PROOF_TEST_MEDIA, 'Proof tests are hydrostatic: water, water-glycol or hydraulic-oil; empty is water. Never test with air or gas.'),
  integer('proof_test_hold_seconds', 'Proof test hold, seconds', 'How long the pressure was held; empty is 60.'),
  text('proof_test_tester', 'Proof tested by', 'Who made the test; empty records "not recorded".'),
  text('notes', 'Notes', 'Free text.'),
];

export const IMPORT_COLUMNS: Record<ImportKind, readonly CsvColumn[]> = {
  constructions: CONSTRUCTION_COLUMNS,
  positions: POSITION_COLUMNS,
  assemblies: ASSEMBLY_COLUMNS,
};

/** The header of a column as the templates and example files write it: quantities with their unit. */
export function templateHeader(column: CsvColumn): string {
  return column.exampleUnit ? `${column.key}_${column.exampleUnit.toLowerCase()}` : column.key;
}

/** The header line of the template of a kind. */
export function templateHeaderLine(kind: ImportKind): string {
  return IMPORT_COLUMNS[kind].map(templateHeader).join(',');
}

// ── The import request and its job ────────────────────────────────────────────────────────────

/** The text fields sent with the file. */
export const importUploadSchema = z
  .object({
    kind: z.enum(IMPORT_KINDS, { message: 'Choose what the file holds: constructions, positions or assemblies' }),
    siteId: z.preprocess((v) => (v === '' ? undefined : v), uuidSchema.optional()),
  })
  .refine((v) => !IMPORT_KIND_NEEDS_SITE[v.kind] || v.siteId, { message: 'Choose the site the rows belong to', path: ['siteId'] });
export type ImportUploadInput = z.infer<typeof importUploadSchema>;

export const importTemplateParamsSchema = z.strictObject({ kind: z.enum(IMPORT_KINDS, { message: 'Unknown kind of import' }) });

/** One problem in an uploaded file. `row` 1 is the first row under the header; 0 is the header itself. */
export interface ImportProblemDto {
  row: number;
  column: string | null;
  message: string;
}

/**
 * One row as it will be written: values by column key; quantities in kPa, mm or °C, sizes as
 * size-class codes, dates ISO, yes/no as booleans.
 */
export interface ImportPreviewRow {
  row: number;
  values: Record<string, string | number | boolean | null>;
}

export interface ImportJobSummaryDto {
  id: string;
  kind: ImportKind;
  siteId: string | null;
  siteName: string | null;
  fileName: string;
  fileBytes: number;
  status: ImportStatus;
  totalRows: number;
  /** Rows checked (while checking) or written (while writing). */
  processedRows: number;
  errorCount: number;
  writtenRows: number;
  message: string | null;
  createdAt: string;
  updatedAt: string;
  finishedAt: string | null;
  abilities: { write: boolean };
}

export interface ImportJobDto extends ImportJobSummaryDto {
  /** The first problems, by row and column (at most IMPORT_LIMITS.maxStoredProblems). */
  problems: ImportProblemDto[];
  /** How many problems there are beyond those listed. */
  moreProblems: number;
  preview: ImportPreviewRow[];
}

// ── The export ────────────────────────────────────────────────────────────────────────────────

/** The register's query without paging: the export has every row of the view. */
export const assemblyExportQuerySchema = assemblyListQuerySchema.omit({ page: true, pageSize: true });
export type AssemblyExportQuery = z.infer<typeof assemblyExportQuerySchema>;

/** The columns of the register export, in order; a quantity's header carries the reader's unit. */
export const EXPORT_COLUMNS = [
  { key: 'tag_code', label: 'Tag code' },
  { key: 'status', label: 'Status' },
  { key: 'site', label: 'Site' },
  { key: 'area', label: 'Area' },
  { key: 'equipment', label: 'Equipment asset number' },
  { key: 'equipment_name', label: 'Equipment' },
  { key: 'position', label: 'Position code' },
  { key: 'position_name', label: 'Position' },
  { key: 'service', label: 'Service' },
  { key: 'construction', label: 'Construction code' },
  { key: 'construction_name', label: 'Construction' },
  { key: 'size', label: 'Nominal size' },
  { key: 'check_outcome', label: 'Selection checks' },
  { key: 'overridden', label: 'Check overridden' },
  { key: 'next_inspection_due', label: 'Next inspection due' },
  { key: 'installed_on', label: 'Installed on' },
  { key: 'installed_on_estimated', label: 'Install date estimated' },
  { key: 'predates_records', label: 'Predates records' },
  { key: 'allowable_pressure', label: 'Allowable pressure', quantity: 'pressure' },
  { key: 'max_operating_pressure', label: 'Maximum operating pressure', quantity: 'pressure' },
  { key: 'overall_length', label: 'Overall length', quantity: 'length' },
  { key: 'built_on', label: 'Built on' },
  { key: 'hose_batch', label: 'Hose batch' },
  { key: 'store_location', label: 'Store location' },
  { key: 'proof_test_on', label: 'Proof test on' },
  { key: 'proof_test_result', label: 'Proof test result' },
] as const satisfies ReadonlyArray<{ key: string; label: string; quantity?: 'pressure' | 'length' }>;
