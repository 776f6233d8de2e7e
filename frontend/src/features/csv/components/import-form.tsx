import { useEffect, useId, useRef, useState, type DragEvent } from 'react';
import { useForm, useWatch, type UseFormRegisterReturn } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { IMPORT_KIND_NEEDS_SITE, IMPORT_LIMITS, importUploadSchema, type ImportJobDto, type ImportKind } from '@shared/schemas/csv.schema';
import { applyServerError } from '@/lib/form-errors';
import { cn } from '@/lib/cn';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SheetIcon } from '@/components/ui/icons';
import { ErrorState } from '@/components/ui/error-state';
import { FieldError, SelectField } from '@/components/ui/field';
import { UploadIcon } from '@/components/ui/icons';
import { RadioTiles } from '@/components/ui/radio-tiles';
import { Skeleton } from '@/components/ui/skeleton';
import { useSites } from '@/features/sites/api/get-sites';
import { useUploadImport } from '../api/upload-import';
import { formatBytes, KIND_OPTIONS } from './import-values';

interface ImportFormProps {
  defaultKind?: ImportKind;
  defaultSiteId?: string;
  onKindChange?: (kind: ImportKind) => void;
  onUploaded: (job: ImportJobDto) => void;
}

/** Says what the file holds and where it belongs, takes the file by drop or by picking, and uploads it. */
export function ImportForm({ defaultKind = 'assemblies', defaultSiteId = '', onKindChange, onUploaded }: ImportFormProps) {
  const form = useForm({
    resolver: zodResolver(importUploadSchema),
    defaultValues: { kind: defaultKind, siteId: defaultSiteId },
  });
  const { register, handleSubmit, setError, control, formState: { errors } } = form;
  const kind = useWatch({ control, name: 'kind' });
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | undefined>();
  const upload = useUploadImport({ onSuccess: onUploaded });

  useEffect(() => onKindChange?.(kind), [kind, onKindChange]);

  const chooseFile = (chosen: File | null | undefined) => {
    upload.reset();
    if (!chosen) return;
    if (chosen.size > IMPORT_LIMITS.maxBytes) {
      setFile(null);
      setFileError(`${chosen.name} is ${formatBytes(chosen.size)}; a file may be at most ${formatBytes(IMPORT_LIMITS.maxBytes)}. Split it into smaller files.`);
      return;
    }
    setFile(chosen);
    setFileError(undefined);
  };

  const onSubmit = handleSubmit((values) => {
    if (!file) {
      setFileError('Choose the CSV file to import.');
      return;
    }
    upload.mutate(
      { kind: values.kind, siteId: IMPORT_KIND_NEEDS_SITE[values.kind] ? values.siteId : undefined, file },
      {
        onError: (error) => {
          if (error instanceof Error && 'field' in error && error.field === 'file') setFileError(error.message);
          else applyServerError(error, setError, ['siteId', 'kind']);
        },
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label="Upload a CSV file">
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <RadioTiles legend="What does the file hold?" options={KIND_OPTIONS} error={errors.kind?.message} {...register('kind')} />
      {IMPORT_KIND_NEEDS_SITE[kind] ? <SiteSelect error={errors.siteId?.message} registration={register('siteId')} /> : null}
      <FileDrop file={file} error={fileError} onFile={chooseFile} />
      <div className="flex flex-col gap-2 sm:flex-row sm:items-center sm:gap-4">
        <Button type="submit" size="lg" icon={<UploadIcon />} loading={upload.isPending} className="shrink-0 whitespace-nowrap">
          {upload.isPending ? 'Uploading…' : 'Upload and check'}
        </Button>
        <p className="text-sm text-ink-600">Nothing is written yet: the file is checked first, and you see every problem before you decide.</p>
      </div>
    </form>
  );
}

function SiteSelect({ error, registration }: { error?: string; registration: UseFormRegisterReturn }) {
  const sites = useSites();
  if (sites.isPending) {
    return (
      <div role="status" className="flex flex-col gap-1.5">
        <span className="font-semibold text-ink-900">Site</span>
        <span className="sr-only">Loading your sites…</span>
        <Skeleton className="h-12" />
      </div>
    );
  }
  if (sites.isError) return <ErrorState title="Your sites could not be loaded" error={sites.error} onRetry={() => void sites.refetch()} retrying={sites.isFetching} />;
  if (sites.data.length === 0) return <Alert tone="info" title="No site to import into">Ask an administrator to give you access to a site first.</Alert>;
  return (
    <SelectField
      label="Site"
      hint="The rows' positions and stock belong to this site."
      placeholder="Choose a site"
      options={sites.data.map((s) => ({ value: s.id, label: `${s.name} (${s.code})` }))}
      error={error}
      {...registration}
    />
  );
}

function FileDrop({ file, error, onFile }: { file: File | null; error?: string; onFile: (file: File | null | undefined) => void }) {
  const inputId = useId();
  const errorId = `${inputId}-error`;
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setOver(false);
    onFile(event.dataTransfer.files[0]);
  };
  return (
    <div className="flex flex-col gap-1.5">
      <span className="text-lg font-semibold text-ink-900" id={`${inputId}-label`}>
        The file
      </span>
      <div
        onDragOver={(event) => {
          event.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        className={cn(
          'flex flex-col items-start gap-3 rounded-[var(--radius-card)] border-2 border-dashed px-5 py-5 sm:flex-row sm:items-center',
          over ? 'border-copper-700 bg-copper-50' : error ? 'border-danger-700 bg-danger-50' : 'border-ink-400 bg-ink-50',
        )}
      >
        <SheetIcon className="size-10 shrink-0 text-ink-600" />
        <div className="flex min-w-0 flex-1 flex-col">
          {file ? (
            <>
              <span className="font-semibold text-ink-950 [overflow-wrap:anywhere]">{file.name}</span>
              <span className="text-sm text-ink-700">{formatBytes(file.size)} · ready to upload</span>
            </>
          ) : (
            <>
              <span className="font-semibold text-ink-950">Drop a CSV file here, or choose one</span>
              <span className="text-sm text-ink-700">
                UTF-8, comma or semicolon separated; at most {formatBytes(IMPORT_LIMITS.maxBytes)} and {IMPORT_LIMITS.maxRows.toLocaleString()} rows.
              </span>
            </>
          )}
        </div>
        <label htmlFor={inputId} className="inline-flex min-h-11 cursor-pointer items-center justify-center rounded-[var(--radius-control)] border-2 border-ink-400 bg-white px-4 font-semibold text-ink-900 hover:border-ink-600 hover:bg-ink-50 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-copper-500">
          {file ? 'Choose another file' : 'Choose a file'}
          <input
            ref={input}
            id={inputId}
            type="file"
            accept=".csv,text/csv,text/plain"
            className="sr-only"
            aria-labelledby={`${inputId}-label`}
            aria-describedby={error ? errorId : undefined}
            aria-invalid={error ? true : undefined}
            onChange={(event) => {
              onFile(event.target.files?.[0]);
              // The same file may be picked again after it is corrected.
              if (input.current) input.current.value = '';
            }}
          />
        </label>
      </div>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
