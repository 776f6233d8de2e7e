import { useMutation } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';

/** The export's address for the register's query string; paging does not apply to a download. */
export function exportHref(search: string | URLSearchParams): string {
  const params = new URLSearchParams(search);
  params.delete('page');
  params.delete('pageSize');
  const query = params.toString();
  return query ? `/api/assemblies/export?${query}` : '/api/assemblies/export';
}

function fileNameOf(disposition: string | null): string {
  const match = disposition ? /filename="([^"]+)"/.exec(disposition) : null;
  return match?.[1] ?? 'ferrule-register.csv';
}

/** Fetches the register's view as CSV and hands it to the browser as a download. */
export async function downloadAssemblyExport(search: string | URLSearchParams): Promise<string> {
  let response: Response;
  try {
    response = await fetch(exportHref(search), { credentials: 'same-origin', headers: { Accept: 'text/csv' } });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Ferrule could not reach the server. Check the connection and try again.' });
  }
  if (!response.ok) {
    const body = (await response.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
    throw new ApiError({ status: response.status, code: body?.error?.code ?? `http_${response.status}`, message: body?.error?.message ?? 'The export could not be made. Try again.' });
  }
  const blob = await response.blob();
  const name = fileNameOf(response.headers.get('Content-Disposition'));
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the file's address goes away.
  window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return name;
}

export function useDownloadAssemblyExport({ onSuccess, onError }: { onSuccess?: (fileName: string) => void; onError?: (error: unknown) => void } = {}) {
  return useMutation({ mutationFn: downloadAssemblyExport, onSuccess, onError });
}
