import { roleMay } from '../../../shared/src/permissions.js';
import type { ImportJobDto, ImportJobSummaryDto, ImportPreviewRow } from '../../../shared/src/schemas/csv.schema.js';
import type { ImportJob } from '../entities/index.js';
import type { Actor } from '../policies/actor.js';

export function presentImportJobSummary(job: ImportJob, siteName: string | null, actor: Actor): ImportJobSummaryDto {
  return {
    id: job.id,
    kind: job.kind,
    siteId: job.siteId,
    siteName,
    fileName: job.fileName,
    fileBytes: job.fileBytes,
    status: job.status,
    totalRows: job.totalRows,
    processedRows: job.processedRows,
    errorCount: job.errorCount,
    writtenRows: job.writtenRows,
    message: job.message,
    createdAt: job.createdAt.toISOString(),
    updatedAt: job.updatedAt.toISOString(),
    finishedAt: job.finishedAt?.toISOString() ?? null,
    abilities: { write: roleMay(actor.role, 'imports.run') && job.status === 'checked' && job.errorCount === 0 && job.totalRows > 0 },
  };
}

export function presentImportJob(job: ImportJob, siteName: string | null, actor: Actor): ImportJobDto {
  return {
    ...presentImportJobSummary(job, siteName, actor),
    problems: job.problems.map((p) => ({ row: p.row, column: p.column, message: p.message })),
    moreProblems: Math.max(0, job.errorCount - job.problems.length),
    preview: job.preview as unknown as ImportPreviewRow[],
  };
}
