import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportJobDto } from '@shared/schemas/csv.schema';
import { api } from '@/lib/api-client';
import { importKeys } from './import-keys';

/** Asks the server to write a checked, clean import; it answers at once and writes in the background. */
export function writeImport(id: string): Promise<ImportJobDto> {
  return api.post<{ data: ImportJobDto }>(`/api/imports/${encodeURIComponent(id)}/write`).then((body) => body.data);
}

export function useWriteImport({ onSuccess }: { onSuccess?: (job: ImportJobDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: writeImport,
    onSuccess: (job) => {
      queryClient.setQueryData(importKeys.detail(job.id), job);
      void queryClient.invalidateQueries({ queryKey: importKeys.lists() });
      onSuccess?.(job);
    },
  });
}
