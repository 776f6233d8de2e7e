import { useEffect, useRef, type ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { IMPORT_KIND_LABELS, IMPORT_LIMITS, type ImportJobDto } from '@shared/schemas/csv.schema';
import { paths } from '@/config/paths';
import { describeError, isApiError } from '@/lib/api-client';
import { countOf, formatDateTime } from '@/lib/format';
import { meKeys } from '@/lib/query-keys';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { CheckIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useImport } from '../api/get-import';
import { useWriteImport } from '../api/write-import';
import { ImportPreviewTable } from './import-preview-table';
import { ImportProblemsTable } from './import-problems-table';
import { ImportProgress } from './import-progress';
import { formatBytes, ImportStatusBadge, kindWord } from './import-values';

/** One import from upload to result: progress while the server works, then the problems or the rows, then what was written. */
export function ImportJobPanel({ jobId, startAgain }: { jobId: string; startAgain: ReactNode }) {
  const job = useImport(jobId);
  if (job.isPending) return <SkeletonBlock label="Loading the import…" lines={5} className="rounded-[var(--radius-card)] border border-ink-200 bg-white p-5" />;
  if (job.isError) {
    const missing = isApiError(job.error) && job.error.status === 404;
    return (
      <div className="flex flex-col items-start gap-4">
        <ErrorState
          className="self-stretch"
          title={missing ? 'This import was not found' : 'The import could not be loaded'}
          message={missing ? 'It may belong to a site you no longer have, or the address is wrong. Start a new import instead.' : describeError(job.error)}
          onRetry={missing ? undefined : () => void job.refetch()}
          retrying={job.isFetching}
        />
        {startAgain}
      </div>
    );
  }
  return <JobView job={job.data} startAgain={startAgain} />;
}

function JobView({ job, startAgain }: { job: ImportJobDto; startAgain: ReactNode }) {
  const titleId = `import-${job.id}`;
  useRefreshAfterWrite(job);
  const what = IMPORT_KIND_LABELS[job.kind].toLowerCase();
  return (
    <div className="flex flex-col gap-6">
      <Card labelledBy={titleId}>
        <CardHeader
          titleId={titleId}
          title={job.fileName}
          description={`${IMPORT_KIND_LABELS[job.kind]}${job.siteName ? ` for ${job.siteName}` : ''} · ${formatBytes(job.fileBytes)} · uploaded ${formatDateTime(job.createdAt)}`}
          actions={<ImportStatusBadge status={job.status} errorCount={job.errorCount} />}
        />
        <CardBody className="flex flex-col gap-5">
          {job.status === 'checking' ? (
            <ImportProgress label={`Checking the ${what}`} processed={job.processedRows} total={job.totalRows} />
          ) : job.status === 'writing' ? (
            <>
              <ImportProgress label={`Writing ${countOf(job.totalRows, kindWord(job.kind, 1), kindWord(job.kind))}`} processed={job.processedRows} total={job.totalRows} />
              <p className="text-ink-700">Every row goes in together, in one step: if anything stops it, nothing is written. You may leave this page; the write carries on.</p>
            </>
          ) : (
            <Summary job={job} startAgain={startAgain} />
          )}
          {job.status === 'checking' ? <p className="text-ink-700">You may leave this page: the check carries on, and this page picks it up again when you come back.</p> : null}
        </CardBody>
      </Card>
      {(job.status === 'checked' || job.status === 'failed') && job.problems.length > 0 ? (
        <PanelBoundary title="The problems could not be shown">
          <ProblemsCard job={job} />
        </PanelBoundary>
      ) : null}
      {job.status === 'checked' && job.errorCount === 0 && job.preview.length > 0 ? (
        <PanelBoundary title="The preview could not be shown">
          <Card labelledBy={`${titleId}-preview`}>
            <CardHeader
              titleId={`${titleId}-preview`}
              title="The first rows as they will be written"
              description={job.totalRows > job.preview.length ? `${job.preview.length} of ${job.totalRows.toLocaleString()} rows, in your units` : 'Every row, in your units'}
            />
            <CardBody>
              <ImportPreviewTable kind={job.kind} rows={job.preview} />
            </CardBody>
          </Card>
        </PanelBoundary>
      ) : null}
    </div>
  );
}

/** Once rows are written, whatever the app has cached of the catalogue and the register is out of date. */
function useRefreshAfterWrite(job: ImportJobDto) {
  const queryClient = useQueryClient();
  const seen = useRef(job.status);
  useEffect(() => {
    if (seen.current !== 'done' && job.status === 'done') void queryClient.invalidateQueries({ predicate: (query) => query.queryKey[0] !== meKeys.all[0] });
    seen.current = job.status;
  }, [job.status, queryClient]);
}

function Counts({ items }: { items: Array<{ label: string; value: number; tone?: 'danger' | 'success' }> }) {
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
      {items.map((item) => (
        <div key={item.label} className="rounded-[var(--radius-control)] border border-ink-200 bg-ink-50 px-4 py-3">
          <dt className="text-sm font-semibold text-ink-700">{item.label}</dt>
          <dd className={item.tone === 'danger' ? 'text-2xl font-bold text-danger-800' : item.tone === 'success' ? 'text-2xl font-bold text-success-700' : 'text-2xl font-bold text-ink-950'}>
            {item.value.toLocaleString()}
          </dd>
        </div>
      ))}
    </dl>
  );
}

