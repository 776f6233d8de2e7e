import type { EntityManager } from 'typeorm';
import { canSeeSite } from '../../../shared/src/permissions.js';
import {
  IMPORT_COLUMNS,
  IMPORT_KIND_NEEDS_SITE,
  IMPORT_LIMITS,
  templateHeaderLine,
  type ImportJobDto,
  type ImportJobSummaryDto,
  type ImportKind,
  type ImportPreviewRow,
  type ImportStatus,
  type ImportUploadInput,
} from '../../../shared/src/schemas/csv.schema.js';
import type { AppContext } from '../context.js';
import { countDataRows, decodeUpload, mapHeaders, parseCsv, RowReader, type Problem } from '../csv/csv-reader.js';
import { presentImportJob, presentImportJobSummary } from '../csv/import-job.presenter.js';
import { capProblems, checkRow, loadLookups, type CheckedRow } from '../csv/import-rows.js';
import { writeCheckedRows } from '../csv/import-writer.js';
import { ImportJob, Site } from '../entities/index.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import { returnedRows } from '../lib/sql.js';
import type { Actor } from '../policies/actor.js';
import { loadSiteInScope } from './sites-admin.service.js';

// A CSV import runs in two steps, each in the background of the server that took the request:
// the check reads every row and lists every problem by row and column, writing nothing; the
// write, asked for only when the check found none, checks again and writes every row in one
// transaction, or nothing. Progress is kept on the job row so any page, reloaded or not, and
// any server instance can answer for it.

/** Rows between progress updates. */
const PROGRESS_EVERY = 500;
/** Rows between pauses that let the server answer other requests while a file is checked. */
const YIELD_EVERY = 100;
/** A job whose progress has not moved for this long was stopped by a server that went away. */
const STALE_AFTER = `10 minutes`;
const RECENT_JOBS = 20;

// ── Work in the background ────────────────────────────────────────────────────────────────────

const running = new Set<Promise<void>>();

function inBackground(ctx: AppContext, jobId: string, what: string, work: () => Promise<void>): void {
  const task: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
    .then(work)
    .catch((err: unknown) => ctx.logger.error({ err, jobId }, `import ${what} stopped`))
    .finally(() => running.delete(task));
  running.add(task);
}

/** Resolves when the imports this process is running have finished (for an orderly stop and for tests). */
export async function settleImportWork(): Promise<void> {
  while (running.size) await Promise.allSettled([...running]);
}

// ── Reading jobs ──────────────────────────────────────────────────────────────────────────────

const inScope = (actor: Actor, job: ImportJob) => job.siteId === null || canSeeSite(actor, job.siteId);

