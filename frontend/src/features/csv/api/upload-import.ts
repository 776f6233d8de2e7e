import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiErrorBody } from '@shared/schemas/common.schema';
import type { ImportJobDto, ImportKind } from '@shared/schemas/csv.schema';
import { ApiError } from '@/lib/api-client';
import { importKeys } from './import-keys';

export interface UploadImportInput {
  kind: ImportKind;
  siteId?: string;
  file: File;
}

/** Sends the file as a multipart form; the server answers at once with the job it checks in the background. */
export async function uploadImport({ kind, siteId, file }: UploadImportInput): Promise<ImportJobDto> {
  const form = new FormData();
  form.set('kind', kind);
  if (siteId) form.set('siteId', siteId);
  form.set('file', file, file.name);
  let response: Response;
  try {
    response = await fetch('/api/imports', { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Ferrule could not reach the server. Check the connection and try again.' });
  }
  const body = (await response.json().catch(() => null)) as ({ data: ImportJobDto } & Partial<ApiErrorBody>) | null;
  if (!response.ok || !body?.data) {
    throw new ApiError({
      status: response.status,
      code: body?.error?.code ?? `http_${response.status}`,
      message: body?.error?.message ?? 'The file could not be uploaded. Try again.',
      field: body?.error?.field,
    });
  }
  return body.data;
}

export function useUploadImport({ onSuccess }: { onSuccess?: (job: ImportJobDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadImport,
    onSuccess: (job) => {
      queryClient.setQueryData(importKeys.detail(job.id), job);
      void queryClient.invalidateQueries({ queryKey: importKeys.lists() });
      onSuccess?.(job);
    },
  });
}