function Summary({ job, startAgain }: { job: ImportJobDto; startAgain: ReactNode }) {
  const write = useWriteImport();
  const rows = countOf(job.totalRows, kindWord(job.kind, 1), kindWord(job.kind));

  if (job.status === 'done') {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title={`${countOf(job.writtenRows, kindWord(job.kind, 1), kindWord(job.kind))} written`}>
          {job.finishedAt ? `Finished ${formatDateTime(job.finishedAt)}.` : null} {job.message}
        </Alert>
        <div className="flex flex-wrap gap-3">
          <ResultLinks job={job} />
          {startAgain}
        </div>
      </div>
    );
  }

  if (job.status === 'failed') {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="danger" title="Nothing was written">
          {job.message ?? 'The import stopped.'}
        </Alert>
        <div className="flex flex-wrap gap-3">{startAgain}</div>
      </div>
    );
  }

  // Checked.
  const clean = job.errorCount === 0;
  return (
    <div className="flex flex-col gap-4">
      <Counts
        items={[
          { label: 'Rows in the file', value: job.totalRows },
          { label: 'Problems', value: job.errorCount, tone: clean ? 'success' : 'danger' },
        ]}
      />
      {clean ? (
        job.totalRows === 0 ? (
          <Alert tone="info" title="The file has no rows">Add rows under the header and upload it again.</Alert>
        ) : (
          <Alert tone="success" title="Every row is clean">
            {job.message ?? `The ${rows} are ready to write. Check the preview below, then write them.`}
          </Alert>
        )
      ) : (
        <Alert tone="danger" title={`${countOf(job.errorCount, 'problem')} to correct`}>
          Nothing is written until the whole file is clean. Correct the file where each problem says, save it, and upload it again.
          {job.message ? ` ${job.message}` : ''}
        </Alert>
      )}
      {write.isError ? <Alert tone="danger" title="The write could not start">{describeError(write.error)}</Alert> : null}
      <div className="flex flex-col gap-3 sm:flex-row sm:flex-wrap">
        {job.abilities.write ? (
          <Button
            size="lg"
            icon={<CheckIcon />}
            loading={write.isPending}
            onClick={() => write.mutate(job.id)}
          >
            Write {rows}
          </Button>
        ) : null}
        {startAgain}
      </div>
    </div>
  );
}

function ResultLinks({ job }: { job: ImportJobDto }) {
  const site = job.siteId ? new URLSearchParams({ siteId: job.siteId }) : undefined;
  if (job.kind === 'constructions') {
    return (
      <>
        <ButtonLink variant="primary" to={paths.catalogue.constructions.getHref()}>
          Open the catalogue
        </ButtonLink>
        <ButtonLink to={paths.register.getHref()}>Open the register</ButtonLink>
      </>
    );
  }
  if (job.kind === 'positions') {
    return (
      <>
        <ButtonLink variant="primary" to={paths.catalogue.places.getHref(job.siteId ?? undefined)}>
          Open sites and equipment
        </ButtonLink>
        <ButtonLink to={paths.register.getHref(site)}>Open the register</ButtonLink>
      </>
    );
  }
  return (
    <ButtonLink variant="primary" to={paths.register.getHref(site)}>
      Open the register{job.siteName ? ` for ${job.siteName}` : ''}
    </ButtonLink>
  );
}

function ProblemsCard({ job }: { job: ImportJobDto }) {
  const titleId = `import-${job.id}-problems`;
  return (
    <Card labelledBy={titleId}>
      <CardHeader
        titleId={titleId}
        title="Problems by row and column"
        description="Row 1 is the first row under the header: line 2 in a spreadsheet."
      />
      <CardBody className="flex flex-col gap-3">
        {job.moreProblems > 0 ? (
          <Alert tone="info" title={`The first ${job.problems.length.toLocaleString()} problems are listed; ${job.moreProblems.toLocaleString()} more are not`}>
            At most {IMPORT_LIMITS.maxStoredProblems.toLocaleString()} are kept. Correct these, upload again, and the rest will show.
          </Alert>
        ) : null}
        <ImportProblemsTable problems={job.problems} />
      </CardBody>
    </Card>
  );
}