async function siteNames(ctx: AppContext, jobs: ImportJob[]): Promise<Map<string, string>> {
  const ids = [...new Set(jobs.map((j) => j.siteId).filter((id): id is string => id !== null))];
  if (!ids.length) return new Map();
  const rows: Array<{ id: string; name: string }> = await ctx.ds.query(`SELECT id, name FROM sites WHERE id = ANY($1::uuid[])`, [ids]);
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** Marks as failed the jobs whose server stopped mid-way; a write that stopped wrote nothing (its transaction never committed). */
async function expireStale(ctx: AppContext): Promise<void> {
  await ctx.ds.query(
    `UPDATE import_jobs SET status = 'failed', written_rows = 0, finished_at = now(), updated_at = now(),
            message = CASE status WHEN 'writing' THEN 'The server stopped while writing: nothing was written. Upload the file again.'
                                  ELSE 'The server stopped while checking the file. Upload it again.' END
      WHERE status IN ('checking', 'writing') AND updated_at < now() - interval '${STALE_AFTER}'`,
  );
}

/** Every column but the file itself, which only the check and the write read. */
const WITHOUT_CONTENT = {
  id: true,
  userId: true,
  kind: true,
  siteId: true,
  fileName: true,
  fileBytes: true,
  status: true,
  totalRows: true,
  processedRows: true,
  errorCount: true,
  problems: true,
  preview: true,
  writtenRows: true,
  message: true,
  createdAt: true,
  updatedAt: true,
  finishedAt: true,
} as const;

async function loadJob(ctx: AppContext, actor: Actor, id: string): Promise<ImportJob> {
  const job = await ctx.ds.getRepository(ImportJob).findOne({ where: { id }, select: WITHOUT_CONTENT });
  if (!job || !inScope(actor, job)) throw new NotFoundError('Import');
  return job;
}

export async function getImport(ctx: AppContext, actor: Actor, id: string): Promise<ImportJobDto> {
  await expireStale(ctx);
  const job = await loadJob(ctx, actor, id);
  return presentImportJob(job, (await siteNames(ctx, [job])).get(job.siteId ?? '') ?? null, actor);
}

/** The signed-in user's recent imports, newest first, in their sites. */
export async function listImports(ctx: AppContext, actor: Actor): Promise<ImportJobSummaryDto[]> {
  await expireStale(ctx);
  const jobs = await ctx.ds.getRepository(ImportJob).find({
    where: { userId: actor.id },
    order: { createdAt: 'DESC' },
    take: RECENT_JOBS,
    // The file, its problems and preview stay in the database: a list needs none of them.
    select: { ...WITHOUT_CONTENT, problems: false, preview: false },
  });
  const visible = jobs.filter((j) => inScope(actor, j));
  const names = await siteNames(ctx, visible);
  return visible.map((j) => presentImportJobSummary(j, names.get(j.siteId ?? '') ?? null, actor));
}

/** A header-only file for a kind, with quantities' units in the header. */
export function importTemplate(kind: ImportKind): string {
  return `\uFEFF${templateHeaderLine(kind)}\r\n`;
}

// ── Checking a file ───────────────────────────────────────────────────────────────────────────

interface CheckOutcome {
  total: number;
  errorCount: number;
  problems: Problem[];
  preview: ImportPreviewRow[];
  /** Every clean row, when asked to keep them (for the write). */
  rows: CheckedRow[];
  message: string | null;
}

/** Checks every row of a job's file against the register as `manager` sees it. */
async function checkFile(
  ctx: AppContext,
  manager: EntityManager,
  job: ImportJob,
  options: { keepRows: boolean; onTotal?: (total: number) => Promise<void>; onProgress?: (processed: number) => Promise<void> },
): Promise<CheckOutcome> {
  const table = parseCsv(job.content);
  await options.onTotal?.(table.rows.length);
  const map = mapHeaders(table.headers, IMPORT_COLUMNS[job.kind]);
  const site = job.siteId ? await manager.getRepository(Site).findOneByOrFail({ id: job.siteId }) : null;
  const now = ctx.clock.now();
  const lookups = await loadLookups(manager, job.kind, site, table, map, now);

  const problems: Problem[] = [];
  let errorCount = 0;
  const add = (list: Problem[]) => {
    errorCount += list.length;
    for (const p of list) if (problems.length < IMPORT_LIMITS.maxStoredProblems) problems.push(p);
  };
  add(map.problems);
  if (table.rows.length === 0) add([{ row: 0, column: null, message: 'The file has a header but no rows under it.' }]);
  const structural = new Map<number, Problem[]>();
  for (const p of table.problems) structural.set(p.row, [...(structural.get(p.row) ?? []), p]);
  add(structural.get(0) ?? []);

  const preview: ImportPreviewRow[] = [];
  const rows: CheckedRow[] = [];
  const outcomes = { fail: 0, warn: 0 };
  for (let i = 0; i < table.rows.length; i++) {
    const { row, cells } = table.rows[i]!;
    const reader = new RowReader(map, cells, row, table.decimalComma);
    const checked = checkRow(reader, lookups);
    add(structural.get(row) ?? []);
    add(reader.problems);
    if (checked && !structural.has(row)) {
      if (preview.length < IMPORT_LIMITS.previewRows) preview.push({ row, values: checked.preview });
      if (checked.kind === 'assemblies' && (checked.record.checkOutcome === 'fail' || checked.record.checkOutcome === 'warn')) outcomes[checked.record.checkOutcome]++;
      if (options.keepRows) rows.push(checked);
    }
    if ((i + 1) % PROGRESS_EVERY === 0) await options.onProgress?.(i + 1);
    // Checking is work for the processor: let the server answer other requests between slices.
    else if ((i + 1) % YIELD_EVERY === 0) await new Promise((resolve) => setImmediate(resolve));
  }
  const assemblies = (n: number) => `${n} installed ${n === 1 ? 'assembly' : 'assemblies'}`;
  const notes: string[] = [];
  if (outcomes.fail) notes.push(`${assemblies(outcomes.fail)} ${outcomes.fail === 1 ? 'fails' : 'fail'} a selection check at ${outcomes.fail === 1 ? 'its position' : 'their positions'}`);
  if (outcomes.warn) notes.push(`${outcomes.fail ? outcomes.warn : assemblies(outcomes.warn)} ${outcomes.warn === 1 ? 'has a check' : 'have checks'} that warn${outcomes.warn === 1 ? 's' : ''}`);
  const message = notes.length ? `${notes.join(' and ')}. They are written as they are and show in the register for a competent person to review.` : null;
  return { total: table.rows.length, errorCount, problems: capProblems(problems), preview, rows, message };
}

async function setProgress(ctx: AppContext, id: string, processed: number): Promise<void> {
  await ctx.ds.query(`UPDATE import_jobs SET processed_rows = $2, updated_at = now() WHERE id = $1`, [id, processed]);
}

async function runCheck(ctx: AppContext, jobId: string): Promise<void> {
  const job = await ctx.ds.getRepository(ImportJob).findOneByOrFail({ id: jobId });
  try {
    const out = await checkFile(ctx, ctx.ds.manager, job, {
      keepRows: false,
      onTotal: (total) => ctx.ds.query(`UPDATE import_jobs SET total_rows = $2, updated_at = now() WHERE id = $1`, [jobId, total]),
      onProgress: (processed) => setProgress(ctx, jobId, processed),
    });
    await ctx.ds.query(
      `UPDATE import_jobs SET status = 'checked', total_rows = $2, processed_rows = $2, error_count = $3, problems = $4, preview = $5, message = $6, updated_at = now()
        WHERE id = $1 AND status = 'checking'`,
      [jobId, out.total, out.errorCount, JSON.stringify(out.problems), JSON.stringify(out.preview), out.message],
    );
  } catch (err) {
    ctx.logger.error({ err, jobId }, 'import check failed');
    await failJob(ctx, jobId, 'The check stopped on an unexpected error, which was logged. Nothing was written. Try again, or ask your administrator.');
  }
}

async function failJob(ctx: AppContext, jobId: string, message: string, problems?: { list: Problem[]; count: number }): Promise<void> {
  await ctx.ds.query(
    `UPDATE import_jobs SET status = 'failed', written_rows = 0, message = $2, content = '', finished_at = now(), updated_at = now()
            ${problems ? ', problems = $3, error_count = $4' : ''}
      WHERE id = $1`,
    problems ? [jobId, message, JSON.stringify(problems.list), problems.count] : [jobId, message],
  );
}

/** Takes an upload: refuses what cannot be read at once (400), then checks it in the background. Answers the new job. */
export async function startImport(ctx: AppContext, actor: Actor, input: ImportUploadInput, file: Express.Multer.File | undefined): Promise<ImportJobDto> {
  const needsSite = IMPORT_KIND_NEEDS_SITE[input.kind];
  const site = needsSite && input.siteId ? await loadSiteInScope(ctx.ds.manager, actor, input.siteId) : null;
  if (!file) throw new ValidationError('Choose a CSV file to upload', 'file', 'file_required');
  if (file.buffer.subarray(0, 4).equals(Buffer.from([0x50, 0x4b, 0x03, 0x04]))) {
    throw new ValidationError('This is a spreadsheet workbook, not a CSV file. Save it as "CSV UTF-8" and upload that.', 'file', 'not_csv');
  }
  const content = decodeUpload(file.buffer);
  if (content.trim() === '') throw new ValidationError('The file is empty', 'file', 'empty_file');
  const rows = countDataRows(content);
  if (rows > IMPORT_LIMITS.maxRows) {
    throw new ValidationError(`The file has ${rows.toLocaleString('en')} rows; an import takes at most ${IMPORT_LIMITS.maxRows.toLocaleString('en')}. Split it into smaller files.`, 'file', 'too_many_rows');
  }
  const job = await ctx.ds.getRepository(ImportJob).save({
    userId: actor.id,
    kind: input.kind,
    siteId: site?.id ?? null,
    fileName: (file.originalname || 'upload.csv').slice(0, 200),
    fileBytes: file.size,
    content,
    status: 'checking',
    totalRows: 0,
    processedRows: 0,
    errorCount: 0,
    problems: [],
    preview: [],
    writtenRows: 0,
    message: null,
    finishedAt: null,
  });
  inBackground(ctx, job.id, 'check', () => runCheck(ctx, job.id));
  return presentImportJob(job, site?.name ?? null, actor);
}

// ── Writing ───────────────────────────────────────────────────────────────────────────────────

/** Found again at write time: the register changed since the check. */
class RecheckFailed extends Error {
  constructor(readonly outcome: CheckOutcome) {
    super('The register changed since the check');
  }
}

const UNIQUE_VIOLATION = '23505';

async function runWrite(ctx: AppContext, actor: Actor, jobId: string): Promise<void> {
  const job = await ctx.ds.getRepository(ImportJob).findOneByOrFail({ id: jobId });
  try {
    await ctx.ds.transaction(async (manager) => {
      const out = await checkFile(ctx, manager, job, { keepRows: true });
      if (out.errorCount > 0) throw new RecheckFailed(out);
      const written = await writeCheckedRows(
        { manager, actorId: actor.id, jobId, kind: job.kind, now: ctx.clock.now(), progress: (n) => setProgress(ctx, jobId, n) },
        out.rows,
        job.siteId,
      );
      const done = returnedRows(
        await manager.query(
          `UPDATE import_jobs SET status = 'done', written_rows = $2, processed_rows = $2, content = '', finished_at = now(), updated_at = now()
            WHERE id = $1 AND status = 'writing' RETURNING id`,
          [jobId, written],
        ),
      );
      // Marked stopped meanwhile: undo rather than write behind the page's back.
      if (done.length === 0) throw new Error('The import was marked as stopped while it was writing');
    });
  } catch (err) {
    if (err instanceof RecheckFailed) {
      await failJob(ctx, jobId, `The register changed since the check: ${err.outcome.errorCount} ${err.outcome.errorCount === 1 ? 'row no longer fits' : 'problems were found'}. Nothing was written. Correct the file and upload it again.`, {
        list: err.outcome.problems,
        count: err.outcome.errorCount,
      });
      return;
    }
    const code = (err as { code?: string }).code;
    if (code === UNIQUE_VIOLATION) {
      await failJob(ctx, jobId, 'Someone added a record with one of these codes while the file was being written. Nothing was written. Upload the file again to check it afresh.');
      return;
    }
    ctx.logger.error({ err, jobId }, 'import write failed');
    await failJob(ctx, jobId, 'The write stopped on an unexpected error, which was logged. Nothing was written.');
  }
}

const NOT_READY: Record<Exclude<ImportStatus, 'checked'>, string> = {
  checking: 'is still being checked',
  writing: 'is already being written',
  done: 'has already been written',
  failed: 'failed',
};

/** Starts writing a checked job with no problems; answers the job, now writing. */
export async function writeImport(ctx: AppContext, actor: Actor, id: string): Promise<ImportJobDto> {
  const job = await loadJob(ctx, actor, id);
  if (job.status !== 'checked') throw new ConflictError('import_not_ready', `This import ${NOT_READY[job.status]}; only a checked file can be written.`);
  if (job.errorCount > 0) throw new ConflictError('import_has_problems', 'The file has problems: correct them and upload it again. Nothing is written until every row is clean.');
  if (job.totalRows === 0) throw new ConflictError('import_empty', 'The file has no rows to write.');
  const claimed = returnedRows(
    await ctx.ds.query(
      `UPDATE import_jobs SET status = 'writing', processed_rows = 0, updated_at = now() WHERE id = $1 AND status = 'checked' AND error_count = 0 RETURNING id`,
      [id],
    ),
  );
  if (claimed.length === 0) throw new ConflictError('import_not_ready', 'Someone has just started writing this import.');
  inBackground(ctx, id, 'write', () => runWrite(ctx, actor, id));
  return getImport(ctx, actor, id);
}
